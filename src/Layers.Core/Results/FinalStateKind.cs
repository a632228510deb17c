namespace Layers.Core.Results;

/// <summary>What the system tends to as time goes on.</summary>
public enum FinalStateKind
{
    /// <summary>A closed system: uniform u = c/K fixed by the mass balance.</summary>
    ClosedEquilibrium,

    /// <summary>One bath, or two baths at the same u: everything equilibrates with the bath.</summary>
    BathEquilibrium,

    /// <summary>
    /// No bath, and a compartment with first-order removal: the removal never stops, so everything ends in it and
    /// nothing is left in the system; the progress toward this state is the fraction of the initial mass removed.
    /// </summary>
    AllRemoved,

    /// <summary>Two baths at different u: a steady flux through the stack.</summary>
    SteadyPermeation,
}
