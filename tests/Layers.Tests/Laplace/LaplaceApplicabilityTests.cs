using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// The exact method needs constant coefficients, linear faces and uniform initial values; the check names what
/// stands in the way (the method's premises, docs/numerics.md, "The exact method in the Laplace domain").
/// </summary>
public sealed class LaplaceApplicabilityTests
{
    [Fact]
    public void A_plain_case_with_every_face_kind_is_served()
    {
        var simulation = Cases.Make(Cases.Bath(1, film: 1e-6), Cases.Compartment(1e-3, 2, 1, 1e-5), 10, layers: Cases.Layer("a", 1e-4, 1e-12));

        Assert.True(LaplaceApplicability.Of(simulation).IsApplicable);
        Assert.Empty(LaplaceApplicability.Of(simulation).Reasons);
    }

    [Fact]
    public void Stages_a_solubility_and_sampling_are_each_named()
    {
        var dispersed = Cases.Layer("matrix", 1e-4, 1e-12, 1, 50) with { SolubilityKgPerCubicMeter = 10 };
        var sampled = Cases.Compartment(1e-3) with { Sampling = new ReceptorSampling(1e-7, [100, 200]) };
        var simulation = Cases.Make(Cases.Closed, sampled, 1000, layers: dispersed) with
        {
            FoodContact = new FoodContactSettings
            {
                Stages = [new TemperatureStage("storage", 1000, 298.15)],
                FoodSide = Side.Right,
            },
        };

        var reasons = LaplaceApplicability.Of(simulation).Reasons;

        Assert.Equal(3, reasons.Count);
        Assert.Contains(reasons, reason => reason.Contains("time-temperature stages", StringComparison.Ordinal));
        Assert.Contains(reasons, reason => reason.Contains("'matrix' has a solubility", StringComparison.Ordinal));
        Assert.Contains(reasons, reason => reason.Contains("sampled with replacement", StringComparison.Ordinal));
        var error = Assert.Throws<ArgumentException>(() => LaplaceSolution.For(simulation));
        Assert.Contains("solubility", error.Message, StringComparison.Ordinal);
    }
}
