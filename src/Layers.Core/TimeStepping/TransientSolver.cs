using System.Diagnostics;
using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Core.TimeStepping;

/// <summary>
/// The time loop: tries TR-BDF2 steps, lets <see cref="StepSizeController"/> accept or resize them, rejects steps
/// that would make a value negative beyond round-off, shortens steps to land exactly on the end and on the times of
/// state events, interpolates the outputs that fall inside a step, and notifies the observer, handing it the step's
/// interpolant (<see cref="IDenseOutput"/>). Work per step is
/// O(nodes); nothing is allocated inside the loop.
/// </summary>
public sealed class TransientSolver
{
    private readonly DiffusionSystem _system;
    private readonly SolverOptions _options;
    private readonly StepSizeController _controller;

    /// <summary>Creates a solver for one assembled system.</summary>
    public TransientSolver(DiffusionSystem system, SolverOptions options, StepSizeController? controller = null)
    {
        _system = system;
        _options = options;
        _controller = controller ?? new StepSizeController();
    }

    /// <summary>Integrates from u(0) according to the plan.</summary>
    public SolverStatistics Run(
        ReadOnlySpan<double> initialState,
        TimeLoopPlan plan,
        ITimeLoopObserver observer,
        CancellationToken cancellation = default)
        => Run(initialState, plan, observer, null, cancellation);

    /// <summary>Integrates from u(0) according to the plan, with instant changes of the state at given times.</summary>
    /// <param name="initialState">u(0) at every node.</param>
    /// <param name="plan">Output times, end and horizon.</param>
    /// <param name="observer">Receives the state at outputs and steps.</param>
    /// <param name="events">Changes of the state, applied right after any output at their times, or null.</param>
    /// <param name="cancellation">Stops the loop early.</param>
    public SolverStatistics Run(
        ReadOnlySpan<double> initialState,
        TimeLoopPlan plan,
        ITimeLoopObserver observer,
        IStateEvents? events,
        CancellationToken cancellation = default)
    {
        var clock = Stopwatch.StartNew();
        var loop = new LoopState(_system.NodeCount, initialState, ToleranceScale(initialState));
        var stepper = new TrBdf2Stepper(_system);
        var interpolant = new StepInterpolant(_system.NodeCount);
        var dense = new AcceptedStepOutput(new StepInterpolant(_system.NodeCount));
        var landings = LandingTimes(plan, events);
        var weights = Weights(_options.RelativeTolerance, loop.Scale);
        var floors = NegativityFloors(initialState, loop.Scale);

        // Past the end only the times to approach the final state are sought; they are read to a few digits, so the
        // steps there may be looser (and grow faster) than those that make the reported profiles and amounts.
        var weightsAfterEnd = Weights(Math.Max(_options.RelativeTolerance, _options.RelativeToleranceAfterEnd), loop.Scale);
        observer.OnOutput(0, loop.Current, default);

        var fastestSeconds = FastestRelaxationSeconds();
        var outputIndex = 0;
        var landingIndex = 0;
        var step = plan.InitialStepSeconds;
        var reason = StopReason.Completed;
        while (true)
        {
            double target;
            if (landingIndex < landings.Length)
            {
                target = landings[landingIndex];
            }
            else if (observer.WantsMoreTime && loop.Time < plan.HorizonSeconds)
            {
                target = plan.HorizonSeconds;
            }
            else
            {
                break;
            }

            if (cancellation.IsCancellationRequested)
            {
                reason = StopReason.Cancelled;
                break;
            }

            if (loop.Accepted + loop.Rejected >= _options.MaximumSteps)
            {
                reason = StopReason.MaximumStepsExceeded;
                break;
            }

            var landsOnTarget = loop.Time + step >= target * (1 - 1e-12);
            var tried = landsOnTarget ? target - loop.Time : step;
            var trial = stepper.Try(loop.Current, tried, loop.Candidate, loop.Time >= plan.EndSeconds ? weightsAfterEnd : weights);
            var negative = NegativeBeyondRoundOff(loop.Candidate, floors)
                || NegativeAtOutputsInside(plan.OutputTimesSeconds, outputIndex, loop, loop.Time + tried, stepper, interpolant, floors);
            var error = negative ? double.PositiveInfinity : trial.NormalisedError;
            var (accept, proposal) = _controller.Decide(tried, error);
            if (!accept)
            {
                loop.Rejected++;
                step = proposal;
                if (step < 1e-14 * Math.Max(loop.Time, fastestSeconds) || double.IsNaN(trial.NormalisedError))
                {
                    reason = double.IsNaN(trial.NormalisedError) ? StopReason.NonFiniteValues : StopReason.StepSizeUnderflow;
                    break;
                }

                continue;
            }

            loop.Accept(landsOnTarget ? target : loop.Time + tried, tried, trial);
            step = landsOnTarget ? Math.Max(proposal, step) : proposal;
            outputIndex = ReportInside(plan.OutputTimesSeconds, outputIndex, loop, stepper, trial, interpolant, observer);
            dense.Set(loop.PreviousTime, loop.Time, loop.Candidate, stepper, loop.Current);
            observer.OnStep(loop.Time, loop.Current, loop.Baths, dense);
            if (outputIndex < plan.OutputTimesSeconds.Count && IsAt(plan.OutputTimesSeconds[outputIndex], loop.Time))
            {
                observer.OnOutput(loop.Time, loop.Current, loop.Baths);
                outputIndex++;
            }

            if (landsOnTarget && landingIndex < landings.Length)
            {
                if (events is not null)
                {
                    events.Apply(loop.Time, loop.Current);
                    stepper.StateChanged();
                }

                landingIndex++;
            }
        }

        return loop.Statistics(reason, clock.Elapsed.TotalSeconds);
    }

