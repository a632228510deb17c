using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Laplace;

namespace Layers.Benchmarks.Peers;

/// <summary>
/// One benchmark case at one target accuracy, as the three methods of the stiff-peer comparison see it: the case with
/// six report times, its finite-volume system on the mesh that <c>numerics.accuracy</c> = target gives it (the same
/// equations for our TR-BDF2 and for the general-purpose integrators), and the exact amount received on the right at
/// those times from the Laplace-domain method at <see cref="ExactContourPoints"/> contour points.
/// </summary>
/// <param name="Name">Case name (cases/NAME.json).</param>
/// <param name="TargetAccuracy">Relative accuracy each method must reach on the amount received.</param>
/// <param name="Case">The case, with report times at 1/10, 2/10, 4/10, 6/10, 8/10 and 10/10 of the duration.</param>
/// <param name="Model">Mesh, system Cap du/dt = s - A u and u(0).</param>
/// <param name="ExactKgPerSquareMeter">Amount received by the right medium at the report times, exact method.</param>
public sealed record PeerProblem(
    string Name,
    double TargetAccuracy,
    SimulationCase Case,
    DiscreteModel Model,
    IReadOnlyList<double> ExactKgPerSquareMeter)
{
    /// <summary>Contour points of the exact answer every setting of the Laplace method is judged against.</summary>
    public const int ExactContourPoints = 48;

    /// <summary>The cases compared: a laminate into a compartment, a membrane between two baths, the stiff stack.</summary>
    public static IReadOnlyList<string> CaseNames { get; } = ["laminate", "membrane", "stiff-stack"];

    /// <summary>The target accuracies of the comparison.</summary>
    public static IReadOnlyList<double> Targets { get; } = [1e-4, 1e-6];

    /// <summary>The amount errors are divided by: the largest exact amount over the report times (the final one).</summary>
    public double ScaleKgPerSquareMeter => ExactKgPerSquareMeter.Max(Math.Abs);

    /// <summary>Reads the case, builds its system on the mesh of the target, and computes the exact amounts.</summary>
    public static PeerProblem Create(string name, double target)
    {
        var loaded = BenchmarkCases.Load(name);
        var simulation = loaded with
        {
            ReportTimesSeconds = [.. AccuracyProblem.ReportFractions.Select(fraction => fraction * loaded.DurationSeconds)],
            Numerics = NumericsSettings.ForAccuracy(target),
        };
        var model = DiscreteModel.Build(simulation);
        var exact = LaplaceRuns.Received(simulation, ExactContourPoints);
        return new PeerProblem(name, target, simulation, model, exact);
    }

    /// <summary>Largest difference from a reference over the report times, divided by <see cref="ScaleKgPerSquareMeter"/>.</summary>
    public double Error(IReadOnlyList<double> received, IReadOnlyList<double> reference)
    {
        ArgumentNullException.ThrowIfNull(received);
        ArgumentNullException.ThrowIfNull(reference);
        var worst = 0.0;
        for (var i = 0; i < received.Count; i++)
        {
            worst = Math.Max(worst, Math.Abs(received[i] - reference[i]));
        }

        return worst / ScaleKgPerSquareMeter;
    }
}
