using System.Text.Json;

namespace Layers.Core.FoodContact;

/// <summary>
/// The polymer constants of <see cref="UpperBoundDiffusivity"/>, read from the embedded data file
/// <c>polymer-constants.json</c> (which names the source of every row and whether it was checked).
/// </summary>
public static class PolymerTable
{
    private static readonly Lazy<PolymerConstants[]> Rows = new(Load);

    /// <summary>All rows, in the order of the data file.</summary>
    public static IReadOnlyList<PolymerConstants> All => Rows.Value;

    /// <summary>The row whose name or alias matches (ignoring case), or null.</summary>
    public static PolymerConstants? Find(string name)
    {
        var wanted = name.Trim();
        return All.FirstOrDefault(row =>
            string.Equals(row.Name, wanted, StringComparison.OrdinalIgnoreCase)
            || row.Aliases.Any(alias => string.Equals(alias, wanted, StringComparison.OrdinalIgnoreCase)));
    }

    private static PolymerConstants[] Load()
    {
        using var stream = typeof(PolymerTable).Assembly.GetManifestResourceStream("Layers.Core.FoodContact.polymer-constants.json")
            ?? throw new InvalidOperationException("the embedded polymer table is missing from the build");
        using var document = JsonDocument.Parse(stream);
        return document.RootElement.GetProperty("polymers").EnumerateArray()
            .Select(row => new PolymerConstants(
                row.GetProperty("name").GetString()!,
                row.GetProperty("aliases").EnumerateArray().Select(alias => alias.GetString()!).ToArray(),
                row.GetProperty("aPrime").GetDouble(),
                row.GetProperty("tauKelvin").GetDouble(),
                row.GetProperty("source").GetString()!,
                row.GetProperty("verified").GetBoolean()))
            .ToArray();
    }
}
