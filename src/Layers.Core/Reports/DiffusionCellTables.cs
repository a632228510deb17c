using System.Globalization;
using Layers.Core.Permeation;
using Layers.Core.Results;
using Layers.Core.Units;

namespace Layers.Core.Reports;

/// <summary>
/// Diffusion-cell and patch results as tables in the display units (ug/cm2, ug/cm2/h, h for permeation cases;
/// permeability coefficients in cm/h, common practice, no source): the permeation metrics of the simulation beside
/// those of the measured data, the samples with their corrected cumulative amounts, and warnings.
/// </summary>
public static class DiffusionCellTables
{
    private static readonly UnitDefinition PermeabilityUnit = UnitTable.Get("cm/h");

    /// <summary>The tables for a result; none when the case has no diffusion-cell figures.</summary>
    public static IReadOnlyList<TextTable> For(SimulationResult result)
    {
        if (result.DiffusionCell is not { } cell)
        {
            return [];
        }

        var format = new DisplayFormat(result.Case.Display);
        var tables = new List<TextTable>();
        if (cell.Simulated is not null || cell.Measured is not null)
        {
            tables.Add(Metrics(cell, format));
        }

        foreach (var sampled in cell.Sampling)
        {
            var rows = sampled.Points.Select(point => (IReadOnlyList<string>)
            [
                format.TimeValue(point.TimeSeconds),
                format.Concentration(point.ConcentrationKgPerCubicMeter),
                format.MassPerArea(point.CorrectedCumulativePerArea),
            ]).ToArray();
            tables.Add(new TextTable(
                $"Samples from {sampled.Name} (cumulative amount corrected for earlier samples)",
                [$"time [{result.Case.Display.Time.ForPeople}]", "concentration", "cumulative amount"],
                rows));
        }

        if (cell.Delivery is { } delivery && (delivery.PerDayPerArea.Count > 0 || delivery.TargetFluxKgPerSquareMeterSecond is not null))
        {
            tables.Add(Delivery(delivery, format));
        }

        return tables;
    }

    /// <summary>
    /// Warnings to show with the results: lost sink conditions, a steady part shorter than asked for, and why there is
    /// no steady line where there is none.
    /// </summary>
    public static IReadOnlyList<string> Warnings(SimulationResult result)
    {
        if (result.DiffusionCell is not { } cell)
        {
            return [];
        }

        var format = new DisplayFormat(result.Case.Display);
        var warnings = new List<string>();
        foreach (var sink in cell.SinkChecks.Where(sink => sink.Exceeded))
        {
            warnings.Add(string.Create(
                CultureInfo.InvariantCulture,
                $"warning: sink conditions lost in {sink.Name}: its concentration exceeds {100 * sink.Fraction:G3} % of the solubility ({format.Concentration(sink.SolubilityKgPerCubicMeter)}) from {format.Time(sink.FirstExceededSeconds!.Value)} on (highest {format.Concentration(sink.HighestConcentrationKgPerCubicMeter)})"));
        }

        foreach (var metrics in new[] { cell.Simulated, cell.Measured }.OfType<PermeationMetrics>())
        {
            if (metrics.NoSteadyLineReason is { } reason)
            {
                warnings.Add($"note: no steady flux, lag time or k_p from the {metrics.Source} data: {reason}");
                continue;
            }

            if (metrics.FromSeconds < SteadyLine.LagMultiple * metrics.LagTimeSeconds * (1 - 1e-9))
            {
                warnings.Add($"warning: the {metrics.Source} data do not reach {SteadyLine.LagMultiple.ToString(CultureInfo.InvariantCulture)} lag times beyond the last three points; the steady flux and lag time are not steady-state values");
            }
        }

        return warnings;
    }

    private static TextTable Metrics(DiffusionCellSummary cell, DisplayFormat format)
    {
        var columns = new[] { cell.Simulated, cell.Measured };
        var headers = new List<string> { "quantity", "simulated" };
        if (cell.Measured is not null)
        {
            headers.Add("measured");
        }

        var rows = new List<IReadOnlyList<string>>();
        void Add(string what, Func<PermeationMetrics, string> value)
            => rows.Add([what, .. columns.Take(headers.Count - 1).Select(metrics => metrics is null ? "-" : value(metrics))]);
        Add("cumulative amount at the last time", metrics => format.MassPerArea(metrics.CumulativeAtEndPerArea));
        const string NotSteady = "none: no steady line (see note)";
        Add("steady flux J_ss", metrics => metrics.IsSteady ? format.Flux(metrics.SteadyFluxKgPerSquareMeterSecond) : NotSteady);
        Add("lag time", metrics => metrics.IsSteady ? format.Time(metrics.LagTimeSeconds) : NotSteady);
        Add("permeability coefficient k_p = J_ss / C_donor", metrics => !metrics.IsSteady
            ? NotSteady
            : metrics.PermeabilityCoefficientMetersPerSecond is { } kp
                ? DisplayFormat.Shown(kp, PermeabilityUnit)
                : "no donor concentration");
        Add("steady part (points at or after 3 lag times)", metrics => string.Create(
            CultureInfo.InvariantCulture,
            $"{format.Time(metrics.FromSeconds)} to {format.Time(metrics.ToSeconds)}, {metrics.PointsUsed} points, R^2 {metrics.RSquared:F4}"));
        return new TextTable("Permeation metrics", headers, rows);
    }

    private static TextTable Delivery(DeliverySummary delivery, DisplayFormat format)
    {
        var rows = new List<IReadOnlyList<string>>();
        for (var day = 0; day < delivery.PerDayPerArea.Count; day++)
        {
            var perArea = format.MassPerArea(delivery.PerDayPerArea[day]);
            var total = delivery.AreaSquareMeters is { } area
                ? $"{perArea}; {DisplayFormat.Shown(delivery.PerDayPerArea[day] * area, UnitTable.Get("mg"))} over {DisplayFormat.Shown(area, UnitTable.Get("cm2"))}"
                : perArea;
            rows.Add([string.Create(CultureInfo.InvariantCulture, $"delivered on day {day + 1}"), total]);
        }

        if (delivery.TargetFluxKgPerSquareMeterSecond is { } target)
        {
            rows.Add([
                $"target rate {format.Flux(target)}",
                delivery.TargetReachedSeconds is { } from
                    ? $"reached at {format.Time(from)}, held until {format.Time(delivery.TargetHeldUntilSeconds!.Value)}"
                    : "not reached within the duration",
            ]);
        }

        return new TextTable("Delivery", ["quantity", "value"], rows);
    }
}
