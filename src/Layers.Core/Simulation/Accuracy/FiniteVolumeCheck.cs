using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// Checks a result of the exact method against the finite volumes: the case solved as <c>numerics.method</c>
/// "finiteVolume" would solve it (error estimated, mesh and steps refined to the accuracy), and every key figure above
/// its floor compared where the finite volumes' own estimate meets the accuracy (a figure they could not refine to it,
/// an early amount deep in a tail, says nothing about the exact method). The two methods
/// share only the case: a difference beyond the accuracy and both estimates is a fault of one of them.
/// </summary>
internal static class FiniteVolumeCheck
{
    /// <summary>The check of a completed exact result whose error was estimated; <paramref name="solve"/> is one finite-volume solve.</summary>
    public static CrossCheckSummary Of(SimulationResult exact, Func<SimulationCase, SimulationResult> solve)
    {
        var simulation = exact.Case;
        var accuracy = simulation.Numerics.Accuracy;
        var numerics = simulation.Numerics with { Method = SolutionMethod.FiniteVolume };
        var finiteVolumes = ErrorEstimation.Run(simulation with { Numerics = numerics }, solve);
        if (!finiteVolumes.Completed || finiteVolumes.NumericalError is not { Unavailable: null } estimate)
        {
            var why = finiteVolumes.Completed ? finiteVolumes.NumericalError?.Unavailable ?? "no estimate" : finiteVolumes.FailureReason;
            return new CrossCheckSummary("the finite-volume solve did not give a result to compare (" + why + ")", accuracy, []) { CheckedBy = SolutionMethod.FiniteVolume };
        }

        var other = estimate.Figures.ToDictionary(figure => figure.Figure.Path, StringComparer.Ordinal);
        var figures = exact.NumericalError!.Figures
            .Where(figure => !figure.Figure.IsNegligible
                && other.TryGetValue(figure.Figure.Path, out var check)
                && !check.Exceeds(accuracy))
            .Select(figure => new FigureComparison(figure, other[figure.Figure.Path].Figure.Value)
            {
                CheckEstimatedError = other[figure.Figure.Path].EstimatedError,
            })
            .ToList();
        return new CrossCheckSummary(null, accuracy, figures) { CheckedBy = SolutionMethod.FiniteVolume };
    }
}
