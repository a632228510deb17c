namespace Layers.Core.Domain;

/// <summary>What a run does about its own numerical error (docs/numerics.md, "The accuracy promise").</summary>
public enum ErrorControl
{
    /// <summary>
    /// Estimate the error of every key figure from a second, coarser solve, and refine the mesh and the steps while a
    /// figure above the negligible floor misses the accuracy: the default of a mesh chosen for an accuracy.
    /// </summary>
    EstimateAndRefine,

    /// <summary>Estimate the error but keep the mesh: the default of an explicit cell count, which fixes the mesh.</summary>
    EstimateOnly,

    /// <summary>One solve, no estimate: for callers that study the discretisation itself.</summary>
    None,
}
