using System.Globalization;

namespace Layers.Tests.Analytics;

/// <summary>Assertions with tolerances for the analytic reference tests, with invariant failure messages.</summary>
internal static class AnalyticAssert
{
    public static void RelativelyClose(double expected, double actual, double relativeTolerance, string what)
    {
        double error = Math.Abs(actual - expected) / Math.Abs(expected);
        Assert.True(
            error <= relativeTolerance,
            string.Create(
                CultureInfo.InvariantCulture,
                $"{what}: expected {expected:R}, got {actual:R}, relative error {error:G3} > {relativeTolerance:G3}"));
    }

    public static void AbsolutelyClose(double expected, double actual, double absoluteTolerance, string what)
    {
        double error = Math.Abs(actual - expected);
        Assert.True(
            error <= absoluteTolerance,
            string.Create(
                CultureInfo.InvariantCulture,
                $"{what}: expected {expected:R}, got {actual:R}, error {error:G3} > {absoluteTolerance:G3}"));
    }
}
