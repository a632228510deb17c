using System.Numerics;
using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// The transformed solution at one s: node values of u and every transformed quantity the solution reports
/// (amounts, fluxes, face-medium values), each of which is inverted to the time domain by <see cref="TalbotContour"/>.
/// </summary>
internal sealed class TransformedState
{
    private readonly StackTransform _stack;
    private readonly LayerTransfer[] _layers;
    private readonly Complex[] _initialOverS;
    private readonly Complex[] _nodes;

    public TransformedState(StackTransform stack, Complex s, LayerTransfer[] layers, Complex[] initialOverS, Complex[] nodes)
    {
        _stack = stack;
        S = s;
        _layers = layers;
        _initialOverS = initialOverS;
        _nodes = nodes;
    }

    public Complex S { get; }

    /// <summary>Transformed u at node i (0: left face, N: right face).</summary>
    public Complex NodeValue(int node) => _nodes[node];

    /// <summary>Transformed mass per area of layer j: K times the integral of u.</summary>
    public Complex LayerMass(int layer)
        => _stack.Partition[layer] * _layers[layer].IntegralOfU(_nodes[layer], _nodes[layer + 1], _initialOverS[layer]);

    /// <summary>
    /// Transformed flux in +x at node i, kg/m2/s. It can be read from the layer on either side of the node or, at an
    /// outer node, from the face medium's law; each is an admittance times a difference of u, and the difference is
    /// largest, so least cancelled, across the smallest admittance: that reading is taken (a thin, fast layer beside a
    /// slow one, or a weak film before a conductive layer, would otherwise lose digits).
    /// </summary>
    public Complex FluxAtNode(int node)
    {
        var n = _layers.Length;
        var face = node == 0 ? _stack.Left : node == n ? _stack.Right : null;
        if (face?.Condition is ClosedFace)
        {
            return Complex.Zero;
        }

        var flux = Complex.Zero;
        var smallest = double.PositiveInfinity;
        if (node > 0)
        {
            smallest = Complex.Abs(_layers[node - 1].Self);
            flux = _layers[node - 1].FluxAtRight(_nodes[node - 1], _nodes[node], _initialOverS[node - 1]);
        }

        if (node < n && Complex.Abs(_layers[node].Self) < smallest)
        {
            smallest = Complex.Abs(_layers[node].Self);
            flux = _layers[node].FluxAtLeft(_nodes[node], _nodes[node + 1], _initialOverS[node]);
        }

        if (face is { IsFixedValue: false } && Complex.Abs(face.Admittance(S)) < smallest)
        {
            // The flux from the medium into the stack is Source - Y u: +x at the left face, -x at the right.
            var intoStack = face.Source(S) - (face.Admittance(S) * _nodes[node]);
            flux = node == 0 ? intoStack : -intoStack;
        }

        return flux;
    }

    /// <summary>Transformed flux from the stack into the medium on a side, kg/m2/s.</summary>
    public Complex FluxIntoMedium(Side side) => side == Side.Left ? -FluxAtNode(0) : FluxAtNode(_layers.Length);

    /// <summary>Transformed u of the medium on a side: the bath's fixed value, or the compartment's through its film.</summary>
    public Complex MediumValue(Side side)
    {
        var face = _stack.Face(side);
        if (face.Condition is BathFace)
        {
            return face.MediumValue / S;
        }

        // u_c = u_face + R F_in, with F_in = -(flux into the medium).
        var node = side == Side.Left ? 0 : _layers.Length;
        return _nodes[node] - (face.FilmResistance * FluxIntoMedium(side));
    }

    /// <summary>Transformed u at depth xi inside a layer.</summary>
    public Complex ValueInLayer(int layer, double depthMeters)
        => _layers[layer].ValueAt(depthMeters, _nodes[layer], _nodes[layer + 1], _initialOverS[layer]);

    /// <summary>Transformed integral of u from depth x1 to x2 inside a layer (depths from the layer's left face).</summary>
    public Complex IntegralInLayer(int layer, double fromMeters, double toMeters)
        => _layers[layer].IntegralOfUBetween(fromMeters, toMeters, _nodes[layer], _nodes[layer + 1], _initialOverS[layer]);
}
