namespace Layers.Core.Results;

/// <summary>
/// How accurate a run's key figures are: the promise, the floor, the error estimate of every figure and the solves
/// that made it (docs/numerics.md, "The accuracy promise").
/// </summary>
/// <param name="Accuracy">The relative accuracy promised for every figure above its floor.</param>
/// <param name="NegligibleAmountPerArea">The floor for amounts, kg/m2; the floors of other figures derive from it.</param>
/// <param name="Figures">Every key figure with its estimated error, in summary.json order; empty when unavailable.</param>
/// <param name="Solves">The solves made, coarsest first, the last being the one reported.</param>
/// <param name="Unavailable">Why no estimate could be made (the comparison solve failed), or null.</param>
public sealed record NumericalErrorSummary(
    double Accuracy,
    double NegligibleAmountPerArea,
    IReadOnlyList<FigureError> Figures,
    IReadOnlyList<SolveRecord> Solves,
    string? Unavailable)
{
    /// <summary>
    /// Why the refinement stopped while figures still miss the accuracy, in words (its work limit, a refinement that
    /// did not pay, a mesh the case fixes, a finer solve that failed); null when nothing misses it.
    /// </summary>
    public string? RefinementStopped { get; init; }

    /// <summary>The figures above their floor whose estimated error exceeds the accuracy.</summary>
    public IReadOnlyList<FigureError> AboveAccuracy => [.. Figures.Where(figure => figure.Exceeds(Accuracy))];

    /// <summary>The largest estimated relative error over the figures above their floor, or null when there are none.</summary>
    public double? WorstRelativeError =>
        Figures.Where(figure => !figure.Figure.IsNegligible).Select(figure => (double?)figure.RelativeError).Max();

    /// <summary>True when an estimate was made and every figure above its floor meets the accuracy.</summary>
    public bool MeetsAccuracy => Unavailable is null && AboveAccuracy.Count == 0;
}
