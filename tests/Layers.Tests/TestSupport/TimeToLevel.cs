namespace Layers.Tests.TestSupport;

/// <summary>A closed-form fraction that grows with time, solved for the time at which it reaches a level.</summary>
internal static class TimeToLevel
{
    /// <summary>The time in [0, <paramref name="latestSeconds"/>] at which <paramref name="fraction"/> reaches <paramref name="level"/>, by bisection.</summary>
    public static double Of(Func<double, double> fraction, double level, double latestSeconds)
    {
        double low = 0, high = latestSeconds;
        for (var i = 0; i < 200; i++)
        {
            var middle = 0.5 * (low + high);
            if (fraction(middle) < level)
            {
                low = middle;
            }
            else
            {
                high = middle;
            }
        }

        return 0.5 * (low + high);
    }
}
