using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// Turns the exact solution at one time into the records the finite volumes report: the integral quantities, the
/// profiles at the places the case's mesh would show (each layer's edges and its cell centres) and the concentrations
/// at the depths the case names, all read from the exact solution rather than reconstructed from cells.
/// </summary>
internal sealed class ExactSampler
{
    private readonly SimulationCase _case;
    private readonly DiscreteModel _model;
    private readonly LaplaceSolution _solution;
    private readonly Observables _observables;
    private readonly ExactDistance _distance;
    private readonly double _initialMass;
    private readonly double[] _centres;
    private readonly double[] _leftEdges;
    private readonly (int Layer, double DepthMeters)[] _centrePlaces;
    private readonly double[] _state;

    private ExactSampler(DiscreteModel model, LaplaceSolution solution, Observables observables, FinalStateTarget final)
    {
        _case = model.Case;
        _model = model;
        _solution = solution;
        _observables = observables;
        _distance = new ExactDistance(model, final);
        _initialMass = model.System.TotalMass(model.InitialState);
        _centres = model.Grid.CentresMeters.ToArray();
        _leftEdges = LeftEdges(model.Case.Stack);
        _centrePlaces = [.. _centres.Select((centre, cell) => (model.Grid.LayerOfCell[cell], centre - _leftEdges[model.Grid.LayerOfCell[cell]]))];
        _state = (double[])model.InitialState.Clone();
        Final = final;
    }

    /// <summary>The case's mesh and system: the places of the profiles, the nodes the fractions are measured on.</summary>
    public DiscreteModel Model => _model;

    /// <summary>The state the case tends to.</summary>
    public FinalStateTarget Final { get; }

    /// <summary>The exact solution sampled.</summary>
    public LaplaceSolution Solution => _solution;

    /// <summary>The whole system's distance from its final state.</summary>
    public ExactDistance Distance => _distance;

    /// <summary>The sampler of a case the exact method can serve, inverting on a contour of the given number of points.</summary>
    public static ExactSampler For(SimulationCase simulation, int contourPoints)
    {
        var model = DiscreteModel.Build(simulation);
        var stages = StageSystem.For(simulation, model.Grid, model.System);
        var final = FinalStateTarget.ForStages(model, stages);
        return new ExactSampler(model, LaplaceSolution.For(simulation, contourPoints), new Observables(model, stages, final), final);
    }

    /// <summary>The integral quantities at t = 0, from the initial state (the flux of a jump is infinite there; the mesh's face link gives a finite value).</summary>
    public StateSample Initial() => _observables.Sample(0, _model.InitialState, default);

    /// <summary>
    /// A compartment's fraction of the way to its final content at the snapshot's time (the finite volumes' measure of
    /// its node), or null where the face has no compartment or its content does not change.
    /// </summary>
    public double? CompartmentFraction(Side side, LaplaceSnapshot snapshot)
    {
        var node = _model.System.CompartmentNode(side);
        if (node < 0)
        {
            return null;
        }

        _state[node] = snapshot.Face(side)!.MediumMassPerArea!.Value / _model.System.Capacity[node];
        return _observables.CompartmentFraction(side, _state);
    }

    /// <summary>The integral quantities at the instant's time.</summary>
    public StateSample Sample(LaplaceInstant instant)
    {
        var snapshot = instant.Snapshot;
        var contents = snapshot.StackMassPerArea;
        var fromBaths = 0.0;
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (snapshot.Face(side) is not { } face)
            {
                continue;
            }

            // What baths and removals gave to the system: a bath gives what the stack did not send into it; a removal
            // takes what it removed.
            contents += face.MediumMassPerArea ?? 0;
            fromBaths -= face.MediumMassPerArea is null ? face.TransferredIntoMediumPerArea : face.RemovedPerArea;
        }

