using Layers.Core.Analytics;

namespace Layers.Tests.TestSupport;

/// <summary>Crank's limited-volume series (The Mathematics of Diffusion, eq. 4.37) solved for a time.</summary>
internal static class LimitedVolumeTimes
{
    /// <summary>The time at which M_t/M_inf reaches <paramref name="level"/>, by bisection over ten diffusion times.</summary>
    public static double ToFraction(double diffusivity, double thickness, double alpha, double level) =>
        TimeToLevel.Of(
            time => PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(diffusivity, thickness, alpha, time),
            level,
            10 * thickness * thickness / diffusivity);
}
