using System.Collections.ObjectModel;
using System.Diagnostics.CodeAnalysis;
using System.Text;

namespace Layers.Core.Units;

/// <summary>
/// The single source of truth for accepted unit symbols. Every entry has one canonical symbol;
/// alternative spellings (µm, μm, cm²/s, cm^2/s, ml, hours, °C, wt% …) resolve to it so that messages
/// and output always show the canonical form.
/// </summary>
/// <remarks>
/// Factors follow the SI definitions (BIPM, The International System of Units, 9th ed., 2019):
/// decimal prefixes from its Table 7; minute, hour, day and litre from its Table 8; degree Celsius from
/// Table 4. Composite units (area per time, mass per volume, …) are generated from the same parts, so a
/// prefix is written once and every pairing of the parts is accepted.
/// </remarks>
public static class UnitTable
{
    private const double Minute = 60;
    private const double Hour = 60 * Minute;
    private const double Day = 24 * Hour;

    // Week and year are conventions rather than SI units (common practice, no source); the Julian year
    // keeps long storage times independent of where leap years fall.
    private const double Week = 7 * Day;
    private const double JulianYear = 365.25 * Day;

    // The mil, a thousandth of the 25.4 mm inch, is how film gauges are often quoted in packaging
    // (common practice, no source).
    private const double Mil = 25.4e-6;

    // Thermochemical calorie, 4.184 J exactly; activation energies are often tabulated in kcal/mol.
    private const double ThermochemicalCalorie = 4.184;

    private const double CelsiusZero = 273.15;

    private static readonly Part[] Lengths =
    [
        new("m", 1), new("dm", 1e-1), new("cm", 1e-2), new("mm", 1e-3), new("um", 1e-6), new("nm", 1e-9),
    ];

    private static readonly Part[] Areas =
    [
        new("m2", 1), new("dm2", 1e-2), new("cm2", 1e-4), new("mm2", 1e-6), new("um2", 1e-12),
    ];

    private static readonly Part[] Volumes =
    [
        new("m3", 1), new("dm3", 1e-3), new("cm3", 1e-6), new("mm3", 1e-9),
        new("L", 1e-3, "l"), new("dL", 1e-4, "dl"), new("mL", 1e-6, "ml"), new("uL", 1e-9, "ul"),
    ];

    private static readonly Part[] Times =
    [
        new("s", 1, "sec", "second", "seconds"),
        new("min", Minute, "minute", "minutes"),
        new("h", Hour, "hr", "hour", "hours"),
        new("d", Day, "day", "days"),
        new("wk", Week, "week", "weeks"),
        new("y", JulianYear, "yr", "year", "years"),
    ];

    // Rates are only written per second, minute, hour or day; "cm2/weeks" would be noise in suggestions.
    private static readonly Part[] RateTimes =
    [
        new("s", 1, "sec"), new("min", Minute), new("h", Hour, "hr"), new("d", Day, "day"),
    ];

    private static readonly Part[] Masses =
    [
        new("kg", 1), new("g", 1e-3), new("mg", 1e-6), new("ug", 1e-9), new("ng", 1e-12),
    ];

    private static readonly Part[] MassFractions =
    [
        new("kg/kg", 1), new("g/kg", 1e-3), new("mg/kg", 1e-6), new("ug/kg", 1e-9), new("ng/kg", 1e-12),
        new("g/g", 1), new("mg/g", 1e-3), new("ug/g", 1e-6), new("ng/g", 1e-9),
        new("ppm", 1e-6), new("ppb", 1e-9), new("% w/w", 1e-2, "%w/w", "wt%"),
    ];

    private static readonly Part[] MolarEnergies =
    [
        new("J/mol", 1), new("kJ/mol", 1e3), new("kcal/mol", 1e3 * ThermochemicalCalorie),
    ];

    private static readonly Catalog Table = BuildCatalog();

    private static readonly Dictionary<Dimension, ReadOnlyCollection<string>> Examples = new()
    {
        [Dimension.Dimensionless] = Array.AsReadOnly(Array.Empty<string>()),
        [Dimension.Length] = Array.AsReadOnly(["um", "mm", "cm", "m"]),
        [Dimension.Area] = Array.AsReadOnly(["cm2", "dm2", "m2"]),
        [Dimension.Volume] = Array.AsReadOnly(["mL", "L", "cm3", "m3"]),
        [Dimension.Time] = Array.AsReadOnly(["s", "min", "h", "d", "y"]),
        [Dimension.Mass] = Array.AsReadOnly(["ug", "mg", "g", "kg"]),
        [Dimension.Diffusivity] = Array.AsReadOnly(["m2/s", "cm2/s", "um2/s"]),
        [Dimension.MassConcentration] = Array.AsReadOnly(["kg/m3", "g/cm3", "mg/L", "ug/mL"]),
        [Dimension.MassFraction] = Array.AsReadOnly(["mg/kg", "ppm", "ug/kg", "% w/w"]),
        [Dimension.Velocity] = Array.AsReadOnly(["m/s", "cm/s", "cm/h"]),
        [Dimension.MassPerArea] = Array.AsReadOnly(["mg/dm2", "ug/cm2", "g/m2"]),
        [Dimension.MassFlux] = Array.AsReadOnly(["ug/cm2/h", "mg/dm2/d", "kg/m2/s"]),
        [Dimension.Temperature] = Array.AsReadOnly(["degC", "K"]),
        [Dimension.MolarEnergy] = Array.AsReadOnly(["kJ/mol", "J/mol", "kcal/mol"]),
    };

