using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Withdraws samples from compartments at their sampling times and replaces them with fresh medium: the
/// compartment's concentration drops by (V - v) / V and the mass v c leaves the system. Keeps what was withdrawn,
/// so the mass balance and the cumulative amount received can account for it.
/// </summary>
internal sealed class SamplingEvents : IStateEvents
{
    private readonly Sampled?[] _sides = new Sampled?[2];
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
        }

        TimesSeconds = _sides.Where(sampled => sampled is not null).SelectMany(sampled => sampled!.Sampling.TimesSeconds).Order().ToArray();
    }

    /// <inheritdoc />
    public IReadOnlyList<double> TimesSeconds { get; }

    /// <summary>True when some compartment is sampled.</summary>
    public bool Any => _sides[0] is not null || _sides[1] is not null;

    /// <summary>Mass per contact area withdrawn from the compartment on a side so far, kg/m2.</summary>
    public double RemovedPerArea(Side side) => _sides[(int)side]?.RemovedPerArea ?? 0;

    /// <summary>The samples taken on a side: time and the concentration withdrawn (just before the withdrawal).</summary>
    public IReadOnlyList<(double TimeSeconds, double ConcentrationKgPerCubicMeter)> Samples(Side side)
        => _sides[(int)side]?.Taken ?? [];

    public void Apply(double timeSeconds, Span<double> state)
    {
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

    private sealed class Sampled(CompartmentFace compartment, ReceptorSampling sampling, int node)
    {
        public CompartmentFace Compartment { get; } = compartment;

        public ReceptorSampling Sampling { get; } = sampling;

        public int Node { get; } = node;

        public List<(double TimeSeconds, double ConcentrationKgPerCubicMeter)> Taken { get; } = [];

        public double RemovedPerArea { get; set; }
    }
}
