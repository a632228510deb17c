using System.Globalization;
using System.Text;
using Layers.Core.Fitting;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// The text artefacts of a fit: fit-points.csv (each measurement beside the model), fit-curve.csv (the fitted
/// model at every output time), both in SI with the unit in every header, and the tables printed on the console.
/// </summary>
public static class FitTables
{
    /// <summary>fit-points.csv: time, measured, standard deviation (empty when none), model, residual, weighted residual.</summary>
    public static string PointsCsv(FitResult fit)
    {
        ArgumentNullException.ThrowIfNull(fit);
        var unit = SiUnit(fit);
        var text = new StringBuilder();
        text.Append(CsvText.Line(["time [s]", $"measured [{unit}]", $"standard deviation [{unit}]", $"model [{unit}]", $"residual [{unit}]", "weighted residual [-]"])).Append('\n');
        foreach (var point in fit.Points)
        {
            text.Append(CsvText.Line([
                CsvText.Number(point.TimeSeconds),
                CsvText.Number(point.Measured),
                point.Deviation is { } deviation ? CsvText.Number(deviation) : string.Empty,
                CsvText.Number(point.Model),
                CsvText.Number(point.Residual),
                point.Deviation is null ? string.Empty : CsvText.Number(point.WeightedResidual),
            ])).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>fit-curve.csv: the fitted model at every output time of its run.</summary>
    public static string CurveCsv(FitResult fit)
    {
        ArgumentNullException.ThrowIfNull(fit);
        var text = new StringBuilder();
        text.Append(CsvText.Line(["time [s]", $"model [{SiUnit(fit)}]"])).Append('\n');
        foreach (var (time, value) in fit.Curve)
        {
            text.Append(CsvText.Line([CsvText.Number(time), CsvText.Number(value)])).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>The estimates: start, estimate, relative standard error and interval, in the case's units.</summary>
    public static TextTable Estimates(FitResult fit)
    {
        ArgumentNullException.ThrowIfNull(fit);
        var level = (fit.Request.Confidence * 100).ToString("0.#", CultureInfo.InvariantCulture);
        var rows = fit.Estimates.Select(estimate => (IReadOnlyList<string>)
        [
            estimate.Parameter.Label,
            estimate.Parameter.Written(estimate.Parameter.StartValue),
            estimate.Parameter.Written(estimate.Value),
            estimate.Identifiable ? estimate.RelativeStandardError.ToString("P1", CultureInfo.InvariantCulture) : "-",
            estimate is { Lower: { } lower, Upper: { } upper }
                ? $"{estimate.Parameter.Written(lower)} to {estimate.Parameter.Written(upper)}"
                : "not identifiable",
        ]).ToArray();
        return new TextTable("Estimates", ["input", "start", "estimate", "rel. std. error", $"{level} % interval"], rows);
    }

    /// <summary>The correlation matrix of the estimates (of their logarithms).</summary>
    public static TextTable Correlation(FitResult fit)
    {
        ArgumentNullException.ThrowIfNull(fit);
        var labels = fit.Estimates.Select((_, i) => $"({i + 1})").ToArray();
        var rows = fit.Estimates.Select((estimate, i) => (IReadOnlyList<string>)
        [
            $"({i + 1}) {estimate.Parameter.Label}",
            .. Enumerable.Range(0, fit.Estimates.Count).Select(j => double.IsFinite(fit.Correlation[i, j])
                ? fit.Correlation[i, j].ToString("F3", CultureInfo.InvariantCulture)
                : "-"),
        ]).ToArray();
        return new TextTable("Correlation of the estimates", ["", .. labels], rows);
    }

    /// <summary>How well the model fits: measurements, residual scale, iterations and why the search stopped.</summary>
    public static TextTable Quality(FitResult fit)
    {
        ArgumentNullException.ThrowIfNull(fit);
        var weighted = fit.Request.Data.Deviations is not null;
        var data = fit.Request.Data;
        var scale = weighted
            ? fit.ResidualScale.ToString("G3", CultureInfo.InvariantCulture) + " (about 1 when model and standard deviations agree)"
            : $"{data.ValueUnit.FromSi(fit.ResidualScale).ToString("G3", CultureInfo.InvariantCulture)} {data.ValueUnit.ForPeople}";
        var stop = fit.Stop switch
        {
            LeastSquaresStop.Converged => "converged",
            LeastSquaresStop.NoFurtherDecrease => "converged (no step lowers the sum of squares further)",
            _ => "stopped at the iteration limit; the estimates may not be at the minimum",
        };
        return new TextTable("Fit", ["", ""],
        [
            ["measurements", fit.Points.Count.ToString(CultureInfo.InvariantCulture)],
            [weighted ? "residual scale sqrt(chi-square / dof)" : "residual standard error", scale],
            ["iterations (model runs)", $"{fit.Iterations} ({fit.ModelRuns})"],
            ["search", stop],
        ]);
    }

    private static string SiUnit(FitResult fit) => NamedResults.SiUnit(fit.Request.Measured).Symbol;
}
