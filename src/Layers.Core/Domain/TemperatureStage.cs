namespace Layers.Core.Domain;

/// <summary>One stage of a time-temperature history: a duration at a constant temperature.</summary>
/// <param name="Name">Name for reports (e.g. "hot fill").</param>
/// <param name="DurationSeconds">Duration, s, &gt; 0.</param>
/// <param name="TemperatureKelvin">Temperature, K, &gt; 0.</param>
public sealed record TemperatureStage(string Name, double DurationSeconds, double TemperatureKelvin)
{
    /// <summary>Diffusion coefficients given for this stage by layer name, m2/s; they replace the layer's own source.</summary>
    public IReadOnlyDictionary<string, double> DiffusivityOverrides { get; init; } = new Dictionary<string, double>();

    /// <summary>
    /// Partition coefficients given for this stage by layer or face name (volume basis, relative to the case's
    /// reference medium); they replace the case's own for this stage. Concentrations carry over unchanged at the
    /// stage boundary, so the continuous variable u = c/K jumps there.
    /// </summary>
    public IReadOnlyDictionary<string, double> PartitionOverrides { get; init; } = new Dictionary<string, double>();

    /// <summary>The diffusion coefficient of a layer in this stage, m2/s, and where it comes from.</summary>
    public (double Value, string Origin) DiffusivityOf(string layerName, DiffusivitySource source)
        => DiffusivityOverrides.TryGetValue(layerName, out var value)
            ? (value, "given for this stage")
            : (source.At(TemperatureKelvin), source.Describe());

    /// <summary>The partition coefficient of a layer or face in this stage: the stage's own, else <paramref name="caseValue"/>.</summary>
    public double PartitionOf(string name, double caseValue) => PartitionOverrides.GetValueOrDefault(name, caseValue);
}
