namespace Layers.Core.Results;

/// <summary>The undissolved drug of one layer with a solubility (a dispersed matrix).</summary>
/// <param name="Layer">Name of the layer.</param>
/// <param name="SolubilityKgPerCubicMeter">Its solubility, kg/m3.</param>
/// <param name="InitialUndissolvedPerArea">Undissolved mass per area at t = 0, kg/m2.</param>
/// <param name="UndissolvedAtEndPerArea">Undissolved mass per area at the end of the duration, kg/m2.</param>
/// <param name="ExhaustedSeconds">
/// When the last undissolved drug dissolved, s, within the duration; null when some is left at the end or there was
/// none to begin with.
/// </param>
public sealed record DispersedLayerSummary(
    string Layer,
    double SolubilityKgPerCubicMeter,
    double InitialUndissolvedPerArea,
    double UndissolvedAtEndPerArea,
    double? ExhaustedSeconds);
