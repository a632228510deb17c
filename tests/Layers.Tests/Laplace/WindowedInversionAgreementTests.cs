using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Tests.TestSupport;
using Xunit.Abstractions;

namespace Layers.Tests.Laplace;

/// <summary>
/// <see cref="LaplaceSolution.AtTimes"/> (hyperbolic contours, one per window of times) on seeded random three-layer
/// stacks with D over six decades, K over six, every kind of face and six report times over two and a half decades.
/// Reference: the same transforms inverted at round-off level (the window contours sized for 1e-15, 48 points), and
/// independently by <see cref="LaplaceSolution.At"/> on Talbot contours. Each contour's own accuracy is checked
/// against published inverses (<see cref="WindowedContourRoundTripTests"/>, <see cref="TalbotRoundTripTests"/>).
/// </summary>
public sealed class WindowedInversionAgreementTests(ITestOutputHelper output)
{
    // A figure that has fallen below a tenth of its largest value in the run keeps the contour error and the round-off
    // of that largest value (its largest terms in the contour sum), so it is held to 1e-8 of that value instead.
    private const double Settled = 0.1;

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    [InlineData(6)]
    [InlineData(7)]
    [InlineData(8)]
    [InlineData(9)]
    [InlineData(10)]
    [InlineData(11)]
    [InlineData(12)]
    public void Every_figure_at_six_times_is_within_1e_8(int seed)
    {
        var simulation = ThreeLayers(new Random(seed), out var times);
        var solution = LaplaceSolution.For(simulation);
        var windowed = solution.AtTimes(times).Select(Figures).ToArray();
        var reference = LaplaceSolution.For(simulation, 48).AtTimes(times).Select(Figures).ToArray();
        var talbot = times.Select(time => Figures(solution.At(time))).ToArray();

        var (own, ofLargest) = WorstDifference(reference, windowed);
        var (_, talbotOfLargest) = WorstDifference(reference, talbot);
        output.WriteLine(
            $"seed {seed}, {simulation.Left.KindName}/{simulation.Right.KindName}: windows {own:G3} of each figure, {ofLargest:G3} of its largest; Talbot {talbotOfLargest:G3} of its largest");
        Assert.True(own <= 1e-8, $"seed {seed}: a figure is off by {own:G3} of itself");
        Assert.True(ofLargest <= 1e-8, $"seed {seed}: a figure is off by {ofLargest:G3} of its largest value");

        // The independent inversion, whose 32 points reach a few 1e-8 on the fluxes of the earliest times.
        Assert.True(talbotOfLargest <= 5e-8, $"seed {seed}: the Talbot inversion is off by {talbotOfLargest:G3} of a figure's largest value");
    }

    [Fact]
    public void Times_come_back_in_the_order_given_with_repeats_and_time_zero()
    {
        var simulation = ThreeLayers(new Random(3), out var times);
        var solution = LaplaceSolution.For(simulation);
        double[] asked = [times[4], 0, times[1], times[4], times[0]];
        var snapshots = solution.AtTimes(asked);

        Assert.Equal(asked, snapshots.Select(snapshot => snapshot.TimeSeconds));
        Assert.Equal(Figures(snapshots[0]), Figures(snapshots[3]));
        Assert.Equal(simulation.Stack.Layers.Select(layer => layer.InitialMassPerArea), snapshots[1].LayerMassPerArea);

        Assert.Throws<ArgumentOutOfRangeException>(() => solution.AtTimes([1, -1]));
        Assert.Throws<ArgumentOutOfRangeException>(() => solution.AtTimes([double.NaN]));
    }

    private static (double Own, double OfLargest) WorstDifference(double[][] reference, double[][] other)
    {
        double own = 0, ofLargest = 0;
        for (var f = 0; f < reference[0].Length; f++)
        {
            var largest = reference.Max(row => Math.Abs(row[f]));
            if (largest == 0)
            {
                Assert.All(other, row => Assert.Equal(0, row[f]));
                continue;
            }

            for (var i = 0; i < reference.Length; i++)
            {
                var difference = Math.Abs(reference[i][f] - other[i][f]);
                ofLargest = Math.Max(ofLargest, difference / largest);
                if (Math.Abs(reference[i][f]) >= Settled * largest)
                {
                    own = Math.Max(own, difference / Math.Abs(reference[i][f]));
                }
            }
        }

        return (own, ofLargest);
    }

    internal static SimulationCase ThreeLayers(Random random, out double[] times)
    {
        var layers = new Layer[3];
        for (var j = 0; j < layers.Length; j++)
        {
            layers[j] = Cases.Layer($"L{j}", LogUniform(random, 1e-6, 1e-3), LogUniform(random, 1e-15, 1e-9), LogUniform(random, 1e-3, 1e3), random.NextDouble() < 0.5 ? 1000 * random.NextDouble() : 0);
        }

        var stack = new LayerStack(layers);
        var capacity = stack.Layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient);
        var slowest = stack.ResistanceSecondsPerMeter * capacity;
        times = [.. new[] { 3e-3, 0.01, 0.05, 0.2, 0.5, 1 }.Select(fraction => fraction * slowest)];

        FaceCondition Face()
        {
            double? film = random.NextDouble() < 0.5 ? null : LogUniform(random, 1e-2, 1e2) / stack.ResistanceSecondsPerMeter;
            return random.Next(3) switch
            {
                0 => Cases.Closed,
                1 => Cases.Bath(100 * random.NextDouble(), LogUniform(random, 1e-1, 1e1), film),
                _ => Cases.Compartment(LogUniform(random, 0.1, 10) * capacity, 1, 100 * random.NextDouble(), film) with
                {
                    RemovalRatePerSecond = random.NextDouble() < 0.5 ? 0 : LogUniform(random, 0.1, 10) / slowest,
                },
            };
        }

        return Cases.Make(Face(), Face(), times[^1], times, layers: layers);
    }

    internal static double[] Figures(LaplaceSnapshot snapshot)
    {
        var list = new List<double>();
        list.AddRange(snapshot.LayerMassPerArea);
        list.AddRange(snapshot.FluxAtInterfaces);
        list.AddRange(snapshot.ContinuousValueAtInterfaces);
        foreach (var face in new[] { snapshot.Left, snapshot.Right })
        {
            if (face is not null)
            {
                list.AddRange([face.TransferredIntoMediumPerArea, face.FluxIntoMediumKgPerSquareMeterSecond, face.ConcentrationKgPerCubicMeter, face.MediumMassPerArea ?? 0, face.RemovedPerArea]);
            }
        }

        return [.. list];
    }

    private static double LogUniform(Random random, double low, double high)
        => Math.Exp(Math.Log(low) + (random.NextDouble() * (Math.Log(high) - Math.Log(low))));
}
