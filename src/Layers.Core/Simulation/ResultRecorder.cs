using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Observer of the time loop that keeps the time series, the report points, the times to approach the final state
/// and, for steady permeation, the cumulative amount from which the lag time is read.
/// </summary>
internal sealed class ResultRecorder : ITimeLoopObserver
{
    /// <summary>
    /// Fraction of the final state beyond which the lag-time intercept is read from the run, when the system is not
    /// linear (<see cref="SteadyAsymptote"/> gives it otherwise); the loop runs to it in either case.
    /// </summary>
    public const double SteadyEnough = 0.9999;

    private readonly SimulationCase _case;
    private readonly DiffusionSystem _system;
    private readonly Observables _observables;
    private readonly ProfileBuilder _profiles;
    private readonly FinalStateTarget _final;
    private readonly List<StateSample> _samples = [];
    private readonly List<ReportPoint> _reports = [];
    private readonly CrossingTracker _systemTracker;
    private readonly CrossingTracker? _leftTracker;
    private readonly CrossingTracker? _rightTracker;
    private readonly double[] _initialState;
    private double _systemFraction;

    public ResultRecorder(DiscreteModel model, IReadOnlyList<StageSystem> stages, FinalStateTarget final, SamplingEvents? sampling = null)
    {
        ReadOnlySpan<double> initialState = model.InitialState;
        _case = model.Case;
        _system = model.System;
        _final = final;
        _observables = new Observables(model, stages, final, sampling);
        _profiles = new ProfileBuilder(model);
        _systemFraction = Tracked(_observables.FractionOfFinalState(initialState));
        _systemTracker = new CrossingTracker(ThresholdTimes.Levels, _systemFraction, state => Tracked(_observables.FractionOfFinalState(state)));
        _leftTracker = TrackerFor(Side.Left, initialState);
        _rightTracker = TrackerFor(Side.Right, initialState);
        _initialState = model.InitialState;
    }

    public IReadOnlyList<StateSample> Samples => _samples;

    public IReadOnlyList<ReportPoint> Reports => _reports;

    public double WorstMassBalanceError { get; private set; }

    /// <summary>
    /// The lowest amount held by any layer or compartment at any output, relative to the mass balance's reference
    /// mass; 0 when none was negative.
    /// </summary>
    public double LowestAmountRelative { get; private set; }

    /// <summary>
    /// Lag-time intercept of the steady line, once steady enough: from the steady asymptote of the discrete system
    /// (<see cref="SteadyAsymptote"/>) when it is linear, else t - Q/J at the first step past <see cref="SteadyEnough"/>.
    /// </summary>
    public double? LagTimeSeconds { get; private set; }

    /// <summary>Flux into the receiving bath at the end of the duration, kg/m2/s.</summary>
    public double FluxAtEnd { get; private set; }

    public bool WantsMoreTime => !_systemTracker.AllReached
        || _leftTracker is { AllReached: false }
        || _rightTracker is { AllReached: false }
        || (_final.Kind == FinalStateKind.SteadyPermeation && LagTimeSeconds is null);

    public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
    {
        var sample = _observables.Sample(timeSeconds, state, bathInflow);
        _samples.Add(sample);
        WorstMassBalanceError = Math.Max(WorstMassBalanceError, Math.Abs(sample.MassBalanceError));
        LowestAmountRelative = Math.Min(LowestAmountRelative, _observables.LowestAmountRelative(sample, state, bathInflow));
        if (OutputSchedule.IsReportTime(_case, timeSeconds))
        {
            var profiles = _profiles.Build(state, timeSeconds);
            _reports.Add(new ReportPoint(sample, profiles) { Depths = DepthReadings.Read(profiles, _case.ReportDepthsMeters) });
        }

        if (timeSeconds >= _case.DurationSeconds * (1 - 1e-12))
        {
            FluxAtEnd = ReceivingBathOutflowRate(state);
        }
    }

    public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
    {
        _systemFraction = Tracked(_observables.FractionOfFinalState(state));
        _systemTracker.Observe(_systemFraction, dense);
        Observe(_leftTracker, Side.Left, state, dense);
        Observe(_rightTracker, Side.Right, state, dense);
        if (_final.Kind == FinalStateKind.SteadyPermeation && LagTimeSeconds is null && _systemFraction >= SteadyEnough)
        {
            var flux = Math.Abs(_final.Steady!.FluxKgPerSquareMeterSecond);
            var received = _final.Steady.FluxKgPerSquareMeterSecond > 0 ? -bathInflow.RightPerArea : -bathInflow.LeftPerArea;
            var exact = _system.Saturation is null
                ? SteadyAsymptote.LagTimeSeconds(_system, _initialState, _final.Steady.FluxKgPerSquareMeterSecond > 0)
                : null;
            LagTimeSeconds = exact ?? (timeSeconds - (received / flux));
        }
    }

    public FinalStateSummary Summary(double horizonSeconds, double? lastSampleSeconds = null) => new(
        _final.Kind,
        Enumerable.Range(0, _case.Stack.Count).Select(layer => _final.LayerEdges(_case, layer)).ToArray(),
        _final.MediumConcentration(Side.Left),
        _final.MediumConcentration(Side.Right),
        Times(_systemTracker)!,
        Times(_leftTracker),
        Times(_rightTracker),
        horizonSeconds)
    {
        MassLeftAfterSamplingPerArea = _final.MassLeftAfterSamplingPerArea,
        LastSampleSeconds = _final.MassLeftAfterSamplingPerArea is null ? null : lastSampleSeconds,
    };

    /// <summary>
    /// A system that starts at its final state has no fraction of the way (NaN); for the times to 50/90/99 % and the lag
    /// time it is all the way there from the start, as when the distance was exactly zero.
    /// </summary>
    private static double Tracked(double fraction) => double.IsNaN(fraction) ? 1 : fraction;

    private static ThresholdTimes? Times(CrossingTracker? tracker)
        => tracker is null ? null : new ThresholdTimes(tracker.Times[0], tracker.Times[1], tracker.Times[2]);

    private CrossingTracker? TrackerFor(Side side, ReadOnlySpan<double> initialState)
        => _observables.CompartmentFraction(side, initialState) is { } fraction
            ? new CrossingTracker(ThresholdTimes.Levels, fraction, state => _observables.CompartmentFraction(side, state) ?? double.NaN)
            : null;

    private void Observe(CrossingTracker? tracker, Side side, ReadOnlySpan<double> state, IDenseOutput dense)
    {
        if (tracker is not null && _observables.CompartmentFraction(side, state) is { } fraction)
        {
            tracker.Observe(fraction, dense);
        }
    }

    private double ReceivingBathOutflowRate(ReadOnlySpan<double> state)
    {
        if (_final.Steady is not { } steady || steady.FluxKgPerSquareMeterSecond == 0)
        {
            return 0;
        }

        return steady.FluxKgPerSquareMeterSecond > 0
            ? -_system.RightBath.InflowRate(_system.Dissolved(state.Length - 1, state[^1]))
            : -_system.LeftBath.InflowRate(_system.Dissolved(0, state[0]));
    }
}
