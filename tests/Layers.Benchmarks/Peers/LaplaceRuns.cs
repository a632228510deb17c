using Layers.Core.Domain;
using Layers.Core.Laplace;

namespace Layers.Benchmarks.Peers;

/// <summary>The Laplace-domain method as the comparison runs it: the solution built, then one inversion per report time.</summary>
public static class LaplaceRuns
{
    /// <summary>Contour point counts tried, coarse to fine.</summary>
    public static IReadOnlyList<int> Ladder { get; } = [8, 10, 12, 14, 16, 18, 20, 24, 28, 32, 40];

    /// <summary>Amount received by the right medium at each report time, kg/m2.</summary>
    public static double[] Received(SimulationCase simulation, int contourPoints)
    {
        var solution = LaplaceSolution.For(simulation, contourPoints);
        var times = simulation.ReportTimesSeconds;
        var received = new double[times.Count];
        for (var i = 0; i < times.Count; i++)
        {
            received[i] = solution.At(times[i]).Face(Side.Right)!.TransferredIntoMediumPerArea;
        }

        return received;
    }
}
