namespace Layers.Core.Studies;

/// <summary>The distributions an uncertain input may follow (<c>$.uncertainty.inputs[i].distribution</c>, names in camel case).</summary>
public enum DistributionKind
{
    /// <summary><c>logNormal</c>: median and geometric standard deviation (<c>factor</c>).</summary>
    LogNormal,

    /// <summary><c>uniform</c>: <c>min</c> to <c>max</c>.</summary>
    Uniform,

    /// <summary><c>logUniform</c>: uniform in the logarithm from <c>min</c> to <c>max</c>.</summary>
    LogUniform,

    /// <summary><c>normal</c>: <c>mean</c> and <c>standardDeviation</c>.</summary>
    Normal,
}
