using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Core.Reports;

/// <summary>
/// The key results of a run as tables in the display units: one row per report time, and a list of key figures
/// (final state, times to 50/90/99 %, permeation figures, mass balance).
/// </summary>
public static class ResultTables
{
    /// <summary>Amounts and concentrations at each report time.</summary>
    public static TextTable AtReportTimes(SimulationResult result)
    {
        var simulation = result.Case;
        var format = new DisplayFormat(simulation.Display);
        var media = Media(simulation).ToArray();
        var headers = new List<string> { $"time [{simulation.Display.Time.ForPeople}]" };
        foreach (var (_, face) in media)
        {
            var name = TimeSeriesCsv.FaceName(face);
            headers.Add($"{name}: concentration [{format.MediumConcentrationUnit(face)}]");
            headers.Add($"{name}: received [{simulation.Display.MassPerArea.ForPeople}]");
        }

        headers.Add("toward final state");
        // Below the run's reporting floor a figure has no known accuracy: "< floor" stands in for its digits.
        var amountFloor = Simulation.NegligibleFloor.AmountPerArea(result);
        var concentrationFloors = media.Select(medium => Simulation.NegligibleFloor.ConcentrationIn(result, medium.Side)).ToArray();
        var rows = result.Reports.Select(report =>
        {
            var row = new List<string> { format.TimeValue(report.Sample.TimeSeconds) };
            foreach (var ((side, face), concentrationFloor) in media.Zip(concentrationFloors))
            {
                var sample = (side == Side.Left ? report.Sample.Left : report.Sample.Right)!;
                row.Add(DisplayFormat.OrFloor(sample.ConcentrationKgPerCubicMeter, concentrationFloor, value => format.MediumConcentrationValue(value, face)));
                row.Add(DisplayFormat.OrFloor(sample.TransferredIntoMediumPerArea, amountFloor, format.MassPerAreaValue));
            }

            // Undefined (NaN) when the system starts at its final state.
            row.Add(double.IsNaN(report.Sample.FractionOfFinalState) ? "n/a" : DisplayFormat.Percent(report.Sample.FractionOfFinalState));
            return (IReadOnlyList<string>)row;
        }).ToArray();
        return new TextTable("At the report times", headers, rows);
    }

    /// <summary>Key figures: final state, times to approach it, permeation, mass balance.</summary>
    public static TextTable KeyFigures(SimulationResult result)
    {
        var simulation = result.Case;
        var format = new DisplayFormat(simulation.Display);
        var rows = new List<IReadOnlyList<string>>();
        void Add(string what, string value) => rows.Add([what, value]);
        var final = result.FinalState;
        Add("final state", FinalStateText.Describe(final, simulation));
        if (final.MassLeftAfterSamplingPerArea is { } left)
        {
            var initial = simulation.Stack.InitialMassPerArea
                + new[] { simulation.Left, simulation.Right }.Sum(face => face.InitialMassPerArea);
            var after = final.LastSampleSeconds is { } last ? $" after the last {FinalStateText.Withdrawal(simulation)} at {format.Time(last)}" : string.Empty;
            Add("mass left in the system" + after, $"{format.MassPerArea(left)} of {format.MassPerArea(initial)} at the start");
        }

        foreach (var (side, face) in Media(simulation))
        {
            var concentration = side == Side.Left ? final.LeftConcentrationKgPerCubicMeter : final.RightConcentrationKgPerCubicMeter;
            if (face.HasFiniteVolume && concentration is { } value)
            {
                Add($"{TimeSeriesCsv.FaceName(face)} at the final state", format.MediumConcentration(value, face));
            }
        }

        AddTimes(rows, "whole system", final.System, result, format);
        AddTimes(rows, TimeSeriesCsv.FaceName(simulation.Left), final.LeftCompartment, result, format);
        AddTimes(rows, TimeSeriesCsv.FaceName(simulation.Right), final.RightCompartment, result, format);
        if (result.Permeation is { } permeation)
        {
            Add(Simulator.LagTimeDefined(simulation) ? "steady flux" : "steady flux with the last period's media", format.Flux(Math.Abs(permeation.SteadyFluxKgPerSquareMeterSecond)));
            Add("flux at the end", format.Flux(permeation.FluxAtEndKgPerSquareMeterSecond));
            Add("lag time", permeation.LagTimeSeconds is { } lag
                ? format.Time(lag)
                : Simulator.LagTimeDefined(simulation) ? "steady state not reached" : "not defined: the schedule changes a medium during the run");
            if (permeation.AnalyticLagTimeSeconds is { } analytic)
            {
                Add("lag time L^2/(6D)", format.Time(analytic));
            }
        }

        foreach (var layer in result.DispersedLayers)
        {
            Add($"{layer.Layer}: undissolved at the start / at the end",
                $"{format.MassPerArea(layer.InitialUndissolvedPerArea)} / {format.MassPerArea(layer.UndissolvedAtEndPerArea)}");
            Add($"{layer.Layer}: undissolved drug used up", layer.ExhaustedSeconds is { } gone
                ? format.Time(gone)
                : layer.InitialUndissolvedPerArea > 0 ? "not within the duration" : "none above the solubility");
        }

        Add("mass balance (worst relative error)", result.WorstMassBalanceError.ToString("G2", System.Globalization.CultureInfo.InvariantCulture));
        Add("method", AccuracyTables.Method(result));
        if (result.NumericalError is { } error)
        {
            Add("numerical error", AccuracyTables.Summary(error));
        }

        if (result.CrossCheck is { } check)
        {
            Add("independent check", AccuracyTables.CrossCheck(check));
        }
        else if (result.Method == SolutionMethod.Laplace && result.NumericalError is not null)
        {
            Add("independent check", "not run (in a batch, --check-every-case runs it)");
        }

        return new TextTable("Key figures", ["quantity", "value"], rows);
    }

    private static IEnumerable<(Side Side, FaceCondition Face)> Media(SimulationCase simulation)
    {
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (simulation.Face(side).IsOpen)
            {
                yield return (side, simulation.Face(side));
            }
        }
    }

    private static void AddTimes(List<IReadOnlyList<string>> rows, string what, ThresholdTimes? times, SimulationResult result, DisplayFormat format)
    {
        if (times is null)
        {
            return;
        }

        var labels = new[] { "50 %", "90 %", "99 %" };
        var values = times.AsList();
        for (var i = 0; i < labels.Length; i++)
        {
            var text = values[i] is { } time
                ? format.Time(time) + (time > result.Case.DurationSeconds ? " (after the duration)" : string.Empty)
                : $"not within {format.Time(result.FinalState.HorizonSeconds)}";
            rows.Add([$"{what}: time to {labels[i]} of the final state", text]);
        }
    }
}
