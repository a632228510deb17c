namespace Layers.Tests.TestSupport;

/// <summary>
/// Flux out of the downstream face of a membrane 0 &lt; x &lt; l with zero initial concentration, its upstream face
/// held at C1 and its downstream face at zero from t = 0. Reference: Crank, The Mathematics of Diffusion, 2nd ed.
/// (1975), ch. 4, section 4.3: the amount Q_t = l C1 (D t / l^2 - 1/6 - (2/pi^2) sum (-1)^n / n^2
/// exp(-D n^2 pi^2 t / l^2)) (eq. 4.24a, from memory), whose time derivative is the flux
/// F = (D C1 / l) (1 + 2 sum_{n>=1} (-1)^n exp(-D n^2 pi^2 t / l^2)). At short times the same flux from the Laplace
/// transform D C1 q / (s sinh(q l)), q = sqrt(s / D), expanded in exp(-(2m+1) q l) and inverted term by term
/// (Crank 1975, ch. 2, the pair exp(-q x) / q, from memory): F = 2 C1 sqrt(D / (pi t)) sum_{m>=0}
/// exp(-(2m+1)^2 l^2 / (4 D t)). Both are summed until a term falls below 1e-17 of the sum.
/// </summary>
internal static class MembraneFluxSeries
{
    public static double Flux(double diffusivity, double thickness, double upstreamConcentration, double time)
    {
        var tau = diffusivity * time / (thickness * thickness);
        if (tau < 0.1)
        {
            var sum = 0.0;
            for (var m = 0; m < 100; m++)
            {
                var term = Math.Exp(-Math.Pow((2 * m) + 1, 2) / (4 * tau));
                sum += term;
                if (term < 1e-17 * sum)
                {
                    break;
                }
            }

            return 2 * upstreamConcentration * Math.Sqrt(diffusivity / (Math.PI * time)) * sum;
        }

        var series = 1.0;
        for (var n = 1; n < 1000; n++)
        {
            var term = 2 * Math.Exp(-n * n * Math.PI * Math.PI * tau);
            series += n % 2 == 1 ? -term : term;
            if (term < 1e-17)
            {
                break;
            }
        }

        return diffusivity * upstreamConcentration / thickness * series;
    }
}
