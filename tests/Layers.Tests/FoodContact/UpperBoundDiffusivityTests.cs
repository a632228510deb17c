using Layers.Core.FoodContact;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>
/// The upper-bound diffusion correlation D_P = 1e4 exp(A_P' - tau/T - 0.1351 Mr^(2/3) + 0.003 Mr - 10454/T) cm2/s,
/// Begley et al., Food Addit. Contam. 22 (2005) 73-90 (citation checked; equation constants from memory). The polymer constants
/// used here are the ones the data file carries for LDPE and HDPE, recalled from memory of that paper's table and
/// flagged unverified there; the checks below test the arithmetic of the equation, not those constants.
/// </summary>
public sealed class UpperBoundDiffusivityTests
{
    [Fact]
    public void Ldpe_at_25_C_for_a_migrant_of_531_g_per_mol_matches_the_value_worked_by_hand()
    {
        // By hand: Mr^(2/3) = 531^(2/3) = 65.574; 0.1351 x 65.574 = 8.8590; 0.003 x 531 = 1.593;
        // 10454 / 298.15 = 35.0629; exponent = 11.5 - 0 - 8.8590 + 1.593 - 35.0629 = -30.8289;
        // D = 1e4 x exp(-30.8289) = 4.085e-10 cm2/s = 4.085e-14 m2/s.
        var ldpe = new PolymerConstants("LDPE", [], 11.5, 0, "test", false);

        var value = UpperBoundDiffusivity.SquareMetersPerSecond(ldpe, 531, 298.15);

        Tolerance.Relative(4.085e-14, value, 1e-3, "D_P of LDPE, Mr 531, 25 C");
    }

    [Fact]
    public void Hdpe_with_tau_at_40_C_for_a_migrant_of_200_g_per_mol_matches_the_value_worked_by_hand()
    {
        // By hand: 200^(2/3) = 34.1995; 0.1351 x 34.1995 = 4.6204; 0.003 x 200 = 0.6; tau/T = 1577 / 313.15 = 5.0359;
        // 10454 / 313.15 = 33.3834; exponent = 14.5 - 5.0359 - 4.6204 + 0.6 - 33.3834 = -27.9397;
        // D = 1e4 x exp(-27.9397) = 7.345e-9 cm2/s = 7.345e-13 m2/s.
        var hdpe = new PolymerConstants("HDPE", [], 14.5, 1577, "test", false);

        var value = UpperBoundDiffusivity.SquareMetersPerSecond(hdpe, 200, 313.15);

        Tolerance.Relative(7.345e-13, value, 1e-3, "D_P of HDPE, Mr 200, 40 C");
    }

    [Fact]
    public void Implied_activation_energy_is_R_times_10454_plus_tau()
    {
        // d ln D / d(1/T) = -(10454 + tau), so Ea = R (10454 + tau): 86.9 kJ/mol for tau = 0 (computed from the equation).
        var ldpe = new PolymerConstants("LDPE", [], 11.5, 0, "test", false);
        var ratio = UpperBoundDiffusivity.SquareMetersPerSecond(ldpe, 300, 333.15) / UpperBoundDiffusivity.SquareMetersPerSecond(ldpe, 300, 298.15);
        var activationEnergy = -Math.Log(ratio) * 8.314462618 / ((1 / 333.15) - (1 / 298.15));

        Tolerance.Relative(86.92e3, activationEnergy, 1e-3, "activation energy implied by the correlation");
    }

    [Fact]
    public void Every_row_of_the_polymer_table_names_its_source_and_says_whether_it_was_checked()
    {
        Assert.NotEmpty(PolymerTable.All);
        foreach (var row in PolymerTable.All)
        {
            Assert.False(string.IsNullOrWhiteSpace(row.Source), row.Name);
            Assert.True(row.Verified || row.Source.Contains("memory", StringComparison.OrdinalIgnoreCase), $"{row.Name}: unchecked rows must say 'memory'");
        }
    }

    [Fact]
    public void Polymers_are_found_by_name_or_alias_ignoring_case()
    {
        Assert.Equal("LDPE", PolymerTable.Find("low-density polyethylene")?.Name);
        Assert.Equal("PP", PolymerTable.Find("pp")?.Name);
        Assert.Null(PolymerTable.Find("unobtainium"));
    }
}
