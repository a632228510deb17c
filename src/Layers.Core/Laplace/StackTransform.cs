using System.Numerics;
using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// The exact transformed solution of a case with constant coefficients: for one value of s, the transformed u at
/// every face and interface of the stack (nodes 0 to N for N layers), from one complex tridiagonal solve.
/// </summary>
/// <remarks>
/// The unknowns are the node values of u = c / K, continuous by construction. Each interior node balances the flux
/// leaving the layer on its left against the flux entering the layer on its right (<see cref="LayerTransfer"/>);
/// each outer node balances the flux from its face medium (<see cref="FaceLaw"/>). The equations are those of a
/// ladder network (<see cref="LadderNetwork"/>), solved without forming differences of large admittances. Away
/// from the negative real axis every leading part of the network is the admittance of a part of the stack, which
/// does not vanish, so the elimination needs no pivoting.
/// </remarks>
internal sealed class StackTransform
{
    private readonly double[] _thickness;
    private readonly double[] _inverseRootDiffusivity;
    private readonly double[] _partition;
    private readonly double[] _conductance;
    private readonly double[] _inversePartition;
    private readonly double[] _permeability;
    private readonly double[] _initialValue;

    public StackTransform(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var layers = simulation.Stack.Layers;
        _thickness = [.. layers.Select(layer => layer.ThicknessMeters)];
        _inverseRootDiffusivity = [.. layers.Select(layer => 1 / Math.Sqrt(layer.DiffusivitySquareMetersPerSecond))];
        _partition = [.. layers.Select(layer => layer.PartitionCoefficient)];
        Partition = _partition;
        _conductance = [.. layers.Select(layer => layer.DiffusivitySquareMetersPerSecond * layer.PartitionCoefficient / layer.ThicknessMeters)];
        _inversePartition = [.. layers.Select(layer => 1 / layer.PartitionCoefficient)];
        _permeability = [.. layers.Select(layer => layer.DiffusivitySquareMetersPerSecond * layer.PartitionCoefficient)];
        _initialValue = [.. layers.Select(layer => layer.InitialContinuousVariable)];
        Left = FaceLaw.For(simulation.Left);
        Right = FaceLaw.For(simulation.Right);
    }

    /// <summary>Number of layers N.</summary>
    public int LayerCount => _thickness.Length;

    /// <summary>Partition coefficient of each layer.</summary>
    public IReadOnlyList<double> Partition { get; }

    /// <summary>Partition coefficient of layer j, without the list interface (read once per layer and s).</summary>
    public double PartitionOf(int layer) => _partition[layer];

    public FaceLaw Left { get; }

    public FaceLaw Right { get; }

    public FaceLaw Face(Side side) => side == Side.Left ? Left : Right;

    /// <summary>Solves for the transformed node values at s (s off the closed negative real axis), in a new state.</summary>
    public TransformedState Solve(Complex s)
    {
        var state = new TransformedState(this);
        Solve(s, state);
        return state;
    }

    /// <summary>Solves for the transformed node values at s into a workspace of this stack, allocating nothing.</summary>
    public void Solve(Complex s, TransformedState state)
    {
        var n = LayerCount;
        var inverseS = Complex.One / s;
        var rootS = Complex.Sqrt(s);
        state.S = s;
        state.InverseS = inverseS;
        var layers = state.Layers;
        var initialOverS = state.InitialOverS;

        // Node i joins layers i-1 and i: series admittance H of each layer between its two nodes, and to ground
        // the storage T of the layers on either side (G = H + T), plus the face medium's Y at the outer nodes.
        var series = state.Series;
        var shunt = state.Shunt;
        var source = state.Source;
        shunt[0] = Complex.Zero;
        source[0] = Complex.Zero;
        for (var j = 0; j < n; j++)
        {
            var layer = new LayerTransfer(rootS, inverseS, _thickness[j], _inverseRootDiffusivity[j], _conductance[j], _inversePartition[j]);
            layers[j] = layer;
            var start = _initialValue[j] * inverseS;
            initialOverS[j] = start;
            series[j] = layer.Cross;
            var storage = layer.Storage;
            var stored = storage * start;
            shunt[j] += storage;
            source[j] += stored;
            shunt[j + 1] = storage;
            source[j + 1] = stored;
        }

        state.LeftAdmittance = Complex.Zero;
        state.LeftSource = Complex.Zero;
        state.RightAdmittance = Complex.Zero;
        state.RightSource = Complex.Zero;
        if (!Left.IsFixedValue)
        {
            (state.LeftAdmittance, state.LeftSource) = Left.AdmittanceAndSource(s, inverseS);
            shunt[0] += state.LeftAdmittance;
            source[0] += state.LeftSource;
        }

        if (!Right.IsFixedValue)
        {
            (state.RightAdmittance, state.RightSource) = Right.AdmittanceAndSource(s, inverseS);
            shunt[n] += state.RightAdmittance;
            source[n] += state.RightSource;
        }

        LadderNetwork.Solve(
            series,
            shunt,
            source,
            Left.IsFixedValue ? Left.MediumValue * inverseS : null,
            Right.IsFixedValue ? Right.MediumValue * inverseS : null,
            state.Nodes,
            state.Pivot,
            state.Reduced);
    }
}
