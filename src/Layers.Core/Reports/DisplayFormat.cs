using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Core.Units;

namespace Layers.Core.Reports;

/// <summary>Formats SI values in the units the user wrote the case in.</summary>
internal sealed class DisplayFormat(DisplayUnits units)
{
    /// <summary>A time in the run's unit, or in a smaller one named beside it when it is far below the run's unit (<see cref="DisplayUnitRules.TimeFigure"/>).</summary>
    public string Time(double seconds) => Shown(seconds, DisplayUnitRules.TimeFigure(seconds, units.Time));

    public string Depth(double meters) => Shown(meters, units.Depth);

    public string Concentration(double kgPerCubicMeter) => Shown(kgPerCubicMeter, units.Concentration);

    public string MassPerArea(double kgPerSquareMeter) => Shown(kgPerSquareMeter, units.MassPerArea);

    public string Flux(double kgPerSquareMeterSecond) => Shown(kgPerSquareMeterSecond, units.Flux);

    /// <summary>
    /// A face medium's concentration: as a mass fraction (mg/kg of food) where the display asks for one and the
    /// medium's density is known, else as mass per volume.
    /// </summary>
    public string MediumConcentration(double kgPerCubicMeter, double? densityKgPerCubicMeter)
        => units.MediumMassFraction is { } fraction && densityKgPerCubicMeter is { } density
            ? Shown(kgPerCubicMeter / density, fraction)
            : Concentration(kgPerCubicMeter);

    public string TimeValue(double seconds) => Number(units.Time.FromSi(seconds));

    public string MassPerAreaValue(double kgPerSquareMeter) => Number(units.MassPerArea.FromSi(kgPerSquareMeter));

    public string MediumConcentration(double kgPerCubicMeter, FaceCondition face)
        => MediumConcentration(kgPerCubicMeter, (face as CompartmentFace)?.DensityKgPerCubicMeter);

    public string MediumConcentrationValue(double kgPerCubicMeter, FaceCondition face)
        => MediumConcentration(kgPerCubicMeter, face).Split(' ')[0];

    public string MediumConcentrationUnit(FaceCondition face)
        => units.MediumMassFraction is { } fraction && (face as CompartmentFace)?.DensityKgPerCubicMeter is not null
            ? fraction.ForPeople
            : units.Concentration.ForPeople;

    public static string Percent(double fraction) => (100 * fraction).ToString("F1", CultureInfo.InvariantCulture) + " %";

    /// <summary>A value in SI in a unit, four significant digits, with the unit as people spell it ("12.5 µg/cm2").</summary>
    public static string Shown(double siValue, UnitDefinition unit) => Number(unit.FromSi(siValue)) + " " + unit.ForPeople;

    /// <summary>A floor shown in place of a figure below it: the number shown rounded up to one significant digit ("2E-05" for 1.4E-05).</summary>
    public static string Floor(string shownNumber) =>
        NegligibleFloor.RoundedUp(double.Parse(shownNumber, CultureInfo.InvariantCulture)).ToString("G1", CultureInfo.InvariantCulture);

    /// <summary>
    /// A figure as a table for people shows it: <paramref name="shown"/> of the value, or "&lt; floor" in its place when
    /// it lies below the run's reporting floor, where it has no known accuracy (<see cref="NegligibleFloor"/>).
    /// </summary>
    public static string OrFloor(double value, double? floor, Func<double, string> shown)
        => NegligibleFloor.Hides(value, floor) ? "< " + Floor(shown(floor!.Value)) : shown(value);

    /// <summary>A number as the console tables show it: four significant digits, invariant culture.</summary>
    public static string Number(double value) => value.ToString("G4", CultureInfo.InvariantCulture);
}
