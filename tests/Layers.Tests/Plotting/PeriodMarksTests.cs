using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Plotting;
using Layers.Tests.TestSupport;
using OxyPlot.Annotations;
using OxyPlot.Series;

namespace Layers.Tests.Plotting;

/// <summary>The periods of a schedule on the plots: a line at each period start over time, the period a profile ends.</summary>
public sealed class PeriodMarksTests
{
    [Fact]
    public void The_transfer_plot_marks_each_period_start_and_the_profile_names_the_period_each_curve_ends()
    {
        var read = CaseDocument.ReadFile(RepoRoot.File("cases", "reusable-container-three-contacts.json"));
        var result = Simulator.Run(read.Case!);

        var transfer = TransferPlot.Create(result, new PlotOptions());
        var lines = transfer.Annotations.OfType<LineAnnotation>().Where(line => line.Type == LineAnnotationType.Vertical).ToList();
        Assert.Equal(2, lines.Count);
        Assert.Contains("starts of the schedule's periods", transfer.Subtitle, StringComparison.Ordinal);

        var profile = ProfilePlot.Create(result, new PlotOptions());
        var legend = profile.Series.OfType<LineSeries>().Where(line => line.RenderInLegend).Select(line => line.Title).ToList();
        Assert.Contains(legend, title => title.EndsWith("(end of 'contact 3 of 3')", StringComparison.Ordinal));
    }
}
