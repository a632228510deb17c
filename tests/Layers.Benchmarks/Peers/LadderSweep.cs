namespace Layers.Benchmarks.Peers;

/// <summary>
/// Finds the cheapest setting of a ladder that meets a target: every setting is run once for its error, then the
/// <see cref="TimedPassing"/> coarsest settings within the target (per absolute-tolerance scale) are timed, and the
/// fastest of those is chosen (the coarsest is nearly always the cheapest, but a finer tolerance sometimes takes
/// fewer rejected steps). Within a scale, the settings finer than the last one timed are not run: they only cost more.
/// </summary>
public static class LadderSweep
{
    /// <summary>How many settings within the target are timed, per absolute-tolerance scale.</summary>
    public const int TimedPassing = 2;

    /// <summary>Runs the ladder; returns every point and the chosen one (null when no setting meets the target).</summary>
    /// <param name="problem">The problem (its target and the scale of its errors).</param>
    /// <param name="ladder">Settings, coarse to fine within each absolute-tolerance scale.</param>
    /// <param name="run">Solves at a setting: the amounts at the report times and the work.</param>
    /// <param name="reference">The method's own converged amounts.</param>
    public static (IReadOnlyList<SweepPoint> Points, SweepPoint? Chosen) Run(
        PeerProblem problem,
        IReadOnlyList<(double Setting, double? AbsoluteScale)> ladder,
        Func<double, double?, (double[] Received, int Work)> run,
        IReadOnlyList<double> reference)
    {
        ArgumentNullException.ThrowIfNull(problem);
        ArgumentNullException.ThrowIfNull(ladder);
        ArgumentNullException.ThrowIfNull(run);
        var points = new List<SweepPoint>();
        var timed = new Dictionary<double, int>();
        foreach (var (setting, absoluteScale) in ladder)
        {
            if (timed.GetValueOrDefault(absoluteScale ?? 0) >= TimedPassing)
            {
                continue;
            }

            var (received, work) = run(setting, absoluteScale);
            var error = problem.Error(received, reference);
            var group = absoluteScale ?? 0;
            double? seconds = null;
            if (error <= problem.TargetAccuracy)
            {
                seconds = Timing.Best(() => run(setting, absoluteScale));
                timed[group] = timed.GetValueOrDefault(group) + 1;
            }

            points.Add(new SweepPoint(setting, absoluteScale, error, work, seconds));
        }

        var chosen = points.Where(point => point.BestSeconds is not null).MinBy(point => point.BestSeconds);
        return (points, chosen);
    }
}
