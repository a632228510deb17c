using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// Reads the results of each period of a schedule off the run's time series, which holds a sample at every period
/// end, taken before that moment's renewals (<see cref="OutputSchedule"/>, and state events come after outputs).
/// The cumulative amount into a medium counts what renewals carried away, so a period's amount is the difference of
/// that cumulative amount at its two ends.
/// </summary>
public static class ScheduleAnalysis
{
    /// <summary>The schedule's results; null for a case without a schedule or a series that does not reach its end.</summary>
    public static ScheduleSummary? Of(SimulationCase simulation, IReadOnlyList<StateSample> series)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        ArgumentNullException.ThrowIfNull(series);
        if (simulation.Schedule is not { } schedule || series.Count == 0)
        {
            return null;
        }

        var outcomes = new List<PeriodOutcome>();
        var start = series[0];
        var mediaBySide = new[] { schedule.MediaByPeriod(Side.Left, simulation.Left), schedule.MediaByPeriod(Side.Right, simulation.Right) };
        for (var p = 0; p < schedule.Periods.Count; p++)
        {
            var period = schedule.Periods[p];
            if (At(series, period.EndSeconds) is not { } end)
            {
                return null;
            }

            var media = new List<MediumInPeriod>();
            foreach (var side in new[] { Side.Left, Side.Right })
            {
                // A bath's amounts are as telling as a compartment's (the body a patch delivers into); its concentration is its own.
                if (mediaBySide[(int)side][p] is { IsOpen: true } face && Face(end, side) is { } atEnd && Face(start, side) is { } atStart)
                {
                    var fresh = face is CompartmentFace && (period.StartSeconds == 0 || period.Renewed.Contains(side));
                    var concentration = atEnd.ConcentrationKgPerCubicMeter;
                    var fluxes = OutputSchedule.WithinPeriod(schedule, period)
                        .Select(time => At(series, time) is { } sample ? Face(sample, side)!.FluxIntoMediumKgPerSquareMeterSecond : double.NaN)
                        .Where(double.IsFinite)
                        .DefaultIfEmpty(atEnd.FluxIntoMediumKgPerSquareMeterSecond)
                        .ToArray();
                    media.Add(new MediumInPeriod(
                        side,
                        face.MediumName,
                        fresh,
                        atEnd.TransferredIntoMediumPerArea - atStart.TransferredIntoMediumPerArea,
                        concentration,
                        concentration / (face as CompartmentFace)?.DensityKgPerCubicMeter,
                        fluxes.Max(),
                        fluxes.Min()));
                }
            }

            outcomes.Add(new PeriodOutcome(period, media));
            start = end;
        }

