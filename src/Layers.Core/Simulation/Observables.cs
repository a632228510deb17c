using System.Numerics;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>Turns a state vector into the quantities people read: masses, concentrations, fractions, profiles.</summary>
internal sealed class Observables
{
    private readonly SimulationCase _case;
    private readonly DiffusionSystem _system;
    private readonly FinalStateTarget _final;
    private readonly double[] _initialState;
    private readonly double _initialMass;
    private readonly double _initialDistance;
    private readonly bool _startsAtFinalState;
    private readonly SamplingEvents? _sampling;
    private readonly FaceReadings _readings;

    public Observables(DiscreteModel model, IReadOnlyList<StageSystem> stages, FinalStateTarget final, SamplingEvents? sampling = null)
    {
        _readings = new FaceReadings(stages);
        var system = model.System;
        ReadOnlySpan<double> initialState = model.InitialState;
        _sampling = sampling;
        _case = model.Case;
        _system = system;
        _final = final;
        _initialState = initialState.ToArray();
        _initialMass = system.TotalMass(initialState);
        _initialDistance = DistanceToFinal(initialState);
        _startsAtFinalState = _initialDistance <= StartsAtFinalStateBelow * MassScale(initialState);
    }

    /// <summary>
    /// An initial distance from the final state below this fraction of the mass scale (sum of Cap (|u0| + |u_final|))
    /// is round-off: the fraction of the way would be round-off divided by round-off.
    /// </summary>
    public const double StartsAtFinalStateBelow = 1e-12;

    /// <summary>True when the system starts at its final state (to round-off), so the fraction of the way is undefined.</summary>
    public bool StartsAtFinalState => _startsAtFinalState;

    /// <summary>
    /// 1 - distance(u, final) / distance(u0, final), with distance the capacity-weighted L1 norm; NaN (not applicable)
    /// when the system starts at its final state.
    /// </summary>
    public double FractionOfFinalState(ReadOnlySpan<double> state)
        => _startsAtFinalState ? double.NaN : 1 - (DistanceToFinal(state) / _initialDistance);

    /// <summary>
    /// The lowest amount held by a layer or a compartment in the state, relative to the reference mass of the mass
    /// balance (negative when some amount is below zero; 0 when nothing is).
    /// </summary>
    public double LowestAmountRelative(StateSample sample, ReadOnlySpan<double> state, BathTotals baths)
    {
        var lowest = 0.0;
        foreach (var mass in sample.LayerMassPerArea)
        {
            lowest = Math.Min(lowest, mass);
        }

        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var node = _system.CompartmentNode(side);
            if (node >= 0)
            {
                lowest = Math.Min(lowest, _system.Capacity[node] * state[node]);
            }
        }

        var reference = Reference(baths);
        return reference > 0 ? lowest / reference : lowest;
    }

    /// <summary>Fraction of the way to equilibrium of a compartment's content, or null if it does not change.</summary>
    public double? CompartmentFraction(Side side, ReadOnlySpan<double> state)
    {
        var node = _system.CompartmentNode(side);
        if (node < 0)
        {
            return null;
        }

        var change = _final.NodeValues[node] - _initialState[node];
        var scale = Math.Max(Math.Abs(_final.NodeValues[node]), Math.Abs(_initialState[node]));
        return Math.Abs(change) > 1e-12 * scale ? (state[node] - _initialState[node]) / change : null;
    }

    public StateSample Sample(double time, ReadOnlySpan<double> state, BathTotals baths)
    {
        var grid = _system.Grid;
        var layerMass = new double[_case.Stack.Count];
        for (var layer = 0; layer < layerMass.Length; layer++)
        {
            // A layer's cells are consecutive: its mass is a sum over one range of nodes.
            layerMass[layer] = _system.Mass(state, _system.FirstCellNode + grid.FirstCell(layer), grid.CellsIn(layer));
        }

        var exchanged = baths.LeftPerArea + baths.RightPerArea;
        var reference = Reference(baths);
        var withdrawn = (_sampling?.RemovedPerArea(Side.Left) ?? 0) + (_sampling?.RemovedPerArea(Side.Right) ?? 0);
        var imbalance = _system.TotalMass(state) - _initialMass - exchanged + withdrawn;
        return new StateSample(
            time,
            layerMass,
            Face(Side.Left, time, state, baths.LeftPerArea),
            Face(Side.Right, time, state, baths.RightPerArea),
            FractionOfFinalState(state),
            reference > 0 ? imbalance / reference : 0);
    }

    /// <summary>The reference mass of the mass balance: the larger of the initial mass and the mass exchanged with baths.</summary>
    private double Reference(BathTotals baths)
        => Math.Max(Math.Abs(_initialMass), Math.Abs(baths.LeftPerArea) + Math.Abs(baths.RightPerArea));

    private double MassScale(ReadOnlySpan<double> initialState)
    {
        var scale = 0.0;
        for (var n = 0; n < initialState.Length; n++)
        {
            scale += _system.Capacity[n] * (Math.Abs(initialState[n]) + Math.Abs(_final.NodeValues[n]));
        }

        return scale;
    }

    private FaceSample? Face(Side side, double time, ReadOnlySpan<double> state, double bathInflow)
    {
        var node = _system.CompartmentNode(side);
        if (node >= 0)
        {
            // What crossed into the compartment: its change of content, plus what samples took out, plus what
            // first-order removal took out (counted by the removal's bath link, as an inflow of opposite sign).
            var transferred = (_system.Capacity[node] * (state[node] - _initialState[node]))
                + (_sampling?.RemovedPerArea(side) ?? 0)
                - bathInflow;
            var (flux, concentration) = _readings.Read(side, time, state);
            return new FaceSample(transferred, concentration!.Value, flux, CompartmentFraction(side, state));
        }

        if (_case.Face(side) is not BathFace)
        {
            return null;
        }

        // 0 - x rather than -x, so that no exchange reads 0, not -0, in the files.
        var (intoBath, level) = _readings.Read(side, time, state);
        return new FaceSample(0 - bathInflow, level!.Value, intoBath, null);
    }

    private double DistanceToFinal(ReadOnlySpan<double> state)
    {
        // Asked after every step: in SIMD vectors, two partial sums so that the additions do not wait on one another.
        var count = state.Length;
        ReadOnlySpan<double> capacity = _system.Capacity.AsSpan(0, count);
        ReadOnlySpan<double> final = _final.NodeValues.AsSpan(0, count);
        var values = state[..count];
        var width = Vector<double>.Count;
        var first = Vector<double>.Zero;
        var second = Vector<double>.Zero;
        var n = 0;
        for (; n + (2 * width) <= count; n += 2 * width)
        {
            first += new Vector<double>(capacity[n..]) * Vector.Abs(new Vector<double>(values[n..]) - new Vector<double>(final[n..]));
            var m = n + width;
            second += new Vector<double>(capacity[m..]) * Vector.Abs(new Vector<double>(values[m..]) - new Vector<double>(final[m..]));
        }

        var sum = Vector.Sum(first + second);
        for (; n < count; n++)
        {
            sum += capacity[n] * Math.Abs(values[n] - final[n]);
        }

        return sum;
    }
}
