using Layers.Core.Fitting;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Fitting;

public sealed class LevenbergMarquardtTests
{
    // NIST Statistical Reference Datasets, nonlinear regression, Misra1a (lower difficulty):
    // y = b1 (1 - exp(-b2 x)), 14 observations (x, y), certified to 11 digits
    // (https://www.itl.nist.gov/div898/strd/nls/data/misra1a.shtml).
    private static readonly double[] X = [77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8, 593.1, 689.1, 760.0];
    private static readonly double[] Y = [10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82, 50.76, 55.05, 61.01, 66.40, 75.47, 81.78];

    private static readonly LeastSquaresOptions Tight = new() { StepTolerance = 1e-12, CostTolerance = 1e-15, MaximumIterations = 500, DifferenceStep = 1e-6 };

    private static double[]? Residuals(double[] b) => X.Select((x, i) => Y[i] - (b[0] * (1 - Math.Exp(-b[1] * x)))).ToArray();

    [Theory]
    [InlineData(500, 1e-4)]
    [InlineData(250, 5e-4)]
    public void Reaches_the_certified_Misra1a_estimates_from_both_NIST_starting_points(double b1, double b2)
    {
        var solution = LevenbergMarquardt.Minimize(Residuals, [b1, b2], Tight)!;

        // NIST StRD Misra1a certified values: b1 = 2.3894212918E+02, b2 = 5.5015643181E-04,
        // residual sum of squares 1.2455138894E-01.
        Assert.Equal(LeastSquaresStop.Converged, solution.Stop);
        Tolerance.Relative(2.3894212918E+02, solution.Parameters[0], 1e-6, "b1");
        Tolerance.Relative(5.5015643181E-04, solution.Parameters[1], 1e-6, "b2");
        Tolerance.Relative(1.2455138894E-01, solution.SumOfSquares, 1e-8, "residual sum of squares");
    }

    [Fact]
    public void Gives_the_certified_Misra1a_standard_errors_and_residual_standard_deviation()
    {
        var solution = LevenbergMarquardt.Minimize(Residuals, [250, 5e-4], Tight)!;

        var statistics = LeastSquaresStatistics.Of(solution.Jacobian, solution.Residuals, 0.95);

        // NIST StRD Misra1a certified standard deviations of the estimates 2.7070075241E+00 and 7.2668688436E-06,
        // residual standard deviation 1.0187876330E-01 with 12 degrees of freedom.
        Tolerance.Relative(2.7070075241E+00, statistics.StandardErrors[0], 1e-5, "SE of b1");
        Tolerance.Relative(7.2668688436E-06, statistics.StandardErrors[1], 1e-5, "SE of b2");
        Tolerance.Relative(1.0187876330E-01, Math.Sqrt(statistics.ResidualVariance), 1e-8, "residual standard deviation");
        Assert.Equal(12, statistics.DegreesOfFreedom);
        Assert.Empty(statistics.UndeterminedDirections);

        // Student t quantile for 12 degrees of freedom at 0.975: 2.1788 (any statistics table, e.g. NIST/SEMATECH
        // e-Handbook of Statistical Methods, section 1.3.6.7.2).
        Tolerance.Absolute(2.1788, statistics.TQuantile, 1e-4, "t(0.975, 12)");
    }

    [Fact]
    public void Names_the_direction_of_two_parameters_that_act_only_as_their_product()
    {
        // y = a b x: only the product a b is determined (a textbook case of a rank-deficient Jacobian).
        double[]? Product(double[] p) => X.Select((x, i) => Y[i] - (p[0] * p[1] * x / 10)).ToArray();

        var solution = LevenbergMarquardt.Minimize(Product, [1, 1], Tight)!;
        var statistics = LeastSquaresStatistics.Of(solution.Jacobian, solution.Residuals, 0.95);

        var direction = Assert.Single(statistics.UndeterminedDirections);
        Assert.Equal(1, Math.Abs(direction[0]) / Math.Abs(direction[1]) * (solution.Parameters[1] / solution.Parameters[0]), 6);
        Assert.True(double.IsPositiveInfinity(statistics.StandardErrors[0]));
        Assert.Equal(-1, statistics.Correlation[0, 1]);
    }
}
