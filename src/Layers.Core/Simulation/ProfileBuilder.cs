using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// Concentration profiles per layer, with the values on each side of every face reconstructed from flux continuity:
/// each side's cells give a value and a resistance (<see cref="CellSide"/>: the quadratic through the two cells nearest
/// the face in its layer, second order), and the face value of u is their resistance-weighted mean,
/// u_f = (v_a/R_a + v_b/R_b)/(1/R_a + 1/R_b); each side then reads c = K u_f with its own K, which shows the partition
/// jump. An outer face's value is reconstructed by its face model (<see cref="FaceModel.FaceValue"/>) from its side.
/// Between a layer a schedule has taken off and the rest nothing flows: each side's edge is its own side's value.
/// </summary>
internal sealed class ProfileBuilder
{
    private readonly SimulationCase _case;
    private readonly DiffusionSystem _system;
    private readonly double[] _halfResistance;

    public ProfileBuilder(DiscreteModel model)
    {
        _case = model.Case;
        _system = model.System;
        _halfResistance = _system.HalfCellResistance;
    }

    /// <summary>Profiles of the dissolved concentration (undissolved drug of a dispersed layer is not part of them).</summary>
    /// <param name="content">The state.</param>
    /// <param name="timeSeconds">Its time: which layers a schedule has off then (before any change at that very time).</param>
    public IReadOnlyList<LayerProfile> Build(ReadOnlySpan<double> content, double timeSeconds = 0)
    {
        var off = _case.Schedule is { ChangesLayers: true } schedule && timeSeconds > 0
            ? schedule.LayersOffAt(timeSeconds * (1 - 1e-9))
            : null;
        var detached = _case.Schedule is { ChangesContacts: true } contacts && timeSeconds > 0
            ? contacts.FacesClosedAt(timeSeconds * (1 - 1e-9))
            : null;
        bool Cut(int layer, int neighbour) =>
            (neighbour < 0 && detached?.Contains(Domain.Side.Left) == true)
            || (neighbour >= _case.Stack.Count && detached?.Contains(Domain.Side.Right) == true)
            || (off is not null && neighbour >= 0 && neighbour < _case.Stack.Count && off.Contains(layer) != off.Contains(neighbour));
        var state = Dissolved(content);
        var grid = _system.Grid;
        var cells = state.Slice(_system.FirstCellNode, grid.CellCount);
        var profiles = new List<LayerProfile>(_case.Stack.Count);
        for (var layerIndex = 0; layerIndex < _case.Stack.Count; layerIndex++)
        {
            var layer = _case.Stack.Layers[layerIndex];
            var first = grid.FirstCell(layerIndex);
            var count = grid.CellsIn(layerIndex);
            var positions = new double[count + 2];
            var concentrations = new double[count + 2];
            positions[0] = _case.Stack.LeftEdgeMeters(layerIndex);
            var firstNode = _system.FirstCellNode + first;
            concentrations[0] = _system.ConcentrationOf(firstNode, Cut(layerIndex, layerIndex - 1) ? Side(cells, first, +1).Value : FaceValue(cells, state, first - 1, first));
            for (var i = 0; i < count; i++)
            {
                positions[i + 1] = grid.CentresMeters[first + i];
                concentrations[i + 1] = _system.ConcentrationOf(firstNode + i, cells[first + i]);
            }

            positions[^1] = positions[0] + layer.ThicknessMeters;
            concentrations[^1] = _system.ConcentrationOf(
                firstNode + count - 1, Cut(layerIndex, layerIndex + 1) ? Side(cells, first + count - 1, -1).Value : FaceValue(cells, state, first + count - 1, first + count));
            profiles.Add(new LayerProfile(layerIndex, layer.Name, positions, concentrations));
        }

        return profiles;
    }

    private ReadOnlySpan<double> Dissolved(ReadOnlySpan<double> content)
    {
        if (_system.Saturation is null)
        {
            return content;
        }

        var dissolved = new double[content.Length];
        for (var n = 0; n < content.Length; n++)
        {
            dissolved[n] = _system.Dissolved(n, content[n]);
        }

        return dissolved;
    }

    /// <summary>u on the face between cell a and cell b; an index of -1 or CellCount means the outer face.</summary>
    private double FaceValue(ReadOnlySpan<double> cells, ReadOnlySpan<double> state, int a, int b)
    {
        if (a < 0)
        {
            var right = Side(cells, b, +1);
            return _system.Left.FaceValue(right.Value, right.Resistance, state[0]);
        }

        if (b >= cells.Length)
        {
            var left = Side(cells, a, -1);
            return _system.Right.FaceValue(left.Value, left.Resistance, state[^1]);
        }

        var sideA = Side(cells, a, -1);
        var sideB = Side(cells, b, +1);
        var weightA = 1 / sideA.Resistance;
        var weightB = 1 / sideB.Resistance;
        return ((sideA.Value * weightA) + (sideB.Value * weightB)) / (weightA + weightB);
    }

    /// <summary>The side of a face made by cell <paramref name="nearest"/> and the next one away from the face (<paramref name="away"/> = -1 or +1), when in the same layer.</summary>
    private CellSide Side(ReadOnlySpan<double> cells, int nearest, int away)
    {
        var grid = _system.Grid;
        var next = nearest + away;
        var sameLayer = next >= 0 && next < cells.Length && grid.LayerOfCell[next] == grid.LayerOfCell[nearest];
        return CellSide.From(
            cells[nearest],
            grid.WidthsMeters[nearest],
            _halfResistance[nearest],
            sameLayer ? cells[next] : null,
            sameLayer ? grid.WidthsMeters[next] : 0);
    }
}
