using System.Text;
using Layers.Core.Domain;
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
            ? PlotSet.Render(result, WithMigrationLimit(settings.PlotOptions, result), cancellation)
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
        Add("report.html", () => HtmlReport.Write(result, settings.CasePath, pictures));
        cancellation.ThrowIfCancellationRequested();
        foreach (var (name, png) in pictures)
        {
            files[name] = png;
        }

        return files;
    }

    /// <summary>
    /// The specific migration limit drawn on the transfer plot, as the mass per contact area that brings the food
    /// from its initial content to the limit: (limit - initial fraction) x density x volume per area.
    /// </summary>
    private static PlotOptions WithMigrationLimit(PlotOptions options, SimulationResult result)
    {
        if (options.LimitMassPerArea is not null
            || result.FoodContact is not { SpecificMigrationLimit: { } limit } food
            || result.Case.Face(food.FoodSide) is not CompartmentFace compartment)
        {
            return options;
        }

        var initialFraction = compartment.InitialConcentrationKgPerCubicMeter / food.FoodDensityKgPerCubicMeter;
        var perArea = (limit - initialFraction) * food.FoodDensityKgPerCubicMeter * compartment.VolumePerAreaMeters;
        return perArea > 0 ? options with { LimitMassPerArea = perArea, LimitLabel = "specific migration limit" } : options;
    }
}
