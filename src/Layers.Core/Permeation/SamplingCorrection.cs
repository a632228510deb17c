namespace Layers.Core.Permeation;

/// <summary>
/// The cumulative amount permeated per area from the concentrations of samples taken from a receptor of volume V,
/// each sample of volume v replaced with fresh medium: Q_n = (V C_n + v sum_{i&lt;n} C_i) / A. This is how measured
/// diffusion-cell data are corrected for the drug withdrawn (common practice, no source).
/// </summary>
public static class SamplingCorrection
{
    /// <summary>Q_n for every sample, kg/m2.</summary>
    /// <param name="concentrations">C_1..C_n in the samples, kg/m3, in sampling order.</param>
    /// <param name="receptorVolumeCubicMeters">V.</param>
    /// <param name="sampleVolumeCubicMeters">v.</param>
    /// <param name="areaSquareMeters">A.</param>
    public static double[] CumulativePerArea(
        IReadOnlyList<double> concentrations,
        double receptorVolumeCubicMeters,
        double sampleVolumeCubicMeters,
        double areaSquareMeters)
    {
        var result = new double[concentrations.Count];
        var earlier = 0.0;
        for (var n = 0; n < concentrations.Count; n++)
        {
            result[n] = ((receptorVolumeCubicMeters * concentrations[n]) + (sampleVolumeCubicMeters * earlier)) / areaSquareMeters;
            earlier += concentrations[n];
        }

        return result;
    }
}
