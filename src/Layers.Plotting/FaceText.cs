using Layers.Core.Domain;

namespace Layers.Plotting;

/// <summary>Short descriptions of what touches the faces of the stack.</summary>
internal static class FaceText
{
    /// <summary>E.g. "closed", "simulant (compartment)", "receptor (bath)".</summary>
    public static string Describe(FaceCondition face) => face switch
    {
        BathFace bath => $"{bath.Name} (bath)",
        CompartmentFace compartment => $"{compartment.Name} (compartment)",
        _ => face.KindName,
    };

    /// <summary>"left face: closed · right face: simulant (compartment)".</summary>
    public static string Both(SimulationCase simulation) =>
        $"left face: {Describe(simulation.Left)}   \u00B7   right face: {Describe(simulation.Right)}";

    /// <summary>The name of the medium on a face, or null when the face is closed.</summary>
    public static string? MediumName(FaceCondition face) => face switch
    {
        BathFace bath => bath.Name,
        CompartmentFace compartment => compartment.Name,
        _ => null,
    };
}
