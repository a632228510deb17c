using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// A renewal that brings a fresh portion with other properties (another volume, K or film; a bath at another level).
/// Checked against published closed forms restarted where a contact starts from a known state: a sheet at
/// equilibrium with its first portion releases into the second as Crank's sheet into a limited volume (The Mathematics
/// of Diffusion, 2nd ed. 1975, ch. 4, eq. 4.37, from memory) from a uniform start, with the second portion's alpha; a
/// membrane whose donor bath changes level passes, by the linearity of Fick's law, the sum of Crank's eq. 4.24a (from
/// memory) for the first level and for the step, started when the level changes; and against the same contact run by
/// hand from the state the first one left.
/// </summary>
public sealed class NewMediumTests
{
    private const double Thickness = 1e-4, Diffusivity = 1e-13, InitialConcentration = 400;

    /// <summary>D T / L^2 = 20: the slowest mode of the first contact decays by exp(-q_1^2 20) &lt; 1e-20, so the sheet ends it uniform.</summary>
    private const double EquilibratingSeconds = 20 * Thickness * Thickness / Diffusivity;

    private const double SecondSeconds = 0.05 * Thickness * Thickness / Diffusivity;

    [Theory]
    [InlineData(0.5, 1.0, 2.0, 1.0)]
    [InlineData(0.2, 3.0, 5.0, 0.25)]
    [InlineData(2.0, 0.5, 0.1, 4.0)]
    public void A_second_portion_with_another_volume_and_K_takes_what_Crank_gives_from_the_sheet_the_first_left(
        double firstVolumeInThicknesses, double firstK, double secondVolumeInThicknesses, double secondK)
    {
        var first = Cases.Compartment(firstVolumeInThicknesses * Thickness, firstK);
        var second = Cases.Compartment(secondVolumeInThicknesses * Thickness, secondK);
        var result = Simulator.Run(TwoContacts(first, second, Cases.FiniteVolumes));

        Assert.True(result.Completed, result.FailureReason);

        // The sheet (K = 1) ends the first contact at equilibrium with it: c_sheet = u, c_medium = K u, one mass.
        var sheetAfterFirst = InitialConcentration * Thickness / (Thickness + (first.VolumePerAreaMeters * firstK));
        var periods = result.Schedule!.Periods;
        Tolerance.Relative(firstK * sheetAfterFirst, periods[0].Media.Single().ConcentrationAtEndKgPerCubicMeter, 1e-4, "first portion at equilibrium");

        // Crank's K is c_sheet / c_solution = 1 / K_medium here, so alpha = (V/A) K_medium / L.
        var expected = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(Diffusivity, Thickness, sheetAfterFirst, second.VolumePerAreaMeters, 1 / secondK, SecondSeconds);
        var received = periods[1].Media.Single();
        Tolerance.Relative(expected, received.ReceivedKgPerSquareMeter, 1e-3, "second portion (Crank eq. 4.37 with its own alpha)");
        Tolerance.Relative(expected / second.VolumePerAreaMeters, received.ConcentrationAtEndKgPerCubicMeter, 1e-3, "second portion's concentration at the end");
        var end = EndSample(result);
        Tolerance.Relative(expected, end.Right!.ConcentrationKgPerCubicMeter * second.VolumePerAreaMeters, 1e-3, "the time series reads the portion in contact");

        // What left with the first portion is what it held; the rest is in the sheet and the second portion.
        var carried = result.Schedule.Renewed.Single().CarriedAwayKgPerSquareMeter;
        Tolerance.Relative(periods[0].Media.Single().ConcentrationAtEndKgPerCubicMeter * first.VolumePerAreaMeters, carried, 1e-12, "carried away by the renewal");
        Tolerance.Relative(InitialConcentration * Thickness, end.LayerMassPerArea.Sum() + (received.ConcentrationAtEndKgPerCubicMeter * second.VolumePerAreaMeters) + carried, 1e-10, "mass balance");
    }

