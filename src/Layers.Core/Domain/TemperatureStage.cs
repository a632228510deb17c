namespace Layers.Core.Domain;

/// <summary>
/// One stage of a time-temperature history: a duration at a constant temperature, with the D and K the case gives
/// for this stage only. Those are keyed by layer index in the stack and by face side, never by name: names are
/// the user's, read once from the case file and shown in reports, and a layer and a face may share one.
/// </summary>
/// <param name="Name">Name for reports (e.g. "hot fill").</param>
/// <param name="DurationSeconds">Duration, s, &gt; 0.</param>
/// <param name="TemperatureKelvin">Temperature, K, &gt; 0.</param>
public sealed record TemperatureStage(string Name, double DurationSeconds, double TemperatureKelvin)
{
    /// <summary>Origin shown for a D given for one stage.</summary>
    public const string GivenForStage = "given for this stage";

    /// <summary>Diffusion coefficients given for this stage by layer index, m2/s; they replace the layer's own source.</summary>
    public IReadOnlyDictionary<int, double> DiffusivityOverrides { get; init; } = new Dictionary<int, double>();

    /// <summary>
    /// Partition coefficients given for this stage by layer index (volume basis, relative to the case's reference
    /// medium); they replace the case's own for this stage. Concentrations carry over unchanged at the stage
    /// boundary, so the continuous variable u = c/K jumps there.
    /// </summary>
    public IReadOnlyDictionary<int, double> LayerPartitionOverrides { get; init; } = new Dictionary<int, double>();

    /// <summary>Partition coefficients given for this stage for the compartment or bath beyond a face, by side.</summary>
    public IReadOnlyDictionary<Side, double> FacePartitionOverrides { get; init; } = new Dictionary<Side, double>();

    /// <summary>True when the stage gives any partition coefficient of its own.</summary>
    public bool HasPartitionOverrides => LayerPartitionOverrides.Count > 0 || FacePartitionOverrides.Count > 0;

    /// <summary>The diffusion coefficient of the layer at <paramref name="layerIndex"/> in this stage, m2/s, and where it comes from.</summary>
    public (double Value, string Origin) DiffusivityOf(int layerIndex, DiffusivitySource source)
    {
        ArgumentNullException.ThrowIfNull(source);
        return DiffusivityOverrides.TryGetValue(layerIndex, out var value)
            ? (value, GivenForStage)
            : (source.At(TemperatureKelvin), source.Describe());
    }

    /// <summary>The partition coefficient of the layer at <paramref name="layerIndex"/> in this stage: the stage's own, else <paramref name="caseValue"/>.</summary>
    public double LayerPartitionOf(int layerIndex, double caseValue) => LayerPartitionOverrides.GetValueOrDefault(layerIndex, caseValue);

    /// <summary>The partition coefficient of the medium beyond a face in this stage: the stage's own, else <paramref name="caseValue"/>.</summary>
    public double FacePartitionOf(Side side, double caseValue) => FacePartitionOverrides.GetValueOrDefault(side, caseValue);

    /// <summary>
    /// The case as it is during this stage: every layer's D from its source (or this stage's own value) and every
    /// K this stage gives. The one place where a stage's D and K are put into a case.
    /// </summary>
    /// <param name="simulation">The case as read.</param>
    /// <param name="sources">Where each layer's D comes from, by layer index.</param>
    public SimulationCase Apply(SimulationCase simulation, IReadOnlyList<DiffusivitySource> sources)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        ArgumentNullException.ThrowIfNull(sources);
        var layers = simulation.Stack.Layers
            .Select((layer, index) => layer with
            {
                DiffusivitySquareMetersPerSecond = DiffusivityOf(index, sources[index]).Value,
                PartitionCoefficient = LayerPartitionOf(index, layer.PartitionCoefficient),
            })
            .ToArray();
        return simulation with
        {
            Stack = new LayerStack(layers),
            Left = WithPartition(simulation.Left, Side.Left),
            Right = WithPartition(simulation.Right, Side.Right),
        };
    }

    private FaceCondition WithPartition(FaceCondition face, Side side) => face switch
    {
        BathFace bath when FacePartitionOverrides.TryGetValue(side, out var value) => bath with { PartitionCoefficient = value },
        CompartmentFace compartment when FacePartitionOverrides.TryGetValue(side, out var value) => compartment with { PartitionCoefficient = value },
        _ => face,
    };
}
