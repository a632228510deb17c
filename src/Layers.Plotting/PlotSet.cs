using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Plotting;

/// <summary>The set of plots written for every case.</summary>
public static class PlotSet
{
    /// <summary>File name of the concentration profile plot.</summary>
    public const string ProfileFileName = "profile.png";

    /// <summary>File name of the transferred-amount plot.</summary>
    public const string TransferFileName = "transfer.png";

    /// <summary>File name of the approach-to-final-state plot (an equilibrium, or everything removed).</summary>
    public const string EquilibriumFileName = "equilibrium.png";

    /// <summary>
    /// File name of the cumulative permeation plot drawn in place of the approach to equilibrium when two baths at
    /// different levels drive a steady permeation: the amount received with its steady asymptote and lag time.
    /// </summary>
    public const string PermeationFileName = "permeation.png";

    /// <summary>File name of the model-and-measurement cumulative amount plot (cases with permeation metrics only).</summary>
    public const string CumulativeFileName = "cumulative.png";

    /// <summary>
    /// The file name of the plot of how the system approaches its final state, named by what it shows: the
    /// cumulative permeation for steady permeation between two baths, else the approach to equilibrium.
    /// </summary>
    public static string FinalStateFileName(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.FinalState.Kind == FinalStateKind.SteadyPermeation ? PermeationFileName : EquilibriumFileName;
    }

    /// <summary>Renders every plot of a result.</summary>
    /// <param name="result">A simulation result.</param>
    /// <param name="options">Picture size and axis choices.</param>
    /// <param name="cancellation">Checked before each plot; once it fires, <see cref="OperationCanceledException"/> is thrown.</param>
    /// <returns>
    /// PNG bytes by file name: profile.png, transfer.png, equilibrium.png (permeation.png for steady permeation
    /// between two baths), and cumulative.png for cases with permeation metrics.
    /// </returns>
    public static IReadOnlyDictionary<string, byte[]> Render(SimulationResult result, PlotOptions options, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        var plots = new Dictionary<string, byte[]>(StringComparer.Ordinal);
        void Add(string name, Func<OxyPlot.PlotModel> create)
        {
            cancellation.ThrowIfCancellationRequested();
            plots[name] = PngRenderer.Render(create(), options);
        }

        Add(ProfileFileName, () => ProfilePlot.Create(result, options));
        Add(TransferFileName, () => TransferPlot.Create(result, options));
        Add(FinalStateFileName(result), () => EquilibriumPlot.Create(result, options));
        if (CumulativeAmountPlot.Applies(result))
        {
            Add(CumulativeFileName, () => CumulativeAmountPlot.Create(result, options));
        }

        cancellation.ThrowIfCancellationRequested();
        return plots;
    }

    /// <summary>
    /// A caption for each plot <see cref="Render"/> makes for this result, by file name: what the figure shows and
    /// how to read it, for report.html.
    /// </summary>
    public static IReadOnlyDictionary<string, string> Captions(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var captions = new Dictionary<string, string>(StringComparer.Ordinal)
        {
            [ProfileFileName] = PlotCaptions.Profile(result),
            [TransferFileName] = PlotCaptions.Transfer(result),
            [FinalStateFileName(result)] = PlotCaptions.FinalState(result),
        };
        if (CumulativeAmountPlot.Applies(result))
        {
            captions[CumulativeFileName] = PlotCaptions.Cumulative(result);
        }

        return captions;
    }
}
