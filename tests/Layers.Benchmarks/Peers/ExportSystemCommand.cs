using System.Globalization;

namespace Layers.Benchmarks.Peers;

/// <summary>
/// The export-system command: for each case and target accuracy of the stiff-peer comparison, sweeps our TR-BDF2
/// (relative tolerance, on the fixed mesh of the target) and the Laplace-domain method (contour points), times the
/// cheapest setting of each that meets the target, and writes the system with those results as CASE-TARGET.json for
/// tests/benchmarks/stiff-peers/peers.py, which solves the same equations with general-purpose stiff integrators.
/// </summary>
public static class ExportSystemCommand
{
    /// <summary>Runs the sweeps and writes one file per case and target into <paramref name="folder"/>.</summary>
    public static int Run(string folder, TextWriter log)
    {
        ArgumentNullException.ThrowIfNull(log);
        Directory.CreateDirectory(folder);

        // Both methods run for a while before anything is timed, so that no timing sees the compiler's first tier.
        var warm = PeerProblem.Create(PeerProblem.CaseNames[0], PeerProblem.Targets[0]);
        Timing.Best(() => TrBdf2Runs.Received(warm, 1e-4, TrBdf2Runs.AbsoluteScales[0]));
        Timing.Best(() => LaplaceRuns.Received(warm.Case, 16));
        foreach (var name in PeerProblem.CaseNames)
        {
            foreach (var target in PeerProblem.Targets)
            {
                var problem = PeerProblem.Create(name, target);
                var (reference, _) = TrBdf2Runs.Received(problem, TrBdf2Runs.ReferenceTolerance, TrBdf2Runs.ReferenceAbsoluteScale);
                var trBdf2 = LadderSweep.Run(problem, TrBdf2Runs.Ladder, (rtol, scale) => TrBdf2Runs.Received(problem, rtol, scale!.Value), reference);
                var laplace = LadderSweep.Run(
                    problem,
                    [.. LaplaceRuns.Ladder.Select(points => ((double)points, (double?)null))],
                    (points, _) => (LaplaceRuns.Received(problem.Case, (int)points), (int)points * problem.Case.ReportTimesSeconds.Count),
                    problem.ExactKgPerSquareMeter);
                var file = Path.Combine(folder, Invariant($"{name}-{target:0e0}.json"));
                SystemJson.Write(file, problem, (reference, trBdf2.Points, trBdf2.Chosen), laplace);
                log.WriteLine(Invariant(
                    $"{name}, target {target:0e0}, {problem.Model.Grid.CellCount} cells: TR-BDF2 {Describe(trBdf2.Chosen, "rtol")}; Laplace {Describe(laplace.Chosen, "points")}; TR-BDF2 at rtol {TrBdf2Runs.ReferenceTolerance:0e0} against exact {problem.Error(reference, problem.ExactKgPerSquareMeter):0.0e0}"));
            }
        }

        log.WriteLine($"wrote the systems to {Path.GetFullPath(folder)}");
        return 0;
    }

    private static string Describe(SweepPoint? chosen, string setting) => chosen is null
        ? "no setting meets the target"
        : Invariant($"{setting} {(chosen.AbsoluteScale is { } scale ? Invariant($"{chosen.Setting:0e0} atol scale {scale:0e0}") : Invariant($"{chosen.Setting:0}"))}, error {chosen.Error:0.0e0}, {chosen.BestSeconds * 1e3:0.000} ms");

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
