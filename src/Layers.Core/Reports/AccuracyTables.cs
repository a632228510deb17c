using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// What the console and the report say about a run's numerical error: one line among the key figures, and a table of
/// the figures whose estimated error exceeds the accuracy, shown only when there are any.
/// </summary>
public static class AccuracyTables
{
    /// <summary>Most figures the table lists; summary.json lists them all.</summary>
    public const int MostRows = 12;

    /// <summary>The key-figures line: the promise and whether the run keeps it.</summary>
    public static string Summary(NumericalErrorSummary error)
    {
        ArgumentNullException.ThrowIfNull(error);
        var accuracy = error.Accuracy.ToString("0.#e0", CultureInfo.InvariantCulture);
        if (error.Unavailable is { } reason)
        {
            return $"no estimate: {reason}";
        }

        var worst = error.WorstRelativeError is { } value ? $"worst estimate {Relative(value)}" : "no figure above the floor";
        var above = error.AboveAccuracy.Count;
        return above == 0
            ? $"within {accuracy} ({worst})"
            : $"{above} figure{(above == 1 ? string.Empty : "s")} above {accuracy} ({worst}; see below)";
    }

    /// <summary>The key-figures line of the method: which one solved the case, and why.</summary>
    public static string Method(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var method = result.Method == SolutionMethod.Laplace ? "exact, in the Laplace domain" : "finite volumes";
        return result.MethodReason.Length == 0 ? method : $"{method} ({result.MethodReason})";
    }

    /// <summary>The key-figures line of the independent check: how far the exact method and the run agree, or why it did not apply.</summary>
    public static string CrossCheck(CrossCheckSummary check)
    {
        ArgumentNullException.ThrowIfNull(check);
        if (check.NotApplicable is { } reason)
        {
            return $"not applicable: {reason}";
        }

        if (check.LargestRelativeDifference is not { } largest)
        {
            return "no figure above the floor to compare";
        }

        var disagreements = check.Disagreements.Count;
        var other = check.CheckedBy == SolutionMethod.FiniteVolume ? "the finite volumes" : "the exact method";
        return disagreements == 0
            ? $"{other} {(check.CheckedBy == SolutionMethod.FiniteVolume ? "agree" : "agrees")} to {Relative(largest)} over {check.Figures.Count} figures"
            : $"{disagreements} of {check.Figures.Count} figures differ from {other} by more than the accuracy and the estimates (largest {Relative(largest)}; summary.json crossCheck)";
    }

    /// <summary>The figures whose estimated error exceeds the accuracy, worst first; null when there are none.</summary>
    public static TextTable? Shortfalls(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.NumericalError is not { } error || error.AboveAccuracy.Count == 0)
        {
            return null;
        }

        var format = new DisplayFormat(result.Case.Display);
        var rows = error.AboveAccuracy
            .OrderByDescending(figure => figure.RelativeError)
            .Take(MostRows)
            .Select(figure => (IReadOnlyList<string>)
            [
                figure.Figure.What + (figure.Figure.AtSeconds is { } at ? " at " + format.Time(at) : string.Empty),
                Value(figure.Figure, format, result.Case),
                double.IsFinite(figure.RelativeError) ? Relative(figure.RelativeError) : "unknown",
            ])
            .ToList();
        var title = $"Estimated numerical error above the accuracy {error.Accuracy.ToString("0.#e0", CultureInfo.InvariantCulture)}"
            + (error.AboveAccuracy.Count > MostRows ? $" ({MostRows} worst of {error.AboveAccuracy.Count}; all in summary.json)" : string.Empty);
        if (error.RefinementStopped is { } stopped)
        {
            title += $"; refinement stopped: {stopped}";
        }

        return new TextTable(title, ["figure", "value", "estimated error"], rows);
    }

    /// <summary>A relative error as a percentage with two significant digits, e.g. "0.033 %".</summary>
    private static string Relative(double fraction) => (100 * fraction).ToString("G2", CultureInfo.InvariantCulture) + " %";

    // A face medium's concentration is shown as the other tables show it: mg/kg of a food of known density.
    private static string Value(KeyFigure figure, DisplayFormat format, SimulationCase simulation) => figure.Kind switch
    {
        FigureKind.Amount => format.MassPerArea(figure.Value),
        FigureKind.Concentration when figure.Path.EndsWith("KgPerKg", StringComparison.Ordinal) =>
            (figure.Value * 1e6).ToString("G4", CultureInfo.InvariantCulture) + " mg/kg",
        FigureKind.Concentration when figure.Path.StartsWith("$.faces.left.", StringComparison.Ordinal) => format.MediumConcentration(figure.Value, simulation.Left),
        FigureKind.Concentration when figure.Path.StartsWith("$.faces.right.", StringComparison.Ordinal) => format.MediumConcentration(figure.Value, simulation.Right),
        FigureKind.Concentration => format.Concentration(figure.Value),
        FigureKind.Flux => format.Flux(figure.Value),
        FigureKind.Time => format.Time(figure.Value),
    };
}
