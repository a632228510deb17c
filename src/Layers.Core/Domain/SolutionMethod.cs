namespace Layers.Core.Domain;

/// <summary>
/// Which method solves a case (<c>numerics.method</c>; docs/numerics.md, "Choosing the method").
/// </summary>
public enum SolutionMethod
{
    /// <summary>
    /// The exact method in the Laplace domain where the case allows it and it reaches the accuracy, the finite volumes
    /// otherwise, with the reason stated: the default.
    /// </summary>
    Auto,

    /// <summary>The finite volumes with TR-BDF2 steps, whatever the case.</summary>
    FiniteVolume,

    /// <summary>The exact method; a case it cannot serve is an error.</summary>
    Laplace,
}
