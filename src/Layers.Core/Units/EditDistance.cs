namespace Layers.Core.Units;

/// <summary>
/// Optimal-string-alignment distance (Levenshtein plus adjacent transpositions), used to suggest the unit a
/// user probably meant; swapped letters ("dyas") are as common a slip as a wrong or missing one.
/// </summary>
internal static class EditDistance
{
    /// <summary>The number of insertions, deletions, substitutions or adjacent swaps turning a into b.</summary>
    public static int Between(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (var i = 0; i <= a.Length; i++)
        {
            d[i, 0] = i;
        }

        for (var j = 0; j <= b.Length; j++)
        {
            d[0, j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            for (var j = 1; j <= b.Length; j++)
            {
                d[i, j] = Cell(d, a, b, i, j);
            }
        }

        return d[a.Length, b.Length];
    }

    private static int Cell(int[,] d, string a, string b, int i, int j)
    {
        var substitution = d[i - 1, j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1);
        var best = Math.Min(substitution, Math.Min(d[i - 1, j], d[i, j - 1]) + 1);
        var swapped = i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1];
        return swapped ? Math.Min(best, d[i - 2, j - 2] + 1) : best;
    }
}
