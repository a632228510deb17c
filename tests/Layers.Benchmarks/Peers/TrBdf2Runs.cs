using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Benchmarks.Peers;

/// <summary>
/// Our TR-BDF2 time loop on a problem's system, as a run of the tool solves it to its duration (the same first step,
/// absolute tolerance and landing on the end), at a given relative tolerance; the mesh is the problem's and stays fixed.
/// </summary>
public static class TrBdf2Runs
{
    /// <summary>Relative tolerances tried, coarse to fine.</summary>
    public static IReadOnlyList<double> Tolerances { get; } =
        [1e-2, 3e-3, 1e-3, 3e-4, 1e-4, 3e-5, 1e-5, 3e-6, 1e-6, 3e-7, 1e-7, 3e-8, 1e-8, 3e-9, 1e-9];

    /// <summary>
    /// Absolute tolerances tried, over (relative tolerance x largest |u|): the tool's default, and tighter ones for
    /// amounts received that are small against the content of the stack (where the default leaves them loosely held).
    /// </summary>
    public static IReadOnlyList<double> AbsoluteScales { get; } = [1e-3, 1e-6, 1e-9];

    /// <summary>Every (relative tolerance, absolute scale) pair tried.</summary>
    public static IReadOnlyList<(double Setting, double? AbsoluteScale)> Ladder { get; } =
        [.. AbsoluteScales.SelectMany(scale => Tolerances.Select(tolerance => (tolerance, (double?)scale)))];

    /// <summary>The relative tolerance of the converged answer each setting is judged against: the finest admitted.</summary>
    public const double ReferenceTolerance = 1e-10;

    /// <summary>The absolute-tolerance scale of the converged answer: the finest admitted.</summary>
    public const double ReferenceAbsoluteScale = 1e-9;

    /// <summary>Amount received by the right medium at the report times, kg/m2, and the steps taken.</summary>
    public static (double[] Received, int Steps) Received(PeerProblem problem, double relativeTolerance, double absoluteScale)
    {
        ArgumentNullException.ThrowIfNull(problem);
        var model = problem.Model;
        var simulation = problem.Case;
        var outputs = simulation.ReportTimesSeconds;
        var plan = new TimeLoopPlan(outputs, simulation.DurationSeconds, simulation.DurationSeconds, InitialStep(model, outputs[0]));
        var recorder = new ReceivedRecorder(model.System, model.InitialState, outputs.Count);
        var statistics = new TransientSolver(model.System, new SolverOptions { RelativeTolerance = relativeTolerance, AbsoluteToleranceScale = absoluteScale })
            .Run(model.InitialState, plan, recorder);
        if (statistics.StopReason != StopReason.Completed)
        {
            throw new InvalidOperationException($"{problem.Name}: TR-BDF2 stopped early at rtol {relativeTolerance}, atol scale {absoluteScale}: {statistics}");
        }

        return (recorder.Received, statistics.AcceptedSteps + statistics.RejectedSteps);
    }

    // The first trial step of a run of the tool: the smaller of the first output and 1e-3 of the fastest cell's h^2/D.
    private static double InitialStep(DiscreteModel model, double firstOutput)
    {
        var grid = model.Grid;
        var layers = model.Case.Stack.Layers;
        var fastest = double.PositiveInfinity;
        for (var cell = 0; cell < grid.CellCount; cell++)
        {
            var width = grid.WidthsMeters[cell];
            fastest = Math.Min(fastest, width * width / layers[grid.LayerOfCell[cell]].DiffusivitySquareMetersPerSecond);
        }

        return Math.Min(firstOutput, 1e-3 * fastest);
    }
}
