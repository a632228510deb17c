namespace Layers.Core.Results;

/// <summary>
/// The results a solved case can be asked for by name: a sweep's plotted result, a column of a batch summary, a
/// design's target, an uncertainty study's result or limit, a fitted measurement. Names, units and where each
/// result is read live in <see cref="NamedResults"/>; every use switches over this type without a fallback arm,
/// so a new result does not compile until each use says what it does with it.
/// </summary>
public enum NamedResult
{
    /// <summary><c>leftReceived</c>: mass per area received by the left medium, kg/m2.</summary>
    LeftReceived,

    /// <summary><c>rightReceived</c>: mass per area received by the right medium, kg/m2.</summary>
    RightReceived,

    /// <summary><c>leftConcentration</c>: concentration in the left medium, kg/m3.</summary>
    LeftConcentration,

    /// <summary><c>rightConcentration</c>: concentration in the right medium, kg/m3.</summary>
    RightConcentration,

    /// <summary><c>foodConcentration</c>: concentration in the food as a mass fraction, kg/kg.</summary>
    FoodConcentration,

    /// <summary><c>steadyFlux</c>: steady flux between two baths, kg/(m2 s).</summary>
    SteadyFlux,

    /// <summary><c>lagTime</c>: lag time of the amount received between two baths, s.</summary>
    LagTime,

    /// <summary><c>timeTo90Percent</c>: time for the whole system to go 90 % of the way to its final state, s.</summary>
    TimeTo90Percent,

    /// <summary><c>timeToLimit</c>: when the food first reaches the specific migration limit, s.</summary>
    TimeToLimit,

    /// <summary><c>leftPeriodReceived</c>: mass per area the left medium received during one period of the schedule, kg/m2.</summary>
    LeftPeriodReceived,

    /// <summary><c>rightPeriodReceived</c>: mass per area the right medium received during one period of the schedule, kg/m2.</summary>
    RightPeriodReceived,

    /// <summary><c>leftPeriodLowestFlux</c>: lowest flux into the left medium in one period as sampled (the trough), kg/(m2 s).</summary>
    LeftPeriodLowestFlux,

    /// <summary><c>rightPeriodLowestFlux</c>: lowest flux into the right medium in one period as sampled (the trough), kg/(m2 s).</summary>
    RightPeriodLowestFlux,

    /// <summary><c>leftPeriodHighestFlux</c>: highest flux into the left medium in one period as sampled (the peak), kg/(m2 s).</summary>
    LeftPeriodHighestFlux,

    /// <summary><c>rightPeriodHighestFlux</c>: highest flux into the right medium in one period as sampled (the peak), kg/(m2 s).</summary>
    RightPeriodHighestFlux,

    /// <summary><c>leftPeriodEndConcentration</c>: concentration in the left medium at the end of one period, before any renewal, kg/m3.</summary>
    LeftPeriodEndConcentration,

    /// <summary><c>rightPeriodEndConcentration</c>: concentration in the right medium at the end of one period, before any renewal, kg/m3.</summary>
    RightPeriodEndConcentration,
}
