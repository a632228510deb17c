using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>
/// A layer carries where its D comes from; a D that depends on temperature is taken at a stage's temperature, in
/// <see cref="TemperatureStage"/> only.
/// </summary>
public sealed class LayerDiffusivitySourceTests
{
    private const string Film = """
        {
          "layers": [
            { "name": "film", "thickness": "40 um", "diffusionCoefficient": "2e-10 cm2/s", "diffusionCoefficientOrigin": "measured" }
          ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "mass": "1 kg", "density": "1 g/cm3", "area": "6 dm2" },
          "foodContact": {
            "stages": [ { "name": "storage", "duration": "10 d", "temperature": "40 degC" } ],
            "layerDiffusion": { "film": { "referenceTemperature": "25 degC", "activationEnergy": "60 kJ/mol" } }
          }
        }
        """;

    [Fact]
    public void An_Arrhenius_source_gives_its_D_at_a_stage_temperature_as_worked_by_hand()
    {
        // Arrhenius law D(T) = D_ref exp(-(Ea/R)(1/T - 1/T_ref)) (the Arrhenius equation of physical chemistry, from
        // memory), R = 8.314462618 J/(mol K) (CODATA 2018). By hand for D_ref = 2e-14 m2/s at 25 degC, Ea = 60 kJ/mol,
        // T = 40 degC: 1/313.15 - 1/298.15 = -1.606586e-4 1/K; x (-60000 / 8.314462618) = 1.159367;
        // exp(1.159367) = 3.187916, so D = 6.375832e-14 m2/s.
        var source = new ArrheniusDiffusivity(2e-14, 298.15, 60e3);
        var stage = new TemperatureStage("storage", 86400, 313.15);

        Tolerance.Relative(6.375832e-14, source.At(313.15), 1e-6, "D at 40 degC");
        Tolerance.Relative(6.375832e-14, stage.DiffusivityOf(0, source).Value, 1e-6, "the stage takes the same D");
    }

    [Fact]
    public void A_layer_with_an_Arrhenius_law_is_read_with_the_law_and_its_own_D_at_the_reference_temperature()
    {
        // The case format's rule: with an Arrhenius law the layer's own D is the value at the reference temperature
        // (common practice, no source); 2e-10 cm2/s = 2e-14 m2/s.
        var read = CaseJson.Read(Film);

        Assert.True(read.IsValid, read.FormatErrors());
        var source = Assert.IsType<ArrheniusDiffusivity>(read.Case!.Stack.Layers[0].Diffusivity);
        Tolerance.Relative(2e-14, source.ReferenceDiffusivity, 1e-12, "D at the reference temperature");
        Assert.Equal(298.15, source.ReferenceKelvin, 9);
        Assert.Equal(60e3, source.ActivationEnergyJoulesPerMole, 6);
        Assert.Equal("measured", source.Origin);
        Tolerance.Relative(6.375832e-14, read.Case.WithFirstStageDiffusivities().Stack.Layers[0].DiffusivitySquareMetersPerSecond, 1e-6, "D at 40 degC, by hand above");
    }

    [Fact]
    public void A_constant_source_returns_its_D_at_any_temperature()
    {
        // A D given without a temperature law is the same at every temperature (the case format's rule; common
        // practice, no source).
        var source = new GivenDiffusivity(3e-13) { Origin = DiffusivityOrigins.Measured };

        Assert.Equal(3e-13, source.At(250));
        Assert.Equal(3e-13, source.At(400));
        Assert.Same(source, source.AtTemperature(350));
    }

    [Fact]
    public void A_D_that_depends_on_temperature_has_a_value_only_in_a_stage()
    {
        // No placeholder: outside a stage there is no temperature to take the D at (common practice, no source).
        var layer = new Layer("film", 40e-6, new ArrheniusDiffusivity(2e-14, 298.15, 60e3), 1, 0);
        var simulation = Cases.Make(Cases.Closed, Cases.Compartment(0.01), 86400, layers: layer);

        Assert.Throws<InvalidOperationException>(() => layer.DiffusivitySquareMetersPerSecond);
        var staged = new TemperatureStage("storage", 86400, 298.15).Apply(simulation);
        Assert.Equal(2e-14, staged.Stack.Layers[0].DiffusivitySquareMetersPerSecond);
    }
}