    private ErrorWeights Weights(double relativeTolerance, double scale)
        => new(relativeTolerance * _options.AbsoluteToleranceScale * scale, relativeTolerance);

    /// <summary>The times the loop must hit exactly: those of the state events before the end, then the end.</summary>
    /// <summary>
    /// The shortest relaxation time of any node, Cap / (sum of its conductances), s. A rejected step is given up only
    /// when it falls below 1e-14 of the larger of this and the current time: below the current time's round-off the
    /// clock cannot advance, but at the start a fine mesh at a tight tolerance needs steps far below any fraction of
    /// the duration to resolve a step change in the initial state.
    /// </summary>
    private double FastestRelaxationSeconds()
    {
        var fastest = double.PositiveInfinity;
        var last = _system.NodeCount - 1;
        for (var n = 0; n <= last; n++)
        {
            var outflow = _system.ConductanceToLeft(n) + _system.ConductanceToRight(n);
            if (outflow > 0)
            {
                fastest = Math.Min(fastest, _system.Capacity[n] / outflow);
            }
        }

        return double.IsPositiveInfinity(fastest) ? 0 : fastest;
    }

    private static double[] LandingTimes(TimeLoopPlan plan, IStateEvents? events)
    {
        var times = new List<double>();
        foreach (var time in events?.TimesSeconds ?? [])
        {
            if (time > 0 && time < plan.EndSeconds * (1 - 1e-12) && (times.Count == 0 || time > times[^1] * (1 + 1e-12)))
            {
                times.Add(time);
            }
        }

        times.Add(plan.EndSeconds);
        return [.. times];
    }

    private static bool IsAt(double wanted, double time) => Math.Abs(wanted - time) <= 1e-12 * Math.Max(wanted, time);

    /// <summary>Reports the outputs that fall strictly inside the step just accepted, interpolated; returns the next index.</summary>
    private static int ReportInside(
        IReadOnlyList<double> outputs,
        int index,
        LoopState loop,
        TrBdf2Stepper stepper,
        StepTrial trial,
        StepInterpolant interpolant,
        ITimeLoopObserver observer)
    {
        var start = loop.PreviousTime;
        var length = loop.Time - start;
        while (index < outputs.Count && outputs[index] < loop.Time && !IsAt(outputs[index], loop.Time))
        {
            var time = outputs[index];
            var stageBaths = new BathTotals(
                loop.PreviousBaths.LeftPerArea + trial.InflowToStage.LeftPerArea,
                loop.PreviousBaths.RightPerArea + trial.InflowToStage.RightPerArea);
            var baths = interpolant.At(
                (time - start) / length, loop.Candidate, stepper.Stage, loop.Current, loop.PreviousBaths, stageBaths, loop.Baths);
            observer.OnOutput(time, interpolant.State, baths);
            index++;
        }

        return index;
    }

    private double ToleranceScale(ReadOnlySpan<double> initialState)
    {
        var scale = Math.Max(Math.Abs(_system.LeftBath.BathValue), Math.Abs(_system.RightBath.BathValue));
        foreach (var value in initialState)
        {
            scale = Math.Max(scale, Math.Abs(value));
        }

        return scale > 0 ? scale : 1;
    }

    /// <summary>
    /// The lowest value each node may take: minus the tolerance times the smaller of the largest |u| and the reference
    /// mass over the node's storage. The first bounds u, the second the node's amount: where partition coefficients
    /// span many decades, a node with a large Cap holds much mass at a small u, and a negative u that is round-off on the
    /// scale of u can be a negative amount far beyond round-off on the scale of the mass.
    /// </summary>
    private double[] NegativityFloors(ReadOnlySpan<double> initialState, double scale)
    {
        var capacity = _system.Capacity;
        var bath = Math.Max(Math.Abs(_system.LeftBath.BathValue), Math.Abs(_system.RightBath.BathValue));
        double initialMass = 0, bathMass = 0;
        for (var n = 0; n < capacity.Length; n++)
        {
            initialMass += capacity[n] * Math.Abs(initialState[n]);
            bathMass += capacity[n] * bath;
        }

        var mass = Math.Max(initialMass, bathMass);
        var floors = new double[capacity.Length];
        for (var n = 0; n < floors.Length; n++)
        {
            floors[n] = -_options.NegativityTolerance * (mass > 0 ? Math.Min(scale, mass / capacity[n]) : scale);
        }

        return floors;
    }

    /// <summary>
    /// True when an output that falls inside the step tried would be interpolated below a floor: the quadratic through
    /// the start, the stage and the end can dip below zero between them where all three are not, and an amount reported
    /// there would fail the run's sign check.
    /// </summary>
    private static bool NegativeAtOutputsInside(
        IReadOnlyList<double> outputs,
        int index,
        LoopState loop,
        double end,
        TrBdf2Stepper stepper,
        StepInterpolant interpolant,
        ReadOnlySpan<double> floors)
    {
        var start = loop.Time;
        for (; index < outputs.Count && outputs[index] < end && !IsAt(outputs[index], end); index++)
        {
            if (outputs[index] <= start)
            {
                continue;
            }

            interpolant.At((outputs[index] - start) / (end - start), loop.Current, stepper.Stage, loop.Candidate, default, default, default);
            if (NegativeBeyondRoundOff(interpolant.State, floors))
            {
                return true;
            }
        }

        return false;
    }

    private static bool NegativeBeyondRoundOff(ReadOnlySpan<double> state, ReadOnlySpan<double> floors)
    {
        for (var n = 0; n < state.Length; n++)
        {
            if (state[n] < floors[n])
            {
                return true;
            }
        }

        return false;
    }
}
