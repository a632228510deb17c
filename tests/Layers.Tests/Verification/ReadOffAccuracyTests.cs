using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Simulation;
using static Layers.Tests.TestSupport.ReadOffReferences;

namespace Layers.Tests.Verification;

/// <summary>
/// Figures read off a run, held relative to their own value against closed forms (<see cref="TestSupport.ReadOffReferences"/>,
/// Crank ch. 4), with the exact method in the Laplace domain beside them as a second reference. The same figures are
/// held to the accuracy promise at 1e-3, 1e-4 and 1e-5 by <see cref="ErrorEstimateTests"/>.
/// </summary>
public sealed class ReadOffAccuracyTests
{
    [Theory]
    [InlineData(1e-3)]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    public void Concentration_at_the_closed_face_early_in_the_release_is_within_the_accuracy(double accuracy)
    {
        var time = 0.05 * TimeScale;
        var simulation = ReleasingSheet(NumericsSettings.ForAccuracy(accuracy) with { Method = SolutionMethod.FiniteVolume }, time);

        var simulated = Simulator.Run(simulation).Reports[^1].Profiles[0].ConcentrationsKgPerCubicMeter[0];

        var exact = ClosedFaceConcentration(time);
        AssertRelative(exact, LaplaceSolution.For(simulation).ConcentrationAt(0, time), 1e-7, "Laplace against Crank eq. 4.17");
        AssertRelative(exact, simulated, accuracy, "concentration at the closed face at D t/L^2 = 0.05 (Crank eq. 4.17)");
    }

    [Fact]
    public void Time_to_half_release_on_a_fine_mesh_is_limited_by_the_mesh_not_by_the_reading()
    {
        // 400 cells at step tolerance 1e-4: the crossing placed on the step's interpolant is within 5e-5 here; placed on
        // a straight line between the step's ends it was 5.5e-4 off, the curvature of F over a step.
        var simulation = ReleasingSheet(NumericsSettings.FixedCells(400, 1e-4), 0.5 * TimeScale);

        var simulated = Simulator.Run(simulation).FinalState.System.Half!.Value;

        var exact = TimeToReleasedFraction(0.5);
        var laplace = LaplaceSolution.For(simulation).FirstTimeReaching(
            snapshot => 1 - (snapshot.StackMassPerArea / (InitialConcentration * Thickness)), 0.5, TimeScale)!.Value;
        AssertRelative(exact, laplace, 1e-7, "Laplace against Crank eq. 4.18");
        AssertRelative(exact, simulated, 1e-4, "time to half release (Crank eq. 4.18)");
    }

    [Theory]
    [InlineData(40, 1e-3)]
    [InlineData(400, 3e-5)]
    public void Lag_time_from_the_steady_asymptote_converges_with_the_mesh(int cells, double bound)
    {
        var simulation = Membrane(NumericsSettings.FixedCells(cells, 1e-6));

        var simulated = Simulator.Run(simulation).Permeation!.LagTimeSeconds!.Value;

        AssertRelative(MembraneLagSeconds, LaplaceSolution.For(simulation).SteadyLine(Side.Right)!.LagTimeSeconds, 1e-7, "Laplace against Crank eq. 4.24c");
        AssertRelative(MembraneLagSeconds, simulated, bound, $"lag time on {cells} cells (Crank eq. 4.24c)");
    }

    [Fact]
    public void Concentrations_on_both_sides_of_a_contact_between_semi_infinite_media_are_within_the_accuracy()
    {
        const double accuracy = 1e-3;
        var profiles = Simulator.Run(SemiInfiniteContact(NumericsSettings.ForAccuracy(accuracy) with { Method = SolutionMethod.FiniteVolume })).Reports[^1].Profiles;

        AssertRelative(ContactPartition * ContactValue, profiles[0].ConcentrationsKgPerCubicMeter[^1], accuracy, "first side of the contact (erfc solution)");
        AssertRelative(ContactValue, profiles[1].ConcentrationsKgPerCubicMeter[0], accuracy, "second side of the contact (erfc solution)");
    }
}
