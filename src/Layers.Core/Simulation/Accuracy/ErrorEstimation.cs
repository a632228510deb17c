using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// A run with its numerical error estimated and, where the case allows, controlled. The case is solved at its own
/// numerics and again with every error source four times larger (<see cref="NumericsSettings.Scaled"/>); for a
/// second-order method the difference of the two is about three times the error of the first, and it is each key
/// figure's estimate. While a figure above its floor misses the accuracy, the mesh and the steps are refined: as many
/// levels at once (each dividing the errors by four) as the worst shortfall asks for, solving the level below the
/// target too so that the estimate again compares two neighbouring levels. The finest solve is the one reported
/// (docs/numerics.md, "The accuracy promise").
/// </summary>
internal static class ErrorEstimation
{
    /// <summary>How much larger the errors of the comparison solve are, and how much smaller each refinement level's.</summary>
    public const double LevelErrorFactor = 4;

    /// <summary>Most levels a run is refined by in all (cells up to 2^this times the first mesh's).</summary>
    public const int MaximumLevels = 8;

    /// <summary>
    /// No refinement is made whose solve would take more than this much work, in cells times steps (each level
    /// doubles both): a few tenths of a second on one core, so that a run that cannot close its shortfall says so instead of
    /// running for minutes.
    /// </summary>
    public const double MaximumWork = 2e6;

    public static SimulationResult Run(SimulationCase simulation, Func<SimulationCase, SimulationResult> solve)
    {
        var level = 0;
        SimulationResult AtLevel(int target) =>
            solve(simulation with { Numerics = simulation.Numerics.Scaled(Math.Pow(LevelErrorFactor, -target)) });

        var fine = solve(simulation);
        if (!fine.Completed)
        {
            return fine;
        }

        var coarse = AtLevel(-1);
        if (WasCancelled(coarse))
        {
            return coarse;
        }

        var solves = new List<SolveRecord> { Record(coarse), Record(fine) };
        if (!coarse.Completed)
        {
            // The coarse mesh cannot carry the case; compare with a finer solve instead, and report that one.
            var finer = AtLevel(1);
            if (WasCancelled(finer))
            {
                return finer;
            }

            if (!finer.Completed)
            {
                return fine with { NumericalError = Unavailable(fine, solves, "the comparison solves on a coarser and a finer mesh did not complete") };
            }

            (coarse, fine, level) = (fine, finer, 1);
            solves.Add(Record(fine));
        }

        var summary = Compare(fine, coarse, solves);
        string? stopped = simulation.Numerics.ErrorControl == ErrorControl.EstimateAndRefine ? null : "the mesh is fixed by numerics.cells";
        while (stopped is null && !summary.MeetsAccuracy)
        {
            var shortfall = WorstShortfall(summary);
            var jump = LevelsToClose(shortfall, Work(fine), MaximumLevels - level);
            if (jump == 0)
            {
                stopped = "the next refinement would exceed the work limit";
                break;
            }

            var below = jump == 1 ? fine : AtLevel(level + jump - 1);
            var target = below.Completed ? AtLevel(level + jump) : below;
            if (WasCancelled(target))
            {
                // A run cancelled while it refines is cancelled, not reported at the level it had reached.
                return target;
            }

            if (!target.Completed)
            {
                stopped = "a finer solve failed: " + target.FailureReason;
                break;
            }

            if (!ReferenceEquals(below, fine))
            {
                solves.Add(Record(below));
            }

            solves.Add(Record(target));
            (coarse, fine, level) = (below, target, level + jump);
            summary = Compare(fine, coarse, solves);

            // A level divides a second-order error by four; a refinement that did not halve the worst shortfall met an
            // error of lower order (a moving front's), and further levels would not pay for themselves either.
            if (!summary.MeetsAccuracy && WorstShortfall(summary) > shortfall / 2)
            {
                stopped = "a refinement did not halve the worst shortfall";
                break;
            }
        }

        return fine with { NumericalError = summary.MeetsAccuracy ? summary : summary with { RefinementStopped = stopped } };
    }

    /// <summary>Every key figure of <paramref name="fine"/> with its estimated error from the comparison with <paramref name="coarse"/>.</summary>
    /// <remarks>
    /// The estimate is |fine - coarse|, and never below <see cref="RoundOff"/> of the figure: two solves that agree to
    /// the last bits say nothing about the round-off both carry.
    /// </remarks>
    internal static NumericalErrorSummary Compare(SimulationResult fine, SimulationResult coarse, IReadOnlyList<SolveRecord> solves)
    {
        var floor = NegligibleFloor.AmountPerArea(fine);
        var comparison = KeyFigures.Of(coarse, floor).ToDictionary(figure => figure.Path, figure => figure.Value, StringComparer.Ordinal);

        // A figure the coarse solve did not produce (a time it never reached) has no bound on its error.
        var figures = KeyFigures.Of(fine, floor)
            .Select(figure => new FigureError(
                figure,
                comparison.TryGetValue(figure.Path, out var other)
                    ? Math.Max(Math.Abs(figure.Value - other), RoundOff * Math.Abs(figure.Value))
                    : double.PositiveInfinity))
            .ToList();
        return new NumericalErrorSummary(fine.Case.Numerics.Accuracy, floor, figures, [.. solves], null);
    }

    /// <summary>The relative round-off a run's figures carry (the mass balance of a run closes to about 1e-13).</summary>
    public const double RoundOff = 1e-12;

    /// <summary>
    /// How many levels to refine by: enough for the worst shortfall to close at second order (each level divides it by
    /// four), within the levels left and the work limit (each level doubles the cells and the steps); 0 when none is
    /// left.
    /// </summary>
    internal static int LevelsToClose(double shortfall, double work, int levelsLeft)
    {
        var wanted = double.IsFinite(shortfall) ? (int)Math.Ceiling(Math.Log(shortfall) / Math.Log(LevelErrorFactor)) : 1;
        var affordable = 0;
        while (affordable < levelsLeft && work * Math.Pow(4, affordable + 1) <= MaximumWork)
        {
            affordable++;
        }

        return Math.Clamp(wanted, Math.Min(1, affordable), affordable);
    }

    /// <summary>The largest estimate over the accuracy times the value, over the figures above their floor.</summary>
    private static double WorstShortfall(NumericalErrorSummary summary) =>
        summary.AboveAccuracy.Max(figure => figure.EstimatedError / (summary.Accuracy * Math.Abs(figure.Figure.Value)));

    private static NumericalErrorSummary Unavailable(SimulationResult fine, IReadOnlyList<SolveRecord> solves, string reason) =>
        new(fine.Case.Numerics.Accuracy, NegligibleFloor.AmountPerArea(fine), [], [.. solves], reason);

    private static bool WasCancelled(SimulationResult result) => result.Statistics.StopReason == StopReason.Cancelled;

    private static double Work(SimulationResult result) => (double)result.Grid.CellCount * result.Statistics.AcceptedSteps;

    private static SolveRecord Record(SimulationResult result) =>
        new(result.Grid.CellCount, result.Statistics.AcceptedSteps, result.Case.Numerics.Solver.RelativeTolerance);
}
