namespace Layers.Core.Results;

/// <summary>The full result at one report time: integral quantities plus the concentration profile.</summary>
/// <param name="Sample">Integral quantities.</param>
/// <param name="Profiles">One profile per layer, left to right.</param>
public sealed record ReportPoint(StateSample Sample, IReadOnlyList<LayerProfile> Profiles);
