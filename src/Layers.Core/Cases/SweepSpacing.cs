namespace Layers.Core.Cases;

/// <summary>How a swept range is divided (<c>$.sweep.parameters[i].spacing</c>, names in camel case).</summary>
public enum SweepSpacing
{
    /// <summary><c>linear</c>: equal steps (the default).</summary>
    Linear,

    /// <summary><c>log</c>: equal ratios, for values that span decades.</summary>
    Log,
}
