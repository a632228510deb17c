using System.Runtime.CompilerServices;

namespace Layers.Core.Analytics;

/// <summary>Argument checks shared by the analytic reference solutions.</summary>
/// <remarks>
/// The reference solutions are used to judge the numerical solver, so a NaN or infinite input must fail loudly
/// instead of producing a plausible-looking number that a comparison could accept.
/// </remarks>
internal static class AnalyticArguments
{
    internal static void RequirePositive(double value, [CallerArgumentExpression(nameof(value))] string? name = null)
    {
        if (!(value > 0) || double.IsPositiveInfinity(value))
        {
            throw new ArgumentOutOfRangeException(name, value, "Must be a finite number greater than zero.");
        }
    }

    internal static void RequireNonNegative(double value, [CallerArgumentExpression(nameof(value))] string? name = null)
    {
        if (!(value >= 0) || double.IsPositiveInfinity(value))
        {
            throw new ArgumentOutOfRangeException(name, value, "Must be a finite number not less than zero.");
        }
    }

    internal static void RequireFinite(double value, [CallerArgumentExpression(nameof(value))] string? name = null)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(name, value, "Must be a finite number.");
        }
    }
}
