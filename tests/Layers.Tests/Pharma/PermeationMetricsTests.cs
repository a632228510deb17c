using System.Globalization;
using Layers.Core.Analytics;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Permeation;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>
/// The steady-part rule and the measured-data path against the Daynes-Barrer series (Crank, The Mathematics of
/// Diffusion, 2nd ed., ch. 4, eq. 4.24a, from memory), whose asymptote has slope D K C / L and intercept L^2/(6D).
/// </summary>
public sealed class PermeationMetricsTests
{
    private const double Thickness = 50e-6;
    private const double Diffusivity = 1e-13;
    private const double Partition = 2;
    private const double Donor = 3;

    private static double Lag => Thickness * Thickness / (6 * Diffusivity);

    private static double Flux => Diffusivity * Partition * Donor / Thickness;

    [Fact]
    public void Steady_line_through_a_Daynes_Barrer_curve_gives_its_flux_and_lag()
    {
        var times = Enumerable.Range(1, 24).Select(i => i * 0.5 * Lag).ToArray();
        var amounts = times.Select(Q).ToArray();

        var metrics = SteadyLine.Fit("measured", times, amounts, Donor)!;

        Tolerance.Relative(Flux, metrics.SteadyFluxKgPerSquareMeterSecond, 1e-3, "slope");
        Tolerance.Relative(Lag, metrics.LagTimeSeconds, 5e-3, "intercept");
        Assert.True(metrics.FromSeconds >= 3 * Lag * 0.99, $"steady part starts at {metrics.FromSeconds / Lag:G3} lag times");
    }

    [Fact]
    public void Steady_line_of_an_early_curve_is_flagged_by_its_start()
    {
        // Up to 2 lag times only: the rule falls back to the last three points, which lie before three lag times.
        var times = Enumerable.Range(1, 8).Select(i => i * 0.25 * Lag).ToArray();

        var metrics = SteadyLine.Fit("measured", times, times.Select(Q).ToArray(), Donor)!;

        Assert.Equal(3, metrics.PointsUsed);
        Assert.True(metrics.FromSeconds < 3 * metrics.LagTimeSeconds);
    }

    [Fact]
    public void Measured_file_in_hours_and_ug_per_cm2_is_read_in_SI_and_gives_the_same_metrics()
    {
        using var folder = new TempFolder();
        var lines = new List<string> { "time [h],cumulative amount [ug/cm2]" };
        foreach (var i in Enumerable.Range(0, 25))
        {
            var t = i * 0.5 * Lag;
            // kg/m2 to ug/cm2: x 1e9 / 1e4 = x 1e5.
            lines.Add(string.Create(CultureInfo.InvariantCulture, $"{t / 3600:R},{Q(t) * 1e5:R}"));
        }

        File.WriteAllLines(Path.Combine(folder.Path, "q.csv"), lines);
        var json = CaseJson.MinimalWith(("$.right", """{ "kind": "bath" }"""), ("$.permeationTest", """{ "measured": "q.csv", "donorConcentration": "3 kg/m3" }"""));
        var read = CaseDocument.ReadText(json, Path.Combine(folder.Path, "case.json"));
        Assert.True(read.IsValid, read.FormatErrors());

        var measured = read.Case!.PermeationTest!.Measured!;
        Tolerance.Relative(12 * Lag, measured.TimesSeconds[^1], 1e-12, "last time in s");
        var metrics = SteadyLine.Fit("measured", measured.TimesSeconds, measured.CumulativePerArea, 3)!;
        Tolerance.Relative(Flux, metrics.SteadyFluxKgPerSquareMeterSecond, 1e-3, "slope from the file");
        Tolerance.Relative(Diffusivity * Partition / Thickness, metrics.PermeabilityCoefficientMetersPerSecond!.Value, 1e-3, "k_p = D K / L");
    }

    [Theory]
    [InlineData("time,Q\n1,2\n2,3\n3,4\n", "'q.csv' line 1: expected two columns with units in brackets")]
    [InlineData("time [h],Q [ug/cm2]\n1,2\n2;3\n3,4\n", "'q.csv' line 3: expected two numbers separated by a comma")]
    [InlineData("time [h],Q [ug/cm2]\n1,2\n3,3\n2,4\n", "'q.csv' line 4: times must be >= 0 and ascending")]
    public void Broken_measured_files_are_reported_at_the_key_with_the_line(string text, string expected)
    {
        using var folder = new TempFolder();
        File.WriteAllText(Path.Combine(folder.Path, "q.csv"), text);
        var json = CaseJson.MinimalWith(("$.permeationTest", """{ "measured": "q.csv" }"""));

        var read = CaseDocument.ReadText(json, Path.Combine(folder.Path, "case.json"));

        var line = Assert.Single(CaseJson.ErrorLines(read));
        Assert.StartsWith($"$.permeationTest.measured: {expected}", line, StringComparison.Ordinal);
    }

    [Fact]
    public void Delivery_per_day_and_target_span_follow_a_hand_worked_curve()
    {
        // Invented: 1e-8 kg/m2/s for the first 1.5 d, then nothing; per day 8.64e-4 and 4.32e-4 kg/m2 (by hand).
        var times = Enumerable.Range(0, 9).Select(i => i * 0.25 * Delivery.DaySeconds).ToArray();
        var amounts = times.Select(t => 1e-8 * Math.Min(t, 1.5 * Delivery.DaySeconds)).ToArray();
        var test = new PermeationTest { TargetFluxKgPerSquareMeterSecond = 5e-9, DeliveryAreaSquareMeters = 1e-3 };

        var delivery = Delivery.Of(test, times, amounts);

        Assert.Equal(2, delivery.PerDayPerArea.Count);
        Tolerance.Relative(8.64e-4, delivery.PerDayPerArea[0], 1e-12, "day 1");
        Tolerance.Relative(4.32e-4, delivery.PerDayPerArea[1], 1e-12, "day 2");
        Assert.Equal(0.25 * Delivery.DaySeconds, delivery.TargetReachedSeconds);
        // The rate drops from 1e-8 to 0 at 1.5 d: halfway between the mid-times 1.375 d and 1.625 d (by hand).
        Tolerance.Relative(1.5 * Delivery.DaySeconds, delivery.TargetHeldUntilSeconds!.Value, 1e-12, "held until");
    }

    [Fact]
    public void The_time_a_falling_rate_drops_below_the_target_is_found_between_output_times()
    {
        // Invented: a rate falling linearly, J(t) = J0 (1 - t/tau), so Q(t) = J0 (t - t^2 / (2 tau)) (by hand). It falls
        // to J0/4 at t = 0.75 tau, between outputs every 0.2 tau; the mean rate over an interval of a linear J is J at
        // the interval's mid-time, so the interpolation between mid-times is exact here.
        const double j0 = 1e-8, tau = 10 * Delivery.DaySeconds;
        var times = Enumerable.Range(0, 6).Select(i => i * 0.2 * tau).ToArray();
        var amounts = times.Select(t => j0 * (t - (t * t / (2 * tau)))).ToArray();
        var test = new PermeationTest { TargetFluxKgPerSquareMeterSecond = j0 / 4 };

        var delivery = Delivery.Of(test, times, amounts);

        Assert.Equal(0.2 * tau, delivery.TargetReachedSeconds);
        Tolerance.Relative(0.75 * tau, delivery.TargetHeldUntilSeconds!.Value, 1e-12, "rate falls to J0/4");
    }

    private static double Q(double t) => MembraneTimeLag.CumulativeMassPerArea(Diffusivity, Thickness, Partition, Donor, t);
}
