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
        return (ConstantDiffusivity(layerIndex, source).DiffusivitySquareMetersPerSecond,
            DiffusivityOverrides.ContainsKey(layerIndex) ? GivenForStage : source.Describe());
    }

    /// <summary>The D of a layer in this stage as a constant: this stage's own value, else its source at this temperature.</summary>
    private GivenDiffusivity ConstantDiffusivity(int layerIndex, DiffusivitySource source)
        => DiffusivityOverrides.TryGetValue(layerIndex, out var value) ? new GivenDiffusivity(value) : source.AtTemperature(TemperatureKelvin);

    /// <summary>The partition coefficient of the layer at <paramref name="layerIndex"/> in this stage: the stage's own, else <paramref name="caseValue"/>.</summary>
    public double LayerPartitionOf(int layerIndex, double caseValue) => LayerPartitionOverrides.GetValueOrDefault(layerIndex, caseValue);

    /// <summary>The partition coefficient of the medium beyond a face in this stage: the stage's own, else <paramref name="caseValue"/>.</summary>
    public double FacePartitionOf(Side side, double caseValue) => FacePartitionOverrides.GetValueOrDefault(side, caseValue);

    /// <summary>
    /// The case as it is during this stage: every layer's D from its source at this stage's temperature (or this
    /// stage's own value), as a constant, and every K this stage gives. The one place where a stage's D and K are
    /// put into a case.
    /// </summary>
    /// <param name="simulation">The case as read.</param>
    public SimulationCase Apply(SimulationCase simulation) => Resolve(simulation, withPartitions: true);

    /// <summary>
    /// The case with every layer's D as in this stage (see <see cref="Apply"/>) and its own K: the case whose
    /// u = c/K states are carried between stages, taken with the D of its first stage.
    /// </summary>
    /// <param name="simulation">The case as read.</param>
    public SimulationCase WithDiffusivities(SimulationCase simulation) => Resolve(simulation, withPartitions: false);

    /// <summary>
    /// The single stage of a case without a temperature history: the whole duration, with no D or K of its own.
    /// Its temperature is <see cref="UnstatedKelvin"/>, which a constant D (all such a case has) does not read.
    /// </summary>
    public static TemperatureStage Whole(double durationSeconds) => new("whole run", durationSeconds, UnstatedKelvin);

    /// <summary>
    /// Temperature of the stage of a case that states none, K: 25 degC, the usual reference temperature; only a D that
    /// depends on temperature would read it, and a case read from a file has such a D only with a temperature history.
    /// </summary>
    public const double UnstatedKelvin = 298.15;

    private SimulationCase Resolve(SimulationCase simulation, bool withPartitions)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var layers = simulation.Stack.Layers
            .Select((layer, index) => layer with
            {
                Diffusivity = ConstantDiffusivity(index, layer.Diffusivity),
                PartitionCoefficient = withPartitions ? LayerPartitionOf(index, layer.PartitionCoefficient) : layer.PartitionCoefficient,
            })
            .ToArray();
        return simulation with
        {
            Stack = new LayerStack(layers),
            Left = withPartitions ? WithPartition(simulation.Left, Side.Left) : simulation.Left,
            Right = withPartitions ? WithPartition(simulation.Right, Side.Right) : simulation.Right,
        };
    }

    private FaceCondition WithPartition(FaceCondition face, Side side) => face switch
    {
        BathFace bath when FacePartitionOverrides.TryGetValue(side, out var value) => bath with { PartitionCoefficient = value },
        CompartmentFace compartment when FacePartitionOverrides.TryGetValue(side, out var value) => compartment with { PartitionCoefficient = value },
        _ => face,
    };
}