    [Fact]
    public void A_closed_system_ends_at_the_equilibrium_of_the_last_portion()
    {
        var first = Cases.Compartment(0.5 * Thickness, 1);
        var second = Cases.Compartment(3 * Thickness, 2);
        var result = Simulator.Run(TwoContacts(first, second, Cases.FiniteVolumes));

        // Partition equilibrium (common practice, no source): the mass left after the renewal shared as
        // u (L K_sheet + (V/A) K_medium), c_medium = K_medium u.
        var left = result.FinalState.MassLeftAfterSamplingPerArea!.Value;
        var u = left / (Thickness + (second.VolumePerAreaMeters * 2));
        Tolerance.Relative(2 * u, result.FinalState.RightConcentrationKgPerCubicMeter!.Value, 1e-12, "final concentration in the last portion");
    }

    [Fact]
    public void A_portion_with_a_film_takes_what_the_same_contact_run_by_hand_from_the_uniform_sheet_takes()
    {
        var first = Cases.Compartment(0.5 * Thickness, 1);
        var second = Cases.Compartment(1.0 * Thickness, 1, c0: 5, film: 10 * Diffusivity / Thickness);
        var result = Simulator.Run(TwoContacts(first, second, Cases.FixedFineMesh));
        Assert.True(result.Completed, result.FailureReason);

        // By hand: the second contact alone, from the sheet the first left (uniform, at equilibrium with it).
        var sheetAfterFirst = InitialConcentration * Thickness / (Thickness + first.VolumePerAreaMeters);
        var alone = Simulator.Run(Cases.Make(Cases.Closed, second, SecondSeconds, null, Cases.FixedFineMesh, Cases.Layer("sheet", Thickness, Diffusivity, 1, sheetAfterFirst)));
        Assert.True(alone.Completed, alone.FailureReason);
        var byHand = EndSample(alone).Right!;
        var medium = result.Schedule!.Periods[1].Media.Single();
        Tolerance.Relative(byHand.TransferredIntoMediumPerArea, medium.ReceivedKgPerSquareMeter, 1e-5, "received by the second portion");
        Tolerance.Relative(byHand.ConcentrationKgPerCubicMeter, medium.ConcentrationAtEndKgPerCubicMeter, 1e-5, "its concentration at the end");
    }

    [Fact]
    public void A_donor_bath_that_changes_level_passes_the_sum_of_two_time_lag_solutions()
    {
        const double membrane = 5e-5, diffusivity = 1e-11, low = 10, high = 25;
        const double change = 0.3 * membrane * membrane / diffusivity, duration = 2.5 * change;
        var simulation = Cases.Make(Cases.Bath(low), Cases.Bath(0), duration, null, Cases.FiniteVolumes, Cases.Layer("membrane", membrane, diffusivity)) with
        {
            Schedule = new ContactSchedule(
            [
                new SchedulePeriod("low", (0, 0), 1, 1, 0, change, []),
                new SchedulePeriod("high", (1, 0), 1, 1, change, duration - change, [Side.Left]) { NewMedia = new Dictionary<Side, FaceCondition> { [Side.Left] = Cases.Bath(high) } },
            ]),
        };
        var result = Simulator.Run(simulation);
        Assert.True(result.Completed, result.FailureReason);

        // Fick's law is linear: the level's step at t1 adds the time-lag solution of the step, started at t1.
        double Expected(double time) => MembraneTimeLag.CumulativeMassPerArea(diffusivity, membrane, 1, low, time)
            + (time > change ? MembraneTimeLag.CumulativeMassPerArea(diffusivity, membrane, 1, high - low, time - change) : 0);
        var scale = Expected(duration);
        foreach (var sample in result.TimeSeries.Where(sample => sample.TimeSeconds > 0 && sample.TimeSeconds <= duration * (1 + 1e-12)))
        {
            Tolerance.Absolute(Expected(sample.TimeSeconds), sample.Right!.TransferredIntoMediumPerArea, 1e-3 * scale, $"received at {sample.TimeSeconds:G4} s (Crank eq. 4.24a, twice)");
        }

        Assert.Equal(high, result.TimeSeries[^1].Left!.ConcentrationKgPerCubicMeter);
        Assert.Equal(low, result.Schedule!.Periods[0].Media.Single(medium => medium.Side == Side.Left).ConcentrationAtEndKgPerCubicMeter);
    }

