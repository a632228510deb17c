using System.Diagnostics;
using Layers.Core.Discretization;

namespace Layers.Core.TimeStepping;

/// <summary>
/// The time loop: tries TR-BDF2 steps, lets <see cref="StepSizeController"/> accept or resize them, rejects steps
/// that would make a value negative beyond round-off, shortens steps to land exactly on output times, and notifies
/// the observer. Work per step is O(nodes); nothing is allocated inside the loop.
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

    /// <summary>Integrates from u(0) according to the plan, with instant changes of the state at output times.</summary>
    /// <param name="initialState">u(0) at every node.</param>
    /// <param name="plan">Output times, end and horizon.</param>
    /// <param name="observer">Receives the state at outputs and steps.</param>
    /// <param name="events">Changes of the state applied right after the output at each output time, or null.</param>
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
        var weights = new ErrorWeights(
            _options.RelativeTolerance * _options.AbsoluteToleranceScale * loop.Scale,
            _options.RelativeTolerance);
        observer.OnOutput(0, loop.Current, default);

        var outputIndex = 0;
        var step = plan.InitialStepSeconds;
        var reason = StopReason.Completed;
        while (true)
        {
            var target = outputIndex < plan.OutputTimesSeconds.Count ? plan.OutputTimesSeconds[outputIndex] : plan.EndSeconds;
            if (loop.Time >= plan.EndSeconds && outputIndex >= plan.OutputTimesSeconds.Count)
            {
                if (!observer.WantsMoreTime || loop.Time >= plan.HorizonSeconds)
                {
                    break;
                }

                target = plan.HorizonSeconds;
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
            var trial = stepper.Try(loop.Current, tried, loop.Candidate, weights);
            var error = NegativeBeyondRoundOff(loop.Candidate, loop.Scale) ? double.PositiveInfinity : trial.NormalisedError;
            var (accept, proposal) = _controller.Decide(tried, error);
            if (!accept)
            {
                loop.Rejected++;
                step = proposal;
                if (step < 1e-14 * Math.Max(plan.EndSeconds, loop.Time) || double.IsNaN(trial.NormalisedError))
                {
                    reason = double.IsNaN(trial.NormalisedError) ? StopReason.NonFiniteValues : StopReason.StepSizeUnderflow;
                    break;
                }

                continue;
            }

            loop.Accept(landsOnTarget ? target : loop.Time + tried, tried, trial);
            step = landsOnTarget ? Math.Max(proposal, step) : proposal;
            observer.OnStep(loop.Time, loop.Current, loop.Baths);
            if (landsOnTarget && outputIndex < plan.OutputTimesSeconds.Count)
            {
                observer.OnOutput(loop.Time, loop.Current, loop.Baths);
                events?.Apply(loop.Time, loop.Current);
                outputIndex++;
            }
        }

        return loop.Statistics(reason, clock.Elapsed.TotalSeconds);
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

    private bool NegativeBeyondRoundOff(ReadOnlySpan<double> state, double scale)
    {
        var floor = -_options.NegativityTolerance * scale;
        foreach (var value in state)
        {
            if (value < floor)
            {
                return true;
            }
        }

        return false;
    }
}
