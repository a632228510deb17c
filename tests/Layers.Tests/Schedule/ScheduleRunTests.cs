using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// A plane sheet releasing into a compartment whose medium is replaced by a fresh portion at the start of each
/// contact. Each contact is the single-contact problem restarted from the profile the previous one left, so: the first
/// contact is Crank's sheet into a well-stirred limited volume (The Mathematics of Diffusion, 2nd ed. 1975, ch. 4,
/// eq. 4.37, from memory) and every contact is its eigenfunction expansion restarted at each renewal
/// (Analytics.SheetIntoRenewedVolume); into a near-perfect sink each contact takes what Crank's eq. 4.18 (from memory) releases
/// between its two ends; the mass balance closes across every renewal; and the run equals the same contacts solved
/// by hand as separate runs, each started from the state the one before ended with.
/// </summary>
public sealed class ScheduleRunTests
{
    private const double Thickness = 1e-4, Diffusivity = 1e-13, InitialConcentration = 400;
    private const double ContactSeconds = 0.2 * Thickness * Thickness / Diffusivity;

    [Fact]
    public void Every_contact_takes_what_the_limited_volume_solution_restarted_from_the_previous_profile_gives()
    {
        const double volumePerArea = 0.5 * Thickness;
        var result = Simulator.Run(Renewed(volumePerArea, contacts: 3, Cases.FiniteVolumes));

        Assert.True(result.Completed, result.FailureReason);
        var first = result.Schedule!.Periods[0].Media.Single();
        var expected = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(Diffusivity, Thickness, InitialConcentration, volumePerArea, 1, ContactSeconds);
        Tolerance.Relative(expected, first.ReceivedKgPerSquareMeter, 1e-3, "first contact (Crank eq. 4.37)");
        Tolerance.Relative(expected / volumePerArea, first.ConcentrationAtEndKgPerCubicMeter, 1e-3, "concentration at the end of the first contact");

        // Each later contact restarts from the profile the one before left: the expansion restarted at each renewal.
        var amounts = result.Schedule.Periods.Select(period => period.Media.Single().ReceivedKgPerSquareMeter).ToArray();
        var restarted = SheetIntoRenewedVolume.AmountPerContact(Diffusivity, Thickness, InitialConcentration, volumePerArea, 1, ContactSeconds, 3);
        foreach (var (contact, (expectedAmount, actual)) in restarted.Zip(amounts).Select((pair, index) => (index + 1, pair)))
        {
            Tolerance.Relative(expectedAmount, actual, 1e-3, $"contact {contact} (the expansion restarted from the previous profile)");
        }

        Assert.All(result.Schedule.Periods.Skip(1), period => Assert.True(period.Media.Single().FreshAtStart));
    }

    [Fact]
    public void Into_a_near_perfect_sink_each_contact_takes_what_Crank_releases_between_its_ends()
    {
        // alpha = V / (A K L) = 1e6: the medium never holds enough to slow the release, so renewing it changes nothing.
        const double volumePerArea = 1e6 * Thickness;
        var result = Simulator.Run(Renewed(volumePerArea, contacts: 4, Cases.FiniteVolumes));

        Assert.True(result.Completed, result.FailureReason);
        var content = InitialConcentration * Thickness;
        foreach (var (outcome, index) in result.Schedule!.Periods.Select((outcome, index) => (outcome, index)))
        {
            var released = PlaneSheetIntoSink.FractionReleased(Diffusivity, Thickness, (index + 1) * ContactSeconds)
                - PlaneSheetIntoSink.FractionReleased(Diffusivity, Thickness, index * ContactSeconds);
            Tolerance.Relative(released * content, outcome.Media.Single().ReceivedKgPerSquareMeter, 1e-3, $"contact {index + 1} (Crank eq. 4.18)");
        }
    }

    [Fact]
    public void The_mass_balance_closes_across_every_renewal()
    {
        const double volumePerArea = 0.3 * Thickness;
        var result = Simulator.Run(Renewed(volumePerArea, contacts: 5, Cases.FiniteVolumes));

        Assert.True(result.Completed, result.FailureReason);
        var schedule = result.Schedule!;
        var renewed = schedule.Renewed.Single();
        Assert.Equal(4, renewed.Renewals);

        // What the replaced portions took away is the sum of what each held at its end.
        var held = schedule.Periods.SkipLast(1).Sum(period => period.Media.Single().ConcentrationAtEndKgPerCubicMeter * volumePerArea);
        Tolerance.Relative(held, renewed.CarriedAwayKgPerSquareMeter, 1e-12, "carried away by the renewals");

        // Fick's law conserves mass: the sheet and the last portion hold the initial content less what left with the others.
        var end = result.TimeSeries.Single(sample => Math.Abs(sample.TimeSeconds - result.Case.DurationSeconds) <= 1e-9 * result.Case.DurationSeconds);
        var inSystem = end.LayerMassPerArea.Sum() + (end.Right!.ConcentrationKgPerCubicMeter * volumePerArea);
        Tolerance.Relative(InitialConcentration * Thickness, inSystem + renewed.CarriedAwayKgPerSquareMeter, 1e-10, "mass balance");

        // The periods' amounts add up to everything that crossed the face.
        Tolerance.Relative(end.Right.TransferredIntoMediumPerArea, schedule.Periods.Sum(period => period.Media.Single().ReceivedKgPerSquareMeter), 1e-12, "sum of the periods");
    }