    [Fact]
    public void The_tables_hide_a_concentration_below_the_same_floor_the_accuracy_promise_uses()
    {
        // A later portion six times the first: its concentrations are the lowest a given amount can make, so both the
        // key figures and the "< floor" of the tables take their floor from it.
        var result = Simulator.Run(TwoContacts(Cases.Compartment(0.5 * Thickness), Cases.Compartment(3 * Thickness), Cases.FiniteVolumes));
        var floor = NegligibleFloor.ConcentrationIn(result, Side.Right)!.Value;

        Tolerance.Relative(NegligibleFloor.AmountPerArea(result) / (3 * Thickness), floor, 1e-12, "floor over the larger portion");
        var figure = result.NumericalError!.Figures.Select(error => error.Figure).First(figure => figure.Path.StartsWith("$.faces.right.concentrationKgPerCubicMeter", StringComparison.Ordinal));
        Tolerance.Relative(floor, figure.NegligibleBelow, 1e-12, "the key figure's floor");
    }

    [Fact]
    public void The_donor_raised_in_steps_demo_reaches_each_level_s_steady_flux_and_tables_it()
    {
        // 12 h periods on a membrane whose diffusion time L^2/D is 5.6 h: each level settles to D K c / L (the steady
        // flux of a membrane, Crank 1975, ch. 4, from eq. 4.24a, from memory) well within its period.
        var read = Layers.Core.Studies.CaseDocument.ReadFile(RepoRoot.File("cases", "donor-concentration-steps.json"));
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);
        Assert.True(result.Completed, result.FailureReason);

        var membrane = read.Case!.Stack.Layers.Single();
        var levels = read.Case.Schedule!.MediaByPeriod(Side.Left, read.Case.Left).Cast<BathFace>().Select(bath => bath.ConcentrationKgPerCubicMeter).ToArray();
        Assert.Equal([1.0, 3.0, 9.0], levels.Select(level => Math.Round(level, 9)));
        foreach (var (outcome, level) in result.Schedule!.Periods.Zip(levels))
        {
            var steady = membrane.DiffusivitySquareMetersPerSecond * membrane.PartitionCoefficient * level / membrane.ThicknessMeters;
            var receptor = outcome.Media.Single(medium => medium.Side == Side.Right);
            Tolerance.Relative(steady, receptor.HighestFluxKgPerSquareMeterSecond, 1e-3, $"highest flux in {outcome.Period.Label}");
        }

        Assert.Contains(Layers.Core.Reports.ScheduleTables.For(result), table => table.Title.StartsWith("Flux into each medium", StringComparison.Ordinal));
        Assert.Null(result.Permeation!.LagTimeSeconds);
    }

    private static SimulationCase TwoContacts(CompartmentFace first, CompartmentFace second, NumericsSettings numerics)
        => Cases.Make(Cases.Closed, first, EquilibratingSeconds + SecondSeconds, null, numerics, Cases.Layer("sheet", Thickness, Diffusivity, 1, InitialConcentration)) with
        {
            Schedule = new ContactSchedule(
            [
                new SchedulePeriod("first", (0, 0), 1, 1, 0, EquilibratingSeconds, []),
                new SchedulePeriod("second", (1, 0), 1, 1, EquilibratingSeconds, SecondSeconds, [Side.Right])
                {
                    NewMedia = new Dictionary<Side, FaceCondition> { [Side.Right] = second },
                },
            ]),
        };

    private static StateSample EndSample(SimulationResult result)
        => result.TimeSeries.Single(sample => Math.Abs(sample.TimeSeconds - result.Case.DurationSeconds) <= 1e-9 * result.Case.DurationSeconds);
}
