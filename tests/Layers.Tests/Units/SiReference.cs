namespace Layers.Tests.Units;

/// <summary>
/// Conversion factors written down from the SI definitions, independently of the unit table under test.
/// Source: BIPM, The International System of Units (SI Brochure), 9th ed., 2019.
/// </summary>
internal static class SiReference
{
    // SI Brochure, Table 7 (SI prefixes).
    public const double Kilo = 1e3;
    public const double Deci = 1e-1;
    public const double Centi = 1e-2;
    public const double Milli = 1e-3;
    public const double Micro = 1e-6;
    public const double Nano = 1e-9;

    // SI Brochure, Table 8 (non-SI units accepted for use with the SI): min, h, d and L.
    public const double MinuteInSeconds = 60;
    public const double HourInSeconds = 3600;
    public const double DayInSeconds = 86400;
    public const double LitreInCubicMetres = 1e-3;

    // SI Brochure, section 2.3.1 and Table 4: t/°C = T/K - 273.15.
    public const double CelsiusZeroInKelvin = 273.15;

    // The kilogram is the base unit, so the gram carries the factor 1e-3.
    public const double GramInKilograms = 1e-3;

    public static IReadOnlyDictionary<string, double> Lengths { get; } = new Dictionary<string, double>
    {
        ["m"] = 1,
        ["dm"] = Deci,
        ["cm"] = Centi,
        ["mm"] = Milli,
        ["um"] = Micro,
        ["nm"] = Nano,
    };

    public static IReadOnlyDictionary<string, double> Areas { get; } = new[] { "m", "dm", "cm", "mm", "um" }
        .ToDictionary(length => length + "2", length => Lengths[length] * Lengths[length]);

    public static IReadOnlyDictionary<string, double> Volumes { get; } = new Dictionary<string, double>
    {
        ["m3"] = 1,
        ["dm3"] = Deci * Deci * Deci,
        ["cm3"] = Centi * Centi * Centi,
        ["mm3"] = Milli * Milli * Milli,
        ["L"] = LitreInCubicMetres,
        ["dL"] = Deci * LitreInCubicMetres,
        ["mL"] = Milli * LitreInCubicMetres,
        ["uL"] = Micro * LitreInCubicMetres,
    };

    public static IReadOnlyDictionary<string, double> Masses { get; } = new Dictionary<string, double>
    {
        ["kg"] = 1,
        ["g"] = GramInKilograms,
        ["mg"] = Milli * GramInKilograms,
        ["ug"] = Micro * GramInKilograms,
        ["ng"] = Nano * GramInKilograms,
    };

    /// <summary>The time units that rates (per second, per hour …) are written with.</summary>
    public static IReadOnlyDictionary<string, double> RateTimes { get; } = new Dictionary<string, double>
    {
        ["s"] = 1,
        ["min"] = MinuteInSeconds,
        ["h"] = HourInSeconds,
        ["d"] = DayInSeconds,
    };

    public static void AssertClose(double expected, double actual, double relativeTolerance = 1e-12) =>
        Assert.Equal(expected, actual, Math.Abs(expected) * relativeTolerance);
}
