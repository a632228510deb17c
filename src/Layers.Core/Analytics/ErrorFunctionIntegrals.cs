using MathNet.Numerics;

namespace Layers.Core.Analytics;

/// <summary>
/// The integrated complementary error function i erfc(z) and the scaled complementary error function
/// exp(z^2) erfc(z), evaluated without the cancellation or overflow of their textbook definitions.
/// </summary>
/// <remarks>
/// Definitions as in Abramowitz and Stegun (1964), Handbook of Mathematical Functions, ch. 7 (i^n erfc in
/// section 7.2, asymptotic expansion of erfc in eq. 7.1.23; numbers from memory):
/// i erfc(z) = integral of erfc from z to infinity = exp(-z^2)/sqrt(pi) - z erfc(z), the function in
/// Crank (1975), The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.20.
/// </remarks>
internal static class ErrorFunctionIntegrals
{
    // Below this argument the direct formula for i erfc cancels away at most a factor 2 z^2 = 128 of relative
    // accuracy; above it the asymptotic series reaches full precision long before its terms start to grow.
    private const double AsymptoticIntegralArgument = 8.0;

    // Above this argument exp(z^2) nears overflow and erfc(z) the subnormal range, so only the asymptotic
    // series keeps full relative precision.
    private const double AsymptoticScaledArgument = 25.0;

    // Below this argument 1 - exp(z^2) erfc(z) would cancel against 1, so it is summed as a power series.
    private const double PowerSeriesArgument = 0.5;

    private const double RelativeTolerance = 1e-17;
    private const int MaxTerms = 200;

    /// <summary>i erfc(z) = integral of erfc from z to infinity = exp(-z^2)/sqrt(pi) - z erfc(z).</summary>
    internal static double IntegralErfc(double z)
    {
        if (z < AsymptoticIntegralArgument)
        {
            return ExpOfNegativeSquare(z) * Constants.InvSqrtPi - z * SpecialFunctions.Erfc(z);
        }

        // i erfc(z) ~ exp(-z^2)/sqrt(pi) * sum_{k>=1} (-1)^(k+1) (2k-1)!! / (2 z^2)^k.
        double twoZSquared = 2 * z * z;
        double term = 1 / twoZSquared;
        double sum = term;
        for (int k = 1; k < MaxTerms && Math.Abs(term) > RelativeTolerance * sum; k++)
        {
            term *= -(2 * k + 1) / twoZSquared;
            sum += term;
        }

        return ExpOfNegativeSquare(z) * Constants.InvSqrtPi * sum;
    }

    /// <summary>erfcx(z) = exp(z^2) erfc(z) for z &gt;= 0.</summary>
    internal static double ScaledErfc(double z)
    {
        if (z < AsymptoticScaledArgument)
        {
            return ExpOfSquare(z) * SpecialFunctions.Erfc(z);
        }

        // erfcx(z) ~ 1/(z sqrt(pi)) * sum_{k>=0} (-1)^k (2k-1)!! / (2 z^2)^k.
        double twoZSquared = 2 * z * z;
        double term = 1;
        double sum = term;
        for (int k = 1; k < MaxTerms && Math.Abs(term) > RelativeTolerance * sum; k++)
        {
            term *= -(2 * k - 1) / twoZSquared;
            sum += term;
        }

        return Constants.InvSqrtPi / z * sum;
    }

    /// <summary>1 - exp(z^2) erfc(z) for z &gt;= 0, accurate in relative terms also as z tends to zero.</summary>
    internal static double OneMinusScaledErfc(double z)
    {
        if (z >= PowerSeriesArgument)
        {
            return 1 - ScaledErfc(z);
        }

        // exp(z^2) erfc(z) = sum_{k>=0} (-z)^k / Gamma(k/2 + 1); the two Gamma values advance by
        // Gamma(k/2 + 1) = (k/2) Gamma(k/2) along the odd and the even k separately.
        double sum = 0;
        double power = 1;
        double gammaOdd = Constants.SqrtPi;
        double gammaEven = 1;
        for (int k = 1; k <= MaxTerms; k++)
        {
            power *= z;
            bool isOdd = k % 2 == 1;
            if (isOdd)
            {
                gammaOdd *= k / 2.0;
            }
            else
            {
                gammaEven *= k / 2.0;
            }

            double term = power / (isOdd ? gammaOdd : gammaEven);
            sum += isOdd ? term : -term;
            if (term <= RelativeTolerance * Math.Abs(sum))
            {
                break;
            }
        }

        return sum;
    }

    // exp(-z^2) with z^2 split into its rounded value and the rounding error, because the rounding error of z^2
    // alone would cost a relative error of z^2 * 1e-16 in the exponential.
    private static double ExpOfNegativeSquare(double z)
    {
        double square = z * z;
        double squareError = Math.FusedMultiplyAdd(z, z, -square);
        return Math.Exp(-square) * (1 - squareError);
    }

    private static double ExpOfSquare(double z)
    {
        double square = z * z;
        double squareError = Math.FusedMultiplyAdd(z, z, -square);
        return Math.Exp(square) * (1 + squareError);
    }
}
