namespace Layers.Core.Cases;

/// <summary>The key result a sweep plots against its first parameter (<c>$.sweep.result</c>).</summary>
public enum SweepResult
{
    /// <summary>Mass per area received by the left medium at the end of the duration.</summary>
    LeftReceived,

    /// <summary>Mass per area received by the right medium at the end of the duration.</summary>
    RightReceived,

    /// <summary>Steady flux between two baths.</summary>
    SteadyFlux,

    /// <summary>Lag time of the cumulative amount received.</summary>
    LagTime,

    /// <summary>Time for the whole system to go 90 % of the way to its final state.</summary>
    TimeTo90Percent,
}
