using System.Diagnostics;
using Layers.Core.Analytics;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Results;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// One solve of a case by the exact method in the Laplace domain (src/Layers.Core/Laplace), reported in the same
/// result as the finite volumes': the integral quantities at every output time, the profiles at the report times (at
/// the places the case's mesh would show), the times to 50/90/99 % of the final state found on the inverted solution,
/// the steady flux and lag time from the transform's small-s expansion (docs/numerics.md, "Choosing the method").
/// </summary>
internal static class ExactRun
{
    /// <summary>Solves a case the exact method can serve, on a contour of the given number of points.</summary>
    public static SimulationResult Solve(SimulationCase simulation, int contourPoints, CancellationToken cancellation)
    {
        var clock = Stopwatch.StartNew();
        var sampler = ExactSampler.For(simulation, contourPoints);
        var (model, final, solution) = (sampler.Model, sampler.Final, sampler.Solution);
        var samples = new List<StateSample> { sampler.Initial() };
        var reports = new List<ReportPoint>();
        foreach (var time in OutputSchedule.For(simulation))
        {
            if (cancellation.IsCancellationRequested)
            {
                return Stopped(simulation, model, samples, reports, final, clock, StopReason.Cancelled, "the run was cancelled");
            }

            var instant = solution.InstantAt(time);
            var sample = sampler.Sample(instant);
            samples.Add(sample);
            if (OutputSchedule.IsReportTime(simulation, time))
            {
                reports.Add(sampler.Report(sample, instant));
            }
        }

        samples = InversionNoise.Clear(samples);
        reports = InversionNoise.Clear(reports, samples);
        var horizon = simulation.DurationSeconds * Simulator.HorizonFactor;
        var summary = new FinalStateSummary(
            final.Kind,
            [.. Enumerable.Range(0, simulation.Stack.Count).Select(layer => final.LayerEdges(simulation, layer))],
            final.MediumConcentration(Side.Left),
            final.MediumConcentration(Side.Right),
            SystemTimes(sampler.Distance, solution, horizon, [.. samples.Select(sample => (sample.TimeSeconds, sample.FractionOfFinalState))]),
            CompartmentTimes(sampler, solution, Side.Left, horizon, samples),
            CompartmentTimes(sampler, solution, Side.Right, horizon, samples),
            horizon);
        var worst = samples.Max(sample => Math.Abs(sample.MassBalanceError));
        var lowest = samples.Min(sample => sampler.LowestAmountRelative(sample));
        var (reason, failure) = SelfChecks.Judge(worst, lowest);
        return new SimulationResult
        {
            Case = simulation,
            Grid = model.Grid,
            TimeSeries = samples,
            Reports = reports,
            FinalState = summary,
            Permeation = Permeation(simulation, final, samples[^1], solution),
            WorstMassBalanceError = worst,
            DiffusionCell = DiffusionCellAnalysis.Of(simulation, samples, new SamplingEvents(model)),
            Schedule = ScheduleAnalysis.Of(simulation, samples),
            Statistics = Statistics(model, clock, reason),
            FailureReason = failure,
            Method = SolutionMethod.Laplace,
        };
    }

    /// <summary>
    /// The key figures of a case again on a contour of another size, for the error estimate of <paramref name="fine"/>
    /// (<see cref="ExactEstimation"/>): the report times and the end of the duration only, and each time to a level
    /// moved from the fine run's by Newton's step on this contour's fraction, t - (F(t) - level) / F'(t), which is the
    /// root this contour would give to first order.
    /// </summary>
    public static SimulationResult Comparison(SimulationCase simulation, int contourPoints, SimulationResult fine)
    {
        var sampler = ExactSampler.For(simulation, contourPoints);
        var solution = sampler.Solution;
        var samples = new List<StateSample> { sampler.Initial() };
        var reports = new List<ReportPoint>();
        foreach (var time in simulation.ReportTimesSeconds.Append(simulation.DurationSeconds).Distinct())
        {
            var instant = solution.InstantAt(time);
            var sample = sampler.Sample(instant);
            samples.Add(sample);
            if (OutputSchedule.IsReportTime(simulation, time))
            {
                reports.Add(sampler.Report(sample, instant));
            }
        }

        var final = fine.FinalState;
        var summary = final with
        {
            System = Moved(final.System, time => sampler.Distance.FractionOfFinalState(solution.InstantAt(time))),
            LeftCompartment = final.LeftCompartment is { } left ? Moved(left, time => sampler.CompartmentFraction(Side.Left, solution.At(time))!.Value) : null,
            RightCompartment = final.RightCompartment is { } right ? Moved(right, time => sampler.CompartmentFraction(Side.Right, solution.At(time))!.Value) : null,
        };
        return fine with
        {
            TimeSeries = samples,
            Reports = reports,
            FinalState = summary,
            Permeation = Permeation(simulation, sampler.Final, samples[^1], solution),
            NumericalError = null,
        };
    }

