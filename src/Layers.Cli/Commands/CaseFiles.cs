using System.Text;
using Layers.Core.Reports;
using Layers.Core.Results;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>The files written for one solved case, by name.</summary>
internal static class CaseFiles
{
    public const string Summary = "summary.json";

    /// <summary>
    /// The files of a solved case; throws <see cref="OperationCanceledException"/> between plots and files once
    /// <paramref name="cancellation"/> fires (Ctrl+C, SIGTERM), so that nothing more is made.
    /// </summary>
    public static Dictionary<string, byte[]> Build(SimulationResult result, RunSettings settings, CancellationToken cancellation)
    {
        var pictures = settings.Plots
            ? PlotSet.Render(result, settings.PlotOptions, cancellation)
            : new Dictionary<string, byte[]>();
        var files = new Dictionary<string, byte[]>();
        void Add(string name, Func<string> text)
        {
            cancellation.ThrowIfCancellationRequested();
            files[name] = Encoding.UTF8.GetBytes(text());
        }

        Add(Summary, () => SummaryJson.Write(result, settings.CasePath));
        Add("timeseries.csv", () => TimeSeriesCsv.Write(result));
        Add("profiles.csv", () => ProfilesCsv.Write(result));
        if (DepthsCsv.Write(result) is { } depths)
        {
            Add("depths.csv", () => depths);
        }

        Add("report.html", () => HtmlReport.Write(result, settings.CasePath, pictures, PlotSet.Captions(result)));
        cancellation.ThrowIfCancellationRequested();
        foreach (var (name, png) in pictures)
        {
            files[name] = png;
        }

        return files;
    }
}
