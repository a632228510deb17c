using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Permeation;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>
/// A membrane between an unlimited donor and a large receptor that is sampled and replenished, against the
/// Daynes-Barrer time-lag solution (Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.24a, from memory):
/// the receptor stays far below the donor, so it is a sink, and the sampling correction Q_n = (V C_n + v sum_{i&lt;n}
/// C_i) / A (common practice, no source) must give back the amount that crossed.
/// </summary>
public sealed class DiffusionCellSamplingTests
{
    private const double Thickness = 20e-6;
    private const double Diffusivity = 3e-13;
    private const double MembraneOverDonor = 4;
    private const double Donor = 5;
    private const double Area = 1.77e-4;

    // V/A = 1 m: the receptor reaches about 1e-4 of the donor level by the end, a sink within the tolerances below.
    private const double ReceptorVolume = Area * 1.0;
    private const double SampleVolume = 0.1 * ReceptorVolume;

    private static double LagTime => Thickness * Thickness / (6 * Diffusivity);

    private static double[] SamplingTimes => Enumerable.Range(1, 10).Select(i => i * LagTime).ToArray();

    [Fact]
    public void Corrected_cumulative_amount_from_samples_matches_the_Daynes_Barrer_series()
    {
        var result = Simulator.Run(Cell(sampled: true));

        var points = result.DiffusionCell!.Sampling.Single().Points;
        Assert.Equal(SamplingTimes.Length, points.Count);
        foreach (var point in points.Where(point => point.TimeSeconds >= LagTime))
        {
            var expected = MembraneTimeLag.CumulativeMassPerArea(Diffusivity, Thickness, MembraneOverDonor, Donor, point.TimeSeconds);
            Tolerance.Relative(expected, point.CorrectedCumulativePerArea, 2e-3, $"Q at {point.TimeSeconds:G4} s (Crank eq. 4.24a)");
        }
    }

    [Fact]
    public void Sampling_changes_the_receptor_but_not_the_corrected_amount_permeated()
    {
        var plain = Simulator.Run(Cell(sampled: false));
        var sampled = Simulator.Run(Cell(sampled: true));

        var last = sampled.DiffusionCell!.Sampling.Single().Points[^1];
        var unsampled = plain.TimeSeries.Single(sample => Math.Abs(sample.TimeSeconds - last.TimeSeconds) < 1e-6 * last.TimeSeconds);
        var uncorrected = last.ConcentrationKgPerCubicMeter * ReceptorVolume / Area;

        Tolerance.Relative(unsampled.Right!.TransferredIntoMediumPerArea, last.CorrectedCumulativePerArea, 1e-4, "corrected Q with sampling against Q without");
        Assert.True(
            uncorrected < 0.7 * last.CorrectedCumulativePerArea,
            $"the receptor alone ({uncorrected:G4} kg/m2) should miss what nine earlier samples took out");
        Assert.True(sampled.WorstMassBalanceError < 1e-10, $"mass balance with samples withdrawn: {sampled.WorstMassBalanceError:G3}");
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Steady_flux_lag_time_and_permeability_coefficient_follow_the_time_lag_law(bool sampled)
    {
        var result = Simulator.Run(Cell(sampled));

        var metrics = result.DiffusionCell!.Simulated!;
        // Crank ch. 4, eqs. 4.24b-c (from memory): J = D K C / L, t_lag = L^2 / (6 D), k_p = J / C = D K / L.
        var flux = Diffusivity * MembraneOverDonor * Donor / Thickness;
        Tolerance.Relative(flux, metrics.SteadyFluxKgPerSquareMeterSecond, 2e-3, "steady flux from the linear part");
        Tolerance.Relative(LagTime, metrics.LagTimeSeconds, 1e-2, "lag time from the intercept");
        Tolerance.Relative(Diffusivity * MembraneOverDonor / Thickness, metrics.PermeabilityCoefficientMetersPerSecond!.Value, 2e-3, "k_p");
    }

    [Fact]
    public void Correction_formula_matches_a_hand_calculation()
    {
        // V = 5, v = 1, A = 2, C = 1, 2, 3: Q = 5/2, (10 + 1)/2, (15 + 1 + 2)/2 (computed by hand).
        var q = SamplingCorrection.CumulativePerArea([1, 2, 3], 5, 1, 2);
        Assert.Equal([2.5, 5.5, 9.0], q);
    }

    private static SimulationCase Cell(bool sampled)
    {
        var receptor = new CompartmentFace("receptor", ReceptorVolume, Area, 1, 0, null)
        {
            Sampling = sampled ? new ReceptorSampling(SampleVolume, SamplingTimes) : null,
        };
        return Cases.Make(
            Cases.Bath(Donor),
            receptor,
            10 * LagTime,
            layers: Cases.Layer("membrane", Thickness, Diffusivity, MembraneOverDonor)) with
        {
            PermeationTest = new PermeationTest(),
        };
    }
}