        var reference = Math.Max(Math.Abs(_initialMass), Math.Abs(fromBaths));
        var imbalance = contents - _initialMass - fromBaths;
        return new StateSample(
            snapshot.TimeSeconds,
            snapshot.LayerMassPerArea,
            Face(Side.Left, snapshot),
            Face(Side.Right, snapshot),
            _distance.FractionOfFinalState(instant),
            reference > 0 ? imbalance / reference : 0);
    }

    /// <summary>The lowest amount held by a layer or compartment, relative to the mass balance's reference (0 when none is negative).</summary>
    public double LowestAmountRelative(StateSample sample)
    {
        var lowest = Math.Min(0, sample.LayerMassPerArea.Min());
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var node = _model.System.CompartmentNode(side);
            var face = side == Side.Left ? sample.Left : sample.Right;
            if (node >= 0 && face is not null)
            {
                lowest = Math.Min(lowest, face.ConcentrationKgPerCubicMeter * _model.System.Capacity[node] / _model.System.PartitionCoefficient[node]);
            }
        }

        return _initialMass > 0 ? lowest / _initialMass : lowest;
    }

    /// <summary>The full result at a report time: the sample, the exact profiles and the named depths.</summary>
    /// <remarks>Every value is inverted from the stack already solved on the instant's contour.</remarks>
    public ReportPoint Report(StateSample sample, LaplaceInstant instant)
    {
        var snapshot = instant.Snapshot;
        var inside = Concentrations(instant, _centrePlaces);
        var grid = _model.Grid;
        var stack = _case.Stack;
        var profiles = new List<LayerProfile>(stack.Count);
        for (var layer = 0; layer < stack.Count; layer++)
        {
            var first = grid.FirstCell(layer);
            var count = grid.CellsIn(layer);
            var k = stack.Layers[layer].PartitionCoefficient;
            var positions = new double[count + 2];
            var concentrations = new double[count + 2];
            positions[0] = stack.LeftEdgeMeters(layer);
            concentrations[0] = k * snapshot.ContinuousValueAtInterfaces[layer];
            for (var i = 0; i < count; i++)
            {
                positions[i + 1] = _centres[first + i];
                concentrations[i + 1] = inside[first + i];
            }

            positions[^1] = positions[0] + stack.Layers[layer].ThicknessMeters;
            concentrations[^1] = k * snapshot.ContinuousValueAtInterfaces[layer + 1];
            profiles.Add(new LayerProfile(layer, stack.Layers[layer].Name, positions, concentrations));
        }

        return new ReportPoint(sample, profiles) { Depths = Depths(profiles, instant) };
    }

    /// <summary>
    /// The named depths, one reading per layer they touch (as the finite volumes report them), each from the exact
    /// solution: on a layer's edge the interface value of that side, inside it the inverted profile.
    /// </summary>
    private IReadOnlyList<DepthReading> Depths(List<LayerProfile> profiles, LaplaceInstant instant)
    {
        var readings = DepthReadings.Read(profiles, _case.ReportDepthsMeters);
        if (readings.Count == 0)
        {
            return readings;
        }

        var snapshot = instant.Snapshot;
        var inside = Concentrations(instant, [.. readings.Select(reading => (reading.LayerIndex, Math.Clamp(
            reading.DepthMeters - _leftEdges[reading.LayerIndex], 0, _case.Stack.Layers[reading.LayerIndex].ThicknessMeters)))]);
        var slack = DepthReadings.OnEdgeRelative * _case.Stack.TotalThicknessMeters;
        return [.. readings.Select((reading, r) =>
        {
            var edges = profiles[reading.LayerIndex].PositionsMeters;
            var k = _case.Stack.Layers[reading.LayerIndex].PartitionCoefficient;
            return reading with { ConcentrationKgPerCubicMeter = ExactDepthValue.Of(reading, (edges[0], edges[^1]), k, snapshot, inside[r], slack) };
        })];
    }

    private FaceSample? Face(Side side, LaplaceSnapshot snapshot)
    {
        if (snapshot.Face(side) is not { } face)
        {
            return null;
        }

        return new FaceSample(
            face.TransferredIntoMediumPerArea,
            face.ConcentrationKgPerCubicMeter,
            face.FluxIntoMediumKgPerSquareMeterSecond,
            CompartmentFraction(side, snapshot));
    }

    /// <summary>c = K u at places given by layer and depth inside it.</summary>
    private double[] Concentrations(LaplaceInstant instant, (int Layer, double DepthMeters)[] places)
    {
        var values = instant.ContinuousValuesAt(places);
        for (var i = 0; i < values.Length; i++)
        {
            values[i] *= _case.Stack.Layers[places[i].Layer].PartitionCoefficient;
        }

        return values;
    }

    /// <summary>Each layer's left edge from the left face of the stack, summed in order as the exact solution locates depths.</summary>
    private static double[] LeftEdges(LayerStack stack)
    {
        var edges = new double[stack.Count];
        for (var layer = 1; layer < stack.Count; layer++)
        {
            edges[layer] = edges[layer - 1] + stack.Layers[layer - 1].ThicknessMeters;
        }

        return edges;
    }
}
