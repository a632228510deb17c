using Layers.Benchmarks.Reference;
using Layers.Core.Analytics;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;

namespace Layers.Benchmarks;

/// <summary>
/// A case with a trusted answer: the mass received by the right face medium at six report times. The error of a
/// run is the largest difference over those times divided by <see cref="ScaleKgPerSquareMeter"/>.
/// </summary>
/// <param name="Name">Short name used in file names and tables.</param>
/// <param name="Case">The case, with report times at 1/10, 2/10, 4/10, 6/10, 8/10 and 10/10 of the duration.</param>
/// <param name="ExactKgPerSquareMeter">The trusted mass per area received at each report time.</param>
/// <param name="ScaleKgPerSquareMeter">The amount errors are divided by.</param>
/// <param name="ReferenceText">Where the trusted answer comes from.</param>
public sealed record AccuracyProblem(
    string Name,
    SimulationCase Case,
    IReadOnlyList<double> ExactKgPerSquareMeter,
    double ScaleKgPerSquareMeter,
    string ReferenceText)
{
    /// <summary>Fractions of the duration at which results are compared; plain steps must divide into tenths.</summary>
    public static IReadOnlyList<double> ReportFractions { get; } = [0.1, 0.2, 0.4, 0.6, 0.8, 1.0];

    /// <summary>
    /// One sheet (50 um, D = 8e-10 cm2/s, 920 mg/L) releasing into a well-mixed liquid of the same volume and K = 1
    /// (alpha = 1) until D t / L^2 = 0.5. Reference: Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4,
    /// eq. 4.37 and 4.38 (equation numbers from memory), as <see cref="PlaneSheetIntoLimitedVolume"/>.
    /// </summary>
    public static AccuracyProblem Sheet()
    {
        const double thickness = 50e-6, diffusivity = 8e-14, initial = 920, volumePerArea = 50e-6;
        var duration = 0.5 * thickness * thickness / diffusivity;
        var simulation = new SimulationCase
        {
            Title = "Benchmark sheet into a limited volume",
            Stack = new LayerStack([new Layer("sheet", thickness, diffusivity, 1, initial)]),
            Left = new ClosedFace(),
            Right = new CompartmentFace("liquid", volumePerArea, 1, 1, 0, null),
            DurationSeconds = duration,
            ReportTimesSeconds = [.. ReportFractions.Select(fraction => fraction * duration)],
        };
        var exact = simulation.ReportTimesSeconds
            .Select(time => PlaneSheetIntoLimitedVolume.TransferredMassPerArea(diffusivity, thickness, initial, volumePerArea, 1, time))
            .ToArray();
        var final = initial * thickness * volumePerArea / (volumePerArea + thickness);
        return new AccuracyProblem("sheet", simulation, exact, final, "Crank's limited-volume series (ch. 4, eq. 4.37/4.38)");
    }

    /// <summary>
    /// The benchmark laminate (cases/laminate.json), against a converged run of the tool: 2000 cells and relative
    /// tolerance 1e-9, far finer than any setting compared (1000 cells give the same amounts to 3e-8).
    /// </summary>
    public static AccuracyProblem Laminate()
    {
        var loaded = BenchmarkCases.Load("laminate");
        var simulation = loaded with { ReportTimesSeconds = [.. ReportFractions.Select(fraction => fraction * loaded.DurationSeconds)] };
        var converged = ToolReceived(simulation, 2000, 1e-9);
        return new AccuracyProblem("laminate", simulation, converged, converged[^1], "a converged run of the tool (2000 cells, rtol 1e-9)");
    }

    /// <summary>The problems of the work-precision diagram.</summary>
    public static IReadOnlyList<AccuracyProblem> All() => [Sheet(), Laminate()];

    /// <summary>Mass received on the right at the report times by the tool at the given settings.</summary>
    public static double[] ToolReceived(SimulationCase simulation, int cells, double relativeTolerance)
    {
        var result = Simulator.Run(simulation with
        {
            Numerics = NumericsSettings.FixedCells(cells, relativeTolerance),
        });
        if (!result.Completed)
        {
            throw new InvalidOperationException($"{simulation.Title}: the tool stopped early at {cells} cells, rtol {relativeTolerance}: {result.Statistics}");
        }

        return [.. result.Reports.Select(report => report.Sample.Right!.TransferredIntoMediumPerArea)];
    }

    /// <summary>
    /// Mass received on the right at the report times by the tool at a <c>numerics.accuracy</c> setting (the mesh by
    /// diffusion length), through the lean solve to the duration: the same work as the plain reference does.
    /// </summary>
    public static double[] ToolReceivedAtAccuracy(SimulationCase simulation, double accuracy)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var (samples, statistics) = Simulator.RunTimeSeries(simulation with { Numerics = NumericsSettings.ForAccuracy(accuracy) });
        if (statistics.StopReason != StopReason.Completed)
        {
            throw new InvalidOperationException($"{simulation.Title}: the tool stopped early at accuracy {accuracy}: {statistics}");
        }

        return [.. simulation.ReportTimesSeconds.Select(time => samples.First(sample => Math.Abs(sample.TimeSeconds - time) <= 1e-9 * time).Right!.TransferredIntoMediumPerArea)];
    }

    /// <summary>The cells of the mesh a <c>numerics.accuracy</c> setting gives this problem.</summary>
    public int CellsAtAccuracy(double accuracy)
        => GridBuilder.Build(Case with { Numerics = NumericsSettings.ForAccuracy(accuracy) }).CellCount;

    /// <summary>The error of a run of the tool at a <c>numerics.accuracy</c> setting.</summary>
    public double ToolErrorAtAccuracy(double accuracy) => Error(ToolReceivedAtAccuracy(Case, accuracy));

    /// <summary>The error of a run of the tool.</summary>
    public double ToolError(int cells, double relativeTolerance) => Error(ToolReceived(Case, cells, relativeTolerance));

    /// <summary>The error of a run of the plain reference.</summary>
    public double PlainError(int cells, int steps) => Error(PlainReference.ReceivedOnTheRight(Case, cells, steps));

    /// <summary>Largest difference from the trusted answer over the report times, relative to the scale.</summary>
    public double Error(IReadOnlyList<double> received)
    {
        ArgumentNullException.ThrowIfNull(received);
        var worst = 0.0;
        for (var i = 0; i < received.Count; i++)
        {
            worst = Math.Max(worst, Math.Abs(received[i] - ExactKgPerSquareMeter[i]));
        }

        return worst / ScaleKgPerSquareMeter;
    }
}
