using Layers.Core.Analytics;
using Layers.Core.Laplace;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Laplace;

/// <summary>
/// Two media in contact with a partition coefficient K = c1/c2 at the contact, medium 1 loaded, medium 2 empty.
/// References: Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed. (1959), ch. 2 (two semi-infinite solids in
/// contact, section 2.15 from memory); Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 3 (composite media;
/// section from memory); as written by Analytics.TwoSemiInfiniteMedia. Each medium is a layer so thick that its far
/// face, closed, is reached by erfc(L / (2 sqrt(D t))) &lt; erfc(6) = 2e-17 of the change: semi-infinite to round-off.
/// </summary>
public sealed class SemiInfiniteLaplaceTests
{
    [Theory]
    [InlineData(1e-13, 4e-13, 5.0)]
    [InlineData(1e-12, 1e-14, 0.02)]
    [InlineData(1e-9, 1e-17, 1e6)]
    [InlineData(1e-17, 1e-9, 1e-6)]
    public void Transferred_mass_and_profile_match_the_erfc_solution_to_1e_8(double d1, double d2, double k1Over2)
    {
        const double c0 = 300;
        const double time = 3600;
        var thickness1 = 12 * Math.Sqrt(d1 * time);
        var thickness2 = 12 * Math.Sqrt(d2 * time);
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            time,
            layers: [Cases.Layer("first", thickness1, d1, k1Over2, c0), Cases.Layer("second", thickness2, d2, 1)]);
        var solution = LaplaceSolution.For(simulation);

        var snapshot = solution.At(time);
        var expected = TwoSemiInfiniteMedia.MassPerAreaTransferred(d1, d2, k1Over2, c0, time);
        Tolerance.Relative(expected, snapshot.LayerMassPerArea[1], 1e-8, "mass transferred into the second medium");
        Tolerance.Relative(c0 * thickness1 - expected, snapshot.LayerMassPerArea[0], 1e-8, "mass left in the first medium");

        // The flux across the contact is the time derivative of A * 2 sqrt(D2 t / pi), i.e. the transferred mass / (2 t).
        Tolerance.Relative(expected / (2 * time), snapshot.FluxAtInterfaces[1], 1e-8, "flux across the contact");

        // Depths measured from the contact: x < 0 in medium 1, x >= 0 in medium 2.
        double[] positions = [-0.3 * thickness1, -0.05 * thickness1, 0, 0.02 * thickness2, 0.1 * thickness2];
        var profile = solution.ConcentrationsAt([.. positions.Select(x => thickness1 + x)], time);
        for (var i = 0; i < positions.Length; i++)
        {
            var reference = TwoSemiInfiniteMedia.Concentration(d1, d2, k1Over2, c0, positions[i], time);
            var scale = positions[i] < 0 ? c0 : c0 / k1Over2;
            Tolerance.Absolute(reference / scale, profile[i] / scale, 1e-8, $"c at x = {positions[i]:G3} m");
        }

        // On the first side of the contact c1 = K A (A the second side's value): written so, not as C0 - B, which
        // cancels to a few digits when K is small and medium 2 is fast.
        var firstSide = solution.ConcentrationAtFace(0, Layers.Core.Domain.Side.Right, time);
        Tolerance.Relative(k1Over2 * TwoSemiInfiniteMedia.Concentration(d1, d2, k1Over2, c0, 0, time), firstSide, 1e-8, "c on the first side of the contact");
    }

    [Theory]
    [InlineData(1e-13, 4e-13, 5.0)]
    [InlineData(1e-12, 1e-14, 0.02)]
    [InlineData(1e-9, 1e-17, 1e6)]
    [InlineData(1e-17, 1e-9, 1e-6)]
    public void Amounts_and_contact_flux_over_a_window_of_times_match_to_1e_8(double d1, double d2, double k1Over2)
    {
        // Five times over two decades through AtTimes (one hyperbolic contour, or two): the media are semi-infinite
        // to round-off up to the last time, as above.
        const double c0 = 300;
        const double last = 3600;
        var thickness1 = 12 * Math.Sqrt(d1 * last);
        var thickness2 = 12 * Math.Sqrt(d2 * last);
        var simulation = Cases.Make(
            Cases.Closed,
            Cases.Closed,
            last,
            layers: [Cases.Layer("first", thickness1, d1, k1Over2, c0), Cases.Layer("second", thickness2, d2, 1)]);
        double[] times = [36, 100, 600, 1800, last];
        var snapshots = LaplaceSolution.For(simulation).AtTimes(times);
        for (var i = 0; i < times.Length; i++)
        {
            var expected = TwoSemiInfiniteMedia.MassPerAreaTransferred(d1, d2, k1Over2, c0, times[i]);
            Tolerance.Relative(expected, snapshots[i].LayerMassPerArea[1], 1e-8, $"mass transferred into the second medium at {times[i]} s");
            Tolerance.Relative(c0 * thickness1 - expected, snapshots[i].LayerMassPerArea[0], 1e-8, $"mass left in the first medium at {times[i]} s");
            Tolerance.Relative(expected / (2 * times[i]), snapshots[i].FluxAtInterfaces[1], 1e-8, $"flux across the contact at {times[i]} s");
        }
    }
}
