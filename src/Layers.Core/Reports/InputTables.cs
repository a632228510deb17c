using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Reports;

/// <summary>
/// The inputs of a case echoed in consistent units, with the derived figures that explain behaviour: each layer's
/// diffusion time h^2/D and its permeance D K / h relative to the reference medium (the layer's permeability
/// coefficient; the smallest controls steady transport through the stack).
/// </summary>
public static class InputTables
{
    /// <summary>One row per layer, left to right.</summary>
    public static TextTable Layers(SimulationCase simulation)
    {
        var format = new DisplayFormat(simulation.Display);
        var depth = simulation.Display.Depth.ForPeople;

        // A D that depends on temperature is shown as in the first stage, where the run starts.
        var rows = simulation.WithFirstStageDiffusivities().Stack.Layers.Select((layer, index) => (IReadOnlyList<string>)
        [
            layer.Name,
            DisplayFormat.Number(simulation.Display.Depth.FromSi(layer.ThicknessMeters)),
            DisplayFormat.Number(UnitTable.Get("cm2/s").FromSi(layer.DiffusivitySquareMetersPerSecond)),
            DisplayFormat.Number(layer.PartitionCoefficient),
            DisplayFormat.Number(simulation.Display.LayerMassFraction is { } fraction
                ? fraction.FromSi(layer.InitialConcentrationKgPerCubicMeter / layer.DensityKgPerCubicMeter!.Value)
                : simulation.Display.Concentration.FromSi(layer.InitialConcentrationKgPerCubicMeter)),
            format.Time(layer.ThicknessMeters * layer.ThicknessMeters / layer.DiffusivitySquareMetersPerSecond),
            DisplayFormat.Number(UnitTable.Get("cm/h").FromSi(1 / layer.ResistanceSecondsPerMeter)),
            OriginOf(simulation, index),
        ]).ToArray();
        var refused = simulation.Display.LayerMassFractionRefused is { } why ? $"; {why}" : string.Empty;
        return new TextTable(
            $"Layers, left to right (K relative to {simulation.ReferenceMedium}, volume basis{refused})",
            ["layer", $"thickness [{depth}]", "D [cm2/s]", "K [-]", $"initial c [{(simulation.Display.LayerMassFraction ?? simulation.Display.Concentration).ForPeople}]", "h^2/D", "D K/h [cm/h]", "D from"],
            rows);
    }

    /// <summary>
    /// Where a layer's D comes from, in one word: <c>estimated</c> (Potts-Guy or the upper-bound polymer correlation;
    /// the details are in the notes and the food-contact tables), else what the case says: <c>given</c>,
    /// <c>measured</c> or <c>fitted</c>.
    /// </summary>
    public static string OriginOf(SimulationCase simulation, int layerIndex)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        return simulation.Stack.Layers[layerIndex].DiffusivityOrigin;
    }

    /// <summary>The two faces, the duration and the report times.</summary>
    public static TextTable Conditions(SimulationCase simulation)
    {
        var format = new DisplayFormat(simulation.Display);
        return new TextTable(
            "Faces and times",
            ["item", "value"],
            [
                ["left face", StackText.Face(simulation.Left, format)],
                ["right face", StackText.Face(simulation.Right, format)],
                ["duration", format.Time(simulation.DurationSeconds)],
                ["report times", string.Join(", ", simulation.ReportTimesSeconds.Select(format.Time))],
            ]);
    }
}
