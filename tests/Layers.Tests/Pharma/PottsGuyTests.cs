using Layers.Core.Cases;
using Layers.Core.Permeation;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>
/// The Potts-Guy equation, log10 k_p [cm/s] = -6.3 + 0.71 log10 K_ow - 0.0061 MW (Potts and Guy, Pharm. Res. 9
/// (1992) 663; constants from memory, unverified), against values worked by hand, and the estimated stratum
/// corneum layer against the k_p it must reproduce.
/// </summary>
public sealed class PottsGuyTests
{
    [Theory]
    // log K_ow 3, MW 300: -6.3 + 2.13 - 1.83 = -6.00, k_p = 1.000e-6 cm/s = 1.000e-8 m/s (by hand).
    [InlineData(3.0, 300.0, 1.000e-8)]
    // log K_ow 1, MW 150: -6.3 + 0.71 - 0.915 = -6.505, k_p = 3.126e-7 cm/s = 3.126e-9 m/s (by hand).
    [InlineData(1.0, 150.0, 3.126e-9)]
    public void Permeability_coefficient_matches_the_published_equation_worked_by_hand(double logKow, double molarMass, double expected)
    {
        Tolerance.Relative(expected, PottsGuy.PermeabilityCoefficientMetersPerSecond(logKow, molarMass), 1e-3, "k_p");
    }

    [Fact]
    public void An_estimated_stratum_corneum_alone_between_a_donor_and_a_sink_has_the_Potts_Guy_permeability()
    {
        const string json = """
            {
              "referenceMedium": { "name": "water" },
              "layers": [ { "name": "stratum corneum", "thickness": "15 um", "pottsGuy": { "logKow": 3, "molarMassGramsPerMole": 300 } } ],
              "left": { "kind": "bath", "concentration": "1 mg/mL" },
              "right": { "kind": "bath", "concentration": "0 mg/mL" },
              "duration": "10 d"
            }
            """;
        var read = CaseDocument.ReadText(json, "sc.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var layer = read.Case!.Stack.Layers[0];

        // K = 10^(0.7 x 3) = 125.9 (by hand, assumed scaling K_ow^0.7).
        Tolerance.Relative(125.89, layer.PartitionCoefficient, 1e-4, "K");
        var result = Simulator.Run(read.Case);
        // J = k_p C_donor = 1e-8 m/s x 1 kg/m3.
        Tolerance.Relative(1e-8, result.Permeation!.FluxAtEndKgPerSquareMeterSecond, 1e-3, "steady flux through the estimated layer");
    }

    [Fact]
    public void Diffusion_coefficient_and_estimate_together_are_refused_with_the_path()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(("$.layers[0].pottsGuy", """{ "logKow": 2, "molarMassGramsPerMole": 200 }""")));

        Assert.Contains(
            "$.layers[0].diffusionCoefficient: give either diffusionCoefficient and partitionCoefficient, or pottsGuy to estimate them, not both",
            CaseJson.ErrorLines(result));
    }
}
