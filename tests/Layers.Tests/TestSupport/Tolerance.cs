using System.Globalization;

namespace Layers.Tests.TestSupport;

/// <summary>Relative- and absolute-error assertions with a readable, culture-independent failure text.</summary>
internal static class Tolerance
{
    public static void Relative(double expected, double actual, double relative, string what)
    {
        var error = Math.Abs(actual - expected) / Math.Abs(expected);
        Assert.True(
            error <= relative,
            string.Create(CultureInfo.InvariantCulture, $"{what}: expected {expected:R}, got {actual:R}, relative error {error:G3} > {relative:G3}"));
    }

    public static void Absolute(double expected, double actual, double absolute, string what)
    {
        var error = Math.Abs(actual - expected);
        Assert.True(
            error <= absolute,
            string.Create(CultureInfo.InvariantCulture, $"{what}: expected {expected:R}, got {actual:R}, error {error:G3} > {absolute:G3}"));
    }

    public static double RelativeError(double expected, double actual) => Math.Abs(actual - expected) / Math.Abs(expected);
}
