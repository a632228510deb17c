using System.Text.RegularExpressions;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Architecture;

/// <summary>
/// Layers.Core reads as layers with one direction of dependency (common practice, no source: a layered
/// architecture, each layer using only those below it). The order is declared in <see cref="CoreLayers"/>.
/// </summary>
public class CoreLayerOrderTests
{
    [Fact]
    public void No_namespace_of_the_core_uses_a_namespace_declared_above_it()
    {
        var backEdges = CoreDependencies.Scan()
            .Where(edge => CoreLayers.Rank(edge.To) > CoreLayers.Rank(edge.From))
            .Select(edge => $"{edge.From} -> {edge.To} in {edge.File} ({edge.Evidence})")
            .ToList();

        Assert.True(backEdges.Count == 0, $"{backEdges.Count} uses point the wrong way:\n" + string.Join('\n', backEdges));
    }

    [Fact]
    public void Every_namespace_of_the_core_has_its_place_in_the_declared_order()
    {
        var root = RepoRoot.File("src", "Layers.Core");
        var folders = Directory.EnumerateDirectories(root)
            .Select(Path.GetFileName)
            .Where(name => name is not ("bin" or "obj"))
            .Order(StringComparer.Ordinal)
            .ToList();
        var namespaces = typeof(Layers.Core.Units.Quantity).Assembly.GetTypes()
            .Select(type => type.Namespace)
            .Where(name => name?.StartsWith("Layers.Core.", StringComparison.Ordinal) == true)
            .Select(name => name!.Split('.')[2])
            .Distinct()
            .Order(StringComparer.Ordinal)
            .ToList();

        Assert.Equal(CoreLayers.Order.Order(StringComparer.Ordinal), folders!);
        Assert.Equal(CoreLayers.Order.Order(StringComparer.Ordinal), namespaces);
    }

    [Fact]
    public void The_scan_sees_a_use_written_with_a_using_directive_and_one_written_as_a_qualified_name()
    {
        // Two uses known by reading the sources: the case reader opens files through Files/InputFile with a using
        // directive, and the reader of the Potts-Guy section names Units.Dimension partly qualified.
        var edges = CoreDependencies.Scan();

        Assert.Contains(edges, edge => edge.From == "Cases" && edge.To == "Files" && edge.File == "Cases/CaseReader.cs");
        Assert.Contains(edges, edge => edge.From == "Cases" && edge.To == "Units" && edge.File == "Cases/PottsGuyReader.cs" && edge.Evidence.StartsWith("Units.Dimension", StringComparison.Ordinal));
    }

    [Fact]
    public void Docs_architecture_lists_the_layers_in_the_declared_order()
    {
        var text = File.ReadAllText(RepoRoot.File("docs", "architecture.md"));
        var listed = Regex.Matches(text, @"^\| (?<rank>\d+) \| `(?<layer>\w+)` \|", RegexOptions.Multiline)
            .Select(match => match.Groups["layer"].Value)
            .ToList();

        Assert.Equal(CoreLayers.Order, listed);
    }
}
