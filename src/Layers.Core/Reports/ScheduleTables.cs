using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Core.Reports;

/// <summary>
/// The results of a schedule as tables in the display units: what each period delivered into each compartment and
/// its concentration at the period's end, then the repeated-use verdict and where repetitions settle.
/// </summary>
public static class ScheduleTables
{
    /// <summary>The tables for a result; none without a schedule.</summary>
    public static IReadOnlyList<TextTable> For(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Schedule is not { } schedule)
        {
            return [];
        }

        // The peak and trough matter where periods repeat (doses) or where the media change (a donor raised in steps).
        var tables = new List<TextTable> { Periods(result, schedule) };
        if (schedule.PeriodicSteadyStates.Count > 0 || result.Case.Schedule is { ChangesMedia: true })
        {
            tables.Add(Fluxes(result, schedule));
        }

        if (schedule.RepeatedUse is { } verdict)
        {
            tables.Add(RepeatedUse(verdict));
        }

        if (schedule.PeriodicSteadyStates.Count > 0)
        {
            tables.Add(new TextTable(
                "Repetitions",
                ["period", "repetitions", "settled (within the accuracy of the one before)", "last change"],
                schedule.PeriodicSteadyStates.Select(state => (IReadOnlyList<string>)
                [
                    state.PeriodName,
                    state.Repetitions.ToString(CultureInfo.InvariantCulture),
                    state.SettledAtRepetition is { } at ? $"from repetition {at.ToString(CultureInfo.InvariantCulture)}" : "not within the schedule",
                    DisplayFormat.Percent(state.LastRelativeChange),
                ]).ToList()));
        }

