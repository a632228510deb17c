using System.Reflection;
using System.Text.RegularExpressions;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Architecture;

/// <summary>
/// docs/architecture.md names only types that exist: a map that points at a missing type sends a newcomer looking for
/// nothing (common practice, no source).
/// </summary>
public class ArchitectureDocTypeTests
{
    private static readonly Assembly[] Assemblies =
    [
        typeof(Layers.Core.Units.Quantity).Assembly,
        typeof(Layers.Plotting.PlotSet).Assembly,
        typeof(Layers.Cli.ExitCodes).Assembly,
        typeof(ArchitectureDocTypeTests).Assembly,
    ];

    [Fact]
    public void Every_type_name_in_backticks_in_docs_architecture_names_a_type_of_the_tool()
    {
        var types = Assemblies.SelectMany(assembly => assembly.GetTypes()).ToList();
        var names = types.Select(type => type.Name.Split('`')[0]).ToHashSet(StringComparer.Ordinal);

        // The layers of the core are namespaces, named in the same style.
        var namespaces = types.Select(type => type.Namespace?.Split('.').Last()).OfType<string>().ToHashSet(StringComparer.Ordinal);
        var text = File.ReadAllText(RepoRoot.File("docs", "architecture.md"));
        var missing = new List<string>();
        var backticked = Regex.Matches(text, "(?<!`)`([^`]+)`(?!`)").Select(match => match.Groups[1].Value);

        // The diagrams in fenced blocks name types without backticks: there a compound PascalCase word is a type name.
        var diagrams = Regex.Matches(text, "```[^\n]*\n(?<body>.*?)```", RegexOptions.Singleline)
            .SelectMany(block => Regex.Matches(block.Groups["body"].Value, @"\b[A-Z][a-z0-9]+(?:[A-Z][a-z0-9]*)+(?:\.[A-Z]\w*)?\b"))
            .Select(match => match.Value);
        foreach (var token in backticked.Concat(diagrams).Distinct())
        {
            if (!LooksLikeType(token) || namespaces.Contains(token))
            {
                continue;
            }

            var parts = token.Split('.');
            var type = types.FirstOrDefault(candidate => candidate.Name.Split('`')[0] == parts[0]);
            if (type is null || (parts.Length == 2 && type.GetMember(parts[1], BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Static | BindingFlags.Instance).Length == 0))
            {
                missing.Add(token);
            }
        }

        Assert.True(names.Count > 100, "the assemblies were not read");
        Assert.True(missing.Count == 0, "docs/architecture.md names types that do not exist: " + string.Join(", ", missing));
    }

    [Theory]
    [InlineData("docs/architecture.md")]
    [InlineData("DEVELOPERS.md")]
    public void Every_source_file_a_map_names_in_backticks_exists(string document)
    {
        var text = File.ReadAllText(RepoRoot.File(document.Split('/')));
        var named = Regex.Matches(text, "`(?<path>[A-Za-z0-9/]+\\.cs)`").Select(match => match.Groups["path"].Value).Distinct().ToList();
        var missing = named.Where(path => !File.Exists(RepoRoot.File("src", "Layers.Core", path)) && !File.Exists(RepoRoot.File(path))).ToList();

        Assert.NotEmpty(named);
        Assert.True(missing.Count == 0, $"{document} names files that do not exist: " + string.Join(", ", missing));
    }

    [Fact]
    public void A_token_counts_as_a_type_name_when_it_is_pascal_case_with_at_most_one_member()
    {
        Assert.True(LooksLikeType("SimulationCase"));
        Assert.True(LooksLikeType("Simulator.Run"));
        Assert.False(LooksLikeType("Layers.Core/Units"));
        Assert.False(LooksLikeType("TrBdf2Stepper.Linear.cs"));
        Assert.False(LooksLikeType("numerics.accuracy"));
        Assert.False(LooksLikeType("Cap du/dt = s - A u"));
    }

    // A backticked C# type: PascalCase, optionally one member after a dot; folders, files, JSON keys and formulae are not.
    private static bool LooksLikeType(string token) =>
        Regex.IsMatch(token, @"^[A-Z][A-Za-z0-9]*[a-z][A-Za-z0-9]*(\.[A-Z][A-Za-z0-9]*)?$")
        && !token.StartsWith("Layers", StringComparison.Ordinal);
}
