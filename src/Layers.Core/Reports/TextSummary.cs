using System.Globalization;
using System.Text;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>The short human summary printed after a run, in the units the case was written in.</summary>
public static class TextSummary
{
    /// <summary>The summary text.</summary>
    public static string Write(SimulationResult result, string caseFile)
    {
        var simulation = result.Case;
        var format = new DisplayFormat(simulation.Display);
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"{simulation.Title} ({Path.GetFileName(caseFile)})\n");
        text.Append(CultureInfo.InvariantCulture, $"  stack: {StackText.Describe(simulation, format)}\n");
        foreach (var report in result.Reports)
        {
            text.Append(CultureInfo.InvariantCulture, $"  at {format.Time(report.Sample.TimeSeconds)}:");
            AppendFace(text, simulation.Left, report.Sample.Left, format);
            AppendFace(text, simulation.Right, report.Sample.Right, format);
            text.Append(CultureInfo.InvariantCulture, $" system {DisplayFormat.Percent(report.Sample.FractionOfFinalState)} of the way to its final state\n");
        }

        AppendFinalState(text, result, format);
        if (result.Permeation is { } permeation)
        {
            text.Append(CultureInfo.InvariantCulture, $"  steady flux {format.Flux(Math.Abs(permeation.SteadyFluxKgPerSquareMeterSecond))}");
            text.Append(permeation.LagTimeSeconds is { } lag ? $", lag time {format.Time(lag)}" : ", lag time: steady state not reached");
            text.Append(permeation.AnalyticLagTimeSeconds is { } analytic ? $" (L^2/6D = {format.Time(analytic)})" : string.Empty).Append('\n');
        }

        text.Append(CultureInfo.InvariantCulture, $"  mass balance: worst relative error {result.WorstMassBalanceError:G2}\n");
        if (!result.Completed)
        {
            text.Append(CultureInfo.InvariantCulture, $"  WARNING: the solver stopped early ({result.Statistics.StopReason}); results cover only the time reached.\n");
        }

        return text.ToString();
    }

    private static void AppendFace(StringBuilder text, FaceCondition face, FaceSample? sample, DisplayFormat format)
    {
        if (sample is null)
        {
            return;
        }

        var name = TimeSeriesCsv.FaceName(face);
        var density = (face as CompartmentFace)?.DensityKgPerCubicMeter;
        text.Append(CultureInfo.InvariantCulture, $" {name} {format.MediumConcentration(sample.ConcentrationKgPerCubicMeter, density)}, received {format.MassPerArea(sample.TransferredIntoMediumPerArea)};");
    }

    private static void AppendFinalState(StringBuilder text, SimulationResult result, DisplayFormat format)
    {
        var final = result.FinalState;
        var kind = final.Kind switch
        {
            FinalStateKind.ClosedEquilibrium => "equilibrium (closed system)",
            FinalStateKind.BathEquilibrium => "equilibrium with the bath",
            _ => "steady permeation",
        };
        text.Append(CultureInfo.InvariantCulture, $"  final state: {kind}");
        foreach (var (face, value) in new[] { (result.Case.Left, final.LeftConcentrationKgPerCubicMeter), (result.Case.Right, final.RightConcentrationKgPerCubicMeter) })
        {
            if (face is CompartmentFace compartment && value is { } concentration)
            {
                text.Append(CultureInfo.InvariantCulture, $"; {compartment.Name} {format.MediumConcentration(concentration, compartment.DensityKgPerCubicMeter)}");
            }
        }

        text.Append('\n');
        AppendTimes(text, "system", final.System, result, format);
        AppendTimes(text, TimeSeriesCsv.FaceName(result.Case.Left), final.LeftCompartment, result, format);
        AppendTimes(text, TimeSeriesCsv.FaceName(result.Case.Right), final.RightCompartment, result, format);
    }

    private static void AppendTimes(StringBuilder text, string what, ThresholdTimes? times, SimulationResult result, DisplayFormat format)
    {
        if (times is null)
        {
            return;
        }

        var parts = ThresholdTimes.Levels.Zip(times.AsList(), (level, time) =>
        {
            var label = DisplayFormat.Percent(level).Replace(".0 ", " ", StringComparison.Ordinal);
            return time is { } t
                ? $"{label} at {format.Time(t)}{(t > result.Case.DurationSeconds ? " (after the duration)" : string.Empty)}"
                : $"{label} not within {format.Time(result.FinalState.HorizonSeconds)}";
        });
        text.Append(CultureInfo.InvariantCulture, $"    {what}: {string.Join(", ", parts)}\n");
    }
}
