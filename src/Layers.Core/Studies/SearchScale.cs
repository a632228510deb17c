namespace Layers.Core.Studies;

/// <summary>How a design searches its range (<c>$.design.input.scale</c>, names in camel case).</summary>
public enum SearchScale
{
    /// <summary><c>log</c>: in equal ratios, for a value spanning decades (a D, a thickness).</summary>
    Log,

    /// <summary><c>linear</c>: in equal steps.</summary>
    Linear,
}
