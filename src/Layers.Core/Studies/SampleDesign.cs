using MathNet.Numerics.Random;

namespace Layers.Core.Studies;

/// <summary>How the probabilities of an uncertainty study are drawn.</summary>
public enum SamplingMethod
{
    /// <summary>Independent random probabilities (plain Monte Carlo).</summary>
    Random,

    /// <summary>
    /// Latin hypercube: for each input the N probabilities fall one in each of the N equal strata of (0, 1), in a
    /// random order per input, so every marginal is covered evenly even for small N.
    /// </summary>
    LatinHypercube,
}

/// <summary>
/// Draws the probabilities of all samples before any run, from one Mersenne Twister (Math.NET Numerics) seeded by
/// the study's seed, in a fixed order. The samples therefore depend only on the seed, the count and the method,
/// never on how many runs go at once or in which order they finish.
/// </summary>
public static class SampleDesign
{
    /// <summary>Probabilities in (0, 1), one row per sample and one column per input.</summary>
    public static double[][] Draw(int samples, int inputs, SamplingMethod method, int seed)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(samples, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(inputs, 1);
        var random = new MersenneTwister(seed, threadSafe: false);
        var rows = Enumerable.Range(0, samples).Select(_ => new double[inputs]).ToArray();
        for (var column = 0; column < inputs; column++)
        {
            var strata = method == SamplingMethod.LatinHypercube ? Permutation(samples, random) : null;
            for (var row = 0; row < samples; row++)
            {
                var draw = OpenUnit(random);
                rows[row][column] = strata is null ? draw : (strata[row] + draw) / samples;
            }
        }

        return rows;
    }

    /// <summary>A uniform draw in (0, 1): the generator's [0, 1) without its zero, where a quantile is infinite.</summary>
    private static double OpenUnit(MersenneTwister random)
    {
        double draw;
        do
        {
            draw = random.NextDouble();
        }
        while (draw <= 0);
        return draw;
    }

    /// <summary>A random order of 0..n-1 (Fisher-Yates).</summary>
    private static int[] Permutation(int count, MersenneTwister random)
    {
        var order = Enumerable.Range(0, count).ToArray();
        for (var i = count - 1; i > 0; i--)
        {
            var j = random.Next(i + 1);
            (order[i], order[j]) = (order[j], order[i]);
        }

        return order;
    }
}
