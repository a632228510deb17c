using Layers.Tests.TestSupport;

// Not "Layers.Tests.Cases": that namespace would hide the TestSupport.Cases helper from the other test folders.
namespace Layers.Tests.CaseReading;

/// <summary>
/// <c>$.depths</c> is read in metres, in the order given, from the left face to the right face of the stack
/// inclusive. Conversions: the SI prefixes micro (1e-6) and milli (1e-3) (BIPM, The International System of Units,
/// 9th ed. (2019), table 7).
/// </summary>
public sealed class DepthsReaderTests
{
    [Fact]
    public void Depths_are_read_in_metres_in_the_order_given_both_faces_included()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(("$.depths", """["10 um", "0.05 mm", "0 um"]""")));

        Assert.True(read.IsValid, string.Join("; ", read.Errors));
        Assert.Equal(3, read.Case!.ReportDepthsMeters.Count);
        Tolerance.Relative(10e-6, read.Case.ReportDepthsMeters[0], 1e-15, "10 um");
        Tolerance.Relative(50e-6, read.Case.ReportDepthsMeters[1], 1e-15, "0.05 mm, the right face of a 50 um stack");
        Assert.Equal(0, read.Case.ReportDepthsMeters[2]);
    }

    [Fact]
    public void A_case_without_depths_reports_none()
    {
        var read = CaseJson.Read(CaseJson.Minimal);

        Assert.Empty(read.Case!.ReportDepthsMeters);
    }
}
