using Layers.Core.Laplace;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// The times to levels read off the exact solution: on f(t) = 1 - e^(-t/tau), whose level x is reached at
/// t = -tau ln(1 - x) (elementary; no source needed), with and without values known beforehand, and a quantity that
/// falls through its level.
/// </summary>
public sealed class FirstCrossingsTests
{
    private const double Tau = 3.7e5;

    private static double Rising(double time) => 1 - Math.Exp(-time / Tau);

    [Fact]
    public void Each_level_is_found_where_the_closed_form_puts_it()
    {
        var times = FirstCrossings.Find(Rising, [0.5, 0.9, 0.99], 100 * Tau);

        Tolerance.Relative(Tau * Math.Log(2), times[0]!.Value, 1e-9, "time to 50 %");
        Tolerance.Relative(Tau * Math.Log(10), times[1]!.Value, 1e-9, "time to 90 %");
        Tolerance.Relative(Tau * Math.Log(100), times[2]!.Value, 1e-9, "time to 99 %");
    }

    [Fact]
    public void Known_values_serve_as_the_scan_and_a_level_out_of_reach_is_null()
    {
        var known = Enumerable.Range(0, 101).Select(i => 1e-4 * Tau * Math.Pow(10, i / 25.0)).Select(time => (time, Rising(time))).ToList();

        var times = FirstCrossings.Find(Rising, [0.5, 0.999999999999], 2 * Tau, known);

        Tolerance.Relative(Tau * Math.Log(2), times[0]!.Value, 1e-9, "time to 50 % from the known values");
        Assert.Null(times[1]);
    }

    [Fact]
    public void A_level_reached_before_the_scan_is_bracketed_below_it()
    {
        var times = FirstCrossings.Find(Rising, [1e-15], 1e3 * Tau);

        Tolerance.Relative(Tau * 1e-15, times[0]!.Value, 1e-6, "a level met long before the scan starts");
    }

    [Fact]
    public void A_falling_quantity_crosses_its_level_downward()
    {
        var time = FirstCrossings.First(time => Math.Exp(-time / Tau), 0.25, 100 * Tau);

        Tolerance.Relative(Tau * Math.Log(4), time!.Value, 1e-9, "e^(-t/tau) down to 1/4");
    }
}
