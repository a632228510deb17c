namespace Layers.Tests.TestSupport;

/// <summary>Relative-error assertions with a readable failure text.</summary>
internal static class Tolerance
{
    public static void Relative(double expected, double actual, double relative, string what)
    {
        var error = Math.Abs(actual - expected) / Math.Abs(expected);
        Assert.True(
            error <= relative,
            FormattableString.Invariant($"{what}: expected {expected:G8}, got {actual:G8}, relative error {error:G3} > {relative:G3}"));
    }

    public static double RelativeError(double expected, double actual) => Math.Abs(actual - expected) / Math.Abs(expected);
}