        return new ScheduleSummary(
            outcomes, SteadyStates(outcomes, simulation.Numerics.Accuracy), RepeatedUse(simulation, schedule, series, mediaBySide), Renewed(simulation, schedule, series))
        {
            LayerMoves = LayerMoves(simulation, schedule, series),
        };
    }

    /// <summary>
    /// Each taking off or putting on of layers: what the layers taken off held just before (the sample at that time is
    /// taken before the change), and what the fresh ones bring as the case loads them.
    /// </summary>
    private static List<LayerMove> LayerMoves(SimulationCase simulation, ContactSchedule schedule, IReadOnlyList<StateSample> series)
    {
        var moves = new List<LayerMove>();
        var layers = simulation.Stack.Layers;
        foreach (var period in schedule.Periods.Where(period => period.ChangesLayers))
        {
            var before = At(series, period.StartSeconds);
            var off = schedule.LayersOffAt(period.StartSeconds * (1 - 1e-9));
            var takenOff = period.RemovedLayers.Concat(period.AppliedLayers).Select(change => change.Layer).Where(layer => !off.Contains(layer)).ToArray();
            var putOn = period.AppliedLayers.Select(change => change.Layer).ToArray();
            moves.Add(new LayerMove(
                period.Label,
                period.StartSeconds,
                [.. takenOff.Select(layer => layers[layer].Name)],
                [.. putOn.Select(layer => layers[layer].Name)],
                before is null ? double.NaN : takenOff.Sum(layer => before.LayerMassPerArea[layer]),
                putOn.Sum(layer => layers[layer].InitialConcentrationKgPerCubicMeter * layers[layer].ThicknessMeters)));
        }

        return moves;
    }

    /// <summary>
    /// Each renewed medium and the net mass its replaced portions took away: at each renewal, what the portion leaving
    /// held, V c per area, less what the fresh one brings, V' c_fresh per area (the same portion again, or one with other
    /// properties).
    /// </summary>
    private static List<RenewedMedium> Renewed(SimulationCase simulation, ContactSchedule schedule, IReadOnlyList<StateSample> series)
    {
        var result = new List<RenewedMedium>();
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (!schedule.Renews(side) || simulation.Face(side) is not CompartmentFace compartment)
            {
                continue;
            }

            var renewals = schedule.Renewals(side, compartment);
            var carried = renewals.Sum(renewal => At(series, renewal.TimeSeconds) is { } sample && Face(sample, side) is { } face
                ? (face.ConcentrationKgPerCubicMeter * ((CompartmentFace)renewal.Old).VolumePerAreaMeters) - renewal.Fresh.InitialMassPerArea
                : double.NaN);
            result.Add(new RenewedMedium(side, compartment.Name, renewals.Count, carried));
        }

        return result;
    }

    /// <summary>
    /// For each repeated period: the first repetition whose amounts into every medium lie within the accuracy of the
    /// repetition before.
    /// </summary>
    private static List<PeriodicSteadyState> SteadyStates(IReadOnlyList<PeriodOutcome> outcomes, double accuracy)
    {
        var result = new List<PeriodicSteadyState>();
        var repeated = outcomes.Where(outcome => outcome.Period.RepetitionCount > 1).GroupBy(outcome => outcome.Period.Slot);
        foreach (var group in repeated)
        {
            var runs = group.ToList();
            int? settled = null;
            var change = double.NaN;
            for (var r = 1; r < runs.Count; r++)
            {
                change = runs[r].Media.Zip(runs[r - 1].Media, (now, before) => RelativeChange(now.ReceivedKgPerSquareMeter, before.ReceivedKgPerSquareMeter))
                    .DefaultIfEmpty(0).Max();
                if (settled is null && change <= accuracy)
                {
                    settled = runs[r].Period.Repetition;
                }
            }

            result.Add(new PeriodicSteadyState(runs[0].Period.Name, runs[0].Period.RepetitionCount, settled, change));
        }

        return result;
    }

    /// <summary>
    /// The repeated-use verdict when the case is a food-contact case whose food medium is renewed: the food's
    /// concentration at the end of each contact (a portion's whole stay), judged as <see cref="RepeatedUseVerdict"/>
    /// states. A rise counts when it exceeds the run's accuracy, so that round-off between equal contacts is not one.
    /// </summary>
    private static RepeatedUseVerdict? RepeatedUse(
        SimulationCase simulation, ContactSchedule schedule, IReadOnlyList<StateSample> series, IReadOnlyList<FaceCondition>[] mediaBySide)
    {
        if (!simulation.JudgesRepeatedUse)
        {
            return null;
        }

        var food = simulation.FoodContact!;
        var compartment = (CompartmentFace)simulation.Face(food.FoodSide);

        var density = compartment.DensityKgPerCubicMeter ?? FoodContactSettings.DefaultFoodDensity;
        var contacts = new List<double>();
        var migration = new List<double>();
        var periodStarting = Enumerable.Range(0, schedule.Periods.Count).ToDictionary(p => schedule.Periods[p].StartSeconds);
        foreach (var (startSeconds, endSeconds) in schedule.Contacts(food.FoodSide))
        {
            if (At(series, endSeconds) is not { } end || Face(end, food.FoodSide) is not { } face)
            {
                return null;
            }

            // Each contact's portion of food may have a volume and a fresh concentration of its own.
            var portion = (CompartmentFace)mediaBySide[(int)food.FoodSide][periodStarting[startSeconds]];
            contacts.Add(face.ConcentrationKgPerCubicMeter / density);
            migration.Add((face.ConcentrationKgPerCubicMeter - portion.InitialConcentrationKgPerCubicMeter) * portion.VolumePerAreaMeters);
        }

        var accuracy = simulation.Numerics.Accuracy;
        var rising = Enumerable.Range(1, contacts.Count - 1)
            .Where(k => contacts[k] > contacts[k - 1] * (1 + accuracy) && contacts[k] - contacts[k - 1] > 0)
            .ToArray();
        return new RepeatedUseVerdict(contacts, Math.Min(3, contacts.Count), food.SpecificMigrationLimit, rising, migration);
    }

    private static double RelativeChange(double now, double before)
    {
        var scale = Math.Max(Math.Abs(now), Math.Abs(before));
        return scale == 0 ? 0 : Math.Abs(now - before) / scale;
    }

    /// <summary>
    /// The sample at a time, or null: a binary search, as the series is in ascending time and a schedule asks for some
    /// twenty samples per period of a series that may hold thousands.
    /// </summary>
    private static StateSample? At(IReadOnlyList<StateSample> series, double timeSeconds)
    {
        var (low, high) = (0, series.Count - 1);
        while (low <= high)
        {
            var middle = (low + high) / 2;
            var time = series[middle].TimeSeconds;
            if (Math.Abs(time - timeSeconds) <= 1e-9 * timeSeconds)
            {
                return series[middle];
            }

            (low, high) = time < timeSeconds ? (middle + 1, high) : (low, middle - 1);
        }

        return null;
    }

    private static FaceSample? Face(StateSample sample, Side side) => side == Side.Left ? sample.Left : sample.Right;
}
