using Layers.Core.Results;

namespace Layers.Plotting;

/// <summary>The set of plots written for every case.</summary>
public static class PlotSet
{
    /// <summary>File name of the concentration profile plot.</summary>
    public const string ProfileFileName = "profile.png";

    /// <summary>File name of the transferred-amount plot.</summary>
    public const string TransferFileName = "transfer.png";

    /// <summary>File name of the approach-to-final-state plot (cumulative permeation for two baths).</summary>
    public const string EquilibriumFileName = "equilibrium.png";

    /// <summary>File name of the model-and-measurement cumulative amount plot (cases with permeation metrics only).</summary>
    public const string CumulativeFileName = "cumulative.png";

    /// <summary>Renders every plot of a result.</summary>
    /// <param name="result">A simulation result.</param>
    /// <param name="options">Picture size and axis choices.</param>
    /// <param name="cancellation">Checked before each plot; once it fires, <see cref="OperationCanceledException"/> is thrown.</param>
    /// <returns>PNG bytes by file name: profile.png, transfer.png and equilibrium.png, and cumulative.png for cases with permeation metrics.</returns>
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
        Add(EquilibriumFileName, () => EquilibriumPlot.Create(result, options));
        if (CumulativeAmountPlot.Applies(result))
        {
            Add(CumulativeFileName, () => CumulativeAmountPlot.Create(result, options));
        }

        cancellation.ThrowIfCancellationRequested();
        return plots;
    }
}
