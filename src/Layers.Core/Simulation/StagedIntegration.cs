using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Integrates through a sequence of stages, each with its own assembled system on the same grid: the state vector
/// and the bath totals at the end of one stage start the next, so no mass is lost between stages, and the observer
/// sees one clock and one running bath total. States go in and come out in the case's own u = c/K; a stage whose
/// partition coefficients differ works in its own (see <see cref="StageSystem.ToStage"/>).
/// </summary>
public static class StagedIntegration
{
    /// <summary>What a staged run ends with.</summary>
    /// <param name="Statistics">Solver counters summed over the stages.</param>
    /// <param name="FinalState">u at the end of the last stage (or where the loop stopped), in the case's own u = c/K.</param>
    /// <param name="Baths">Bath totals at that time.</param>
    public sealed record Outcome(SolverStatistics Statistics, double[] FinalState, BathTotals Baths);

    /// <summary>Runs the stages from <paramref name="initialState"/> at t = 0.</summary>
    /// <param name="stages">Consecutive stages starting at 0.</param>
    /// <param name="initialState">u(0), in the case's own u = c/K.</param>
    /// <param name="outputTimes">Ascending output times on the run's clock, within the stages.</param>
    /// <param name="horizonSeconds">How far past the end the last stage may run while the observer wants more time.</param>
    /// <param name="initialStep">First trial step for a stage.</param>
    /// <param name="options">Time-stepping settings.</param>
    /// <param name="observer">Receives outputs and steps.</param>
    /// <param name="events">Changes of the state at output times (receptor sampling), in times of the whole run; or null.</param>
    /// <param name="cancellation">Stops the loop.</param>
    public static Outcome Run(
        IReadOnlyList<StageSystem> stages,
        ReadOnlySpan<double> initialState,
        IReadOnlyList<double> outputTimes,
        double horizonSeconds,
        Func<StageSystem, double, double> initialStep,
        SolverOptions options,
        ITimeLoopObserver observer,
        IStateEvents? events = null,
        CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(stages);
        ArgumentNullException.ThrowIfNull(initialStep);
        var state = initialState.ToArray();
        var baths = default(BathTotals);
        var total = new SolverStatistics { StopReason = StopReason.Completed, SmallestStepSeconds = double.PositiveInfinity };
        for (var index = 0; index < stages.Count; index++)
        {
            var stage = stages[index];
            var last = index == stages.Count - 1;
            var length = stage.EndSeconds - stage.StartSeconds;
            var outputs = outputTimes
                .Where(time => time > stage.StartSeconds * (1 + 1e-12) && time < stage.EndSeconds * (1 - 1e-12))
                .Select(time => time - stage.StartSeconds)
                .Append(length)
                .ToArray();
            var shifted = new ShiftedObserver(observer, stage, length, baths, first: index == 0, last, outputTimes, state.Length);
            var horizon = last ? Math.Max(length, horizonSeconds - stage.StartSeconds) : length;
            var plan = new TimeLoopPlan(outputs, length, horizon, initialStep(stage, outputs[0]));
            // Events at the end of a stage other than the last are applied here, between the stages, to the state the next
            // one starts from: inside the stage they would change only the loop's own copy, after the stage's end state
            // was taken.
            var shiftedEvents = events is null ? null : new ShiftedEvents(events, stage, last ? double.PositiveInfinity : length);
            var stageState = (double[])state.Clone();
            stage.IntoStage(stageState);
            var statistics = new TransientSolver(stage.System, options).Run(stageState, plan, shifted, shiftedEvents, cancellation);
            total = Add(total, statistics);
            state = shifted.StateAtEnd ?? state;
            baths = shifted.BathsAtEnd;
            if (statistics.StopReason != StopReason.Completed)
            {
                break;
            }

            if (!last && events is not null && events.TimesSeconds.Any(time => Math.Abs(time - stage.EndSeconds) <= 1e-12 * stage.EndSeconds))
            {
                state = (double[])state.Clone();
                events.Apply(stage.EndSeconds, state);
            }
        }

        if (double.IsPositiveInfinity(total.SmallestStepSeconds))
        {
            total = total with { SmallestStepSeconds = 0 };
        }

        return new Outcome(total, state, baths);
    }

    private static SolverStatistics Add(SolverStatistics total, SolverStatistics stage) => new()
    {
        AcceptedSteps = total.AcceptedSteps + stage.AcceptedSteps,
        RejectedSteps = total.RejectedSteps + stage.RejectedSteps,
        SmallestStepSeconds = stage.AcceptedSteps > 0 ? Math.Min(total.SmallestStepSeconds, stage.SmallestStepSeconds) : total.SmallestStepSeconds,
        LargestStepSeconds = Math.Max(total.LargestStepSeconds, stage.LargestStepSeconds),
        Unknowns = stage.Unknowns,
        WallSeconds = total.WallSeconds + stage.WallSeconds,
        StopReason = stage.StopReason,
    };

