using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Permeation;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Plotting;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>
/// A steady flux and lag time are reported only where Q(t) has a steady line: through a membrane from an unlimited
/// donor they follow the Daynes-Barrer time-lag law (Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.24a,
/// from memory: slope D K C / L, intercept L^2 / (6 D)); from a small donor that empties within the run there is no
/// steady line, and the reports say so instead of giving the slope and intercept of a line through a curve.
/// </summary>
public sealed class SteadyLineCriteriaTests
{
    private const double Thickness = 20e-6;
    private const double Diffusivity = 3e-13;
    private const double Partition = 4;
    private const double Donor = 5;
    private const double Area = 1e-4;

    private static double LagTime => Thickness * Thickness / (6 * Diffusivity);

    [Fact]
    public void An_unlimited_donor_through_a_membrane_reaches_a_steady_line_with_the_Daynes_Barrer_flux_and_lag()
    {
        var result = Simulator.Run(Cell(Cases.Bath(Donor)));

        var metrics = result.DiffusionCell!.Simulated!;
        Assert.True(metrics.IsSteady, metrics.NoSteadyLineReason);
        Tolerance.Relative(Diffusivity * Partition * Donor / Thickness, metrics.SteadyFluxKgPerSquareMeterSecond, 2e-3, "J_ss = D K C / L");
        Tolerance.Relative(LagTime, metrics.LagTimeSeconds, 1e-2, "lag time L^2 / (6 D)");
        using var summary = JsonDocument.Parse(SummaryJson.Write(result, "case.json"));
        var simulated = summary.RootElement.GetProperty("diffusionCell").GetProperty("simulated");
        Assert.True(simulated.GetProperty("steadyLineReached").GetBoolean());
        Tolerance.Relative(LagTime, simulated.GetProperty("lagTimeSeconds").GetDouble(), 1e-2, "lag time in summary.json");
    }

    [Fact]
    public void A_donor_that_empties_within_the_run_has_no_steady_flux_or_lag_time_and_the_reports_say_why()
    {
        // By hand: a donor of V/A = 1e-5 m empties through the membrane with time constant (V/A) L / (D K) = 167 s,
        // a little under one lag time (222 s); over ten lag times it loses nearly all, and Q(t) bends flat.
        var donor = new CompartmentFace("donor", 1e-5 * Area, Area, 1, Donor, null);

        var result = Simulator.Run(Cell(donor));

        var metrics = result.DiffusionCell!.Simulated!;
        var content = Donor * 1e-5;
        Assert.True(metrics.CumulativeAtEndPerArea > SteadyLine.DepletionLimit * content, "premise: the donor depletes");
        Assert.False(metrics.IsSteady);
        Assert.Contains("the donor lost", metrics.NoSteadyLineReason, StringComparison.Ordinal);
        Assert.Contains("not straight", metrics.NoSteadyLineReason, StringComparison.Ordinal);

        using var summary = JsonDocument.Parse(SummaryJson.Write(result, "case.json"));
        var simulated = summary.RootElement.GetProperty("diffusionCell").GetProperty("simulated");
        Assert.False(simulated.GetProperty("steadyLineReached").GetBoolean());
        Assert.Equal(JsonValueKind.Null, simulated.GetProperty("steadyFluxKgPerSquareMeterSecond").ValueKind);
        Assert.Equal(JsonValueKind.Null, simulated.GetProperty("lagTimeSeconds").ValueKind);
        Assert.Equal(metrics.NoSteadyLineReason, simulated.GetProperty("noSteadyLineReason").GetString());
        var table = string.Join("\n", DiffusionCellTables.For(result).SelectMany(t => t.Rows).Select(row => string.Join(" | ", row)));
        Assert.Contains("steady flux J_ss | none: no steady line", table, StringComparison.Ordinal);
        Assert.Contains(DiffusionCellTables.Warnings(result), line => line.Contains(metrics.NoSteadyLineReason!, StringComparison.Ordinal));

        var plot = CumulativeAmountPlot.Create(result, new PlotOptions());
        Assert.Contains("no steady line for the simulated data: the donor lost", plot.Subtitle.Replace('\n', ' '), StringComparison.Ordinal);
        Assert.DoesNotContain(plot.Series, series => series.Title?.Contains("steady line", StringComparison.Ordinal) == true);
    }

    [Fact]
    public void A_line_through_a_curve_that_bends_down_is_no_steady_line_and_a_negative_lag_time_is_not_a_result()
    {
        // By hand: Q = Q_inf (1 - exp(-t / tau)), the amount from a well-stirred donor through a thin membrane; the
        // line through its second half meets the time axis before t = 0 and its halves' slopes differ by far more
        // than 5 %.
        const double tau = 1000;
        var times = Enumerable.Range(1, 20).Select(i => i * 100.0).ToArray();
        var amounts = times.Select(t => 1e-3 * (1 - Math.Exp(-t / tau))).ToArray();

        var metrics = SteadyLine.Fit("measured", times, amounts, null)!;

        Assert.True(metrics.LagTimeSeconds < 0, "premise: the fitted line's intercept is negative");
        Assert.False(metrics.IsSteady);
        Assert.Contains("negative lag time", metrics.NoSteadyLineReason, StringComparison.Ordinal);
    }

    private static SimulationCase Cell(FaceCondition donor)
    {
        var receptor = new CompartmentFace("receptor", 1.0 * Area, Area, 1, 0, null);
        return Cases.Make(donor, receptor, 10 * LagTime, layers: Cases.Layer("membrane", Thickness, Diffusivity, Partition)) with
        {
            PermeationTest = new PermeationTest(),
        };
    }
}
