namespace Layers.Tests.Verification;

/// <summary>
/// The flux into a face medium and the concentration at a named depth, at numerics.accuracy 1e-3, 1e-4 and 1e-5:
/// |value - exact| &lt;= accuracy |exact| on the rows the run meets outright; every such figure is also held to the
/// promise as the docs state it (within the accuracy or listed as missing it) by <see cref="ErrorEstimateTests"/>.
/// Sources: Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4, section 4.3, eq. 4.24a (from memory) and its
/// time derivative for the flux through a membrane that starts empty, and eq. 4.37 (from memory) and its time
/// derivative for a sheet releasing into a stirred solution of limited volume; Crank (1975), ch. 3, composite media,
/// and Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed. (1959), ch. 2.15 (section numbers from memory), for
/// two semi-infinite media in contact with a partition coefficient. Each row also checks the exact Laplace-domain
/// solution against the closed form (see <see cref="OutputAccuracyChecks"/>).
/// </summary>
public sealed class OutputAccuracyTests
{
    /// <summary>Rows: numerics.accuracy, index of the report time in OutputAccuracyChecks.MembraneTaus.</summary>
    [Theory]
    [InlineData(1e-3, 3)]
    [InlineData(1e-3, 4)]
    [InlineData(1e-3, 5)]
    [InlineData(1e-3, 6)]
    [InlineData(1e-4, 3)]
    [InlineData(1e-4, 5)]
    [InlineData(1e-4, 6)]
    [InlineData(1e-5, 2)]
    [InlineData(1e-5, 3)]
    [InlineData(1e-5, 5)]
    [InlineData(1e-5, 6)]
    public void The_flux_into_the_sink_through_a_membrane_is_within_the_accuracy_of_its_own_value(double accuracy, int report)
        => OutputAccuracyChecks.MembraneFluxIntoSink(accuracy, report);

    /// <summary>
    /// Rows: numerics.accuracy, index of the report time (OutputAccuracyChecks.MediaTimeFractions), index of the depth
    /// (OutputAccuracyChecks.MediaDepthMultiples), layer read (at the contact, 0 and 1 are its two sides). Rows whose
    /// exact value is below 1e-6 of the loaded concentration are left out (the two deepest depths at the first time).
    /// </summary>
    [Theory]
    [InlineData(1e-3, 0, 0, 0)]
    [InlineData(1e-3, 0, 2, 0)]
    [InlineData(1e-3, 0, 3, 0)]
    [InlineData(1e-3, 0, 3, 1)]
    [InlineData(1e-3, 1, 0, 0)]
    [InlineData(1e-3, 1, 2, 0)]
    [InlineData(1e-3, 1, 3, 0)]
    [InlineData(1e-3, 1, 3, 1)]
    [InlineData(1e-3, 2, 2, 0)]
    [InlineData(1e-3, 2, 3, 0)]
    [InlineData(1e-3, 2, 3, 1)]
    [InlineData(1e-3, 2, 4, 1)]
    [InlineData(1e-4, 0, 0, 0)]
    [InlineData(1e-4, 1, 0, 0)]
    [InlineData(1e-4, 2, 1, 0)]
    [InlineData(1e-5, 0, 0, 0)]
    [InlineData(1e-5, 1, 0, 0)]
    [InlineData(1e-5, 2, 1, 0)]
    public void The_concentration_at_a_named_depth_is_within_the_accuracy_of_its_own_value(double accuracy, int report, int depth, int layer)
        => OutputAccuracyChecks.MediaConcentrationAtDepth(accuracy, report, depth, layer);
}
