using Layers.Core.Studies;

namespace Layers.Core.Batch;

/// <summary>
/// The figure of one period of a schedule that a sweep plots, and its value in one sub-case: a batch summary has no
/// column per period, so the sub-case's row carries it (and summary.json keeps it, for <c>layers merge</c>).
/// </summary>
/// <param name="Measure">Which figure, in which period (the last when it names none).</param>
/// <param name="ValueSi">Its value, SI; null when the run does not define it (no period of that label).</param>
public sealed record PeriodFigureValue(ResultMeasure Measure, double? ValueSi);