    /// <summary>All canonical entries, grouped by dimension in declaration order (for generated docs).</summary>
    public static IReadOnlyList<UnitDefinition> All => Table.Canonical;

    /// <summary>Looks up a unit after normalising its spelling.</summary>
    /// <param name="symbol">
    /// A unit symbol; surrounding whitespace is ignored, µ (U+00B5) and μ (U+03BC) read as u,
    /// ² and ³ as 2 and 3, and '^' is dropped. Otherwise matching is case-sensitive (mL, but not ML).
    /// </param>
    /// <param name="unit">The canonical entry when found.</param>
    /// <returns>True when the symbol names a known unit.</returns>
    public static bool TryFind(string symbol, [MaybeNullWhen(false)] out UnitDefinition unit)
    {
        unit = null;
        return symbol is not null && Table.BySpelling.TryGetValue(Normalize(symbol), out unit);
    }

    /// <summary>Looks up a unit and fails loudly when it is unknown.</summary>
    /// <param name="symbol">A unit symbol, normalised as in <see cref="TryFind"/>.</param>
    /// <returns>The canonical entry.</returns>
    /// <exception cref="ArgumentException">The symbol is unknown; the message lists the accepted units.</exception>
    public static UnitDefinition Get(string symbol)
    {
        if (TryFind(symbol, out var unit))
        {
            return unit;
        }

        throw new ArgumentException(
            $"Unknown unit '{symbol}'. Accepted units: {AcceptedList()}.", nameof(symbol));
    }

    /// <summary>
    /// The SI unit of a dimension as this table writes it: its first canonical entry with factor 1 and no offset
    /// (kg/m2, kg/m2/s, kg/kg, s ...), so results labelled "SI" use the same symbols as everything a case may write.
    /// </summary>
    /// <param name="dimension">Any dimension but <see cref="Dimension.Dimensionless"/>, which has no symbol.</param>
    /// <exception cref="ArgumentOutOfRangeException">The dimension has no unit in the table.</exception>
    public static UnitDefinition SiUnit(Dimension dimension) =>
        All.FirstOrDefault(unit => unit.Dimension == dimension && unit.FactorToSi == 1 && unit.OffsetToSi == 0)
            ?? throw new ArgumentOutOfRangeException(nameof(dimension), dimension, "No SI unit in the table for this dimension.");

    /// <summary>The most common canonical symbols of a dimension, most useful first, for messages.</summary>
    /// <param name="dimension">The dimension.</param>
    /// <returns>
    /// Two to five symbols; empty for <see cref="Dimension.Dimensionless"/>, which is written without unit.
    /// </returns>
    public static IReadOnlyList<string> ExamplesFor(Dimension dimension) =>
        Examples.TryGetValue(dimension, out var examples)
            ? examples
            : throw new ArgumentOutOfRangeException(nameof(dimension), dimension, "Unknown dimension.");

    /// <summary>
    /// Canonical symbols whose spelling is closest to an unknown symbol, best first; among equally close
    /// ones, units of a preferred dimension come first.
    /// </summary>
    internal static IReadOnlyList<string> ClosestSymbols(
        string symbol, IReadOnlyCollection<Dimension>? preferred = null, int maxCount = 3)
    {
        var normalized = Normalize(symbol);
        // One edit is plenty for short symbols, and a suggestion must keep at least one typed character:
        // otherwise "%" would be "one edit from" every single-letter unit.
        var limit = Math.Min(normalized.Length <= 4 ? 1 : 2, normalized.Length - 1);
        var closest = Table.Spellings
            .Select(entry => (entry.Unit, Distance: SpellingDistance(normalized, entry.Spelling)))
            .Where(candidate => candidate.Distance <= limit)
            .OrderBy(candidate => candidate.Distance)
            .ThenBy(candidate => preferred?.Contains(candidate.Unit.Dimension) == true ? 0 : 1)
            .Select(candidate => candidate.Unit.Symbol)
            .Distinct(StringComparer.Ordinal)
            .Take(maxCount);
        return [.. closest];
    }

    internal static string Normalize(string symbol)
    {
        var builder = new StringBuilder(symbol.Length);
        foreach (var c in symbol.Trim())
        {
            switch (c)
            {
                case '\u00B5' or '\u03BC':
                    builder.Append('u');
                    break;
                case '\u00B2':
                    builder.Append('2');
                    break;
                case '\u00B3':
                    builder.Append('3');
                    break;
                case '^':
                    break;
                default:
                    builder.Append(c);
                    break;
            }
        }

        return builder.ToString();
    }

