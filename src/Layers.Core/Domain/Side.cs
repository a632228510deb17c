namespace Layers.Core.Domain;

/// <summary>The two faces of the stack.</summary>
public enum Side
{
    /// <summary>The face before the first layer (depth 0).</summary>
    Left,

    /// <summary>The face after the last layer.</summary>
    Right,
}
