namespace Layers.Core.Domain;

/// <summary>The words a case may use for where a layer's diffusion coefficient comes from.</summary>
public static class DiffusivityOrigins
{
    /// <summary>Taken from elsewhere (a handbook, a colleague, an assumption): the default.</summary>
    public const string Given = "given";

    /// <summary>Measured for this substance and material.</summary>
    public const string Measured = "measured";

    /// <summary>Estimated from measurements by <c>layers fit</c>.</summary>
    public const string Fitted = "fitted";

    /// <summary>
    /// Estimated by a correlation (Potts-Guy, the upper-bound polymer law): said of a D in reports, never written in a
    /// case, where the estimate's own section says so.
    /// </summary>
    public const string Estimated = "estimated";

    /// <summary>All the words a case may write, in the order the messages list them.</summary>
    public static IReadOnlyList<string> All { get; } = [Given, Measured, Fitted];
}
