namespace Layers.Core.Domain;

/// <summary>
/// Sampling of a compartment as done in a diffusion cell: at each time a volume is withdrawn and replaced at once
/// with fresh medium, so the concentration drops by (V - v) / V and the withdrawn drug leaves the system.
/// </summary>
/// <param name="VolumeCubicMeters">Volume withdrawn (and replaced) at each sampling time, m3; less than the compartment's volume.</param>
/// <param name="TimesSeconds">Sampling times, s, strictly ascending, within the duration.</param>
public sealed record ReceptorSampling(double VolumeCubicMeters, IReadOnlyList<double> TimesSeconds);
