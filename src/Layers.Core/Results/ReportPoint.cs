namespace Layers.Core.Results;

/// <summary>The full result at one report time: integral quantities plus the concentration profile.</summary>
/// <param name="Sample">Integral quantities.</param>
/// <param name="Profiles">One profile per layer, left to right.</param>
public sealed record ReportPoint(StateSample Sample, IReadOnlyList<LayerProfile> Profiles)
{
    /// <summary>
    /// The concentrations at the depths the case names (<see cref="DepthReadings"/>), read from <see cref="Profiles"/>;
    /// the same depths and layers at every report time, empty when the case names none.
    /// </summary>
    public IReadOnlyList<DepthReading> Depths { get; init; } = [];
}
