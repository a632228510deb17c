using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Chooses the units results are shown in. Without a <c>display</c> object the trade's habits decide: a case
/// written like a food-contact case (a compartment given by mass, or concentrations as mass fractions) is shown in
/// mg/kg, mg/dm2 and mg/dm2/d; any other case like a permeation case, in ug/mL, ug/cm2 and ug/cm2/h (common
/// practice, no source). Times and depths follow <see cref="DisplayUnitRules"/>, as the plots do. Each choice can be
/// overridden.
/// </summary>
internal static class DisplayReader
{
    private static readonly string[] Keys = ["time", "depth", "concentration", "massPerArea", "flux"];

    public static DisplayUnits Read(JsonFields root, ReadContext context, double durationSeconds, IEnumerable<double> reportTimesSeconds, IReadOnlyList<Layer> layers)
    {
        var foodStyle = context.SawMassFraction || context.SawCompartmentByMass;
        var totalThicknessMeters = layers.Sum(layer => layer.ThicknessMeters);
        // Layers written as mass fractions are shown back so, each with its density, when every layer has one.
        var withoutDensity = layers.FirstOrDefault(layer => layer.DensityKgPerCubicMeter is null);
        var layersAsWritten = context.SawLayerMassFraction && withoutDensity is null;
        var defaults = new DisplayUnits
        {
            LayerMassFraction = layersAsWritten ? UnitTable.Get("mg/kg") : null,
            LayerMassFractionRefused = context.SawLayerMassFraction && withoutDensity is not null
                ? $"layer concentrations in mass per volume: {withoutDensity.Name} gives no density"
                : null,
            Time = DisplayUnitRules.Time(durationSeconds, reportTimesSeconds),
            Depth = DisplayUnitRules.Depth(totalThicknessMeters),
            Concentration = UnitTable.Get(foodStyle ? "mg/L" : "ug/mL"),
            MediumMassFraction = foodStyle ? UnitTable.Get("mg/kg") : null,
            MassPerArea = UnitTable.Get(foodStyle ? "mg/dm2" : "ug/cm2"),
            Flux = UnitTable.Get(foodStyle ? "mg/dm2/d" : "ug/cm2/h"),
        };
        if (root.Member("display") is not { } element
            || JsonFields.Open(element, root.PathOf("display"), context.Errors, Keys) is not { } display)
        {
            return defaults;
        }

        var concentration = Unit(display, "concentration", ReadContext.ConcentrationDimensions);
        return defaults with
        {
            Time = Unit(display, "time", [Dimension.Time]) ?? defaults.Time,
            Depth = Unit(display, "depth", [Dimension.Length]) ?? defaults.Depth,
            Concentration = concentration is { Dimension: Dimension.MassConcentration } ? concentration : defaults.Concentration,
            // An explicit mass per volume shows the layers so too; an explicit mass fraction, when every layer has a density.
            LayerMassFraction = concentration switch
            {
                { Dimension: Dimension.MassConcentration } => null,
                { Dimension: Dimension.MassFraction } when withoutDensity is null => concentration,
                _ => defaults.LayerMassFraction,
            },
            MediumMassFraction = concentration switch
            {
                { Dimension: Dimension.MassFraction } => concentration,
                null => defaults.MediumMassFraction,
                _ => null,
            },
            MassPerArea = Unit(display, "massPerArea", [Dimension.MassPerArea]) ?? defaults.MassPerArea,
            Flux = Unit(display, "flux", [Dimension.MassFlux]) ?? defaults.Flux,
        };
    }

    private static UnitDefinition? Unit(JsonFields display, string key, IReadOnlyCollection<Dimension> expected)
    {
        if (display.Text(key) is not { } symbol)
        {
            return null;
        }

        if (!UnitTable.TryFind(symbol, out var unit) || !expected.Contains(unit.Dimension))
        {
            var examples = expected.SelectMany(UnitTable.ExamplesFor);
            display.Error(key, $"expected a unit of {string.Join(" or ", expected.Select(QuantityParser.Describe))}, e.g. {string.Join(", ", examples)}; got '{symbol}'");
            return null;
        }

        return unit;
    }
}
