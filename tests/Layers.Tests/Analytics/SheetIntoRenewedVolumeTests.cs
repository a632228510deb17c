using Layers.Core.Analytics;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Analytics;

/// <summary>
/// The eigenfunction expansion of a sheet releasing into a solution renewed after every contact, against Crank (1975),
/// The Mathematics of Diffusion, 2nd ed., ch. 4 (equation numbers from memory): its first contact is eq. 4.37; with a
/// solution so large that it stays a sink, its contacts are the differences of eq. 4.18; and mass is conserved.
/// </summary>
public sealed class SheetIntoRenewedVolumeTests
{
    private const double Thickness = 1e-4, Diffusivity = 1e-13, C0 = 400;
    private const double Contact = 0.2 * Thickness * Thickness / Diffusivity;

    [Theory]
    [InlineData(0.1, 1.0)]
    [InlineData(0.5, 3.0)]
    [InlineData(4.0, 0.2)]
    public void The_first_contact_is_Crank_eq_4_37(double alpha, double k)
    {
        var volume = alpha * k * Thickness;
        var amounts = SheetIntoRenewedVolume.AmountPerContact(Diffusivity, Thickness, C0, volume, k, Contact, 1);

        Tolerance.Relative(PlaneSheetIntoLimitedVolume.TransferredMassPerArea(Diffusivity, Thickness, C0, volume, k, Contact), amounts[0], 1e-10, "first contact");
    }

    [Fact]
    public void Into_a_solution_that_stays_a_sink_each_contact_is_the_difference_of_Crank_eq_4_18()
    {
        var amounts = SheetIntoRenewedVolume.AmountPerContact(Diffusivity, Thickness, C0, 1e7 * Thickness, 1, Contact, 5);

        for (var k = 0; k < amounts.Length; k++)
        {
            var released = PlaneSheetIntoSink.FractionReleased(Diffusivity, Thickness, (k + 1) * Contact) - PlaneSheetIntoSink.FractionReleased(Diffusivity, Thickness, k * Contact);
            Tolerance.Relative(released * C0 * Thickness, amounts[k], 1e-6, $"contact {k + 1}");
        }
    }

    [Fact]
    public void Many_contacts_take_out_everything_the_sheet_held_and_no_more()
    {
        // A long contact takes alpha / (1 + alpha) = 1/3 of what the sheet still holds: after 60, (2/3)^60 ~ 3e-11 of it is left.
        var amounts = SheetIntoRenewedVolume.AmountPerContact(Diffusivity, Thickness, C0, 0.5 * Thickness, 1, 5 * Contact, 60);

        Assert.All(amounts.Zip(amounts.Skip(1)), pair => Assert.True(pair.Second < pair.First));
        Tolerance.Relative(C0 * Thickness, amounts.Sum(), 1e-9, "everything released");
    }
}
