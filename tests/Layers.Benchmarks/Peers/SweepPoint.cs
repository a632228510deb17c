namespace Layers.Benchmarks.Peers;

/// <summary>One setting of a method's ladder: its error against the method's own converged answer, its work, its time.</summary>
/// <param name="Setting">The setting (a relative tolerance, a number of contour points).</param>
/// <param name="AbsoluteScale">
/// For a tolerance, the absolute tolerance over (relative tolerance x largest |u|); null for contour points.
/// </param>
/// <param name="Error">Largest difference in the amount received over the report times, over the final amount.</param>
/// <param name="Work">Steps taken (accepted and rejected), or contour points times report times.</param>
/// <param name="BestSeconds">Best wall time of repeated warm runs, or null when the setting was not timed.</param>
public sealed record SweepPoint(double Setting, double? AbsoluteScale, double Error, int Work, double? BestSeconds);
