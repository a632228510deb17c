namespace Layers.Core.Results;

/// <summary>One key figure as the run reported it beside the value of the method that checks it.</summary>
/// <param name="Figure">The figure as reported, with its estimated error.</param>
/// <param name="CheckValue">The checking method's value, in the same unit.</param>
public sealed record FigureComparison(FigureError Figure, double CheckValue)
{
    /// <summary>The checking method's own estimated error of its value (0 for the exact method, whose unreliable values are left out).</summary>
    public double CheckEstimatedError { get; init; }

    /// <summary>|reported - check| over |check| (infinite when the check's value is zero and the reported one is not).</summary>
    public double RelativeDifference => Figure.Figure.Value == CheckValue ? 0 : Math.Abs(Figure.Figure.Value - CheckValue) / Math.Abs(CheckValue);

    /// <summary>
    /// True when the two methods differ by more than the accuracy allows and by more than either method's estimated
    /// error says they may: a difference neither the promise nor the estimates account for.
    /// </summary>
    public bool Disagrees(double accuracy) =>
        Math.Abs(Figure.Figure.Value - CheckValue) > Math.Max(accuracy * Math.Abs(CheckValue), Math.Max(Figure.EstimatedError, CheckEstimatedError));
}
