using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// The food-contact figures as tables for the console and report.html: concentrations in the food in mg/kg and
/// mg/dm2, the verdict against the limit, barrier times, test versus shelf life, maximum loading, and where every
/// layer's diffusion coefficient comes from in every stage.
/// </summary>
public static class FoodContactTables
{
    /// <summary>The caution specific to food-contact results, printed with them.</summary>
    public const string Caution =
        "Migration figures are model estimates under the assumptions listed; they do not replace migration testing. " +
        "Upper-bound diffusion estimates are meant to over-predict, given or fitted values can under-predict. " +
        "Compliance of a food-contact material is decided under the applicable regulation, not by this output.";

    /// <summary>The tables for a result with food-contact figures; empty otherwise.</summary>
    public static IReadOnlyList<TextTable> For(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.FoodContact is { } food ? [Figures(result, food), .. Stages(result.Case)] : [];
    }

    /// <summary>
    /// Each stage's temperature and every layer's D in it with where it comes from, for a case with food-contact
    /// settings (empty otherwise); shown by <c>check</c> as well, since the layer table there gives D at the first stage.
    /// </summary>
    public static IReadOnlyList<TextTable> Stages(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (simulation.FoodContact is not { } settings)
        {
            return [];
        }

        var format = new DisplayFormat(simulation.Display);
        var rows = new List<IReadOnlyList<string>>();
        foreach (var stage in settings.Stages)
        {
            foreach (var (layer, index) in simulation.Stack.Layers.Select((layer, index) => (layer, index)))
            {
                var (value, origin) = stage.DiffusivityOf(index, layer.Diffusivity);
                rows.Add([$"{stage.Name}, {format.Time(stage.DurationSeconds)} at {Celsius(stage.TemperatureKelvin)}", layer.Name, DisplayFormat.Number(value * 1e4), origin]);
            }
        }

        var tables = new List<TextTable> { new("Diffusion coefficients by stage", ["stage", "layer", "D [cm2/s]", "where it comes from"], rows) };
        if (settings.Stages.Any(stage => stage.HasPartitionOverrides))
        {
            var food = (CompartmentFace)simulation.Face(settings.FoodSide);
            var layers = simulation.Stack.Layers;
            var partitions = settings.Stages
                .Select(stage => (IReadOnlyList<string>)
                [
                    stage.Name,
                    .. layers.Select((layer, index) => DisplayFormat.Number(stage.LayerPartitionOf(index, layer.PartitionCoefficient))),
                    DisplayFormat.Number(stage.FacePartitionOf(settings.FoodSide, food.PartitionCoefficient)),
                ])
                .ToList();
            tables.Add(new TextTable("Partition coefficients by stage (volume basis)", ["stage", .. layers.Select(layer => layer.Name), food.Name], partitions));
        }

        return tables;
    }

    private static TextTable Figures(SimulationResult result, FoodContactResult food)
    {
        var format = new DisplayFormat(result.Case.Display);
        var rows = new List<IReadOnlyList<string>>();
        void Add(string what, string value) => rows.Add([what, value]);
        Add("food", $"{food.FoodName} ({(food.FoodSide == Side.Left ? "left" : "right")} face), {DisplayFormat.Number(food.AreaPerFoodMassSquareMetersPerKilogram * 100)} dm2 per kg"
            + (food.FoodDensityAssumed ? ", density taken as 1 kg/L" : string.Empty));
        Add("in the food at the end", $"{MgPerKg(food.FinalConcentration)}, {MgPerDm2(food.FinalMigrationPerArea)}");
        if (food.SpecificMigrationLimit is { } limit && result.Schedule?.RepeatedUse is { } repeated)
        {
            // An article in repeated use is judged at one contact, each with a fresh portion of food: the verdict reads that
            // contact, and a limit reached earlier is said to be so.
            var judged = repeated.JudgedValue;
            Add("specific migration limit", MgPerKg(limit));
            Add($"verdict (model, contact {repeated.JudgedContact})", judged <= limit
                ? $"below the limit: {DisplayFormat.Percent(judged / limit)} of it, margin {MgPerKg(limit - judged)}"
                : $"EXCEEDS the limit: {DisplayFormat.Percent(judged / limit)} of it");
            Add("limit first reached at", food.LimitReachedSeconds is { } t
                ? $"{format.Time(t)}, in contact {ContactAt(result.Case, food.FoodSide, t)}"
                : "not within the history");
        }
        else if (food.SpecificMigrationLimit is { } single)
        {
            Add("specific migration limit", MgPerKg(single));
            Add("verdict (model)", food.MeetsLimit == true
                ? $"below the limit: {DisplayFormat.Percent(food.FinalConcentration / single)} of it, margin {MgPerKg(food.LimitMargin!.Value)}"
                : $"EXCEEDS the limit: {DisplayFormat.Percent(food.FinalConcentration / single)} of it");
            Add("limit reached at", food.LimitReachedSeconds is { } t ? format.Time(t) : "not within the history");
        }

        Add("detection threshold", MgPerKg(food.DetectionLimit));
        Add("detection threshold reached at", food.DetectionReachedSeconds is { } seen ? format.Time(seen) : "not within the history");
        foreach (var lag in food.BarrierLags)
        {
            Add($"barrier lag d^2/(6D): {lag.Layer}, {lag.Stage}", format.Time(lag.Seconds));
        }

        if (food.Test is { } test)
        {
            var condition = $"{format.Time(test.Condition.DurationSeconds)} at {Celsius(test.Condition.TemperatureKelvin)}";
            Add($"test {condition}: in the food", MgPerKg(test.FoodConcentration));
            Add("test covers the history (model)", test.CoversByModel(food.FinalConcentration) ? "yes" : "no");
            Add(string.Create(CultureInfo.InvariantCulture, $"history as test time (Arrhenius rule, Ea {test.ActivationEnergy / 1e3:0.#} kJ/mol)"),
                format.Time(test.RegulatoryEquivalentSeconds));
            Add("test covers the history (rule)", test.CoversByRule ? "yes" : "no");
        }

        if (food.MaximumLoading is { } loading)
        {
            foreach (var (layer, perVolume, fraction) in loading.Layers)
            {
                var judged = result.Schedule?.RepeatedUse is { } verdict ? $" (limit at contact {verdict.JudgedContact})" : string.Empty;
                Add($"maximum initial concentration: {layer}{judged}", double.IsPositiveInfinity(perVolume)
                    ? "no limit (nothing reaches the food)"
                    : fraction is { } f ? MgPerKg(f) : format.Concentration(perVolume));
            }
        }

        if (food.PartitionConvention is { } convention)
        {
            Add("partition coefficients", string.Create(CultureInfo.InvariantCulture,
                $"worst-case convention '{convention}', K polymer/food = {PartitionConvention.Values[convention]:0.###} ({PartitionConvention.Source})"));
        }

        return new TextTable("Food contact", ["quantity", "value"], rows);
    }

    /// <summary>Which contact with a fresh portion of food a time falls in, from 1.</summary>
    private static int ContactAt(SimulationCase simulation, Side foodSide, double timeSeconds)
        => simulation.Schedule!.Contacts(foodSide).TakeWhile(contact => contact.StartSeconds <= timeSeconds).Count();

    private static string MgPerKg(double massFraction) => $"{DisplayFormat.Number(massFraction * 1e6)} mg/kg";

    private static string MgPerDm2(double kgPerSquareMeter) => $"{DisplayFormat.Number(kgPerSquareMeter * 1e4)} mg/dm2";

    private static string Celsius(double kelvin) => string.Create(CultureInfo.InvariantCulture, $"{kelvin - 273.15:0.##} degC");
}
