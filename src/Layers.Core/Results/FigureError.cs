namespace Layers.Core.Results;

/// <summary>A key figure with the estimate of its numerical error.</summary>
/// <param name="Figure">The figure as reported.</param>
/// <param name="EstimatedError">Estimated absolute error, in the figure's unit.</param>
public sealed record FigureError(KeyFigure Figure, double EstimatedError)
{
    /// <summary>The estimate over the figure's magnitude (infinite for a zero figure with an error).</summary>
    public double RelativeError => EstimatedError == 0 ? 0 : EstimatedError / Math.Abs(Figure.Value);

    /// <summary>True when the figure is above its floor and its estimated error exceeds the accuracy times its value.</summary>
    public bool Exceeds(double accuracy) => !Figure.IsNegligible && EstimatedError > accuracy * Math.Abs(Figure.Value);
}
