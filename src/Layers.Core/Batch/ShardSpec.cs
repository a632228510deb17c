using System.Globalization;

namespace Layers.Core.Batch;

/// <summary>
/// <c>--shard I/N</c>: the I-th of N parts of a batch. Part I takes the expanded cases at positions I-1, I-1+N,
/// I-1+2N, ... of the list ordered by name, so the N parts are disjoint, cover every case, and differ in size by at
/// most one, whichever machine computes them.
/// </summary>
/// <param name="Index">1-based part number.</param>
/// <param name="Count">Number of parts.</param>
public readonly record struct ShardSpec(int Index, int Count)
{
    /// <summary>The whole batch.</summary>
    public static ShardSpec Whole { get; } = new(1, 1);

    /// <summary>Reads "I/N" with 1 &lt;= I &lt;= N.</summary>
    public static bool TryParse(string text, out ShardSpec shard, out string? error)
    {
        shard = Whole;
        var parts = text.Split('/');
        if (parts.Length == 2
            && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out var index)
            && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out var count)
            && count >= 1 && index >= 1 && index <= count)
        {
            shard = new ShardSpec(index, count);
            error = null;
            return true;
        }

        error = $"--shard must be I/N with 1 <= I <= N, e.g. 3/8; got '{text}'";
        return false;
    }

    /// <summary>True when the case at a 0-based position of the ordered list belongs to this part.</summary>
    public bool Contains(int position) => position % Count == Index - 1;

    /// <summary>"I/N".</summary>
    public override string ToString() => FormattableString.Invariant($"{Index}/{Count}");
}
