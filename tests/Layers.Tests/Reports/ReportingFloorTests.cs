using System.Globalization;
using Layers.Core.Analytics;
using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Reports;

/// <summary>
/// A figure below the run's reporting floor (the level the numerical-error estimate counts as negligible,
/// docs/numerics.md "The accuracy promise") has no known accuracy; the tables show "&lt; floor" in its place (issue
/// #20: no '1.28×10⁻⁴⁹ mg/kg'). The amounts are checked against the Daynes-Barrer solution (Crank, The Mathematics
/// of Diffusion, 2nd ed., ch. 4, eq. 4.24a, from memory; <see cref="MembraneTimeLag"/>).
/// </summary>
public sealed class ReportingFloorTests
{
    private const string Membrane = """
        {
          "layers": [ { "name": "membrane", "thickness": "100 um", "diffusionCoefficient": "1e-7 cm2/s" } ],
          "left": { "kind": "bath", "name": "donor", "concentration": "1 mg/mL" },
          "right": { "kind": "bath", "name": "receiver" },
          "reportTimes": [ "10 s", "1 h" ],
          "duration": "1 h",
          "numerics": { "method": "finiteVolume" }
        }
        """;

    // The finite volumes carry a tiny amount ahead of the front at 10 s (the exact method gives 0 there, shown as 0).
    [Fact]
    public void An_amount_below_the_floor_is_shown_as_below_it_and_one_above_with_its_digits()
    {
        var read = CaseReader.ReadText(Membrane, "floor.json");
        Assert.True(read.IsValid, read.FormatErrors());
        var result = Simulator.Run(read.Case!);
        var floor = NegligibleFloor.AmountPerArea(result);
        var early = MembraneTimeLag.CumulativeMassPerArea(1e-11, 100e-6, 1, 1, 10);
        var late = MembraneTimeLag.CumulativeMassPerArea(1e-11, 100e-6, 1, 1, 3600);
        Assert.True(early < floor && late > floor, $"the case must straddle the floor: {early}, {late}, floor {floor}");

        var table = ResultTables.AtReportTimes(result);

        var received = table.Headers.ToList().FindIndex(header => header.StartsWith("receiver: received", StringComparison.Ordinal));
        Assert.StartsWith("< ", table.Rows[0][received], StringComparison.Ordinal);
        // The floor is shown with one digit, in the column's unit (ug/cm2: 1 kg/m2 = 1e5 ug/cm2).
        var shownFloor = double.Parse(table.Rows[0][received][2..], CultureInfo.InvariantCulture);
        Tolerance.Relative(floor * 1e5, shownFloor, 0.5, "floor");
        Tolerance.Relative(late * 1e5, double.Parse(table.Rows[1][received], CultureInfo.InvariantCulture), 1e-3, "Q at 1 h");
    }

    [Theory]
    [InlineData(1.4e-5, 2e-5)]
    [InlineData(1e-5, 1e-5)]
    [InlineData(1.0000000000000002e-5, 1e-5)]
    [InlineData(9.2e-7, 1e-6)]
    [InlineData(3, 3)]
    public void A_floor_is_shown_rounded_up_so_that_less_than_it_stays_true(double floor, double shown)
    {
        // Common practice, no source: a bound stated to one digit is rounded outward.
        var rounded = NegligibleFloor.RoundedUp(floor);

        Tolerance.Relative(shown, rounded, 1e-12, "floor as shown");
        Assert.True(rounded >= floor * (1 - 1e-9));
    }
}
