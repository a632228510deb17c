using Layers.Core.Domain;

namespace Layers.Core.Analytics;

/// <summary>
/// Time lag of a laminate of any number of layers between a constant source and a perfect sink, all layers
/// starting empty, without films. Frisch's integral (H. L. Frisch, J. Phys. Chem. 61 (1957) 93, from memory)
/// written in the interface-continuous variable u = c/K: with the resistance density r = 1/(D K), rho(x) the
/// resistance upstream of x and R the total,
/// t_lag = integral over the stack of K(x) (1 - rho(x)/R) rho(x) dx.
/// Within a layer rho is linear, so each layer contributes exactly K h [mean(rho) - mean(rho^2)/R], with
/// mean(rho) = (a+b)/2 and mean(rho^2) = (a^2 + ab + b^2)/3 for rho running from a to b. For one layer this is
/// L^2/(6D), the Daynes-Barrer lag; for laminates it is the composite-membrane lag (Crank, The Mathematics of
/// Diffusion, 2nd ed., ch. 12, laminates; section from memory).
/// </summary>
public static class LaminateTimeLag
{
    /// <summary>The time lag of the stack, s.</summary>
    public static double Seconds(LayerStack stack)
    {
        var total = stack.ResistanceSecondsPerMeter;
        var upstream = 0.0;
        var lag = 0.0;
        foreach (var layer in stack.Layers)
        {
            var a = upstream;
            var b = upstream + layer.ResistanceSecondsPerMeter;
            var meanRho = (a + b) / 2;
            var meanRhoSquared = ((a * a) + (a * b) + (b * b)) / 3;
            lag += layer.PartitionCoefficient * layer.ThicknessMeters * (meanRho - (meanRhoSquared / total));
            upstream = b;
        }

        return lag;
    }
}
