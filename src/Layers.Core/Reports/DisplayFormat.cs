using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Reports;

/// <summary>Formats SI values in the units the user wrote the case in.</summary>
internal sealed class DisplayFormat(DisplayUnits units)
{
    public string Time(double seconds) => QuantityParser.FormatSi(seconds, units.Time);

    public string Depth(double meters) => QuantityParser.FormatSi(meters, units.Depth);

    public string Concentration(double kgPerCubicMeter) => QuantityParser.FormatSi(kgPerCubicMeter, units.Concentration);

    public string MassPerArea(double kgPerSquareMeter) => QuantityParser.FormatSi(kgPerSquareMeter, units.MassPerArea);

    public string Flux(double kgPerSquareMeterSecond)
    {
        var perTime = kgPerSquareMeterSecond * units.Time.FactorToSi;
        return $"{QuantityParser.FormatSi(perTime, units.MassPerArea)}/{units.Time.Symbol}";
    }

    public static string Percent(double fraction) => (100 * fraction).ToString("F1", CultureInfo.InvariantCulture) + " %";

    public static string Number(double value) => value.ToString("G4", CultureInfo.InvariantCulture);
}
