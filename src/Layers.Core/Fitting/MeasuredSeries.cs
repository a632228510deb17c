using Layers.Core.Cases;
using Layers.Core.Files;
using Layers.Core.Units;

namespace Layers.Core.Fitting;

/// <summary>What a measured file holds, from the kind of unit of its value column.</summary>
public enum MeasuredQuantity
{
    /// <summary>The concentration in the compartment on the chosen face (a mass per volume, e.g. mg/L).</summary>
    Concentration,

    /// <summary>The cumulative amount per area received by the medium on the chosen face (e.g. ug/cm2).</summary>
    AmountPerArea,

    /// <summary>
    /// The concentration in the compartment on the chosen face as a mass fraction (e.g. mg/kg of food), compared with
    /// the model through the compartment's density.
    /// </summary>
    MassFraction,
}

/// <summary>Measured values against time, in SI, as read from the user's CSV file.</summary>
/// <param name="FileName">The file as the user named it.</param>
/// <param name="Quantity">What the values are.</param>
/// <param name="TimeUnit">The unit of the time column, for display.</param>
/// <param name="ValueUnit">The unit of the value column, for display.</param>
/// <param name="ValueName">The name of the value column, e.g. "cumulative amount".</param>
/// <param name="TimesSeconds">Measurement times, s, ascending.</param>
/// <param name="Values">Measured values, SI (kg/m3, kg/kg or kg/m2).</param>
/// <param name="Deviations">Standard deviations of the values, SI, or null when the file gives none.</param>
public sealed record MeasuredSeries(
    string FileName,
    MeasuredQuantity Quantity,
    UnitDefinition TimeUnit,
    UnitDefinition ValueUnit,
    string ValueName,
    IReadOnlyList<double> TimesSeconds,
    IReadOnlyList<double> Values,
    IReadOnlyList<double>? Deviations)
{
    private static readonly MeasuredCsv.Layout Layout = new(
        [Dimension.MassConcentration, Dimension.MassFraction, Dimension.MassPerArea],
        "time [h],concentration [mg/L],sd [mg/L]",
        "a concentration (mass per volume, or mass per mass for a compartment with a density) or a cumulative amount per area",
        AllowsDeviation: true);

    /// <summary>
    /// Reads a measured file: <c>time [unit],value [unit]</c> and optionally <c>,sd [unit]</c>; a value unit of
    /// concentration means compartment concentrations, one of mass per area cumulative amounts per area.
    /// </summary>
    /// <returns>The series, or null with the problem (file, line, what was expected) in <paramref name="problem"/>.</returns>
    public static MeasuredSeries? Read(string path, out string? problem)
    {
        // The path is the user's own, given on the command line: any regular file they can read.
        var text = InputFile.ReadText(path, InputFile.CaseLimitBytes, out var reason);
        problem = reason is null ? null : $"'{path}': {reason}";
        if (text is null || MeasuredCsv.Parse(text, path, Layout, out problem) is not { } table)
        {
            return null;
        }

        var quantity = table.ValueUnit.Dimension switch
        {
            Dimension.MassPerArea => MeasuredQuantity.AmountPerArea,
            Dimension.MassFraction => MeasuredQuantity.MassFraction,
            _ => MeasuredQuantity.Concentration,
        };
        return new MeasuredSeries(path, quantity, table.TimeUnit, table.ValueUnit, table.ValueName, table.TimesSeconds, table.Values, table.Deviations);
    }
}
