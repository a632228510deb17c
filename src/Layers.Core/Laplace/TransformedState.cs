using System.Numerics;
using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// The transformed solution at one s: node values of u and every transformed quantity the solution reports
/// (amounts, fluxes, face-medium values), each of which is inverted to the time domain on a contour.
/// </summary>
/// <remarks>
/// One instance is a workspace: <see cref="StackTransform.Solve(Complex, TransformedState)"/> refills it for each s
/// of a contour, so a whole inversion allocates nothing per point. It belongs to one caller at a time (one per
/// inversion call), which keeps a solution usable from several threads at once.
/// </remarks>
internal sealed class TransformedState
{
    private readonly StackTransform _stack;

    public TransformedState(StackTransform stack)
    {
        _stack = stack;
        var n = stack.LayerCount;
        Layers = new LayerTransfer[n];
        InitialOverS = new Complex[n];
        Nodes = new Complex[n + 1];
        Series = new Complex[n];
        Shunt = new Complex[n + 1];
        Source = new Complex[n + 1];
        Pivot = new Complex[n + 1];
        Reduced = new Complex[n + 1];
    }

    public Complex S { get; internal set; }

    /// <summary>1 / s.</summary>
    public Complex InverseS { get; internal set; }

    internal LayerTransfer[] Layers { get; }

    internal Complex[] InitialOverS { get; }

    internal Complex[] Nodes { get; }

    // The ladder network's admittances, sources and elimination scratch (see LadderNetwork).
    internal Complex[] Series { get; }

    internal Complex[] Shunt { get; }

    internal Complex[] Source { get; }

    internal Complex[] Pivot { get; }

    internal Complex[] Reduced { get; }

    // Y(s) and Y(s) g(s) of each face medium at this s (zero for a closed face or a held node).
    internal Complex LeftAdmittance { get; set; }

    internal Complex LeftSource { get; set; }

    internal Complex RightAdmittance { get; set; }

    internal Complex RightSource { get; set; }

    /// <summary>Transformed u at node i (0: left face, N: right face).</summary>
    public Complex NodeValue(int node) => Nodes[node];

    /// <summary>Transformed mass per area of layer j: K times the integral of u.</summary>
    public Complex LayerMass(int layer)
        => _stack.PartitionOf(layer) * Layers[layer].IntegralOfU(Nodes[layer], Nodes[layer + 1], InitialOverS[layer]);

    /// <summary>
    /// Transformed flux in +x at node i, kg/m2/s. It can be read from the layer on either side of the node or, at an
    /// outer node, from the face medium's law; each is an admittance times a difference of u, and the difference is
    /// largest, so least cancelled, across the smallest admittance: that reading is taken (a thin, fast layer beside a
    /// slow one, or a weak film before a conductive layer, would otherwise lose digits).
    /// </summary>
    public Complex FluxAtNode(int node)
    {
        var n = Layers.Length;
        var face = node == 0 ? _stack.Left : node == n ? _stack.Right : null;
        if (face?.Condition is ClosedFace)
        {
            return Complex.Zero;
        }

        // The admittances are compared by their squared moduli, which order them alike without a square root.
        var flux = Complex.Zero;
        var smallest = double.PositiveInfinity;
        if (node > 0)
        {
            smallest = SquaredModulus(Layers[node - 1].Self);
            flux = Layers[node - 1].FluxAtRight(Nodes[node - 1], Nodes[node], InitialOverS[node - 1]);
        }

        if (node < n && SquaredModulus(Layers[node].Self) < smallest)
        {
            smallest = SquaredModulus(Layers[node].Self);
            flux = Layers[node].FluxAtLeft(Nodes[node], Nodes[node + 1], InitialOverS[node]);
        }

        if (face is { IsFixedValue: false })
        {
            var admittance = node == 0 ? LeftAdmittance : RightAdmittance;
            if (SquaredModulus(admittance) < smallest)
            {
                // The flux from the medium into the stack is Source - Y u: +x at the left face, -x at the right.
                var intoStack = (node == 0 ? LeftSource : RightSource) - (admittance * Nodes[node]);
                flux = node == 0 ? intoStack : -intoStack;
            }
        }

        return flux;
    }

    /// <summary>Transformed flux from the stack into the medium on a side, kg/m2/s.</summary>
    public Complex FluxIntoMedium(Side side) => side == Side.Left ? -FluxAtNode(0) : FluxAtNode(Layers.Length);

    /// <summary>Transformed u of the medium on a side: the bath's fixed value, or the compartment's through its film.</summary>
    public Complex MediumValue(Side side) => MediumValue(side, FluxIntoMedium(side));

    /// <summary>The same, given the transformed flux into that medium.</summary>
    public Complex MediumValue(Side side, Complex fluxIntoMedium)
    {
        var face = _stack.Face(side);
        if (face.Condition is BathFace)
        {
            return face.MediumValue * InverseS;
        }

        // u_c = u_face + R F_in, with F_in = -(flux into the medium).
        var node = side == Side.Left ? 0 : Layers.Length;
        return Nodes[node] - (face.FilmResistance * fluxIntoMedium);
    }

    private static double SquaredModulus(Complex value) => (value.Real * value.Real) + (value.Imaginary * value.Imaginary);

    /// <summary>Transformed u at depth xi inside a layer.</summary>
    public Complex ValueInLayer(int layer, double depthMeters)
        => Layers[layer].ValueAt(depthMeters, Nodes[layer], Nodes[layer + 1], InitialOverS[layer]);

    /// <summary>Transformed integral of u from depth x1 to x2 inside a layer (depths from the layer's left face).</summary>
    public Complex IntegralInLayer(int layer, double fromMeters, double toMeters)
        => Layers[layer].IntegralOfUBetween(fromMeters, toMeters, Nodes[layer], Nodes[layer + 1], InitialOverS[layer]);
}
