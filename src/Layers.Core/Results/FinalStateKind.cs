namespace Layers.Core.Results;

/// <summary>What the system tends to as time goes on.</summary>
public enum FinalStateKind
{
    /// <summary>A closed system: uniform u = c/K fixed by the mass balance.</summary>
    ClosedEquilibrium,

    /// <summary>One bath, or two baths at the same u: everything equilibrates with the bath.</summary>
    BathEquilibrium,

    /// <summary>Two baths at different u: a steady flux through the stack.</summary>
    SteadyPermeation,
}
