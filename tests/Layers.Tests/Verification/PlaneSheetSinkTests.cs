using Layers.Core.Analytics;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// Desorption of a plane sheet into a perfect sink. Reference: Crank, The Mathematics of Diffusion, 2nd ed. (1975),
/// ch. 4.3, eqs. 4.17-4.18 (sheet of thickness 2l, both faces at zero; here the half-sheet with a closed face).
/// </summary>
public sealed class PlaneSheetSinkTests
{
    private const double Thickness = 100e-6;
    private const double Diffusivity = 1e-13;
    private const double InitialConcentration = 900;

    [Theory]
    [InlineData(0.003)]
    [InlineData(0.03)]
    [InlineData(0.2)]
    [InlineData(1.0)]
    public void Released_fraction_matches_Crank_series_within_a_tenth_of_a_percent(double dimensionlessTime)
    {
        var time = dimensionlessTime * Thickness * Thickness / Diffusivity;
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Bath(0),
            time,
            layers: Cases.Layer("sheet", Thickness, Diffusivity, c0: InitialConcentration));

        var result = Simulator.Run(simulation);

        var released = result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea / (InitialConcentration * Thickness);
        var expected = PlaneSheetIntoSink.FractionReleased(Diffusivity, Thickness, time);
        Tolerance.Relative(expected, released, 1e-3, "fraction released (Crank eq. 4.18)");
    }
}
