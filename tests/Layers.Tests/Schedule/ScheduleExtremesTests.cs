using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Schedules at the edges of the coefficients a case may hold: partition coefficients from 1e-3 to 1e3 and diffusion
/// coefficients from 1e-15 to 1e-9 m2/s, with media from a tenth to ten times the sheet's capacity and contacts from a
/// fiftieth of the diffusion time to half of it. Every contact of a sheet releasing into a medium renewed after each
/// contact is held against Crank's sheet into a limited volume restarted from each contact's profile (The Mathematics
/// of Diffusion, 2nd ed. 1975, ch. 4, eq. 4.37, and its eigenfunction expansion, Carslaw and Jaeger, Conduction of Heat
/// in Solids, 2nd ed. 1959, section 3.11; both from memory: Analytics.SheetIntoRenewedVolume), at the default
/// accuracy of 1e-4 with a test margin of ten.
/// </summary>
public sealed class ScheduleExtremesTests
{
    private const double Thickness = 1e-4, InitialConcentration = 250;

    [Theory]
    [InlineData(1e-3, 1e-15, 0.1, 0.02)]
    [InlineData(1e-3, 1e-9, 10, 0.5)]
    [InlineData(1e3, 1e-15, 10, 0.5)]
    [InlineData(1e3, 1e-9, 0.1, 0.02)]
    [InlineData(1, 1e-12, 1, 0.1)]
    [InlineData(30, 1e-13, 0.3, 0.05)]
    public void Every_contact_holds_to_the_restarted_expansion(double mediumK, double diffusivity, double alpha, double tau)
    {
        const int contacts = 4;
        var contactSeconds = tau * Thickness * Thickness / diffusivity;

        // alpha = (V/A) / (K L) with Crank's K = c_sheet / c_solution = 1 / K_medium here.
        var volumePerArea = alpha * Thickness / mediumK;
        var simulation = Cases.Make(
            Cases.Closed, Cases.Compartment(volumePerArea, mediumK), contacts * contactSeconds, null, Cases.FiniteVolumes,
            Cases.Layer("sheet", Thickness, diffusivity, 1, InitialConcentration)) with
        {
            Schedule = new ContactSchedule(Enumerable.Range(0, contacts)
                .Select(index => new SchedulePeriod("contact", (0, 0), index + 1, contacts, index * contactSeconds, contactSeconds, [Side.Right]))
                .ToArray()),
        };
        var result = Simulator.Run(simulation);
        Assert.True(result.Completed, result.FailureReason);

        var expected = SheetIntoRenewedVolume.AmountPerContact(diffusivity, Thickness, InitialConcentration, volumePerArea, 1 / mediumK, contactSeconds, contacts);
        var largest = expected.Max();
        foreach (var (amount, index) in expected.Select((amount, index) => (amount, index)))
        {
            var medium = result.Schedule!.Periods[index].Media.Single();

            // The promise is against each figure's own value, above the floor: a contact that takes a tiny share is held to
            // its share of the largest.
            Tolerance.Absolute(amount, medium.ReceivedKgPerSquareMeter, 1e-3 * Math.Max(amount, 1e-3 * largest), $"contact {index + 1} received");
            Tolerance.Absolute(amount / volumePerArea, medium.ConcentrationAtEndKgPerCubicMeter, 1e-3 * Math.Max(amount, 1e-3 * largest) / volumePerArea, $"contact {index + 1} concentration at the end");
        }
    }
}
