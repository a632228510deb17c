using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Withdraws samples from compartments at their sampling times and replaces them with fresh medium: the
/// compartment's concentration drops by (V - v) / V and the mass v c leaves the system. Also replaces a compartment's
/// whole medium by a fresh portion at the starts of the schedule's periods that renew it: the mass V (c - c_fresh)
/// leaves. Keeps what was withdrawn, net of what fresh medium brought, so the mass balance and the cumulative amount
/// received can account for it. Takes layers off the stack and puts fresh ones on where a schedule says so, counting what
/// they take away and bring on the side they are on.
/// </summary>
internal sealed class SamplingEvents : IStateEvents
{
    private readonly Sampled?[] _sides = new Sampled?[2];
    private readonly Renewed?[] _renewed = new Renewed?[2];
    private readonly double[] _layersRemovedPerArea = new double[2];
    private readonly IReadOnlyList<SchedulePeriod> _layerChanges;
    private readonly double[] _initialState;
    private readonly DiffusionSystem _system;

    public SamplingEvents(DiscreteModel model)
    {
        var simulation = model.Case;
        var system = model.System;
        _system = system;
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (simulation.Face(side) is CompartmentFace { Sampling: { } sampling } compartment)
            {
                _sides[(int)side] = new Sampled(compartment, sampling, system.CompartmentNode(side));
            }

            if (simulation.Face(side) is CompartmentFace && simulation.Schedule is { } schedule && schedule.Renews(side))
            {
                var portions = schedule.Renewals(side, simulation.Face(side))
                    .Select(renewal => (renewal.TimeSeconds, (CompartmentFace)renewal.Old, (CompartmentFace)renewal.Fresh))
                    .ToArray();
                _renewed[(int)side] = new Renewed(portions, system.CompartmentNode(side));
            }
        }

        _initialState = model.InitialState;
        _layerChanges = simulation.Schedule?.Periods.Where(period => period.StartSeconds > 0 && period.ChangesLayers).ToArray() ?? [];
        TimesSeconds = _sides.Where(sampled => sampled is not null).SelectMany(sampled => sampled!.Sampling.TimesSeconds)
            .Concat(_renewed.Where(renewed => renewed is not null).SelectMany(renewed => renewed!.TimesSeconds))
            .Concat(_layerChanges.Select(period => period.StartSeconds))
            .Distinct().Order().ToArray();
    }

    /// <inheritdoc />
    public IReadOnlyList<double> TimesSeconds { get; }

    /// <summary>True when some compartment is sampled.</summary>
    public bool Any => TimesSeconds.Count > 0;

    /// <summary>Mass per contact area withdrawn from the compartment on a side so far, kg/m2.</summary>
    public double RemovedPerArea(Side side) =>
        (_sides[(int)side]?.RemovedPerArea ?? 0) + (_renewed[(int)side]?.RemovedPerArea ?? 0) + _layersRemovedPerArea[(int)side];

    /// <summary>The renewals of the medium on a side so far: time and the concentration of the portion replaced.</summary>
    public IReadOnlyList<(double TimeSeconds, double ConcentrationKgPerCubicMeter)> Renewals(Side side)
        => _renewed[(int)side]?.Replaced ?? [];

    /// <summary>The samples taken on a side: time and the concentration withdrawn (just before the withdrawal).</summary>
    public IReadOnlyList<(double TimeSeconds, double ConcentrationKgPerCubicMeter)> Samples(Side side)
        => _sides[(int)side]?.Taken ?? [];

    public void Apply(double timeSeconds, Span<double> state)
    {
        foreach (var period in _layerChanges.Where(period => Math.Abs(period.StartSeconds - timeSeconds) <= 1e-9 * timeSeconds))
        {
            // A layer taken off leaves with what it holds; one put on comes fresh, loaded as the case writes it (a layer
            // on already is replaced: the old one leaves with its content).
            foreach (var change in period.RemovedLayers.Concat(period.AppliedLayers))
            {
                foreach (var node in ScheduleStages.NodesOf(_system, change.Layer))
                {
                    _layersRemovedPerArea[(int)change.Side] += _system.Capacity[node] * state[node];
                    state[node] = 0;
                }
            }

            foreach (var change in period.AppliedLayers)
            {
                foreach (var node in ScheduleStages.NodesOf(_system, change.Layer))
                {
                    state[node] = _initialState[node];
                    _layersRemovedPerArea[(int)change.Side] -= _system.Capacity[node] * state[node];
                }
            }
        }

        foreach (var renewed in _renewed)
        {
            if (renewed?.Portions.FirstOrDefault(portion => Math.Abs(portion.TimeSeconds - timeSeconds) <= 1e-9 * portion.TimeSeconds)
                is not (_, { } old, { } fresh))
            {
                continue;
            }

            // The node's u is in the case's own variable, whose storage times u is the content whatever portion is in
            // contact: the old portion leaves with its content, the fresh one brings c_fresh over its own volume.
            var storage = _system.Capacity[renewed.Node];
            var content = storage * state[renewed.Node];
            var brought = fresh.InitialMassPerArea;
            renewed.Replaced.Add((timeSeconds, content / old.VolumePerAreaMeters));
            renewed.RemovedPerArea += content - brought;
            state[renewed.Node] = brought == 0 ? 0 : brought / storage;
        }

        foreach (var sampled in _sides)
        {
            if (sampled is null || !sampled.Sampling.TimesSeconds.Any(time => Math.Abs(time - timeSeconds) <= 1e-9 * time))
            {
                continue;
            }

            var compartment = sampled.Compartment;
            var concentration = _system.ConcentrationOf(sampled.Node, state[sampled.Node]);
            sampled.Taken.Add((timeSeconds, concentration));
            sampled.RemovedPerArea += sampled.Sampling.VolumeCubicMeters * concentration / compartment.ContactAreaSquareMeters;
            state[sampled.Node] *= (compartment.VolumeCubicMeters - sampled.Sampling.VolumeCubicMeters) / compartment.VolumeCubicMeters;
        }
    }

    private sealed class Renewed((double TimeSeconds, CompartmentFace Old, CompartmentFace Fresh)[] portions, int node)
    {
        public (double TimeSeconds, CompartmentFace Old, CompartmentFace Fresh)[] Portions { get; } = portions;

        public IEnumerable<double> TimesSeconds => Portions.Select(portion => portion.TimeSeconds);

        public int Node { get; } = node;

        public List<(double TimeSeconds, double ConcentrationKgPerCubicMeter)> Replaced { get; } = [];

        public double RemovedPerArea { get; set; }
    }

    private sealed class Sampled(CompartmentFace compartment, ReceptorSampling sampling, int node)
    {
        public CompartmentFace Compartment { get; } = compartment;

        public ReceptorSampling Sampling { get; } = sampling;

        public int Node { get; } = node;

        public List<(double TimeSeconds, double ConcentrationKgPerCubicMeter)> Taken { get; } = [];

        public double RemovedPerArea { get; set; }
    }
}
