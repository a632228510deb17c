using System.Globalization;

namespace Layers.Core.Units;

/// <summary>
/// Reads quantities such as "50 um", "1e-9 cm2/s" or "10 d" from case files and formats SI values for
/// output. Numbers are always read and written in invariant culture, whatever the machine's locale.
/// </summary>
public static class QuantityParser
{
    private const string GeneralExample = "'50 um'";
    private const string GeneralUnitExamples = "units look like um, cm2/s, d, mg/kg, g/cm3, degC";

    // One typical value per dimension, so that a message shows a complete quantity rather than a bare unit.
    private static readonly Dictionary<Dimension, string> Samples = new()
    {
        [Dimension.Dimensionless] = "0.5",
        [Dimension.Length] = "50 um",
        [Dimension.Area] = "6 dm2",
        [Dimension.Volume] = "1 L",
        [Dimension.Time] = "10 d",
        [Dimension.Mass] = "1 g",
        [Dimension.Diffusivity] = "1e-9 cm2/s",
        [Dimension.MassConcentration] = "0.92 g/cm3",
        [Dimension.MassFraction] = "1000 mg/kg",
        [Dimension.Velocity] = "1e-4 cm/s",
        [Dimension.MassPerArea] = "10 mg/dm2",
        [Dimension.MassFlux] = "1 ug/cm2/h",
        [Dimension.Temperature] = "40 degC",
        [Dimension.MolarEnergy] = "80 kJ/mol",
    };

    private static readonly Dictionary<Dimension, string> Descriptions = new()
    {
        [Dimension.Dimensionless] = "a dimensionless number (a plain number without unit)",
        [Dimension.Length] = "a length",
        [Dimension.Area] = "an area",
        [Dimension.Volume] = "a volume",
        [Dimension.Time] = "a time",
        [Dimension.Mass] = "a mass",
        [Dimension.Diffusivity] = "a diffusion coefficient (area per time)",
        [Dimension.MassConcentration] = "a mass concentration (mass per volume)",
        [Dimension.MassFraction] = "a mass fraction (mass per mass)",
        [Dimension.Velocity] = "a velocity or mass-transfer coefficient (length per time)",
        [Dimension.MassPerArea] = "a mass per area",
        [Dimension.MassFlux] = "a mass flux (mass per area per time)",
        [Dimension.Temperature] = "a temperature",
        [Dimension.MolarEnergy] = "a molar energy (energy per amount of substance)",
    };

    /// <summary>Parses a number followed by a unit, e.g. "50 um", "1e-9 cm2/s", "1.5E+3um".</summary>
    /// <param name="text">
    /// The text: a number in invariant culture (optional sign, decimal point, exponent), optional
    /// whitespace, then a unit symbol accepted by <see cref="UnitTable.TryFind"/>.
    /// </param>
    /// <param name="quantity">The parsed quantity on success; default otherwise.</param>
    /// <param name="error">
    /// On failure, a message for the user that quotes the text and says how to fix it; null on success.
    /// </param>
    /// <returns>True when the text is a finite number with a known unit.</returns>
    public static bool TryParse(string? text, out Quantity quantity, out string? error) =>
        TryParseCore(text, null, out quantity, out error);

    /// <summary>
    /// Parses like <see cref="TryParse(string?, out Quantity, out string?)"/> and also checks the dimension.
    /// </summary>
    /// <param name="text">The text, e.g. "1e-9 cm2/s".</param>
    /// <param name="expected">The dimensions the value may have; must not be empty.</param>
    /// <param name="quantity">The parsed quantity on success; default otherwise.</param>
    /// <param name="error">
    /// On failure, a message that says what was found and what was expected with example units,
    /// e.g. "'2 mm' is a length; expected a diffusion coefficient (area per time), e.g. 1e-9 cm2/s, m2/s, …";
    /// null on success.
    /// </param>
    /// <returns>True when the text parses and its dimension is one of <paramref name="expected"/>.</returns>
    /// <exception cref="ArgumentException"><paramref name="expected"/> is empty.</exception>
    public static bool TryParse(
        string? text, IReadOnlyCollection<Dimension> expected, out Quantity quantity, out string? error)
    {
        ArgumentNullException.ThrowIfNull(expected);
        if (expected.Count == 0)
        {
            throw new ArgumentException("At least one expected dimension is required.", nameof(expected));
        }

        if (!TryParseCore(text, expected, out quantity, out error))
        {
            return false;
        }

        if (expected.Contains(quantity.Dimension))
        {
            return true;
        }

        error = $"'{text!.Trim()}' is {Describe(quantity.Dimension)}; expected {DescribeExpected(expected)}";
        quantity = default;
        return false;
    }

    /// <summary>Describes a dimension in plain words for messages, with an article.</summary>
    /// <param name="dimension">The dimension.</param>
    /// <returns>E.g. "a length" or "a diffusion coefficient (area per time)".</returns>
    public static string Describe(Dimension dimension) =>
        Descriptions.TryGetValue(dimension, out var description)
            ? description
            : throw new ArgumentOutOfRangeException(nameof(dimension), dimension, "Unknown dimension.");

