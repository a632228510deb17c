using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;
using MathNet.Numerics.LinearAlgebra;

namespace Layers.Tests.Numerics;

/// <summary>The Thomas solve of Cap + cA against a dense LU solve by Math.NET Numerics (an outside reference).</summary>
public sealed class ImplicitMatrixTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void Tridiagonal_solve_matches_a_dense_solve(int seed)
    {
        var random = new Random(seed);
        var system = SmallMixedSystem.Build();
        var coefficient = 10 * random.NextDouble();
        var rightHandSide = Enumerable.Range(0, system.NodeCount).Select(_ => random.NextDouble()).ToArray();
        var matrix = new ImplicitMatrix(system);
        matrix.Factor(coefficient);
        var solution = new double[system.NodeCount];

        matrix.Solve(rightHandSide, solution);

        var dense = Matrix<double>.Build.Dense(system.NodeCount, system.NodeCount);
        for (var n = 0; n < system.NodeCount; n++)
        {
            dense[n, n] += system.Capacity[n];
            if (n < system.NodeCount - 1)
            {
                var g = coefficient * system.Conductance[n];
                dense[n, n] += g;
                dense[n + 1, n + 1] += g;
                dense[n, n + 1] -= g;
                dense[n + 1, n] -= g;
            }
        }

        dense[0, 0] += coefficient * system.LeftBath.Conductance;
        dense[system.NodeCount - 1, system.NodeCount - 1] += coefficient * system.RightBath.Conductance;
        var expected = dense.Solve(Vector<double>.Build.DenseOfArray(rightHandSide));
        for (var n = 0; n < system.NodeCount; n++)
        {
            Tolerance.Relative(expected[n], solution[n], 1e-10, $"node {n}");
        }
    }
}
