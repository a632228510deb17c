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

    internal static string Face(FaceCondition face, DisplayFormat format) => face switch
    {
        BathFace bath => $"bath \"{bath.Name}\" at {format.Concentration(bath.ConcentrationKgPerCubicMeter)} (K {DisplayFormat.Number(bath.PartitionCoefficient)}{Film(bath.FilmCoefficientMetersPerSecond)})",
        CompartmentFace compartment => $"compartment \"{compartment.Name}\" {DisplayFormat.Shown(compartment.VolumeCubicMeters, UnitTable.Get("mL"))} on {DisplayFormat.Shown(compartment.ContactAreaSquareMeters, UnitTable.Get("cm2"))}, starting at {format.Concentration(compartment.InitialConcentrationKgPerCubicMeter)} (K {DisplayFormat.Number(compartment.PartitionCoefficient)}{Film(compartment.FilmCoefficientMetersPerSecond)})",
        _ => "closed",
    };

    private static string Film(double? coefficient)
        => coefficient is { } k ? $", film {DisplayFormat.Shown(k, UnitTable.Get("cm/s"))}" : string.Empty;
}
