using BenchmarkDotNet.Attributes;
using Layers.Benchmarks.Reference;

namespace Layers.Benchmarks;

/// <summary>
/// The tool against the plain reference at equal accuracy, in the same run. The tool runs at the coarsest
/// <c>numerics.accuracy</c> setting of the work-precision ladder whose error is at most 1e-4 of the final amount (its
/// default mesh by diffusion length, solved to the duration); the plain reference at the coarsest of its settings that
/// meets the same requirement.
/// Both settings and errors are printed by the setup. The Ratio column is tool time / plain time.
/// </summary>
[Config(typeof(SolveConfig))]
public class EqualAccuracyBenchmarks
{
    private const double TargetError = 1e-4;
    private AccuracyProblem _problem = null!;
    private double _toolAccuracy;
    private (int Cells, int Steps) _plain;

    /// <summary>The problem: the analytic sheet or the laminate.</summary>
    [Params("sheet", "laminate")]
    public string Problem { get; set; } = "sheet";

    /// <summary>Finds, for each solver, the first setting of its ladder (coarse to fine) that meets the error requirement.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _problem = Problem == "sheet" ? AccuracyProblem.Sheet() : AccuracyProblem.Laminate();
        _toolAccuracy = ToolMatching(_problem, TargetError);
        var toolError = _problem.ToolErrorAtAccuracy(_toolAccuracy);
        _plain = PlainMatching(_problem, TargetError);
        var plainError = _problem.PlainError(_plain.Cells, _plain.Steps);
        Console.WriteLine(
            $"// {Problem}: tool accuracy {_toolAccuracy:0e0} ({_problem.CellsAtAccuracy(_toolAccuracy)} cells) error {toolError:0.00e0}; " +
            $"plain {_plain.Cells} cells {_plain.Steps} steps error {plainError:0.00e0}");
    }

    /// <summary>The plain reference at the matching setting.</summary>
    [Benchmark(Baseline = true)]
    public double[] Plain() => PlainReference.ReceivedOnTheRight(_problem.Case, _plain.Cells, _plain.Steps);

    /// <summary>The tool at the matching setting.</summary>
    [Benchmark]
    public double[] Tool() => AccuracyProblem.ToolReceivedAtAccuracy(_problem.Case, _toolAccuracy);

    /// <summary>The coarsest accuracy setting of the work-precision ladder with an error at most <paramref name="target"/>.</summary>
    public static double ToolMatching(AccuracyProblem problem, double target)
    {
        ArgumentNullException.ThrowIfNull(problem);
        foreach (var accuracy in WorkPrecision.ToolAccuracies)
        {
            if (problem.ToolErrorAtAccuracy(accuracy) <= target)
            {
                return accuracy;
            }
        }

        throw new InvalidOperationException($"{problem.Name}: no tool setting of the ladder reaches {target:0.00e0}");
    }

    /// <summary>
    /// The coarsest plain setting with an error at most <paramref name="target"/>; past the table, cells keep
    /// doubling and steps quadrupling.
    /// </summary>
    public static (int Cells, int Steps) PlainMatching(AccuracyProblem problem, double target)
    {
        ArgumentNullException.ThrowIfNull(problem);
        var (cells, steps) = WorkPrecision.PlainSettings[0];
        for (var level = 0; level < 12; level++)
        {
            (cells, steps) = level < WorkPrecision.PlainSettings.Count
                ? WorkPrecision.PlainSettings[level]
                : (cells * 2, steps * 4);
            if (problem.PlainError(cells, steps) <= target)
            {
                return (cells, steps);
            }
        }

        throw new InvalidOperationException($"{problem.Name}: no plain setting up to {cells} cells and {steps} steps reaches {target:0.00e0}");
    }
}