    [Fact]
    public void The_run_equals_the_contacts_solved_as_separate_runs_chained_by_their_end_states()
    {
        const double volumePerArea = 0.5 * Thickness;
        const int contacts = 3;
        var result = Simulator.Run(Renewed(volumePerArea, contacts, Cases.FixedFineMesh));
        Assert.True(result.Completed, result.FailureReason);

        // By hand: one contact at a time on the same grid, the compartment emptied before each later one.
        var single = Cases.Make(Cases.Closed, Cases.Compartment(volumePerArea), ContactSeconds, [ContactSeconds], Cases.FixedFineMesh, Sheet());
        var model = Layers.Core.Discretization.DiscreteModel.Build(single);
        var node = model.System.CompartmentNode(Side.Right);
        var state = model.InitialState.ToArray();
        for (var contact = 0; contact < contacts; contact++)
        {
            state[node] = 0;
            state = StagedIntegration.Run(
                StageSystem.For(single, model.Grid, model.System), state, [ContactSeconds], ContactSeconds,
                (stage, first) => Simulator.InitialStep(stage.Case, model.Grid, first), single.Numerics.Solver, new Unobserved()).FinalState;
            var byHand = model.System.Capacity[node] * state[node];
            Tolerance.Relative(byHand, result.Schedule!.Periods[contact].Media.Single().ReceivedKgPerSquareMeter, 1e-5, $"contact {contact + 1} by hand");
        }
    }

    [Fact]
    public void A_bath_donor_through_a_membrane_into_a_receptor_exchanged_each_period_settles_to_the_steady_flux()
    {
        // The receptor is exchanged so often that it stays near sink conditions: each period then takes J T, with the
        // steady flux J = D K c / L of a membrane (Crank 1975, ch. 4, eq. 4.24a and its derivative, from memory).
        const double membrane = 5e-5, diffusivity = 1e-11, donor = 10;
        const double period = 5 * membrane * membrane / diffusivity;
        var simulation = Cases.Make(Cases.Bath(donor), Cases.Compartment(1e4 * membrane), 20 * period, null, Cases.FiniteVolumes, Cases.Layer("membrane", membrane, diffusivity))
            with
            {
                Schedule = Schedule(period, 20),
            };
        var result = Simulator.Run(simulation);

        Assert.True(result.Completed, result.FailureReason);
        var settling = result.Schedule!.PeriodicSteadyStates.Single();
        Assert.NotNull(settling.SettledAtRepetition);
        Assert.True(settling.SettledAtRepetition > 1);
        var steady = diffusivity * donor / membrane * period;
        var last = result.Schedule.Periods[^1].Media.Single(medium => medium.Side == Side.Right);
        Tolerance.Relative(steady, last.ReceivedKgPerSquareMeter, 2e-3, "last period (steady flux times the period)");

        // Once settled, the flux no longer swings within a period: its peak and trough are the steady flux.
        Tolerance.Relative(steady / period, last.HighestFluxKgPerSquareMeterSecond, 2e-3, "highest flux in the last period");
        Tolerance.Relative(steady / period, last.LowestFluxKgPerSquareMeterSecond, 2e-3, "lowest flux in the last period");
    }

    private static SimulationCase Renewed(double volumePerArea, int contacts, NumericsSettings numerics)
        => Cases.Make(Cases.Closed, Cases.Compartment(volumePerArea), contacts * ContactSeconds, null, numerics, Sheet())
            with
            {
                Schedule = Schedule(ContactSeconds, contacts),
            };

    private static ContactSchedule Schedule(double periodSeconds, int count)
        => new(Enumerable.Range(0, count)
            .Select(index => new SchedulePeriod("contact", (0, 0), index + 1, count, index * periodSeconds, periodSeconds, [Side.Right]))
            .ToArray());

    private static Layer Sheet() => Cases.Layer("sheet", Thickness, Diffusivity, 1, InitialConcentration);

    private sealed class Unobserved : ITimeLoopObserver
    {
        public bool WantsMoreTime => false;

        public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
        {
        }

        public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
        {
        }
    }
}
