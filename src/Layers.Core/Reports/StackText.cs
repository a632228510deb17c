using System.Globalization;
using System.Text;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Reports;

/// <summary>Describes a case's stack in consistent units, for <c>layers check</c> and the run summary.</summary>
public static class StackText
{
    /// <summary>One line: left face | layers | right face.</summary>
    public static string Describe(SimulationCase simulation)
        => Describe(simulation, new DisplayFormat(simulation.Display));

    internal static string Describe(SimulationCase simulation, DisplayFormat format)
    {
        var parts = new List<string> { Face(simulation.Left, format) };
        parts.AddRange(simulation.Stack.Layers.Select(layer => $"{layer.Name} {format.Depth(layer.ThicknessMeters)}"));
        parts.Add(Face(simulation.Right, format));
        return string.Join(" | ", parts);
    }

    /// <summary>A table of the stack with every input in SI and in the case's units, plus derived figures.</summary>
    public static string Table(SimulationCase simulation)
    {
        var format = new DisplayFormat(simulation.Display);
        var text = new StringBuilder();
        var resistance = simulation.Stack.ResistanceSecondsPerMeter;
        text.Append(CultureInfo.InvariantCulture, $"{simulation.Title}: partition coefficients relative to {simulation.ReferenceMedium}, volume basis\n");
        text.Append(CultureInfo.InvariantCulture, $"  left:  {Face(simulation.Left, format)}\n");
        foreach (var layer in simulation.Stack.Layers)
        {
            var diffusionTime = layer.ThicknessMeters * layer.ThicknessMeters / layer.DiffusivitySquareMetersPerSecond;
            text.Append(CultureInfo.InvariantCulture,
                $"  layer {layer.Name}: thickness {format.Depth(layer.ThicknessMeters)}, " +
                $"D {QuantityParser.FormatSi(layer.DiffusivitySquareMetersPerSecond, UnitTable.Get("cm2/s"))}, K {DisplayFormat.Number(layer.PartitionCoefficient)}, " +
                $"c0 {format.Concentration(layer.InitialConcentrationKgPerCubicMeter)}, h^2/D {format.Time(diffusionTime)}, " +
                $"share of stack resistance {DisplayFormat.Percent(layer.ResistanceSecondsPerMeter / resistance)}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"  right: {Face(simulation.Right, format)}\n");
        text.Append(CultureInfo.InvariantCulture, $"  duration {format.Time(simulation.DurationSeconds)}; report times {string.Join(", ", simulation.ReportTimesSeconds.Select(format.Time))}\n");
        return text.ToString();
    }

    private static string Face(FaceCondition face, DisplayFormat format) => face switch
    {
        BathFace bath => $"bath \"{bath.Name}\" at {format.Concentration(bath.ConcentrationKgPerCubicMeter)} (K {DisplayFormat.Number(bath.PartitionCoefficient)}{Film(bath.FilmCoefficientMetersPerSecond)})",
        CompartmentFace compartment => $"compartment \"{compartment.Name}\" {QuantityParser.FormatSi(compartment.VolumeCubicMeters, UnitTable.Get("mL"))} on {QuantityParser.FormatSi(compartment.ContactAreaSquareMeters, UnitTable.Get("cm2"))}, starting at {format.Concentration(compartment.InitialConcentrationKgPerCubicMeter)} (K {DisplayFormat.Number(compartment.PartitionCoefficient)}{Film(compartment.FilmCoefficientMetersPerSecond)})",
        _ => "closed",
    };

    private static string Film(double? coefficient)
        => coefficient is { } k ? $", film {QuantityParser.FormatSi(k, UnitTable.Get("cm/s"))}" : string.Empty;
}
