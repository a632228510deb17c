namespace Layers.Core.Studies;

/// <summary>The results a study can read from a solved case (names as in the case file, docs/case-format.md).</summary>
public enum MeasureKind
{
    /// <summary><c>leftReceived</c>: mass per area received by the left medium at a time, kg/m2.</summary>
    LeftReceived,

    /// <summary><c>rightReceived</c>: mass per area received by the right medium at a time, kg/m2.</summary>
    RightReceived,

    /// <summary><c>leftConcentration</c>: concentration in the left medium at a time, kg/m3.</summary>
    LeftConcentration,

    /// <summary><c>rightConcentration</c>: concentration in the right medium at a time, kg/m3.</summary>
    RightConcentration,

    /// <summary><c>foodConcentration</c>: concentration in the food as a mass fraction at a time, kg/kg.</summary>
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
