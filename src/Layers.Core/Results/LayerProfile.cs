namespace Layers.Core.Results;

/// <summary>
/// Concentration across one layer at one time: the value on the layer's side of its left face, at every cell centre,
/// and on the layer's side of its right face. Kept per layer so that plots never draw a line across a partition jump.
/// </summary>
/// <param name="LayerIndex">Index of the layer in the stack.</param>
/// <param name="LayerName">Name of the layer.</param>
/// <param name="PositionsMeters">Depths from the left face of the stack, m, ascending.</param>
/// <param name="ConcentrationsKgPerCubicMeter">Concentrations at those depths, kg/m3.</param>
public sealed record LayerProfile(
    int LayerIndex,
    string LayerName,
    IReadOnlyList<double> PositionsMeters,
    IReadOnlyList<double> ConcentrationsKgPerCubicMeter);
