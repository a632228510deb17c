using Layers.Benchmarks.Reference;
using Layers.Core.Analytics;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// The plain reference of the benchmarks (uniform cells, fixed backward-Euler steps) must solve the same problem as
/// the tool, or the speed-up it is compared against means nothing. Reference: a plane sheet releasing into a
/// well-stirred solution of limited volume, Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, eq. 4.37
/// (from memory), as evaluated by <see cref="PlaneSheetIntoLimitedVolume"/>.
/// </summary>
public sealed class PlainReferenceTests
{
    private const double Thickness = 50e-6;
    private const double Diffusivity = 8e-14;
    private const double InitialConcentration = 920;
    private const double VolumePerArea = 50e-6; // alpha = (V/A) / (K L) = 1

    [Fact]
    public void Plain_reference_converges_to_Crank_limited_volume_series_at_first_order_in_time()
    {
        var time = 0.2 * Thickness * Thickness / Diffusivity;
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Compartment(VolumePerArea),
            time,
            layers: Cases.Layer("sheet", Thickness, Diffusivity, 1, InitialConcentration));
        var exact = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
            Diffusivity, Thickness, InitialConcentration, VolumePerArea, 1, time);

        // 400 cells keep the second-order space error far below the time error of these step counts.
        var errors = new[] { 20, 40, 80 }
            .Select(steps => Math.Abs(PlainReference.ReceivedOnTheRight(simulation, 400, steps)[0] - exact) / exact)
            .ToArray();

        // Backward Euler is first order: halving the step halves the error (Roache 1998, ch. 5, p = log2(e_h / e_h/2)).
        var orders = new[] { Math.Log2(errors[0] / errors[1]), Math.Log2(errors[1] / errors[2]) };
        Assert.All(orders, order => Assert.InRange(order, 0.9, 1.1));
        Assert.InRange(errors[2], 0, 5e-3);
    }

    [Fact]
    public void Plain_reference_refuses_report_times_between_its_steps()
    {
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Compartment(VolumePerArea),
            1000,
            reports: [333.3, 1000],
            layers: Cases.Layer("sheet", Thickness, Diffusivity, 1, InitialConcentration));

        Assert.Throws<ArgumentException>(() => PlainReference.ReceivedOnTheRight(simulation, 40, 10));
    }
}