        return tables;
    }

    private static TextTable Periods(SimulationResult result, ScheduleSummary schedule)
    {
        var simulation = result.Case;
        var format = new DisplayFormat(simulation.Display);
        var media = schedule.Periods[0].Media;
        var changes = schedule.Periods.Select(outcome => AtStart(simulation, outcome.Period, format)).ToList();
        var anyChange = changes.Any(change => change.Length > 0);
        var headers = new List<string> { "period", $"from [{simulation.Display.Time.Symbol}]", $"to [{simulation.Display.Time.Symbol}]" };
        if (anyChange)
        {
            headers.Add("at its start");
        }

        foreach (var medium in media)
        {
            var face = simulation.Face(medium.Side);
            headers.Add($"{medium.Name}: received [{simulation.Display.MassPerArea.ForPeople}]");
            if (face is CompartmentFace)
            {
                headers.Add($"{medium.Name}: at the end [{format.MediumConcentrationUnit(face)}]");
            }
        }

        // Below the run's reporting floor a figure has no known accuracy: "< floor" stands in for its digits.
        var amountFloor = NegligibleFloor.AmountPerArea(result);
        string Received(double value) => DisplayFormat.OrFloor(value, amountFloor, format.MassPerAreaValue);
        var concentrationFloors = new[] { NegligibleFloor.ConcentrationIn(result, Side.Left), NegligibleFloor.ConcentrationIn(result, Side.Right) };
        string AtEnd(double value, Side side, FaceCondition face) =>
            DisplayFormat.OrFloor(value, concentrationFloors[(int)side], concentration => format.MediumConcentrationValue(concentration, face));
        var rows = schedule.Periods.Select(outcome => (IReadOnlyList<string>)
        [
            outcome.Period.Label,
            format.TimeValue(outcome.Period.StartSeconds),
            format.TimeValue(outcome.Period.EndSeconds),
            .. anyChange ? [AtStart(simulation, outcome.Period, format)] : Array.Empty<string>(),
            .. outcome.Media.SelectMany(medium => simulation.Face(medium.Side) is CompartmentFace face
                ? new[] { Received(medium.ReceivedKgPerSquareMeter), AtEnd(medium.ConcentrationAtEndKgPerCubicMeter, medium.Side, face) }
                : [Received(medium.ReceivedKgPerSquareMeter)]),
        ]).ToList();
        return new TextTable("Periods (amounts received during each period)", headers, rows);
    }

    /// <summary>
    /// What changes at a period's start, in words: "simulant renewed", "matrix put on fresh", "matrix taken off"; a fresh
    /// portion with other properties is described in full.
    /// </summary>
    private static string AtStart(SimulationCase simulation, SchedulePeriod period, DisplayFormat format)
    {
        if (period.StartSeconds == 0)
        {
            return string.Join("; ", period.ClosedFaces.Select(side => $"{simulation.Face(side).MediumName} out of contact"));
        }

        string Names(IEnumerable<LayerChange> changes) => string.Join(", ", changes.Select(change => simulation.Stack.Layers[change.Layer].Name));
        var parts = new List<string>();
        parts.AddRange(period.ClosedFaces.Select(side => $"{simulation.Face(side).MediumName} out of contact"));
        parts.AddRange(period.OpenedFaces.Select(side => $"{simulation.Face(side).MediumName} in contact again"));
        parts.AddRange(period.Renewed.Select(side => period.NewMedia.TryGetValue(side, out var medium)
            ? $"{simulation.Face(side).MediumName} renewed as {StackText.Face(medium, format)}"
            : $"{simulation.Face(side).MediumName} renewed"));
        if (period.AppliedLayers.Count > 0)
        {
            parts.Add($"{Names(period.AppliedLayers)} put on fresh");
        }

        if (period.RemovedLayers.Count > 0)
        {
            parts.Add($"{Names(period.RemovedLayers)} taken off");
        }

        return string.Join("; ", parts);
    }

    /// <summary>Peak and trough of the flux into each medium in each period: what a repeated dose delivers and how low it falls.</summary>
    private static TextTable Fluxes(SimulationResult result, ScheduleSummary schedule)
    {
        var display = result.Case.Display;
        var headers = new List<string> { "period" };
        foreach (var medium in schedule.Periods[0].Media)
        {
            headers.Add($"{medium.Name}: highest flux [{display.Flux.ForPeople}]");
            headers.Add($"{medium.Name}: lowest flux [{display.Flux.ForPeople}]");
        }

        // A flux that would move less than the floor amount over the whole period is shown as "< floor".
        var amountFloor = NegligibleFloor.AmountPerArea(result);
        string Flux(double value, double periodSeconds) =>
            DisplayFormat.OrFloor(value, amountFloor / periodSeconds, flux => DisplayFormat.Number(display.Flux.FromSi(flux)));
        var rows = schedule.Periods.Select(outcome => (IReadOnlyList<string>)
        [
            outcome.Period.Label,
            .. outcome.Media.SelectMany(medium => new[]
            {
                Flux(medium.HighestFluxKgPerSquareMeterSecond, outcome.Period.DurationSeconds),
                Flux(medium.LowestFluxKgPerSquareMeterSecond, outcome.Period.DurationSeconds),
            }),
        ]).ToList();
        return new TextTable("Flux into each medium in each period (highest and lowest at the period's output times)", headers, rows);
    }

    private static TextTable RepeatedUse(RepeatedUseVerdict verdict)
    {
        var rows = new List<IReadOnlyList<string>>();
        for (var contact = 1; contact <= verdict.Contacts.Count; contact++)
        {
            var judged = contact == verdict.JudgedContact ? "judged" : string.Empty;
            var rose = verdict.RisingFrom.Contains(contact - 1) ? "rose from the contact before" : string.Empty;
            var over = verdict.LimitKgPerKg is { } limitValue && verdict.Contacts[contact - 1] > limitValue ? "above the limit" : string.Empty;
            rows.Add([contact.ToString(CultureInfo.InvariantCulture), MgPerKg(verdict.Contacts[contact - 1]), string.Join("; ", new[] { judged, over, rose }.Where(note => note.Length > 0))]);
        }

        var limit = verdict.LimitKgPerKg is { } value ? $"limit {MgPerKg(value)}" : "no limit given";
        var findings = new List<string>();
        if (verdict.LimitKgPerKg is not null)
        {
            findings.Add(verdict.LimitExceeded ? "EXCEEDS the limit at the judged contact" : "within the limit at the judged contact");
        }

        findings.Add(verdict.RisingFrom.Count > 0 ? "migration RISES between contacts" : "migration does not rise between contacts");
        rows.Add(["verdict (model)", limit, string.Join("; ", findings)]);
        return new TextTable(
            "Repeated use: the food at the end of each contact (the third is judged; EU 10/2011, Art. 17)",
            ["contact", "in the food", "note"],
            rows);
    }

    private static string MgPerKg(double massFraction) => $"{DisplayFormat.Number(massFraction * 1e6)} mg/kg";
}