    /// <summary>
    /// State events (receptor sampling, renewals) at times of the whole run, applied inside one stage: those before
    /// <paramref name="endSeconds"/> on the stage's clock (the stage's length, or infinity for the last stage). Events
    /// work in the case's own variable, as between stages, so a stage with storages of its own hands them its state
    /// turned into that variable and takes it back.
    /// </summary>
    private sealed class ShiftedEvents(IStateEvents inner, StageSystem stage, double endSeconds) : IStateEvents
    {
        public IReadOnlyList<double> TimesSeconds { get; } = inner.TimesSeconds
            .Select(time => time - stage.StartSeconds)
            .Where(time => time < endSeconds * (1 - 1e-12))
            .ToArray();

        public void Apply(double timeSeconds, Span<double> state)
        {
            if (timeSeconds < endSeconds * (1 - 1e-12))
            {
                stage.OutOfStage(state);
                inner.Apply(timeSeconds + stage.StartSeconds, state);
                stage.IntoStage(state);
            }
        }
    }

    /// <summary>
    /// Puts a stage's clock, bath totals and state variable on the run's, passes on only the outputs the run asked for
    /// (a stage end is always integrated to but reported only if it was asked for), and keeps the state at the
    /// stage's end.
    /// </summary>
    private sealed class ShiftedObserver(
        ITimeLoopObserver inner,
        StageSystem stage,
        double lengthSeconds,
        BathTotals offsetBaths,
        bool first,
        bool last,
        IReadOnlyList<double> requested,
        int nodeCount) : ITimeLoopObserver
    {
        private readonly double _offsetSeconds = stage.StartSeconds;
        private readonly double[] _end = new double[nodeCount];
        private readonly double[]? _own = stage.ToStage is null ? null : new double[nodeCount];
        private readonly ShiftedDenseOutput _dense = new(stage, nodeCount);
        private bool _reachedEnd;
        private int _nextRequested;

        public double[]? StateAtEnd => _reachedEnd ? _end : null;

        public BathTotals BathsAtEnd { get; private set; }

        public bool WantsMoreTime => last && inner.WantsMoreTime;

        public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
        {
            if (timeSeconds == 0 && !first)
            {
                return;
            }

            var time = timeSeconds + _offsetSeconds;
            if (timeSeconds == 0 || IsRequested(time))
            {
                inner.OnOutput(time, Own(state), Shift(bathInflow));
            }
        }

        public void OnStep(double timeSeconds, ReadOnlySpan<double> stageState, BathTotals bathInflow, IDenseOutput dense)
        {
            var state = Own(stageState);
            _dense.Wrap(dense);
            inner.OnStep(timeSeconds + _offsetSeconds, state, Shift(bathInflow), _dense);

            // The loop lands exactly on the stage end (its last output); only the last stage may step past it, while the
            // observer looks for the times to equilibrium, and those later states are not the stage's end.
            if (timeSeconds <= lengthSeconds * (1 + 1e-12))
            {
                state.CopyTo(_end);
                BathsAtEnd = Shift(bathInflow);
                _reachedEnd = true;
            }
        }

        /// <summary>
        /// Whether the run asked for this time. Outputs arrive in ascending order, so one index walks the ascending
        /// requested times once over the stage: O(1) per output and no allocation.
        /// </summary>
        private bool IsRequested(double time)
        {
            while (_nextRequested < requested.Count && requested[_nextRequested] < time - (1e-12 * Math.Max(requested[_nextRequested], 1)))
            {
                _nextRequested++;
            }

            return _nextRequested < requested.Count && Math.Abs(requested[_nextRequested] - time) <= 1e-12 * Math.Max(requested[_nextRequested], 1);
        }

        private BathTotals Shift(BathTotals stageTotals)
            => new(stageTotals.LeftPerArea + offsetBaths.LeftPerArea, stageTotals.RightPerArea + offsetBaths.RightPerArea);

        private ReadOnlySpan<double> Own(ReadOnlySpan<double> stageState)
        {
            if (_own is null)
            {
                return stageState;
            }

            stageState.CopyTo(_own);
            stage.OutOfStage(_own);
            return _own;
        }
    }

    /// <summary>
    /// A stage's dense output on the run's clock and in the case's own state variable: the same step, shifted by the
    /// stage's start, with its own buffer so that reading inside the step leaves the step's end state untouched.
    /// </summary>
    private sealed class ShiftedDenseOutput(StageSystem stage, int nodeCount) : IDenseOutput
    {
        private readonly double[]? _own = stage.ToStage is null ? null : new double[nodeCount];
        private IDenseOutput? _step;

        public double StartSeconds => _step!.StartSeconds + stage.StartSeconds;

        public double EndSeconds => _step!.EndSeconds + stage.StartSeconds;

        public void Wrap(IDenseOutput step) => _step = step;

        public ReadOnlySpan<double> StateAt(double timeSeconds)
        {
            var state = _step!.StateAt(timeSeconds - stage.StartSeconds);
            if (_own is null)
            {
                return state;
            }

            state.CopyTo(_own);
            stage.OutOfStage(_own);
            return _own;
        }
    }
}
