using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Benchmarks.Reference;

/// <summary>
/// The plain way to solve the same equations, kept only to show what the tool gains: cells of equal width in each
/// layer and fixed backward-Euler steps, (Cap + dt A) u_n+1 = Cap u_n + dt s, solved by the Thomas algorithm.
/// </summary>
/// <remarks>
/// The physics is the tool's own: the system Cap du/dt = s - A u comes from <see cref="DiffusionSystemBuilder"/>
/// (u = c/K continuous, the series-resistance face law, compartments as end nodes), so any difference in the
/// results is the discretisation's alone. Backward Euler is first order in time and the uniform cell-centred mesh
/// second order in space. Not part of the tool; the tests and benchmarks use it.
/// </remarks>
public static class PlainReference
{
    /// <summary>
    /// Mesh settings for cells of equal width within each layer. Faces must fall on the interfaces, so one width
    /// for the whole stack is not possible in general; every layer gets at least totalCells / layerCount cells
    /// (and at least four), which spares a thin layer the starvation a plain mesh would give it.
    /// </summary>
    /// <param name="totalCells">Target number of cells over the stack.</param>
    /// <param name="layerCount">Number of layers.</param>
    public static CellCountMesh UniformGrid(int totalCells, int layerCount) => new(totalCells)
    {
        MinimumCellsPerLayer = Math.Max(4, Math.Min(totalCells / Math.Max(1, layerCount), 10_000)),
        GradingRatio = 1,
    };

    /// <summary>
    /// Solves the case on a uniform mesh with <paramref name="steps"/> equal steps over its duration and returns the
    /// mass per contact area received by the right face medium at each report time.
    /// </summary>
    /// <param name="simulation">The case; its report times must fall on the step boundaries.</param>
    /// <param name="totalCells">Target number of cells.</param>
    /// <param name="steps">Number of equal backward-Euler steps over the duration.</param>
    /// <returns>Mass per area received on the right at each report time, kg/m2 (0 for a closed face).</returns>
    public static double[] ReceivedOnTheRight(SimulationCase simulation, int totalCells, int steps)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        ArgumentOutOfRangeException.ThrowIfLessThan(steps, 1);
        var grid = GridBuilder.Build(simulation.Stack, UniformGrid(totalCells, simulation.Stack.Count));
        var (system, initial) = DiffusionSystemBuilder.Build(simulation, grid);
        var step = simulation.DurationSeconds / steps;
        var reportSteps = simulation.ReportTimesSeconds.Select(time => StepIndex(time, step)).ToArray();

        var n = system.NodeCount;
        var last = n - 1;
        var factors = new TridiagonalFactors(system, step);
        var u = (double[])initial.Clone();
        var rhs = new double[n];
        var received = new double[reportSteps.Length];
        var bathIntake = 0.0;
        var next = 0;
        for (var k = 1; k <= steps && next < reportSteps.Length; k++)
        {
            for (var i = 0; i < n; i++)
            {
                rhs[i] = system.Capacity[i] * u[i];
            }

            rhs[0] += step * system.LeftBath.Conductance * system.LeftBath.BathValue;
            rhs[last] += step * system.RightBath.Conductance * system.RightBath.BathValue;
            factors.Solve(rhs, u);
            // Backward Euler's flux is the one at the end of the step, so the bath's intake closes the discrete mass
            // balance exactly.
            bathIntake -= step * system.RightBath.InflowRate(u[last]);
            while (next < reportSteps.Length && reportSteps[next] == k)
            {
                received[next++] = simulation.Right is CompartmentFace
                    ? system.Capacity[last] * (u[last] - initial[last])
                    : bathIntake;
            }
        }

        return received;
    }

    private static int StepIndex(double time, double step)
    {
        var index = (int)Math.Round(time / step);
        if (Math.Abs((index * step) - time) > 1e-9 * time || index < 1)
        {
            throw new ArgumentException($"report time {time} s is not a whole number of steps of {step} s");
        }

        return index;
    }

    /// <summary>Cap + dt A factored once by the Thomas algorithm; it is symmetric and diagonally dominant.</summary>
    private sealed class TridiagonalFactors
    {
        private readonly double[] _lower;
        private readonly double[] _upperOverPivot;
        private readonly double[] _inversePivot;

        public TridiagonalFactors(DiffusionSystem system, double step)
        {
            var n = system.NodeCount;
            _lower = new double[n];
            _upperOverPivot = new double[n];
            _inversePivot = new double[n];
            var previous = 0.0;
            for (var i = 0; i < n; i++)
            {
                var toLeft = i > 0 ? system.Conductance[i - 1] : system.LeftBath.Conductance;
                var toRight = i < n - 1 ? system.Conductance[i] : system.RightBath.Conductance;
                _lower[i] = i > 0 ? -step * system.Conductance[i - 1] : 0;
                var upper = i < n - 1 ? -step * system.Conductance[i] : 0;
                var pivot = system.Capacity[i] + (step * (toLeft + toRight)) - (_lower[i] * previous);
                _inversePivot[i] = 1 / pivot;
                _upperOverPivot[i] = upper / pivot;
                previous = _upperOverPivot[i];
            }
        }

        public void Solve(double[] rhs, double[] solution)
        {
            var previous = 0.0;
            for (var i = 0; i < rhs.Length; i++)
            {
                previous = (rhs[i] - (_lower[i] * previous)) * _inversePivot[i];
                solution[i] = previous;
            }

            for (var i = rhs.Length - 2; i >= 0; i--)
            {
                solution[i] -= _upperOverPivot[i] * solution[i + 1];
            }
        }
    }
}
