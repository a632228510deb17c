using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Follows the undissolved drug of every layer with a solubility, sum of Cap (w - u_sat) over its saturated cells,
/// after each accepted step within the duration, and finds when it runs out.
/// </summary>
internal sealed class UndissolvedTracker : ITimeLoopObserver
{
    /// <summary>Fraction of the initial undissolved amount below which it counts as gone (round-off at u_sat).</summary>
    private const double Gone = 1e-9;

    private readonly SimulationCase _case;
    private readonly DiffusionSystem _system;
    private readonly int[] _layers;
    private readonly double[] _atEnd;
    private readonly double?[] _exhausted;
    private readonly double[] _previous;
    private readonly double[] _beforePrevious;
    private double _previousTime;
    private double _beforePreviousTime;

    public UndissolvedTracker(DiscreteModel model)
    {
        var simulation = model.Case;
        var initialState = model.InitialState;
        _case = simulation;
        _system = model.System;
        _layers = Enumerable.Range(0, simulation.Stack.Count)
            .Where(layer => simulation.Stack.Layers[layer].SolubilityKgPerCubicMeter is not null)
            .ToArray();
        _atEnd = new double[_layers.Length];
        _exhausted = new double?[_layers.Length];
        _previous = new double[_layers.Length];
        _beforePrevious = new double[_layers.Length];
        for (var i = 0; i < _layers.Length; i++)
        {
            _previous[i] = Undissolved(_layers[i], initialState);
            _beforePrevious[i] = _previous[i];
            _atEnd[i] = _previous[i];
        }
    }

    public bool WantsMoreTime => false;

    /// <summary>One entry per layer with a solubility, left to right.</summary>
    public IReadOnlyList<DispersedLayerSummary> Summaries => _layers.Select((layer, i) =>
    {
        var definition = _case.Stack.Layers[layer];
        return new DispersedLayerSummary(
            definition.Name, definition.SolubilityKgPerCubicMeter!.Value, definition.InitialUndissolvedPerArea, _atEnd[i], _exhausted[i]);
    }).ToArray();

    public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
    {
    }

    public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
    {
        if (timeSeconds > _case.DurationSeconds * (1 + 1e-12))
        {
            return;
        }

        for (var i = 0; i < _layers.Length; i++)
        {
            var now = Undissolved(_layers[i], state);
            var initial = _case.Stack.Layers[_layers[i]].InitialUndissolvedPerArea;
            if (now <= Gone * initial)
            {
                now = 0;
                if (_previous[i] > 0)
                {
                    _exhausted[i] = Exhaustion(i, timeSeconds);
                }
            }
            else
            {
                _exhausted[i] = null;
            }

            _atEnd[i] = now;
            _beforePrevious[i] = _previous[i];
            _previous[i] = now;
        }

        _beforePreviousTime = _previousTime;
        _previousTime = timeSeconds;
    }

    /// <summary>
    /// The time the amount reached zero within the last step, extrapolating the straight line through the two
    /// amounts before it (the amount falls smoothly until the last cell empties); the end of the step if that fails.
    /// </summary>
    private double Exhaustion(int i, double timeSeconds)
    {
        var span = _previousTime - _beforePreviousTime;
        var slope = span > 0 ? (_beforePrevious[i] - _previous[i]) / span : 0;
        return slope > 0 ? Math.Min(timeSeconds, _previousTime + (_previous[i] / slope)) : timeSeconds;
    }

    private double Undissolved(int layer, ReadOnlySpan<double> state)
    {
        var grid = _system.Grid;
        var sum = 0.0;
        for (var cell = grid.FirstCell(layer); cell < grid.FirstCell(layer) + grid.CellsIn(layer); cell++)
        {
            var node = _system.FirstCellNode + cell;
            sum += _system.Capacity[node] * Math.Max(0, state[node] - _system.Saturation![node]);
        }

        return sum;
    }
}
