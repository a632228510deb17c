namespace Layers.Core.Results;

/// <summary>
/// The run checked by a second, independent method: the exact solution in the Laplace domain, where the case allows
/// it (docs/numerics.md, "The independent check").
/// </summary>
/// <param name="NotApplicable">Why the exact method cannot serve the case, or null when it did.</param>
/// <param name="Accuracy">The case's accuracy, against which differences are judged.</param>
/// <param name="Figures">The key figures above their floor that the exact method gives reliably, with its values.</param>
public sealed record CrossCheckSummary(string? NotApplicable, double Accuracy, IReadOnlyList<FigureComparison> Figures)
{
    /// <summary>The largest relative difference between the methods, or null when nothing was compared.</summary>
    public double? LargestRelativeDifference => Figures.Select(figure => (double?)figure.RelativeDifference).Max();

    /// <summary>The figures the two methods disagree on beyond the accuracy and the estimate.</summary>
    public IReadOnlyList<FigureComparison> Disagreements => [.. Figures.Where(figure => figure.Disagrees(Accuracy))];
}
