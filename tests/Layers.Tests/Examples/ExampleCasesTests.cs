using Layers.Core.Cases;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Examples;

/// <summary>
/// The case files shipped in cases/: every example outside cases/invalid/ is valid and solves; every file in
/// cases/invalid/ gives exactly the error lines listed in its sibling .expected.txt (as
/// <see cref="CaseError.Format"/> prints them with the file name only).
/// </summary>
public sealed class ExampleCasesTests
{
    private static string CasesFolder => RepoRoot.File("cases");

    private static string InvalidFolder => Path.Combine(CasesFolder, "invalid");

    public static TheoryData<string> ExampleCases => new(ExampleCasePaths());

    public static TheoryData<string> InvalidCases => new(
        Directory.Exists(InvalidFolder)
            ? Directory.EnumerateFiles(InvalidFolder, "*.json", SearchOption.AllDirectories).Select(Relative).Order(StringComparer.Ordinal)
            : []);

    [Theory]
    [MemberData(nameof(ExampleCases))]
    public void Example_case_reads_valid_and_runs_to_completion_conserving_mass(string relativePath)
    {
        var read = CaseDocument.ReadFile(RepoRoot.File(relativePath));
        Assert.True(read.IsValid, read.FormatErrors());

        var result = Simulator.Run(read.Case!);

        Assert.True(result.Completed, $"{relativePath}: {result.Statistics}");
        // Common practice, no source: a conservative finite-volume scheme keeps the total mass to round-off.
        Assert.True(result.WorstMassBalanceError < 1e-9, $"{relativePath}: mass balance error {result.WorstMassBalanceError:G3}");
        Assert.Equal(read.Case!.ReportTimesSeconds.Count, result.Reports.Count);
    }

    [Theory]
    [MemberData(nameof(InvalidCases))]
    public void Invalid_case_gives_exactly_the_errors_listed_beside_it(string relativePath)
    {
        var path = RepoRoot.File(relativePath);
        var expectedFile = Path.ChangeExtension(path, ".expected.txt");
        Assert.True(File.Exists(expectedFile), $"{relativePath} has no sibling {Path.GetFileName(expectedFile)}");
        var expected = File.ReadAllLines(expectedFile).Where(line => line.Length > 0).ToList();
        Assert.NotEmpty(expected);

        var read = CaseDocument.ReadFile(path);

        Assert.False(read.IsValid, $"{relativePath} reads as valid");
        Assert.Equal(expected, read.Errors.Select(error => error.Format(Path.GetFileName(path))));
    }

    [Fact]
    public void Every_expected_errors_file_belongs_to_a_case()
    {
        if (!Directory.Exists(InvalidFolder))
        {
            return;
        }

        var orphans = Directory.EnumerateFiles(InvalidFolder, "*.expected.txt", SearchOption.AllDirectories)
            .Where(file => !File.Exists(file[..^".expected.txt".Length] + ".json"))
            .Select(Relative)
            .ToList();

        Assert.True(orphans.Count == 0, "no case for: " + string.Join(", ", orphans));
    }

    [Fact]
    public void The_demo_case_is_among_the_examples() =>
        Assert.Contains("cases/laminate-fatty-food.json", ExampleCasePaths());

    private static IEnumerable<string> ExampleCasePaths() =>
        Directory.EnumerateFiles(CasesFolder, "*.json", SearchOption.AllDirectories)
            .Where(path => !IsUnder(path, InvalidFolder))
            .Select(Relative)
            .Order(StringComparer.Ordinal);

    private static bool IsUnder(string path, string folder) =>
        path.StartsWith(folder + Path.DirectorySeparatorChar, StringComparison.Ordinal);

    private static string Relative(string path) =>
        Path.GetRelativePath(RepoRoot.Path, path).Replace(Path.DirectorySeparatorChar, '/');
}