    // A wrong case ("ML", "Kg") is the likeliest slip, so it ranks before any real edit.
    private static int SpellingDistance(string typed, string spelling) =>
        string.Equals(typed, spelling, StringComparison.OrdinalIgnoreCase)
            ? 0
            : EditDistance.Between(typed, spelling);

    private static string AcceptedList() =>
        string.Join("; ", All
            .GroupBy(unit => unit.Dimension)
            .Select(group => group.Key + ": " + string.Join(", ", group.Select(unit => unit.Symbol))));

    private static Catalog BuildCatalog()
    {
        var catalog = new Catalog();
        // The mil stays out of the composites: nobody writes a rate or a flux per mil.
        catalog.AddParts(Dimension.Length, [.. Lengths, new Part("mil", Mil)]);
        catalog.AddParts(Dimension.Area, Areas);
        catalog.AddParts(Dimension.Volume, Volumes);
        catalog.AddParts(Dimension.Time, Times);
        catalog.AddParts(Dimension.Mass, Masses);
        catalog.AddRatios(Dimension.Diffusivity, Areas, RateTimes);
        catalog.AddRatios(Dimension.MassConcentration, Masses, Volumes);
        catalog.AddParts(Dimension.MassFraction, MassFractions);
        catalog.AddRatios(Dimension.Velocity, Lengths, RateTimes);
        catalog.AddRatios(Dimension.MassPerArea, Masses, Areas);
        catalog.AddFluxes(Masses, Areas, RateTimes);
        catalog.Add(new UnitDefinition("K", Dimension.Temperature, 1), []);
        catalog.Add(new UnitDefinition("degC", Dimension.Temperature, 1, CelsiusZero), ["C", "\u00B0C", "\u2103"]);
        catalog.AddParts(Dimension.MolarEnergy, MolarEnergies);
        return catalog;
    }

    private sealed record Part(string Symbol, double Factor, params string[] Aliases)
    {
        public IEnumerable<string> Spellings => [Symbol, .. Aliases];
    }

    private sealed class Catalog
    {
        private readonly List<UnitDefinition> _canonical = [];

        public Catalog() => Canonical = _canonical.AsReadOnly();

        public ReadOnlyCollection<UnitDefinition> Canonical { get; }

        public Dictionary<string, UnitDefinition> BySpelling { get; } = new(StringComparer.Ordinal);

        // Kept in insertion order so that suggestions prefer the commoner units declared first.
        public List<(string Spelling, UnitDefinition Unit)> Spellings { get; } = [];

        public void AddParts(Dimension dimension, IEnumerable<Part> parts)
        {
            foreach (var part in parts)
            {
                Add(new UnitDefinition(part.Symbol, dimension, part.Factor), part.Aliases);
            }
        }

        public void AddRatios(Dimension dimension, Part[] numerators, Part[] denominators)
        {
            foreach (var top in numerators)
            {
                foreach (var bottom in denominators)
                {
                    var aliases = top.Spellings
                        .SelectMany(t => bottom.Spellings.Select(b => t + "/" + b))
                        .Skip(1);
                    Add(new UnitDefinition(
                        top.Symbol + "/" + bottom.Symbol, dimension, top.Factor / bottom.Factor), aliases);
                }
            }
        }

        public void AddFluxes(Part[] masses, Part[] areas, Part[] times)
        {
            foreach (var mass in masses)
            {
                foreach (var area in areas)
                {
                    foreach (var time in times)
                    {
                        AddFlux(mass, area, time);
                    }
                }
            }
        }

        public void Add(UnitDefinition unit, IEnumerable<string> aliases)
        {
            _canonical.Add(unit);
            Register(unit.Symbol, unit);
            foreach (var alias in aliases)
            {
                Register(alias, unit);
            }
        }

        private void AddFlux(Part mass, Part area, Part time)
        {
            var spellings = time.Spellings
                .SelectMany(t => new[] { $"{mass.Symbol}/{area.Symbol}/{t}", $"{mass.Symbol}/({area.Symbol} {t})" })
                .Skip(1);
            var factor = mass.Factor / area.Factor / time.Factor;
            var symbol = $"{mass.Symbol}/{area.Symbol}/{time.Symbol}";
            Add(new UnitDefinition(symbol, Dimension.MassFlux, factor), spellings);
        }

        // Both checks guard the table itself: a clash or an unreachable spelling is a programming error.
        private void Register(string spelling, UnitDefinition unit)
        {
            if (Normalize(spelling) != spelling)
            {
                throw new InvalidOperationException($"Unit spelling '{spelling}' would never match after normalising.");
            }

            if (!BySpelling.TryAdd(spelling, unit))
            {
                throw new InvalidOperationException(
                    $"Unit spelling '{spelling}' is claimed by both {BySpelling[spelling].Symbol} and {unit.Symbol}.");
            }

            Spellings.Add((spelling, unit));
        }
    }
}
