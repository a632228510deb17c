using Layers.Core.Domain;

namespace Layers.Core.Results;

/// <summary>
/// The run checked by a second, independent method (docs/numerics.md, "The independent check"): a run of the finite
/// volumes by the exact solution in the Laplace domain, where the case allows it; a run of the exact method by the
/// finite volumes.
/// </summary>
/// <param name="NotApplicable">Why the checking method could not check the case, or null when it did.</param>
/// <param name="Accuracy">The case's accuracy, against which differences are judged.</param>
/// <param name="Figures">The key figures above their floor that the checking method gives reliably, with its values.</param>
public sealed record CrossCheckSummary(string? NotApplicable, double Accuracy, IReadOnlyList<FigureComparison> Figures)
{
    /// <summary>The method that checked the run: the exact method (the default) or the finite volumes.</summary>
    public SolutionMethod CheckedBy { get; init; } = SolutionMethod.Laplace;

    /// <summary>The largest relative difference between the methods, or null when nothing was compared.</summary>
    public double? LargestRelativeDifference => Figures.Select(figure => (double?)figure.RelativeDifference).Max();

    /// <summary>The figures the two methods disagree on beyond the accuracy and the estimate.</summary>
    public IReadOnlyList<FigureComparison> Disagreements => [.. Figures.Where(figure => figure.Disagrees(Accuracy))];
}
