using Layers.Core.Discretization;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;
using MathNet.Numerics.LinearAlgebra;

namespace Layers.Tests.Numerics;

/// <summary>
/// The linear TR-BDF2 step, whose solves are fused with the right-hand sides, residuals and error estimate, against
/// the same step written out with dense matrices and solved by Math.NET Numerics' LU (an outside reference). The
/// step: Bank et al., IEEE Trans. Electron Devices 32 (1985) 1992, with gamma = 2 - sqrt(2); the error estimate: Hosea
/// and Shampine, Appl. Numer. Math. 20 (1996) 21 (from memory: the filtered combination of the three stage rates).
/// </summary>
public sealed class LinearStepTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void Fused_step_matches_the_stage_equations_solved_densely(int seed)
    {
        var random = new Random(seed);
        var system = SmallMixedSystem.Build();
        var count = system.NodeCount;
        var start = Enumerable.Range(0, count).Select(_ => random.NextDouble()).ToArray();
        var step = 100 * random.NextDouble();
        var weights = new ErrorWeights(1e-3, 1e-3);
        var next = new double[count];

        var trial = new TrBdf2Stepper(system).Try(start, step, next, weights);
        var stepper = new TrBdf2Stepper(system);
        stepper.Try(start, step, new double[count], weights);
        var stage = stepper.Stage.ToArray();

        var (expectedStage, expectedNext, expectedError) = DenseStep(system, start, step, weights);
        for (var n = 0; n < count; n++)
        {
            Tolerance.Relative(expectedStage[n], stage[n], 1e-10, $"stage value at node {n}");
            Tolerance.Relative(expectedNext[n], next[n], 1e-10, $"end value at node {n}");
        }

        Tolerance.Relative(expectedError, trial.NormalisedError, 1e-8, "normalised error");
    }

    private static (Vector<double> Stage, Vector<double> End, double Error) DenseStep(
        DiffusionSystem system, double[] start, double step, ErrorWeights weights)
    {
        var count = system.NodeCount;
        var gamma = 2 - Math.Sqrt(2);
        var c = gamma * step / 2;
        var a = Matrix<double>.Build.Dense(count, count);
        for (var n = 0; n < count - 1; n++)
        {
            var g = system.Conductance[n];
            a[n, n] += g;
            a[n + 1, n + 1] += g;
            a[n, n + 1] -= g;
            a[n + 1, n] -= g;
        }

        a[0, 0] += system.LeftBath.Conductance;
        a[count - 1, count - 1] += system.RightBath.Conductance;
        var source = Vector<double>.Build.Dense(count);
        source[0] += system.LeftBath.Conductance * system.LeftBath.BathValue;
        source[count - 1] += system.RightBath.Conductance * system.RightBath.BathValue;
        var capacity = Matrix<double>.Build.Diagonal(system.Capacity);
        var matrix = capacity + (c * a);
        var u0 = Vector<double>.Build.DenseOfArray(start);
        Vector<double> Rate(Vector<double> u) => source - (a * u);

        var stage = matrix.Solve((capacity * u0) + (c * Rate(u0)) + (c * source));
        var weightOfStage = 1 / (gamma * (2 - gamma));
        var weightOfStart = (1 - gamma) * (1 - gamma) / (gamma * (2 - gamma));
        var end = matrix.Solve((capacity * ((weightOfStage * stage) - (weightOfStart * u0))) + (c * source));

        var k = ((-3 * gamma * gamma) + (4 * gamma) - 2) / (12 * (2 - gamma));
        var combined = 2 * k * step * ((Rate(u0) / gamma) - (Rate(stage) / (gamma * (1 - gamma))) + (Rate(end) / (1 - gamma)));
        var error = matrix.Solve(combined);
        var worst = 0.0;
        for (var n = 0; n < count; n++)
        {
            var tolerance = weights.Absolute + (weights.Relative * Math.Max(Math.Abs(u0[n]), Math.Abs(end[n])));
            worst = Math.Max(worst, Math.Abs(error[n]) / tolerance);
        }

        return (stage, end, worst);
    }
}
