namespace Layers.Core.Results;

/// <summary>One key figure as the finite volumes reported it beside the exact method's value.</summary>
/// <param name="Figure">The figure as reported, with its estimated error.</param>
/// <param name="Exact">The exact method's value, in the same unit.</param>
public sealed record FigureComparison(FigureError Figure, double Exact)
{
    /// <summary>|reported - exact| over |exact| (infinite when the exact value is zero and the reported one is not).</summary>
    public double RelativeDifference => Figure.Figure.Value == Exact ? 0 : Math.Abs(Figure.Figure.Value - Exact) / Math.Abs(Exact);

    /// <summary>
    /// True when the two methods differ by more than the accuracy allows and by more than the figure's own estimated
    /// error says they may: a difference neither the promise nor the estimate accounts for.
    /// </summary>
    public bool Disagrees(double accuracy) =>
        Math.Abs(Figure.Figure.Value - Exact) > Math.Max(accuracy * Math.Abs(Exact), Figure.EstimatedError);
}
