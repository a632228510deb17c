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
}
