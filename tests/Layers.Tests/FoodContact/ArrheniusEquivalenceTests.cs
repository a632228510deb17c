using Layers.Core.FoodContact;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>
/// Test-time equivalence t2 = t1 exp(-(Ea/R)(1/T1 - 1/T2)) with Ea = 80 kJ/mol, EU Regulation 10/2011 Annex V
/// (accelerated testing of long-term contact; the regulation writes R = 8.31 J/(mol K), i.e. exp(-9627 (...)).
/// </summary>
public sealed class ArrheniusEquivalenceTests
{
    private const double Day = 86400;

    [Fact]
    public void Ten_days_at_60_C_stand_for_about_297_days_at_25_C()
    {
        // By hand: 1/298.15 - 1/333.15 = 35 / (298.15 x 333.15) = 3.5237e-4 K^-1; Ea/R = 80000 / 8.31 = 9627 K;
        // exp(9627 x 3.5237e-4) = exp(3.3923) = 29.74; 10 d x 29.74 = 297 d. With R = 8.314462618 the factor is 29.68
        // (297 d to 0.2 %), so the check allows 0.5 %.
        var testSeconds = Arrhenius.EquivalentTestSeconds(297 * Day, 298.15, 333.15, 80e3);

        Tolerance.Relative(10 * Day, testSeconds, 5e-3, "test time at 60 C for 297 d at 25 C");
    }

    [Fact]
    public void Ten_days_at_40_C_stand_for_about_47_days_at_25_C()
    {
        // By hand: 1/298.15 - 1/313.15 = 15 / (298.15 x 313.15) = 1.6066e-4; x 9627 = 1.5467; exp = 4.696; 10 d x 4.696 = 47 d.
        var contactSeconds = 10 * Day / Arrhenius.EquivalentTestSeconds(1, 298.15, 313.15, 80e3);

        Tolerance.Relative(47 * Day, contactSeconds, 5e-3, "contact time at 25 C covered by 10 d at 40 C");
    }

    [Fact]
    public void Arrhenius_factor_is_one_at_the_reference_and_grows_with_temperature()
    {
        Assert.Equal(1, Arrhenius.Factor(80e3, 298.15, 298.15), 12);
        Assert.True(Arrhenius.Factor(80e3, 333.15, 298.15) > 1);
    }
}