    /// <summary>Each time moved by Newton's step on <paramref name="fraction"/> toward its level (0 and null stay).</summary>
    private static ThresholdTimes Moved(ThresholdTimes times, Func<double, double> fraction)
    {
        double? Move(double? time, double level)
        {
            if (time is not { } t || t <= 0)
            {
                return time;
            }

            const double step = 1e-4;
            var slope = (fraction(t * (1 + step)) - fraction(t * (1 - step))) / (2 * step * t);
            return slope > 0 ? t - ((fraction(t) - level) / slope) : t;
        }

        var levels = ThresholdTimes.Levels;
        return new ThresholdTimes(Move(times.Half, levels[0]), Move(times.NinetyPercent, levels[1]), Move(times.NinetyNinePercent, levels[2]));
    }

    /// <summary>The integral quantities at the output times up to the duration, and nothing else (fitting).</summary>
    public static IReadOnlyList<StateSample> TimeSeries(SimulationCase simulation, int contourPoints)
    {
        var sampler = ExactSampler.For(simulation, contourPoints);
        var samples = new List<StateSample> { sampler.Initial() };
        foreach (var time in OutputSchedule.For(simulation))
        {
            samples.Add(sampler.Sample(sampler.Solution.InstantAt(time)));
        }

        return InversionNoise.Clear(samples);
    }

    /// <summary>
    /// Times for the whole system to go 50/90/99 % of the way, on the finite volumes' measure in its limit of fine cells
    /// (<see cref="ExactDistance"/>).
    /// </summary>
    private static ThresholdTimes SystemTimes(ExactDistance distance, LaplaceSolution solution, double horizon, IReadOnlyList<(double, double)> known)
    {
        if (distance.StartsAtFinalState)
        {
            return new ThresholdTimes(0, 0, 0);
        }

        var times = FirstCrossings.Find(time => distance.FractionOfFinalState(solution.InstantAt(time)), ThresholdTimes.Levels, horizon, known);
        return new ThresholdTimes(times[0], times[1], times[2]);
    }

    /// <summary>Times for a compartment's content to go 50/90/99 % of the way to its final content, or null when it does not change.</summary>
    private static ThresholdTimes? CompartmentTimes(ExactSampler sampler, LaplaceSolution solution, Side side, double horizon, List<StateSample> samples)
    {
        if (sampler.CompartmentFraction(side, solution.At(horizon)) is null)
        {
            return null;
        }

        var known = samples.Select(sample => (sample.TimeSeconds, (side == Side.Left ? sample.Left : sample.Right)!.FractionOfEquilibrium!.Value)).ToList();
        var times = FirstCrossings.Find(time => sampler.CompartmentFraction(side, solution.At(time))!.Value, ThresholdTimes.Levels, horizon, known);
        return new ThresholdTimes(times[0], times[1], times[2]);
    }

    /// <summary>Steady permeation between two baths: the steady flux, the flux at the end, the lag time of the exact line.</summary>
    private static PermeationSummary? Permeation(SimulationCase simulation, FinalStateTarget final, StateSample last, LaplaceSolution solution)
    {
        if (final.Kind != FinalStateKind.SteadyPermeation || simulation.Left.HasFiniteVolume || simulation.Right.HasFiniteVolume)
        {
            return null;
        }

        var flux = final.Steady!.FluxKgPerSquareMeterSecond;
        var receiving = flux > 0 ? Side.Right : Side.Left;
        var atEnd = flux == 0 ? 0 : (receiving == Side.Right ? last.Right : last.Left)!.FluxIntoMediumKgPerSquareMeterSecond;
        return new PermeationSummary(flux, atEnd, solution.SteadyLine(receiving)?.LagTimeSeconds, SingleMembrane.LagTimeSeconds(simulation));
    }

    private static SolverStatistics Statistics(DiscreteModel model, Stopwatch clock, StopReason reason) => new()
    {
        Unknowns = model.System.NodeCount,
        WallSeconds = clock.Elapsed.TotalSeconds,
        StopReason = reason,
    };

    private static SimulationResult Stopped(
        SimulationCase simulation, DiscreteModel model, List<StateSample> samples, List<ReportPoint> reports, FinalStateTarget final, Stopwatch clock, StopReason reason, string failure)
        => new()
        {
            Case = simulation,
            Grid = model.Grid,
            TimeSeries = samples,
            Reports = reports,
            FinalState = new FinalStateSummary(final.Kind, [], null, null, new ThresholdTimes(null, null, null), null, null, simulation.DurationSeconds),
            WorstMassBalanceError = 0,
            Statistics = Statistics(model, clock, reason),
            FailureReason = failure,
            Method = SolutionMethod.Laplace,
        };
}