    /// <summary>Formats an SI value in a display unit, e.g. 5e-5 m in um gives "50 um".</summary>
    /// <param name="siValue">The value in the SI unit of the display unit's dimension.</param>
    /// <param name="displayUnit">The unit to show the value in.</param>
    /// <param name="significantDigits">Significant digits, 1 to 17, as in the "G" numeric format.</param>
    /// <returns>The converted value in invariant culture, a space, and the canonical symbol.</returns>
    public static string FormatSi(double siValue, UnitDefinition displayUnit, int significantDigits = 4)
    {
        ArgumentNullException.ThrowIfNull(displayUnit);
        ArgumentOutOfRangeException.ThrowIfLessThan(significantDigits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(significantDigits, 17);
        var format = "G" + significantDigits.ToString(CultureInfo.InvariantCulture);
        return displayUnit.FromSi(siValue).ToString(format, CultureInfo.InvariantCulture) + " " + displayUnit.Symbol;
    }

    /// <summary>A typical complete quantity of a dimension, e.g. "1e-9 cm2/s", used in messages.</summary>
    internal static string SampleFor(Dimension dimension) => Samples[dimension];

    private static bool TryParseCore(
        string? text, IReadOnlyCollection<Dimension>? expected, out Quantity quantity, out string? error)
    {
        quantity = default;
        var trimmed = text?.Trim() ?? string.Empty;
        error = trimmed.Length == 0
            ? $"a value is required: a number followed by a unit, e.g. {ExampleFor(expected)}"
            : ReadNumber(trimmed, expected, out var value, out var unitText)
              ?? ReadUnit(trimmed, unitText, value, expected, out quantity);
        return error is null;
    }

    private static string? ReadNumber(
        string text, IReadOnlyCollection<Dimension>? expected, out double value, out string unitText)
    {
        value = 0;
        var length = NumberLength(text);
        unitText = text[length..].TrimStart();
        if (length == 0)
        {
            return LooksNonFinite(text)
                ? $"'{text}': the value must be a finite number"
                : $"'{text}' does not start with a number; write a number followed by a unit, "
                  + $"e.g. {ExampleFor(expected)}";
        }

        if (!double.TryParse(text.AsSpan(0, length), NumberStyles.Float, CultureInfo.InvariantCulture, out value)
            || !double.IsFinite(value))
        {
            return $"'{text}': the number is out of range; the value must be a finite number";
        }

        if (unitText.StartsWith(','))
        {
            return $"'{text}': ',' is not allowed in numbers; "
                + "use '.' as the decimal separator and no thousands separator";
        }

        return unitText.Length == 0
            ? $"'{text}' has no unit; a unit is required, e.g. {ExampleFor(expected)}"
            : null;
    }

    private static string? ReadUnit(
        string text, string unitText, double value, IReadOnlyCollection<Dimension>? expected, out Quantity quantity)
    {
        if (UnitTable.TryFind(unitText, out var unit))
        {
            quantity = new Quantity(value, unit);
            return null;
        }

        quantity = default;
        var hint = expected is null ? GeneralUnitExamples : "expected " + DescribeExpected(expected);
        return $"'{text}': unknown unit '{unitText}'{DidYouMean(unitText, expected)}; {hint}";
    }

    // Scans an invariant-culture number by hand: digits are ASCII only, and an 'e' not followed by an
    // exponent belongs to the unit rather than the number.
    private static int NumberLength(string text)
    {
        var i = 0;
        if (i < text.Length && text[i] is '+' or '-')
        {
            i++;
        }

        var digits = SkipDigits(text, ref i);
        if (i < text.Length && text[i] == '.')
        {
            i++;
            digits += SkipDigits(text, ref i);
        }

        if (digits == 0)
        {
            return 0;
        }

        return i + ExponentLength(text, i);
    }

    private static int ExponentLength(string text, int start)
    {
        if (start >= text.Length || text[start] is not ('e' or 'E'))
        {
            return 0;
        }

        var i = start + 1;
        if (i < text.Length && text[i] is '+' or '-')
        {
            i++;
        }

        return SkipDigits(text, ref i) > 0 ? i - start : 0;
    }

    private static int SkipDigits(string text, ref int i)
    {
        var start = i;
        while (i < text.Length && char.IsAsciiDigit(text[i]))
        {
            i++;
        }

        return i - start;
    }

    private static bool LooksNonFinite(string text)
    {
        var unsigned = text.TrimStart('+', '-');
        return unsigned.StartsWith("nan", StringComparison.OrdinalIgnoreCase)
            || unsigned.StartsWith("inf", StringComparison.OrdinalIgnoreCase)
            || unsigned.StartsWith('\u221E');
    }

    private static string DidYouMean(string unitText, IReadOnlyCollection<Dimension>? expected)
    {
        var closest = UnitTable.ClosestSymbols(unitText, expected);
        return closest.Count == 0 ? string.Empty : " (did you mean " + JoinAlternatives(closest) + "?)";
    }

    private static string JoinAlternatives(IReadOnlyList<string> symbols)
    {
        var quoted = symbols.Select(symbol => "'" + symbol + "'").ToList();
        return quoted.Count == 1
            ? quoted[0]
            : string.Join(", ", quoted.Take(quoted.Count - 1)) + " or " + quoted[^1];
    }

    private static string ExampleFor(IReadOnlyCollection<Dimension>? expected) =>
        expected is null ? GeneralExample : "'" + SampleFor(expected.First()) + "'";

    private static string DescribeExpected(IReadOnlyCollection<Dimension> expected) =>
        string.Join("; or ", expected.Select(DescribeWithExamples));

    private static string DescribeWithExamples(Dimension dimension)
    {
        IEnumerable<string> examples = [SampleFor(dimension), .. UnitTable.ExamplesFor(dimension)];
        return Describe(dimension) + ", e.g. " + string.Join(", ", examples);
    }
}
