using System.Text;
using Layers.Core.Reports;
using Layers.Core.Results;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>The files written for one solved case, by name.</summary>
internal static class CaseFiles
{
    public const string Summary = "summary.json";

    public static Dictionary<string, byte[]> Build(SimulationResult result, RunSettings settings)
    {
        var pictures = settings.Plots ? PlotSet.Render(result, settings.PlotOptions) : new Dictionary<string, byte[]>();
        var files = new Dictionary<string, byte[]>
        {
            [Summary] = Encoding.UTF8.GetBytes(SummaryJson.Write(result, settings.CasePath)),
            ["timeseries.csv"] = Encoding.UTF8.GetBytes(TimeSeriesCsv.Write(result)),
            ["profiles.csv"] = Encoding.UTF8.GetBytes(ProfilesCsv.Write(result)),
            ["report.html"] = Encoding.UTF8.GetBytes(HtmlReport.Write(result, settings.CasePath, pictures)),
        };
        foreach (var (name, png) in pictures)
        {
            files[name] = png;
        }

        return files;
    }
}
