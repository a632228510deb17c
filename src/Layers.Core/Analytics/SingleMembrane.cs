using Layers.Core.Domain;

namespace Layers.Core.Analytics;

/// <summary>
/// Recognises a case that is a single membrane between a constant source and a perfect sink, starting empty and
/// without films, for which the time lag L^2 / (6 D) and the steady flux D K c_source / L hold (Daynes-Barrer;
/// Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, eqs. 4.24a-c, from memory).
/// </summary>
public static class SingleMembrane
{
    /// <summary>The time lag L^2/(6D), s, or null when the case is not such a membrane.</summary>
    public static double? LagTimeSeconds(SimulationCase simulation)
    {
        if (simulation.Stack.Count != 1
            || simulation.Left is not BathFace left
            || simulation.Right is not BathFace right)
        {
            return null;
        }

        var layer = simulation.Stack.Layers[0];
        var oneSourceOneSink = (left.ConcentrationKgPerCubicMeter > 0 && right.ConcentrationKgPerCubicMeter == 0)
            || (right.ConcentrationKgPerCubicMeter > 0 && left.ConcentrationKgPerCubicMeter == 0);
        var isClassic = layer.InitialConcentrationKgPerCubicMeter == 0
            && oneSourceOneSink
            && left.FilmCoefficientMetersPerSecond is null
            && right.FilmCoefficientMetersPerSecond is null;
        return isClassic
            ? layer.ThicknessMeters * layer.ThicknessMeters / (6 * layer.DiffusivitySquareMetersPerSecond)
            : null;
    }
}
