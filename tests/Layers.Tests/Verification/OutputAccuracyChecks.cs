using System.Collections.Concurrent;
using System.Globalization;
using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// The checks behind the output-accuracy tests: a number a user reads (the flux into a face medium, bath or
/// compartment, and the concentration at a named depth) within numerics.accuracy of its own value, |value - exact| &lt;= accuracy |exact|, against a
/// published closed form, with the exact Laplace-domain solution as a second reference beside it. Values below 1e-6
/// of their scale are not checked (their rows are left out). Every figure of this kind is also held to the promise,
/// within the accuracy or listed as missing it, by <see cref="ErrorEstimateTests"/>.
/// </summary>
internal static class OutputAccuracyChecks
{
    // Membrane between a source bath and a sink, empty at first.
    public const double MembraneThickness = 100e-6;
    public const double MembraneDiffusivity = 1e-13;
    public const double MembranePartition = 3;
    public const double SourceConcentration = 2;

    /// <summary>The report times of the membrane run, as D t / l^2.</summary>
    public static readonly double[] MembraneTaus = [0.02, 0.05, 0.1, 0.2, 0.5, 1, 2];

    // Two thick layers in contact, closed outer faces: the first loaded, the second empty, K1/K2 = 5.
    public const double FirstDiffusivity = 1e-13;
    public const double SecondDiffusivity = 4e-13;
    public const double FirstPartition = 5;
    public const double LoadedConcentration = 300;
    public const double MediumThickness = 400e-6;

    /// <summary>The report times of the two-media run, as fractions of its duration.</summary>
    public static readonly double[] MediaTimeFractions = [1.0 / 16, 1.0 / 4, 1];

    /// <summary>
    /// The named depths of the two-media run, as multiples of the diffusion length 2 sqrt(D t_end) of the medium they
    /// lie in, from the contact (negative in the first medium); 0 is the contact, read on both sides.
    /// </summary>
    public static readonly double[] MediaDepthMultiples = [-1.5, -0.5, -0.1, 0, 0.1, 0.5, 1.0, 1.5];

    private static readonly ConcurrentDictionary<double, SimulationResult> MembraneRuns = new();
    private static readonly ConcurrentDictionary<double, SimulationResult> MediaRuns = new();

    /// <summary>
    /// The flux into the sink at report time index <paramref name="report"/> against Crank's membrane series
    /// (<see cref="MembraneFluxSeries"/>; Crank 1975, ch. 4, eq. 4.24a and its time derivative, from memory) and the
    /// Laplace solution.
    /// </summary>
    public static void MembraneFluxIntoSink(double accuracy, int report)
    {
        var result = MembraneRuns.GetOrAdd(accuracy, RunMembrane);
        var time = result.Case.ReportTimesSeconds[report];
        var exact = MembraneFluxSeries.Flux(MembraneDiffusivity, MembraneThickness, MembranePartition * SourceConcentration, time);
        var laplace = LaplaceSolution.For(result.Case).At(time).Face(Side.Right)!.FluxIntoMediumKgPerSquareMeterSecond;
        Tolerance.Relative(exact, laplace, 1e-8, "Laplace solution against Crank's membrane series");
        var simulated = result.Reports[report].Sample.Right!.FluxIntoMediumKgPerSquareMeterSecond;
        Tolerance.Relative(exact, simulated, accuracy, Describe($"flux into the sink at D t / l^2 = {MembraneTaus[report]}, accuracy {accuracy:G1} (Crank eq. 4.24a, derivative)"));
    }

