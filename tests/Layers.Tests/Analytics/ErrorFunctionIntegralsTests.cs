using Layers.Core.Analytics;
using MathNet.Numerics;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Analytics;

public sealed class ErrorFunctionIntegralsTests
{
    [Fact]
    public void Integrated_erfc_at_zero_is_one_over_root_pi()
    {
        // Abramowitz and Stegun (1964), ch. 7, i^n erfc(0) = 1 / (2^n Gamma(1 + n/2)) (section 7.2, from memory);
        // n = 1 gives 1/sqrt(pi).
        Tolerance.Relative(
            1 / Math.Sqrt(Math.PI), ErrorFunctionIntegrals.IntegralErfc(0), 1e-15, "i erfc(0)");
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(3.0)]
    [InlineData(7.99)]
    [InlineData(8.01)]
    [InlineData(15.0)]
    public void Integrated_erfc_equals_the_integral_of_erfc(double z)
    {
        double expected = ErrorFunctionIntegrals.IntegralErfc(z);

        // Abramowitz and Stegun (1964), ch. 7 (section 7.2, from memory): i erfc(z) = integral from z to infinity
        // of erfc; erfc(z + 12) is below 1e-60 of erfc(z) here, so the upper limit z + 12 loses nothing.
        double integral = Integrate.OnClosedInterval(SpecialFunctions.Erfc, z, z + 12, 1e-13 * expected);
        Tolerance.Relative(integral, expected, 1e-11, "i erfc against the integral of erfc");
    }

    [Theory]
    [InlineData(0.7)]
    [InlineData(10.0)]
    [InlineData(24.9)]
    [InlineData(25.1)]
    [InlineData(26.0)]
    public void Scaled_erfc_matches_its_definition_where_that_is_representable(double z)
    {
        // Abramowitz and Stegun (1964), ch. 7: exp(z^2) erfc(z); below z = 26.5 both factors are normal doubles,
        // so the product is a fair check of the asymptotic branch used from z = 25 on.
        double definition = Math.Exp(z * z) * SpecialFunctions.Erfc(z);
        Tolerance.Relative(definition, ErrorFunctionIntegrals.ScaledErfc(z), 1e-12, "erfcx");
    }

    [Fact]
    public void Scaled_erfc_follows_its_asymptotic_leading_term_for_large_arguments()
    {
        const double z = 1e4;

        // Abramowitz and Stegun (1964), ch. 7, eq. 7.1.23 (from memory): exp(z^2) erfc(z) ~ 1/(z sqrt(pi)) with a
        // relative correction -1/(2 z^2).
        double leading = 1 / (z * Math.Sqrt(Math.PI)) * (1 - 1 / (2 * z * z));
        Tolerance.Relative(leading, ErrorFunctionIntegrals.ScaledErfc(z), 1e-15, "erfcx(1e4)");
    }

    [Theory]
    [InlineData(0.1)]
    [InlineData(0.3)]
    [InlineData(0.499)]
    [InlineData(0.501)]
    public void One_minus_scaled_erfc_matches_its_definition_away_from_zero(double z)
    {
        // Abramowitz and Stegun (1964), ch. 7: 1 - exp(z^2) erfc(z), evaluated directly where it does not cancel.
        double definition = 1 - Math.Exp(z * z) * SpecialFunctions.Erfc(z);
        Tolerance.Relative(
            definition, ErrorFunctionIntegrals.OneMinusScaledErfc(z), 1e-13, "1 - erfcx");
    }

    [Fact]
    public void One_minus_scaled_erfc_keeps_relative_accuracy_near_zero()
    {
        const double z = 1e-9;

        // Abramowitz and Stegun (1964), ch. 7, eq. 7.1.6 (from memory), series of erfc times that of exp(z^2):
        // 1 - exp(z^2) erfc(z) = 2 z / sqrt(pi) - z^2 + O(z^3).
        double leading = 2 * z / Math.Sqrt(Math.PI) - z * z;
        Tolerance.Relative(leading, ErrorFunctionIntegrals.OneMinusScaledErfc(z), 1e-15, "1 - erfcx(1e-9)");
    }
}
