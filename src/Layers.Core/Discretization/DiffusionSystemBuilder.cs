using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>Assembles a <see cref="DiffusionSystem"/> from a case and its mesh.</summary>
public static class DiffusionSystemBuilder
{
    /// <summary>Assembles the system and returns it with the initial state u(0).</summary>
    public static (DiffusionSystem System, double[] InitialState) Build(SimulationCase simulation, Grid grid)
    {
        var stack = simulation.Stack;
        var hasLeftCompartment = simulation.Left is CompartmentFace;
        var hasRightCompartment = simulation.Right is CompartmentFace;
        var first = hasLeftCompartment ? 1 : 0;
        var nodeCount = grid.CellCount + first + (hasRightCompartment ? 1 : 0);
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

        if (simulation.Left is CompartmentFace leftCompartment)
        {
            capacity[0] = leftCompartment.VolumePerAreaMeters * leftCompartment.PartitionCoefficient;
            partition[0] = leftCompartment.PartitionCoefficient;
            initial[0] = leftCompartment.InitialConcentrationKgPerCubicMeter / leftCompartment.PartitionCoefficient;
            conductance[0] = 1 / (halfResistance[0] + FilmResistance(leftCompartment));
        }

        if (simulation.Right is CompartmentFace rightCompartment)
        {
            var last = nodeCount - 1;
            capacity[last] = rightCompartment.VolumePerAreaMeters * rightCompartment.PartitionCoefficient;
            partition[last] = rightCompartment.PartitionCoefficient;
            initial[last] = rightCompartment.InitialConcentrationKgPerCubicMeter / rightCompartment.PartitionCoefficient;
            conductance[last - 1] = 1 / (halfResistance[^1] + FilmResistance(rightCompartment));
        }

        var leftBath = Coupling(simulation.Left, halfResistance[0], capacity[0]);
        var rightBath = Coupling(simulation.Right, halfResistance[^1], capacity[^1]);
        return (new DiffusionSystem(grid, capacity, conductance, halfResistance, partition, leftBath, rightBath, first, saturation), initial);
    }

    private static double FilmResistance(CompartmentFace compartment)
        => SeriesResistance.Film(compartment.FilmCoefficientMetersPerSecond, compartment.PartitionCoefficient);

    private static BathCoupling Coupling(FaceCondition face, double halfCellResistance, double endCapacity)
    {
        // First-order removal from a compartment, k V c per area and time = k (V/A) K u, is a link of conductance
        // k (V/A) K from the compartment node to a bath at u = 0: the loss sits on the diagonal, the system stays
        // tridiagonal, and the removed mass is counted by the bath quadrature, so the balance closes to round-off.
        if (face is CompartmentFace { RemovalRatePerSecond: > 0 } removing)
        {
            return new BathCoupling(removing.RemovalRatePerSecond * endCapacity, 0);
        }

        if (face is not BathFace bath)
        {
            return BathCoupling.None;
        }

        var film = SeriesResistance.Film(bath.FilmCoefficientMetersPerSecond, bath.PartitionCoefficient);
        return new BathCoupling(1 / (halfCellResistance + film), bath.ContinuousVariable);
    }
}
