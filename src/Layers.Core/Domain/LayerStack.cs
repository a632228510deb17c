namespace Layers.Core.Domain;

/// <summary>
/// Ordered list of layers from the left face (index 0) to the right face. Immutable once built.
/// </summary>
public sealed class LayerStack
{
    private readonly Layer[] _layers;

    /// <summary>Creates a stack; the caller (the case mapper) has already validated every layer.</summary>
    /// <exception cref="ArgumentException">When the list is empty.</exception>
    public LayerStack(IEnumerable<Layer> layers)
    {
        _layers = layers.ToArray();
        if (_layers.Length == 0)
        {
            throw new ArgumentException("A stack needs at least one layer.", nameof(layers));
        }
    }

    /// <summary>The layers, left to right.</summary>
    public IReadOnlyList<Layer> Layers => _layers;

    /// <summary>Number of layers.</summary>
    public int Count => _layers.Length;

    /// <summary>Total thickness, m.</summary>
    public double TotalThicknessMeters => _layers.Sum(layer => layer.ThicknessMeters);

    /// <summary>Position of the left face of layer <paramref name="index"/>, measured from the left face of the stack, m.</summary>
    public double LeftEdgeMeters(int index) => _layers.Take(index).Sum(layer => layer.ThicknessMeters);

    /// <summary>Initial mass per unit area held by all layers, kg/m2.</summary>
    public double InitialMassPerArea => _layers.Sum(layer => layer.InitialMassPerArea);

    /// <summary>Sum of h/(D K) over the layers: the stack's share of the series resistance, s/m.</summary>
    public double ResistanceSecondsPerMeter => _layers.Sum(layer => layer.ResistanceSecondsPerMeter);
}
