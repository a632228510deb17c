using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Core.Analytics;

/// <summary>
/// Steady state of a stack between two baths: the N-layer series-resistance law with partition coefficients,
/// J = (c_left/K_left - c_right/K_right) / (1/(k_left K_left) + sum_i h_i/(D_i K_i) + 1/(k_right K_right)),
/// the two-resistance law of interfacial mass transfer generalised to N layers and two films (Crank, The
/// Mathematics of Diffusion, 2nd ed., ch. 12, composite membranes, section from memory; Cussler, Diffusion, ch. 13 on overall
/// mass-transfer coefficients). Inside each layer u = c / K is linear; at each interface c jumps by K_i / K_i+1.
/// With one bath only, the steady state is that bath's u everywhere and J = 0.
/// </summary>
public sealed class SteadyStateStack
{
    private readonly double[] _interfaceValues;
    private readonly LayerStack _stack;

    private SteadyStateStack(LayerStack stack, double flux, double[] interfaceValues)
    {
        _stack = stack;
        FluxKgPerSquareMeterSecond = flux;
        _interfaceValues = interfaceValues;
    }

    /// <summary>Steady flux from the left face to the right face, kg/m2/s.</summary>
    public double FluxKgPerSquareMeterSecond { get; }

    /// <summary>Computes the steady state of a case with at least one bath.</summary>
    /// <exception cref="ArgumentException">When no face is a bath.</exception>
    public static SteadyStateStack Of(SimulationCase simulation)
    {
        var stack = simulation.Stack;
        var values = new double[stack.Count + 1];
        if (simulation.Left is BathFace left && simulation.Right is BathFace right)
        {
            var total = SeriesResistance.Film(left.FilmCoefficientMetersPerSecond, left.PartitionCoefficient)
                + stack.ResistanceSecondsPerMeter
                + SeriesResistance.Film(right.FilmCoefficientMetersPerSecond, right.PartitionCoefficient);
            var flux = (left.ContinuousVariable - right.ContinuousVariable) / total;
            values[0] = left.ContinuousVariable
                - (flux * SeriesResistance.Film(left.FilmCoefficientMetersPerSecond, left.PartitionCoefficient));
            for (var i = 0; i < stack.Count; i++)
            {
                values[i + 1] = values[i] - (flux * stack.Layers[i].ResistanceSecondsPerMeter);
            }

            return new SteadyStateStack(stack, flux, values);
        }

        var bath = simulation.Left as BathFace ?? simulation.Right as BathFace
            ?? throw new ArgumentException("A steady state needs at least one bath.", nameof(simulation));
        Array.Fill(values, bath.ContinuousVariable);
        return new SteadyStateStack(stack, 0, values);
    }

    /// <summary>u = c / K at the left face of layer i (i = Count gives the right face of the stack).</summary>
    public double ContinuousVariableAtEdge(int edge) => _interfaceValues[edge];

    /// <summary>u at a depth inside layer <paramref name="layer"/>, measured from that layer's left face.</summary>
    public double ContinuousVariableInLayer(int layer, double depthInLayerMeters)
    {
        var fraction = depthInLayerMeters / _stack.Layers[layer].ThicknessMeters;
        return _interfaceValues[layer] + (fraction * (_interfaceValues[layer + 1] - _interfaceValues[layer]));
    }

    /// <summary>Concentration at a depth inside a layer, kg/m3.</summary>
    public double ConcentrationInLayer(int layer, double depthInLayerMeters)
        => _stack.Layers[layer].PartitionCoefficient * ContinuousVariableInLayer(layer, depthInLayerMeters);
}
