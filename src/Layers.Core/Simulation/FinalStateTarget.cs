using Layers.Core.Analytics;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// The final state of a case at every node (for the approach measures), from the analytic references: the
/// closed-system equilibrium or the series-resistance steady state.
/// </summary>
internal sealed class FinalStateTarget
{
    private FinalStateTarget(FinalStateKind kind, double[] nodeValues, SteadyStateStack? steady, double? closedValue)
    {
        Kind = kind;
        NodeValues = nodeValues;
        Steady = steady;
        ClosedValue = closedValue;
    }

    public FinalStateKind Kind { get; }

    /// <summary>Final u at every node.</summary>
    public double[] NodeValues { get; }

    public SteadyStateStack? Steady { get; }

    public double? ClosedValue { get; }

    public static FinalStateTarget Of(SimulationCase simulation, DiffusionSystem system)
    {
        var values = new double[system.NodeCount];
        if (simulation.IsClosed)
        {
            var equilibrium = ClosedSystemEquilibrium.Of(simulation).ContinuousVariable;
            Array.Fill(values, equilibrium);
            return new FinalStateTarget(FinalStateKind.ClosedEquilibrium, values, null, equilibrium);
        }

        var steady = SteadyStateStack.Of(simulation);
        Array.Fill(values, steady.ContinuousVariableAtEdge(0));
        var grid = system.Grid;
        for (var cell = 0; cell < grid.CellCount; cell++)
        {
            var layer = grid.LayerOfCell[cell];
            var depthInLayer = grid.CentresMeters[cell] - simulation.Stack.LeftEdgeMeters(layer);
            values[system.FirstCellNode + cell] = steady.ContinuousVariableInLayer(layer, depthInLayer);
        }

        var kind = steady.FluxKgPerSquareMeterSecond == 0 ? FinalStateKind.BathEquilibrium : FinalStateKind.SteadyPermeation;
        return new FinalStateTarget(kind, values, steady, null);
    }

    /// <summary>Final concentration at the left and right edge of a layer, kg/m3.</summary>
    public (double Left, double Right) LayerEdges(SimulationCase simulation, int layer)
    {
        var k = simulation.Stack.Layers[layer].PartitionCoefficient;
        if (Steady is null)
        {
            return (k * ClosedValue!.Value, k * ClosedValue!.Value);
        }

        return (k * Steady.ContinuousVariableAtEdge(layer), k * Steady.ContinuousVariableAtEdge(layer + 1));
    }

    /// <summary>Final concentration in a face medium, or null for a closed face, kg/m3.</summary>
    public double? MediumConcentration(FaceCondition face, Side side)
    {
        var u = side == Side.Left ? NodeValues[0] : NodeValues[^1];
        return face switch
        {
            CompartmentFace compartment => compartment.PartitionCoefficient * u,
            BathFace bath => bath.ConcentrationKgPerCubicMeter,
            _ => null,
        };
    }
}
