using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Simulation;
using static Layers.Tests.TestSupport.ReadOffReferences;

namespace Layers.Tests.Pending;

/// <summary>
/// Read-off figures at numerics.accuracy, relative to their own value, that the present mesh and step rules do not meet
/// (measured errors in docs/numerics.md, "Figures read off a run"): excluded from compilation in the test project until
/// the adaptive refinement lands. The reading itself is not the limit: on a fine mesh these figures are held
/// (Verification/ReadOffAccuracyTests.cs).
/// </summary>
public sealed class ReadOffAccuracyPendingTests
{
    [Theory]
    [InlineData(1e-3)]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    public void Time_to_half_release_of_a_plane_sheet_is_within_the_accuracy(double accuracy)
    {
        var simulation = ReleasingSheet(NumericsSettings.ForAccuracy(accuracy), 0.5 * TimeScale);

        var simulated = Simulator.Run(simulation).FinalState.System.Half!.Value;

        var exact = TimeToReleasedFraction(0.5);
        var laplace = LaplaceSolution.For(simulation).FirstTimeReaching(
            snapshot => 1 - (snapshot.StackMassPerArea / (InitialConcentration * Thickness)), 0.5, TimeScale)!.Value;
        AssertRelative(exact, laplace, 1e-7, "Laplace against Crank eq. 4.18");
        AssertRelative(exact, simulated, accuracy, "time to half release (Crank eq. 4.18)");
    }

    [Theory]
    [InlineData(1e-3)]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    public void Lag_time_of_a_single_membrane_is_within_the_accuracy(double accuracy)
    {
        var simulation = Membrane(NumericsSettings.ForAccuracy(accuracy));

        var simulated = Simulator.Run(simulation).Permeation!.LagTimeSeconds!.Value;

        AssertRelative(MembraneLagSeconds, LaplaceSolution.For(simulation).SteadyLine(Side.Right)!.LagTimeSeconds, 1e-7, "Laplace against Crank eq. 4.24c");
        AssertRelative(MembraneLagSeconds, simulated, accuracy, "lag time (Crank eq. 4.24c)");
    }

    [Theory]
    [InlineData(1e-3)]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    public void Concentration_at_the_closed_face_later_in_the_release_is_within_the_accuracy(double accuracy)
    {
        var time = 0.2 * TimeScale;
        var simulation = ReleasingSheet(NumericsSettings.ForAccuracy(accuracy), time);

        var simulated = Simulator.Run(simulation).Reports[^1].Profiles[0].ConcentrationsKgPerCubicMeter[0];

        var exact = ClosedFaceConcentration(time);
        AssertRelative(exact, LaplaceSolution.For(simulation).ConcentrationAt(0, time), 1e-7, "Laplace against Crank eq. 4.17");
        AssertRelative(exact, simulated, accuracy, "concentration at the closed face at D t/L^2 = 0.2 (Crank eq. 4.17)");
    }

    [Theory]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    public void Concentrations_on_both_sides_of_a_contact_between_semi_infinite_media_are_within_the_accuracy(double accuracy)
    {
        var profiles = Simulator.Run(SemiInfiniteContact(NumericsSettings.ForAccuracy(accuracy))).Reports[^1].Profiles;

        AssertRelative(ContactPartition * ContactValue, profiles[0].ConcentrationsKgPerCubicMeter[^1], accuracy, "first side of the contact (erfc solution)");
        AssertRelative(ContactValue, profiles[1].ConcentrationsKgPerCubicMeter[0], accuracy, "second side of the contact (erfc solution)");
    }
}
