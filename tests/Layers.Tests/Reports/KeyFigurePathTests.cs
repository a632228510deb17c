using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Reports;

/// <summary>
/// Every key figure the error estimate names sits in summary.json at its path, with the same value (docs/outputs.md,
/// numericalError.figures[].path), on demos that between them have compartments, baths, named depths, permeation,
/// food contact and a schedule.
/// </summary>
public sealed partial class KeyFigurePathTests
{
    [Theory]
    [InlineData("cases/two-liquid-layers.json")]
    [InlineData("cases/membrane-time-lag.json")]
    [InlineData("cases/hot-fill-barrier-shelf-life.json")]
    [InlineData("cases/repeated-dose-diffusion-cell.json")]
    public void Every_key_figure_is_at_its_path_in_summary_json_with_the_same_value(string relativePath)
    {
        var read = CaseReader.ReadFile(RepoRoot.File(relativePath.Split('/')));
        Assert.True(read.IsValid, read.FormatErrors());
        var simulation = read.Case!;

        // One comparison solve is enough to name the figures; no refinement is needed for where they sit.
        var result = Simulator.Run(simulation with { Numerics = simulation.Numerics with { ErrorControl = ErrorControl.EstimateOnly } });
        using var summary = JsonDocument.Parse(SummaryJson.Write(result, relativePath));

        var figures = result.NumericalError!.Figures;
        Assert.NotEmpty(figures);
        foreach (var figure in figures)
        {
            Assert.Equal(figure.Figure.Value, Resolve(summary.RootElement, figure.Figure.Path).GetDouble());
        }

        var listed = summary.RootElement.GetProperty("numericalError").GetProperty("figures").EnumerateArray()
            .Select(entry => entry.GetProperty("path").GetString()).ToList();
        Assert.Equal(figures.Select(figure => figure.Figure.Path), listed);
    }

    private static JsonElement Resolve(JsonElement root, string path)
    {
        Assert.StartsWith("$", path, StringComparison.Ordinal);
        var element = root;
        foreach (Match step in PathStep().Matches(path[1..]))
        {
            element = step.Groups["name"].Success
                ? element.GetProperty(step.Groups["name"].Value)
                : element[int.Parse(step.Groups["index"].Value, CultureInfo.InvariantCulture)];
        }

        return element;
    }

    [GeneratedRegex(@"\.(?<name>\w+)|\[(?<index>\d+)\]")]
    private static partial Regex PathStep();
}
