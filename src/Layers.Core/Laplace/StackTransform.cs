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
    private readonly double[] _diffusivity;
    private readonly double[] _permeability;
    private readonly double[] _initialValue;

    public StackTransform(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var layers = simulation.Stack.Layers;
        _thickness = [.. layers.Select(layer => layer.ThicknessMeters)];
        _diffusivity = [.. layers.Select(layer => layer.DiffusivitySquareMetersPerSecond)];
        Partition = [.. layers.Select(layer => layer.PartitionCoefficient)];
        _permeability = [.. layers.Select(layer => layer.DiffusivitySquareMetersPerSecond * layer.PartitionCoefficient)];
        _initialValue = [.. layers.Select(layer => layer.InitialContinuousVariable)];
        Left = FaceLaw.For(simulation.Left);
        Right = FaceLaw.For(simulation.Right);
    }

    /// <summary>Number of layers N.</summary>
    public int LayerCount => _thickness.Length;

    /// <summary>Partition coefficient of each layer.</summary>
    public IReadOnlyList<double> Partition { get; }

    public FaceLaw Left { get; }

    public FaceLaw Right { get; }

    public FaceLaw Face(Side side) => side == Side.Left ? Left : Right;

    /// <summary>Solves for the transformed node values at s (s off the closed negative real axis).</summary>
    public TransformedState Solve(Complex s)
    {
        var n = LayerCount;
        var layers = new LayerTransfer[n];
        var initialOverS = new Complex[n];
        for (var j = 0; j < n; j++)
        {
            layers[j] = new LayerTransfer(s, _thickness[j], _diffusivity[j], _permeability[j]);
            initialOverS[j] = _initialValue[j] / s;
        }

        // Node i joins layers i-1 and i: series admittance H of each layer between its two nodes, and to ground
        // the storage T of the layers on either side (G = H + T), plus the face medium's Y at the outer nodes.
        var series = new Complex[n];
        var shunt = new Complex[n + 1];
        var source = new Complex[n + 1];
        for (var j = 0; j < n; j++)
        {
            series[j] = layers[j].Cross;
            var storage = layers[j].Storage;
            shunt[j] += storage;
            shunt[j + 1] += storage;
            source[j] += storage * initialOverS[j];
            source[j + 1] += storage * initialOverS[j];
        }

        if (!Left.IsFixedValue)
        {
            shunt[0] += Left.Admittance(s);
            source[0] += Left.Source(s);
        }

        if (!Right.IsFixedValue)
        {
            shunt[n] += Right.Admittance(s);
            source[n] += Right.Source(s);
        }

        var values = LadderNetwork.Solve(
            series, shunt, source, Left.IsFixedValue ? Left.FixedValue(s) : null, Right.IsFixedValue ? Right.FixedValue(s) : null);
        return new TransformedState(this, s, layers, initialOverS, values);
    }
}