    /// <summary>
    /// The concentration at a named depth on one side of the contact of two semi-infinite media against the erfc
    /// solution (<see cref="TwoSemiInfiniteMedia"/>; Crank 1975, ch. 3, composite media, and Carslaw and Jaeger 1959,
    /// ch. 2.15, section numbers from memory) and the Laplace solution.
    /// </summary>
    /// <param name="accuracy">numerics.accuracy of the run.</param>
    /// <param name="report">Index of the report time in <see cref="MediaTimeFractions"/>.</param>
    /// <param name="depth">Index of the depth in <see cref="MediaDepthMultiples"/>.</param>
    /// <param name="layer">The layer read (0 or 1: at the contact, the side).</param>
    public static void MediaConcentrationAtDepth(double accuracy, int report, int depth, int layer)
    {
        var result = MediaRuns.GetOrAdd(accuracy, RunMedia);
        var time = result.Case.ReportTimesSeconds[report];
        var position = result.Case.ReportDepthsMeters[depth] - MediumThickness;
        var onMediumTwoSide = TwoSemiInfiniteMedia.Concentration(
            FirstDiffusivity, SecondDiffusivity, FirstPartition, LoadedConcentration, position, time);

        // At the contact the erfc solution gives the second medium's side; the first's is K1/K2 times it (c1 = K c2).
        var exact = layer == 0 && position >= 0 ? FirstPartition * onMediumTwoSide : onMediumTwoSide;
        Assert.True(exact > 1e-6 * LoadedConcentration, "a row below 1e-6 of the scale is not checked; leave it out");
        var laplace = layer == 0 && position >= 0
            ? LaplaceSolution.For(result.Case).ConcentrationAtFace(0, Side.Right, time)
            : LaplaceSolution.For(result.Case).ConcentrationAt(result.Case.ReportDepthsMeters[depth], time);
        Tolerance.Relative(exact, laplace, 1e-8, "Laplace solution against the erfc solution");
        var reading = result.Reports[report].Depths.Single(reading => reading.DepthMeters == result.Case.ReportDepthsMeters[depth] && reading.LayerIndex == layer);
        Tolerance.Relative(exact, reading.ConcentrationKgPerCubicMeter, accuracy, Describe(
            $"concentration in layer {layer} at {position * 1e6:G4} um from the contact, t = {MediaTimeFractions[report]:G3} t_end, accuracy {accuracy:G1} (erfc solution)"));
    }

    private static SimulationResult RunMembrane(double accuracy)
    {
        var scale = MembraneThickness * MembraneThickness / MembraneDiffusivity;
        var reports = MembraneTaus.Select(tau => tau * scale).ToArray();
        var simulation = Cases.Make(
            Cases.Bath(SourceConcentration),
            Cases.Bath(0),
            reports[^1],
            reports,
            NumericsSettings.ForAccuracy(accuracy) with { Method = SolutionMethod.FiniteVolume },
            Cases.Layer("membrane", MembraneThickness, MembraneDiffusivity, MembranePartition));
        return Completed(Simulator.Run(simulation));
    }

    private static SimulationResult RunMedia(double accuracy)
    {
        // L / (2 sqrt(D t)) = 4 in the faster medium at the end: the far faces see erfc(8) of the change (the image in
        // a closed face lies 2L away), so both layers are semi-infinite to far below every tolerance here.
        var end = Math.Pow(MediumThickness / 8, 2) / Math.Max(FirstDiffusivity, SecondDiffusivity);
        var first = 2 * Math.Sqrt(FirstDiffusivity * end);
        var second = 2 * Math.Sqrt(SecondDiffusivity * end);
        var depths = MediaDepthMultiples.Select(multiple => MediumThickness + (multiple * (multiple < 0 ? first : second))).ToArray();
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            end,
            MediaTimeFractions.Select(fraction => fraction * end).ToArray(),
            NumericsSettings.ForAccuracy(accuracy) with { Method = SolutionMethod.FiniteVolume },
            Cases.Layer("first", MediumThickness, FirstDiffusivity, FirstPartition, LoadedConcentration),
            Cases.Layer("second", MediumThickness, SecondDiffusivity, 1)) with { ReportDepthsMeters = depths };
        return Completed(Simulator.Run(simulation));
    }

    private static SimulationResult Completed(SimulationResult result)
    {
        Assert.True(result.Completed, result.FailureReason);
        return result;
    }

    private static string Describe(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
