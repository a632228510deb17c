using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// The exact method with the error of its key figures estimated: the case inverted on the contour of
/// <see cref="ContourPoints"/> points and its key figures again on one of <see cref="ComparisonContourPoints"/>
/// (<see cref="ExactRun.Comparison"/>); the difference of the two (never below the round-off of
/// <see cref="ErrorEstimation.RoundOff"/>) is each figure's estimate. The
/// contour's error falls geometrically with its points, so the difference bounds the error of the finer inversion
/// many times over where the inversion converges, and shows where it does not: a figure deep in a diffusion tail, far
/// below the largest values of its transform, where the inversion's round-off is large beside it.
/// </summary>
internal static class ExactEstimation
{
    /// <summary>Points of the contour whose values are reported.</summary>
    public const int ContourPoints = 32;

    /// <summary>Points of the comparison contour.</summary>
    public const int ComparisonContourPoints = 24;

    /// <summary>How the estimate is made, in words (summary.json <c>numericalError.method</c>).</summary>
    public const string Description =
        "exact method in the Laplace domain: difference between the inversions on contours of 32 and 24 points";

    public static SimulationResult Run(SimulationCase simulation, CancellationToken cancellation)
    {
        var fine = ExactRun.Solve(simulation, ContourPoints, cancellation);
        if (!fine.Completed || simulation.Numerics.ErrorControl == ErrorControl.None)
        {
            return fine;
        }

        if (cancellation.IsCancellationRequested)
        {
            return fine with { Statistics = fine.Statistics with { StopReason = StopReason.Cancelled }, FailureReason = "the run was cancelled" };
        }

        var coarse = ExactRun.Comparison(simulation, ComparisonContourPoints, fine);

        var error = coarse.Completed
            ? ErrorEstimation.Compare(fine, coarse, [])
            : new NumericalErrorSummary(simulation.Numerics.Accuracy, NegligibleFloor.AmountPerArea(fine), [], [], "the comparison inversion failed its own checks: " + coarse.FailureReason);
        return fine with { NumericalError = error };
    }

    /// <summary>
    /// Why a result of the exact method should not be kept when the finite volumes could be used instead (it failed its
    /// own checks, its estimate is unavailable, or a figure above its floor misses the accuracy), or null to keep it.
    /// A cancelled run is kept: it ends cancelled whatever the method.
    /// </summary>
    public static string? WhyNotKept(SimulationResult exact)
    {
        if (exact.Statistics.StopReason == StopReason.Cancelled)
        {
            return null;
        }

        if (!exact.Completed)
        {
            return "the exact method failed its own checks (" + exact.FailureReason + ")";
        }

        if (exact.NumericalError is { Unavailable: { } reason })
        {
            return "the exact method's error could not be estimated (" + reason + ")";
        }

        if (exact.NumericalError is { MeetsAccuracy: false } error)
        {
            var worst = error.AboveAccuracy.MaxBy(figure => figure.RelativeError)!;
            return string.Create(
                CultureInfo.InvariantCulture,
                $"the exact inversion misses the accuracy on {error.AboveAccuracy.Count} figure(s) (worst: {worst.Figure.What}, estimate {worst.RelativeError:0.#e0})");
        }

        return null;
    }
}
