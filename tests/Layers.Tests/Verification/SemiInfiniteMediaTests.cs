using Layers.Core.Analytics;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// Two media in contact, each thick enough to be semi-infinite over the time simulated, with a partition
/// coefficient at the contact. Reference: Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 3 (composite
/// media, erfc solution; section number from memory); Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed. (1959), ch. 2.15.
/// </summary>
public sealed class SemiInfiniteMediaTests
{
    [Theory]
    [InlineData(1e-13, 4e-13, 5.0)]
    [InlineData(1e-12, 1e-14, 0.02)]
    public void Transferred_mass_and_profile_match_the_erfc_solution(double d1, double d2, double k1Over2)
    {
        const double c0 = 300;
        var thickness1 = 400e-6;
        var thickness2 = 400e-6;
        // L / (2 sqrt(D t)) = 4 in the faster medium: the far faces see erfc(4) ~ 1.5e-8 of the change, so both
        // layers are effectively semi-infinite.
        var time = Math.Pow(Math.Min(thickness1, thickness2) / 8, 2) / Math.Max(d1, d2);
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            time,
            numerics: Cases.FixedFineMesh,
            layers: [Cases.Layer("first", thickness1, d1, k1Over2, c0), Cases.Layer("second", thickness2, d2, 1)]);

        var result = Simulator.Run(simulation);

        var report = result.Reports[^1];
        var expected = TwoSemiInfiniteMedia.MassPerAreaTransferred(d1, d2, k1Over2, c0, time);
        Tolerance.Relative(expected, report.Sample.LayerMassPerArea[1], 1e-3, "mass transferred into the second medium");
        var interfaceSecondSide = report.Profiles[1].ConcentrationsKgPerCubicMeter[0];
        var expectedInterface = TwoSemiInfiniteMedia.Concentration(d1, d2, k1Over2, c0, 0, time);
        Tolerance.Relative(expectedInterface, interfaceSecondSide, 1e-3, "concentration on the second side of the contact");
    }
}
