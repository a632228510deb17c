using System.Globalization;
using System.Text;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Plotting;

/// <summary>Numbers, times and unit symbols as the plots print them: invariant culture, typographic symbols.</summary>
internal static class DisplayText
{
    private const string Superscripts = "\u2070\u00B9\u00B2\u00B3\u2074\u2075\u2076\u2077\u2078\u2079";

    /// <summary>
    /// A unit symbol as printed on a plot: u as micro sign at the start of a unit (um, ug, uL), 2 and 3 after a
    /// letter as superscripts (dm2, m3), degC as a degree sign.
    /// </summary>
    public static string Unit(UnitDefinition unit) => Unit(unit.Symbol);

    /// <inheritdoc cref="Unit(UnitDefinition)"/>
    public static string Unit(string symbol)
    {
        if (symbol == "degC")
        {
            return "\u00B0C";
        }

        var builder = new StringBuilder(symbol.Length);
        for (var i = 0; i < symbol.Length; i++)
        {
            var c = symbol[i];
            var startsUnit = i == 0 || symbol[i - 1] is '/' or '(' or ' ';
            var afterLetter = i > 0 && char.IsAsciiLetter(symbol[i - 1]);
            if (c == 'u' && startsUnit && i + 1 < symbol.Length && char.IsAsciiLetter(symbol[i + 1]))
            {
                builder.Append('\u00B5');
            }
            else if (c is '2' or '3' && afterLetter)
            {
                builder.Append(Superscripts[c - '0']);
            }
            else
            {
                builder.Append(c);
            }
        }

        return builder.ToString();
    }

    /// <summary>The case's concentration unit when it is a mass per volume, else kg/m3.</summary>
    public static UnitDefinition ConcentrationUnit(DisplayUnits display) =>
        display.Concentration.Dimension == Dimension.MassConcentration ? display.Concentration : UnitTable.Get("kg/m3");

    /// <summary>The case's mass-per-area unit when it is one, else kg/m2.</summary>
    public static UnitDefinition MassPerAreaUnit(DisplayUnits display) =>
        display.MassPerArea.Dimension == Dimension.MassPerArea ? display.MassPerArea : UnitTable.Get("kg/m2");

    /// <summary>
    /// A time in the run's one unit (<c>display.time</c>), three significant digits: "2 h", "240 h"; a figure far below
    /// that unit in a smaller one, named beside it (<see cref="DisplayUnitRules.TimeFigure"/>), as on the console.
    /// </summary>
    public static string Time(double seconds, UnitDefinition runUnit)
    {
        var unit = DisplayUnitRules.TimeFigure(seconds, runUnit);
        return Quantity(unit.FromSi(seconds), unit);
    }

    /// <summary>
    /// A value in a unit with three significant digits, e.g. "0.458 mg/dm²"; the space is a no-break space so that
    /// wrapped lines never part a number from its unit.
    /// </summary>
    public static string Quantity(double value, UnitDefinition unit) => Number(value) + "\u00A0" + Unit(unit);

    /// <summary>A number with three significant digits, in plain or power-of-ten notation.</summary>
    public static string Number(double value)
    {
        if (value == 0 || !double.IsFinite(value))
        {
            return value.ToString(CultureInfo.InvariantCulture);
        }

        // "G3" writes 1115 as 1.12E+03; rounding first and printing plainly gives 1120.
        var scale = Math.Pow(10, Math.Floor(Math.Log10(Math.Abs(value))) - 2);
        var rounded = Math.Round(value / scale) * scale;
        return Math.Abs(rounded) is < 1e-3 or >= 1e5
            ? PowerOfTen(value, "G3")
            : rounded.ToString("G6", CultureInfo.InvariantCulture);
    }

    /// <summary>An axis tick label: plain notation between 0.001 and 100000, power-of-ten notation outside.</summary>
    public static string Tick(double value) => Tick(value, NeedsPowerOfTen(value));

    /// <summary>
    /// An axis tick label in the notation chosen for its whole axis (<see cref="AxisTicks"/>): power-of-ten notation
    /// when <paramref name="powersOfTen"/> (1 as 10⁰), else plain; zero is "0" either way.
    /// </summary>
    public static string Tick(double value, bool powersOfTen)
    {
        var rounded = TickValue(value);
        if (rounded == 0 || !powersOfTen)
        {
            return rounded.ToString("G10", CultureInfo.InvariantCulture);
        }

        return PowerOfTen(rounded, "G6");
    }

    /// <summary>Whether a tick value reads badly in plain notation: below 0.001 or from 100000 on, zero excepted.</summary>
    public static bool NeedsPowerOfTen(double value)
    {
        var magnitude = Math.Abs(TickValue(value));
        return magnitude != 0 && magnitude is < 1e-3 or >= 1e5;
    }

    // Tick values are sums of steps and carry rounding noise (0.30000000000000004); 12 digits drop it.
    private static double TickValue(double value) =>
        double.Parse(value.ToString("G12", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>A percentage with as many decimals as needed to tell 99 % from 99.9 %.</summary>
    public static string Percent(double fraction) =>
        (100 * fraction).ToString("0.#", CultureInfo.InvariantCulture) + "\u00A0%";

    private static string PowerOfTen(double value, string mantissaFormat)
    {
        var exponent = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        var mantissa = value / Math.Pow(10, exponent);
        // Rounding the mantissa can reach 10 (9.996 -> "10"); carry it into the exponent.
        if (Math.Abs(double.Parse(mantissa.ToString(mantissaFormat, CultureInfo.InvariantCulture), CultureInfo.InvariantCulture)) >= 10)
        {
            exponent++;
            mantissa /= 10;
        }

        var power = "10" + Superscript(exponent);
        var mantissaText = mantissa.ToString(mantissaFormat, CultureInfo.InvariantCulture);
        return mantissaText switch
        {
            "1" => power,
            "-1" => "\u2212" + power,
            _ => mantissaText + "\u00D7" + power,
        };
    }

    private static string Superscript(int exponent)
    {
        var builder = new StringBuilder();
        if (exponent < 0)
        {
            builder.Append('\u207B');
        }

        foreach (var digit in Math.Abs(exponent).ToString(CultureInfo.InvariantCulture))
        {
            builder.Append(Superscripts[digit - '0']);
        }

        return builder.ToString();
    }
}
