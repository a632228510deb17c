using Layers.Core.Analytics;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// The final state of a case at every node (for the approach measures), from the analytic references: the
/// closed-system equilibrium or the series-resistance steady state. What sampling and first-order removal take out is
/// accounted for: a sampled closed system settles to the equilibrium of the mass left after its last sample, and a
/// system that loses to first-order removal with no bath to refill it ends with everything in the removal.
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

    /// <summary>Mass per area the closed-system equilibrium holds when it is that of the mass left after the last sample, kg/m2; else null.</summary>
    public double? MassLeftAfterSamplingPerArea { get; private init; }

    /// <summary>The case whose partition coefficients <see cref="Steady"/> and <see cref="ClosedValue"/> are in, when not the run's own.</summary>
    private SimulationCase? PartitionCase { get; init; }

    /// <summary>
    /// The system and case of the run's end (its last stage), with the factor from the case's own u to the end's
    /// (null when they are the same): the media in contact at the end read their concentrations through them.
    /// </summary>
    private (SimulationCase Case, DiffusionSystem System, double[]? ToEnd) End { get; init; }

    /// <summary>
    /// The final state of a staged run: that of its last stage, whose partition coefficients (and D) hold from the
    /// end of the run on, with the node values in the case's own u = c/K, as observers read states.
    /// </summary>
    /// <param name="model">The case's discrete model.</param>
    /// <param name="stages">Its stages.</param>
    /// <param name="massLeftAfterSamplingPerArea">
    /// For a sampled closed system, the mass per area left in it after the last sample, kg/m2, from a run up to it;
    /// null for the equilibrium of the initial mass.
    /// </param>
    public static FinalStateTarget ForStages(
        DiscreteModel model, IReadOnlyList<StageSystem> stages, double? massLeftAfterSamplingPerArea = null)
    {
        var last = stages[^1];
        if (last.ToStage is not { } factors)
        {
            return Of(model.Case, model.System, massLeftAfterSamplingPerArea);
        }

        var target = Of(last.Case, last.System, massLeftAfterSamplingPerArea);
        var values = new double[target.NodeValues.Length];
        for (var n = 0; n < values.Length; n++)
        {
            values[n] = target.NodeValues[n] / factors[n];
        }

        return new FinalStateTarget(target.Kind, values, target.Steady, target.ClosedValue)
        {
            PartitionCase = last.Case,
            MassLeftAfterSamplingPerArea = target.MassLeftAfterSamplingPerArea,
            End = (last.Case, last.System, factors),
        };
    }

    /// <summary>The final state of a case run in one stage; see <see cref="ForStages"/> for the mass left after sampling.</summary>
    public static FinalStateTarget Of(SimulationCase simulation, DiffusionSystem system, double? massLeftAfterSamplingPerArea = null)
    {
        var values = new double[system.NodeCount];
        var original = simulation;
        simulation = RemovalAsSink(simulation);
        if (simulation.IsClosed)
        {
            var closed = massLeftAfterSamplingPerArea is { } left
                ? ClosedSystemEquilibrium.Of(simulation, left)
                : ClosedSystemEquilibrium.Of(simulation);
            var equilibrium = closed.ContinuousVariable;
            Array.Fill(values, equilibrium);
            AddUndissolved(simulation, system, closed, values);
            return new FinalStateTarget(FinalStateKind.ClosedEquilibrium, values, null, equilibrium)
            {
                MassLeftAfterSamplingPerArea = massLeftAfterSamplingPerArea,
                End = (original, system, null),
            };
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

        SetRemovingCompartment(system, steady, values);
        // With no bath in the case itself, the only "bath" is the removal: it takes everything in the end.
        var kind = original.IsClosed
            ? FinalStateKind.AllRemoved
            : steady.FluxKgPerSquareMeterSecond == 0 ? FinalStateKind.BathEquilibrium : FinalStateKind.SteadyPermeation;
        return new FinalStateTarget(kind, values, steady, null) { End = (original, system, null) };
    }

    /// <summary>The content w of the cells that keep the undissolved excess at a capped equilibrium, spread by storage.</summary>
    private static void AddUndissolved(SimulationCase simulation, DiffusionSystem system, ClosedSystemEquilibrium closed, double[] values)
    {
        if (closed.UndissolvedPerArea <= 0)
        {
            return;
        }

        var grid = system.Grid;
        var holding = Enumerable.Range(0, grid.CellCount)
            .Where(cell => simulation.Stack.Layers[grid.LayerOfCell[cell]].SaturationContinuousVariable <= closed.ContinuousVariable)
            .Select(cell => system.FirstCellNode + cell)
            .ToArray();
        var storage = holding.Sum(node => system.Capacity[node]);
        foreach (var node in holding)
        {
            values[node] += closed.UndissolvedPerArea / storage;
        }
    }

    /// <summary>
    /// The case with every compartment that has first-order removal replaced by a sink at c = 0 behind the same
    /// resistances: the film 1/(k_f K) and the removal 1/(k (V/A) K) in series give one film of coefficient
    /// 1 / (1/k_f + A/(k V)). The stack's steady state is the same; the compartment's own value is set afterwards.
    /// </summary>
    private static SimulationCase RemovalAsSink(SimulationCase simulation)
    {
        static FaceCondition Replace(FaceCondition face) => face is CompartmentFace { RemovalRatePerSecond: > 0 } c
            ? new BathFace(c.Name, 0, c.PartitionCoefficient, 1 / ((c.FilmCoefficientMetersPerSecond is { } film ? 1 / film : 0)
                + (1 / (c.RemovalRatePerSecond * c.VolumePerAreaMeters))))
            : face;
        return simulation with { Left = Replace(simulation.Left), Right = Replace(simulation.Right) };
    }

    /// <summary>
    /// A removing compartment holds, at steady state, the u whose removal k (V/A) K u equals the flux it receives: the
    /// removal is the link of the face's added node to a bath at u = 0, of conductance k (V/A) K.
    /// </summary>
    private static void SetRemovingCompartment(DiffusionSystem system, SteadyStateStack steady, double[] values)
    {
        if (system.Left.AddsNode && system.LeftBath.Exists)
        {
            values[0] = -steady.FluxKgPerSquareMeterSecond / system.LeftBath.Conductance;
        }

        if (system.Right.AddsNode && system.RightBath.Exists)
        {
            values[^1] = steady.FluxKgPerSquareMeterSecond / system.RightBath.Conductance;
        }
    }

    /// <summary>
    /// The final state when a schedule leaves layers off at its end: they hold nothing and exchange with nothing, so
    /// their cells end empty; a closed system settles to the equilibrium of the layers still on (and its media) with the
    /// mass left in it. The other final states (a bath's level, everything removed) are uniform and stand as they are
    /// on the layers still on.
    /// </summary>
    internal FinalStateTarget WithLayersOff(SimulationCase simulation, DiffusionSystem system, IReadOnlySet<int> off, double? massLeftPerArea)
    {
        if (off.Count == 0)
        {
            return this;
        }

        var values = (double[])NodeValues.Clone();
        var closedValue = ClosedValue;
        if (Kind == FinalStateKind.ClosedEquilibrium)
        {
            var kept = simulation with { Stack = new LayerStack([.. simulation.Stack.Layers.Where((_, layer) => !off.Contains(layer))]) };
            var closed = massLeftPerArea is { } left ? ClosedSystemEquilibrium.Of(kept, left) : ClosedSystemEquilibrium.Of(kept);
            closedValue = closed.ContinuousVariable;
            Array.Fill(values, closed.ContinuousVariable);
        }

        foreach (var node in off.SelectMany(layer => ScheduleStages.NodesOf(system, layer)))
        {
            values[node] = 0;
        }

        return new FinalStateTarget(Kind, values, Steady, closedValue)
        {
            PartitionCase = PartitionCase,
            MassLeftAfterSamplingPerArea = MassLeftAfterSamplingPerArea,
            End = End,
        };
    }

    /// <summary>Final concentration at the left and right edge of a layer, kg/m3.</summary>
    public (double Left, double Right) LayerEdges(SimulationCase simulation, int layer)
    {
        var k = (PartitionCase ?? simulation).Stack.Layers[layer].PartitionCoefficient;
        if (Steady is null)
        {
            return (k * ClosedValue!.Value, k * ClosedValue!.Value);
        }

        return (k * Steady.ContinuousVariableAtEdge(layer), k * Steady.ContinuousVariableAtEdge(layer + 1));
    }

    /// <summary>
    /// Final concentration in the medium on a side at the end of the run, or null for a closed face, kg/m3; a
    /// compartment's through the node map of the end's system, in whose variable its node value is turned first.
    /// </summary>
    public double? MediumConcentration(Side side)
    {
        var node = side == Side.Left ? 0 : NodeValues.Length - 1;
        return End.Case.Face(side) switch
        {
            CompartmentFace => End.System.ConcentrationOf(node, End.ToEnd is { } factors ? NodeValues[node] * factors[node] : NodeValues[node]),
            BathFace bath => bath.ConcentrationKgPerCubicMeter,
            _ => null,
        };
    }
}
