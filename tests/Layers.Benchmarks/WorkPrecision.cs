using System.Globalization;
using System.Text;
using Layers.Benchmarks.Reference;
using Layers.Plotting;

namespace Layers.Benchmarks;

/// <summary>
/// The work-precision command: for each <see cref="AccuracyProblem"/>, the tool at several accuracy settings (its
/// default mesh by diffusion length) and at several shared-count mesh sizes and relative tolerances, and the plain
/// reference at several mesh and step sizes; writes work-precision.csv with every point
/// and one PNG per problem (work-precision.png for the analytic sheet, work-precision-laminate.png).
/// </summary>
public static class WorkPrecision
{
    /// <summary>Cell counts of the tool's lines.</summary>
    public static IReadOnlyList<int> ToolCells { get; } = [60, 120, 240, 480];

    /// <summary>Relative tolerances along each of the tool's lines.</summary>
    public static IReadOnlyList<double> ToolTolerances { get; } = [1e-3, 1e-4, 1e-5, 1e-6, 1e-7, 1e-8];

    /// <summary>The <c>numerics.accuracy</c> settings of the tool's line on its own mesh by diffusion length.</summary>
    public static IReadOnlyList<double> ToolAccuracies { get; } = [1e-2, 3e-3, 1e-3, 3e-4, 1e-4, 3e-5, 1e-5];

    /// <summary>
    /// Plain reference settings: cells doubled and steps quadrupled together, which keeps its first-order time error
    /// and second-order space error in step.
    /// </summary>
    public static IReadOnlyList<(int Cells, int Steps)> PlainSettings { get; } =
        [(20, 40), (40, 160), (80, 640), (160, 2560), (320, 10240), (640, 40960)];

    /// <summary>Runs the comparison and writes the files into <paramref name="folder"/>.</summary>
    public static int Run(string folder, TextWriter log)
    {
        ArgumentNullException.ThrowIfNull(log);
        Directory.CreateDirectory(folder);
        var csv = new StringBuilder("problem,solver,cells,relative_tolerance,steps,error,median_seconds,runs\n");
        foreach (var problem in AccuracyProblem.All())
        {
            var series = new List<WorkPrecisionSeries>();
            var byAccuracy = new List<WorkPrecisionPoint>();
            foreach (var accuracy in ToolAccuracies)
            {
                var error = problem.ToolErrorAtAccuracy(accuracy);
                var (seconds, runs) = Timing.Median(() => AccuracyProblem.ToolReceivedAtAccuracy(problem.Case, accuracy));
                var cells = problem.CellsAtAccuracy(accuracy);
                byAccuracy.Add(new WorkPrecisionPoint(seconds, error));
                csv.Append(Invariant($"{problem.Name},tool-accuracy,{cells},{accuracy:R},,{error:R},{seconds:R},{runs}\n"));
                log.WriteLine(Invariant($"{problem.Name}: tool, accuracy {accuracy:0e0} ({cells} cells): error {error:0.00e0}, {seconds * 1e3:0.000} ms"));
            }

            series.Add(new WorkPrecisionSeries("tool, numerics.accuracy 1e-2 to 1e-5 (mesh by diffusion length; solve to the duration)", byAccuracy));
            foreach (var cells in ToolCells)
            {
                var points = new List<WorkPrecisionPoint>();
                foreach (var tolerance in ToolTolerances)
                {
                    var error = problem.ToolError(cells, tolerance);
                    var (seconds, runs) = Timing.Median(() => AccuracyProblem.ToolReceived(problem.Case, cells, tolerance));
                    points.Add(new WorkPrecisionPoint(seconds, error));
                    csv.Append(Invariant($"{problem.Name},tool,{cells},{tolerance:R},,{error:R},{seconds:R},{runs}\n"));
                    log.WriteLine(Invariant($"{problem.Name}: tool, {cells} cells, rtol {tolerance:0e0}: error {error:0.00e0}, {seconds * 1e3:0.000} ms"));
                }

                series.Add(new WorkPrecisionSeries($"tool, {cells} cells shared by thickness, rtol 1e-3 to 1e-8", points));
            }

            var plain = new List<WorkPrecisionPoint>();
            foreach (var (cells, steps) in PlainSettings)
            {
                var error = problem.PlainError(cells, steps);
                var (seconds, runs) = Timing.Median(() => PlainReference.ReceivedOnTheRight(problem.Case, cells, steps));
                plain.Add(new WorkPrecisionPoint(seconds, error));
                csv.Append(Invariant($"{problem.Name},plain,{cells},,{steps},{error:R},{seconds:R},{runs}\n"));
                log.WriteLine(Invariant($"{problem.Name}: plain, {cells} cells, {steps} steps: error {error:0.00e0}, {seconds * 1e3:0.000} ms"));
            }

            series.Add(new WorkPrecisionSeries("plain reference: uniform cells, fixed backward-Euler steps (20 to 640 cells, 40 to 40960 steps)", plain, IsReference: true));
            var png = WorkPrecisionPlot.Render(
                $"Work and precision: {problem.Case.Title}",
                [$"Error: largest difference in the amount received over six times, against {problem.ReferenceText}, divided by the final amount.",
                 $"Solve time: median of repeated warm runs, {Environment.ProcessorCount} cores, .NET {Environment.Version}."],
                series,
                new PlotOptions());
            var name = problem.Name == "sheet" ? "work-precision.png" : $"work-precision-{problem.Name}.png";
            File.WriteAllBytes(Path.Combine(folder, name), png);
        }

        File.WriteAllText(Path.Combine(folder, "work-precision.csv"), csv.ToString());
        log.WriteLine($"wrote work-precision.csv and the PNGs to {Path.GetFullPath(folder)}");
        return 0;
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
