using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// Assembles a <see cref="DiffusionSystem"/> from a case and its mesh: the cells of the stack, and at each end what
/// the face's <see cref="FaceModel"/> adds (a node, its links); no kind of face is named here.
/// </summary>
public static class DiffusionSystemBuilder
{
    /// <summary>Assembles the system and returns it with the initial state u(0).</summary>
    public static (DiffusionSystem System, double[] InitialState) Build(SimulationCase simulation, Grid grid)
    {
        var stack = simulation.Stack;
        var left = FaceModel.For(simulation.Left);
        var right = FaceModel.For(simulation.Right);
        var first = left.AddsNode ? 1 : 0;
        var nodeCount = grid.CellCount + first + (right.AddsNode ? 1 : 0);
        var capacity = new double[nodeCount];
        var partition = new double[nodeCount];
        var initial = new double[nodeCount];
        var halfResistance = new double[grid.CellCount];
        var dispersed = stack.Layers.Any(layer => layer.SolubilityKgPerCubicMeter is not null);
        var saturation = dispersed ? new double[nodeCount] : null;
        saturation?.AsSpan().Fill(double.PositiveInfinity);

        for (var cell = 0; cell < grid.CellCount; cell++)
        {
            var layer = stack.Layers[grid.LayerOfCell[cell]];
            var width = grid.WidthsMeters[cell];
            capacity[first + cell] = width * layer.PartitionCoefficient;
            partition[first + cell] = layer.PartitionCoefficient;
            initial[first + cell] = layer.InitialContinuousVariable;
            if (saturation is not null)
            {
                saturation[first + cell] = layer.SaturationContinuousVariable;
            }

            halfResistance[cell] = SeriesResistance.HalfCell(
                width, layer.DiffusivitySquareMetersPerSecond, layer.PartitionCoefficient);
        }

        var conductance = new double[nodeCount - 1];
        for (var cell = 0; cell < grid.CellCount - 1; cell++)
        {
            conductance[first + cell] = 1 / (halfResistance[cell] + halfResistance[cell + 1]);
        }

        // A face that adds a node puts its storage, K and initial u there, linked to the end cell.
        if (left.AddsNode)
        {
            capacity[0] = left.NodeCapacity;
            partition[0] = left.NodePartitionCoefficient;
            initial[0] = left.NodeInitialValue;
            conductance[0] = left.NodeConductance(halfResistance[0]);
        }

        if (right.AddsNode)
        {
            var last = nodeCount - 1;
            capacity[last] = right.NodeCapacity;
            partition[last] = right.NodePartitionCoefficient;
            initial[last] = right.NodeInitialValue;
            conductance[last - 1] = right.NodeConductance(halfResistance[^1]);
        }

        var system = new DiffusionSystem(
            grid, capacity, conductance, halfResistance, partition, left, right,
            left.OuterCoupling(halfResistance[0]), right.OuterCoupling(halfResistance[^1]), first, saturation);
        return (system, initial);
    }
}
