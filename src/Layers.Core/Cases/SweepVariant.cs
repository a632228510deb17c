namespace Layers.Core.Cases;

/// <summary>One sub-case of a sweep: its name, its document, and the values it was given.</summary>
/// <param name="Name">Deterministic, filesystem-safe name: the file name stem, a zero-padded index and the values.</param>
/// <param name="Json">The case document with the values substituted and the <c>sweep</c> key removed.</param>
/// <param name="Values">For each swept parameter, in the order declared, the value substituted.</param>
public sealed record SweepVariant(string Name, string Json, IReadOnlyList<SweepValue> Values)
{
    /// <summary>The values as "label = value; ..." for tables and plot legends.</summary>
    public string Describe() => string.Join("; ", Values.Select(value => $"{value.Label} = {value.Written}"));
}

/// <summary>A value given to one parameter of a sweep.</summary>
/// <param name="Path">JSON path of the parameter, e.g. <c>$.layers[0].thickness</c>.</param>
/// <param name="Label">The parameter in words for tables and plots, e.g. "membrane thickness" (<see cref="InputLabels"/>).</param>
/// <param name="Written">The value as substituted into the document, e.g. "20 um" or "0.5".</param>
/// <param name="Number">The number of <paramref name="Written"/> in its own unit, for plotting.</param>
/// <param name="Unit">The unit text of <paramref name="Written"/>; empty for plain numbers.</param>
public sealed record SweepValue(string Path, string Label, string Written, double Number, string Unit);

/// <summary>Building <see cref="SweepValue"/>s.</summary>
public static class SweepValues
{
    /// <summary>The value written at a path, with its number and unit split for plotting (NaN when not a number).</summary>
    /// <param name="path">The JSON path of the parameter.</param>
    /// <param name="written">The value as written.</param>
    /// <param name="label">The parameter in words; null for the words of the path alone (no case document at hand).</param>
    public static SweepValue Of(string path, string written, string? label = null)
    {
        var (number, unit) = SweepParameterReader.Split(written) ?? (double.NaN, string.Empty);
        return new SweepValue(path, label ?? InputLabels.Of(null, path), written, number, unit);
    }
}
