using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// A whole run of the exact method (numerics.method "laplace" or "auto"), through the same result the finite volumes
/// fill, against published closed forms: Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, a plane sheet into
/// a perfect sink (eq. 4.18) and into a well-stirred limited volume (eq. 4.37), and the membrane time lag L^2/(6D)
/// (eq. 4.24a) (equation numbers from memory), as summed by Analytics.
/// </summary>
public sealed class ExactRunTests
{
    private static readonly NumericsSettings Exact = NumericsSettings.Default with { Method = SolutionMethod.Laplace };

    [Fact]
    public void A_sheet_into_a_sink_releases_as_Crank_says_and_its_times_to_a_fraction_invert_his_series()
    {
        const double thickness = 1e-4, diffusivity = 1e-13, c0 = 700;
        var scale = thickness * thickness / diffusivity;
        var result = Simulator.Run(Cases.Make(Cases.Closed, Cases.Bath(0), scale, [0.01 * scale, 0.1 * scale, scale], Exact, Cases.Layer("sheet", thickness, diffusivity, 1, c0)), checkExactByFiniteVolumes: false);

        Assert.True(result.Completed, result.FailureReason);
        Assert.Equal(SolutionMethod.Laplace, result.Method);
        foreach (var sample in result.TimeSeries.Where(sample => sample.TimeSeconds > 0))
        {
            var expected = PlaneSheetIntoSink.FractionReleased(diffusivity, thickness, sample.TimeSeconds);
            Tolerance.Absolute(expected, sample.Right!.TransferredIntoMediumPerArea / (c0 * thickness), 1e-9, $"released at {sample.TimeSeconds:G4} s (Crank eq. 4.18)");

            // Everything ends in the sink: the whole system's distance from its final state is what the sheet still holds.
            Tolerance.Absolute(expected, sample.FractionOfFinalState, 1e-9, $"fraction of the way at {sample.TimeSeconds:G4} s");
        }

        foreach (var (level, time) in ThresholdTimes.Levels.Zip(result.FinalState.System.AsList()))
        {
            var expected = TimeToLevel.Of(t => PlaneSheetIntoSink.FractionReleased(diffusivity, thickness, t), level, 10 * scale);
            Tolerance.Relative(expected, time!.Value, 1e-8, $"time to {level:P0} of the final state (Crank eq. 4.18 solved for it)");
        }
    }

    [Theory]
    [InlineData(0.1, 1000.0)]
    [InlineData(4.0, 0.5)]
    public void A_sheet_into_a_limited_volume_fills_it_as_Crank_says(double alpha, double kSheet)
    {
        const double thickness = 5e-5, diffusivity = 4e-14, c0 = 900;
        var scale = thickness * thickness / diffusivity;
        var volumePerArea = alpha * kSheet * thickness;
        var simulation = Cases.Make(Cases.Closed, Cases.Compartment(volumePerArea), 0.5 * scale, [0.01 * scale, 0.1 * scale, 0.5 * scale], Exact, Cases.Layer("sheet", thickness, diffusivity, kSheet, c0));
        var result = Simulator.Run(simulation, checkExactByFiniteVolumes: false);

        Assert.True(result.Completed, result.FailureReason);
        foreach (var sample in result.TimeSeries.Where(sample => sample.TimeSeconds > 0))
        {
            var expected = PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(diffusivity, thickness, alpha, sample.TimeSeconds);
            Tolerance.Absolute(expected, sample.Right!.FractionOfEquilibrium!.Value, 1e-8, $"M_t/M_inf at {sample.TimeSeconds:G4} s (Crank eq. 4.37)");
        }

        foreach (var (level, time) in ThresholdTimes.Levels.Zip(result.FinalState.RightCompartment!.AsList()))
        {
            var expected = TimeToLevel.Of(t => PlaneSheetIntoLimitedVolume.FractionOfEquilibrium(diffusivity, thickness, alpha, t), level, 100 * scale);
            Tolerance.Relative(expected, time!.Value, 1e-7, $"compartment's time to {level:P0} (Crank eq. 4.37 solved for it)");
        }
    }

    [Fact]
    public void A_membrane_between_baths_has_the_lag_time_and_flux_of_the_closed_forms()
    {
        const double thickness = 8e-5, diffusivity = 2e-12, k = 3, donor = 50;
        var lag = thickness * thickness / (6 * diffusivity);
        var simulation = Cases.Make(Cases.Bath(donor), Cases.Bath(0), 20 * lag, [lag, 20 * lag], Exact, Cases.Layer("membrane", thickness, diffusivity, k));
        var result = Simulator.Run(simulation, checkExactByFiniteVolumes: false);

        Assert.True(result.Completed, result.FailureReason);
        var permeation = result.Permeation!;
        Tolerance.Relative(lag, permeation.LagTimeSeconds!.Value, 1e-8, "lag time L^2/(6D) (Crank eq. 4.24a, from memory)");
        Tolerance.Relative(diffusivity * k * donor / thickness, permeation.SteadyFluxKgPerSquareMeterSecond, 1e-12, "steady flux D K c1 / L (Fick's first law)");
        foreach (var sample in result.TimeSeries.Where(sample => sample.TimeSeconds > 0.3 * lag))
        {
            var expected = MembraneTimeLag.CumulativeMassPerArea(diffusivity, thickness, k, donor, sample.TimeSeconds);
            Tolerance.Relative(expected, sample.Right!.TransferredIntoMediumPerArea, 1e-7, $"Q(t) at {sample.TimeSeconds:G4} s (Crank eq. 4.24a and its image sum)");
        }
    }

    [Fact]
    public void Profiles_are_read_at_the_places_of_the_case_mesh_with_the_partition_jump_at_each_interface()
    {
        var simulation = Cases.Make(
            Cases.Closed, Cases.Closed, 3600, [60, 3600], Exact,
            Cases.Layer("loaded", 2e-5, 1e-13, 4, 100), Cases.Layer("empty", 3e-5, 5e-13, 0.5, 0));
        var result = Simulator.Run(simulation, checkExactByFiniteVolumes: false);

        var exact = result.Reports[^1].Profiles;
        Assert.Equal([result.Grid.CellsIn(0) + 2, result.Grid.CellsIn(1) + 2], exact.Select(profile => profile.PositionsMeters.Count));
        Assert.Equal(result.Grid.CentresMeters[0], exact[0].PositionsMeters[1]);

        // c = K u with u continuous: the two sides of the interface stand in the ratio of the partition coefficients.
        Tolerance.Relative(4 / 0.5, exact[0].ConcentrationsKgPerCubicMeter[^1] / exact[1].ConcentrationsKgPerCubicMeter[0], 1e-12, "c_left / c_right = K_left / K_right at the interface");
    }
}
