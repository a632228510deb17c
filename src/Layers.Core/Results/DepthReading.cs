namespace Layers.Core.Results;

/// <summary>The concentration at one depth the case names, in one layer, at one report time.</summary>
/// <param name="DepthMeters">Depth from the left face of the stack, m, as the case gives it.</param>
/// <param name="LayerIndex">Index of the layer read; a depth on an interface gives one reading for each side.</param>
/// <param name="LayerName">Name of that layer.</param>
/// <param name="ConcentrationKgPerCubicMeter">Concentration c (not u = c/K) in that layer at that depth, kg/m3.</param>
public sealed record DepthReading(double DepthMeters, int LayerIndex, string LayerName, double ConcentrationKgPerCubicMeter);
