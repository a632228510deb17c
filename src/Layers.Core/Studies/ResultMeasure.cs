using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Units;

namespace Layers.Core.Studies;

/// <summary>
/// A named result read from a solved case, in SI units: what a design aims at and what an uncertainty study
/// reports. Results "at" a time are read at an output time of the run (studies add that time to the outputs, see
/// <see cref="CaseVariation.Read"/>); without a time they are read at the end of the duration. The figures of one
/// period of a schedule are read off the run's per-period outcomes (<see cref="ScheduleSummary"/>), in the period
/// named by its label or, without one, in the last period.
/// </summary>
/// <param name="Kind">Which result.</param>
/// <param name="AtSeconds">The time at which a time-dependent result is read, s; null for the end of the duration.</param>
/// <param name="AtText">That time as written; empty when not given.</param>
public sealed record ResultMeasure(NamedResult Kind, double? AtSeconds = null, string AtText = "")
{
    /// <summary>The label of the period a period's figure is read in, e.g. "dose 7 of 7"; null for the last period.</summary>
    public string? Period { get; init; }

    /// <summary>
    /// True when the food's concentration at the end is that of the judged contact: the case tests an article for
    /// repeated use with a fresh portion of food at each contact, and the run's limit verdict and batch summary read
    /// that contact (<see cref="RepeatedUseVerdict"/>), so a study reads the same.
    /// </summary>
    public bool AtJudgedContact { get; init; }

    /// <summary>The case-file name, e.g. <c>rightReceived</c>.</summary>
    public string Name => NamedResults.Name(Kind);

    /// <summary>True for the results that are read at a time (and accept <c>at</c>).</summary>
    public bool IsAtTime => NamedResults.IsReadAtTime(Kind);

    /// <summary>True for the figures of one period of a schedule (and accept <c>period</c>).</summary>
    public bool IsInPeriod => NamedResults.IsReadInPeriod(Kind);

    /// <summary>The dimension of the result, for parsing targets and limits.</summary>
    public Dimension Dimension => NamedResults.Dimension(Kind);

    /// <summary>The SI unit of the result, as in summary files.</summary>
    public string SiUnit => NamedResults.SiUnit(Kind).Symbol;

    /// <summary>
    /// The result in words with its time or period, for tables and plots people read: "mass per area received by the
    /// right medium at 10 d", "... at the end", "lag time", "lowest flux into the right medium in 'dose 7 of 7'".
    /// </summary>
    public string Label
    {
        get
        {
            var quantity = NamedResults.Quantity(Kind);
            if (IsAtTime)
            {
                return AtText.Length > 0 ? $"{quantity} at {AtText}" : $"{quantity} at the end{(AtJudgedContact ? " of the judged contact" : string.Empty)}";
            }

            if (!IsInPeriod)
            {
                return quantity;
            }

            var period = Period is { } label ? $"'{label}'" : "the last period";
            return Kind is NamedResult.LeftPeriodEndConcentration or NamedResult.RightPeriodEndConcentration
                ? $"{quantity} at the end of {period}"
                : $"{quantity} in {period}";
        }
    }

    /// <summary>The case-file name with its time or period, e.g. "rightReceived at 10 d", for files read by programs.</summary>
    public string Describe() => AtText.Length > 0 ? $"{Name} at {AtText}" : Period is { } period ? $"{Name} in {period}" : Name;

    /// <summary>
    /// The result of a solved case, SI; null when the case does not define it (no bath pair for a lag time, the
    /// limit never reached, a time after the duration, no period of that label).
    /// </summary>
    public double? Read(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var at = AtSeconds ?? result.Case.DurationSeconds;
        return Kind switch
        {
            NamedResult.LeftReceived => Face(result, Side.Left, at)?.TransferredIntoMediumPerArea,
            NamedResult.RightReceived => Face(result, Side.Right, at)?.TransferredIntoMediumPerArea,
            NamedResult.LeftConcentration => Face(result, Side.Left, at)?.ConcentrationKgPerCubicMeter,
            NamedResult.RightConcentration => Face(result, Side.Right, at)?.ConcentrationKgPerCubicMeter,
            NamedResult.FoodConcentration => Food(result, at),
            NamedResult.SteadyFlux => result.Permeation?.SteadyFluxKgPerSquareMeterSecond,
            NamedResult.LagTime => result.Permeation?.LagTimeSeconds,
            NamedResult.TimeTo90Percent => result.FinalState.System.NinetyPercent,
            NamedResult.TimeToLimit => result.FoodContact?.LimitReachedSeconds,
            NamedResult.LeftPeriodReceived => InPeriod(result, Side.Left)?.ReceivedKgPerSquareMeter,
            NamedResult.RightPeriodReceived => InPeriod(result, Side.Right)?.ReceivedKgPerSquareMeter,
            NamedResult.LeftPeriodLowestFlux => InPeriod(result, Side.Left)?.LowestFluxKgPerSquareMeterSecond,
            NamedResult.RightPeriodLowestFlux => InPeriod(result, Side.Right)?.LowestFluxKgPerSquareMeterSecond,
            NamedResult.LeftPeriodHighestFlux => InPeriod(result, Side.Left)?.HighestFluxKgPerSquareMeterSecond,
            NamedResult.RightPeriodHighestFlux => InPeriod(result, Side.Right)?.HighestFluxKgPerSquareMeterSecond,
            NamedResult.LeftPeriodEndConcentration => InPeriod(result, Side.Left)?.ConcentrationAtEndKgPerCubicMeter,
            NamedResult.RightPeriodEndConcentration => InPeriod(result, Side.Right)?.ConcentrationAtEndKgPerCubicMeter,
        };
    }

    /// <summary>
    /// Why this result cannot be read from a case of this shape (a closed face, no food contact, no schedule), or null
    /// when it can. Checked against the base case when a study is read; a period's label is checked apart
    /// (<see cref="PeriodProblem"/>), as its error has a path of its own.
    /// </summary>
    public string? Problem(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (AtSeconds is { } at && at > simulation.DurationSeconds * (1 + 1e-12))
        {
            return string.Create(CultureInfo.InvariantCulture, $"'{AtText}' is after the end of the duration ({simulation.DurationSeconds:G6} s)");
        }

        return Kind switch
        {
            NamedResult.LeftReceived or NamedResult.LeftConcentration => NeedsMedium(simulation, Side.Left),
            NamedResult.RightReceived or NamedResult.RightConcentration => NeedsMedium(simulation, Side.Right),
            NamedResult.FoodConcentration => simulation.FoodContact is null ? $"{Name} needs $.foodContact" : null,
            NamedResult.TimeToLimit => simulation.FoodContact?.SpecificMigrationLimit is null
                ? $"{Name} needs $.foodContact.specificMigrationLimit"
                : null,
            NamedResult.SteadyFlux or NamedResult.LagTime => !simulation.Left.IsUnlimited || !simulation.Right.IsUnlimited
                ? $"{Name} needs a bath on each face"
                : null,
            NamedResult.TimeTo90Percent => null,
            NamedResult.LeftPeriodReceived or NamedResult.LeftPeriodLowestFlux or NamedResult.LeftPeriodHighestFlux
                or NamedResult.LeftPeriodEndConcentration => NeedsSchedule(simulation) ?? NeedsMedium(simulation, Side.Left),
            NamedResult.RightPeriodReceived or NamedResult.RightPeriodLowestFlux or NamedResult.RightPeriodHighestFlux
                or NamedResult.RightPeriodEndConcentration => NeedsSchedule(simulation) ?? NeedsMedium(simulation, Side.Right),
        };
    }

    /// <summary>
    /// Why <see cref="Period"/> names no period of the case's schedule, listing the labels it has (shortened when
    /// there are many); null when it names one, or names none and so means the last.
    /// </summary>
    public string? PeriodProblem(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (Period is not { } wanted || simulation.Schedule is not { } schedule)
        {
            return null;
        }

        var labels = schedule.Periods.Select(period => period.Label).ToList();
        return labels.Contains(wanted, StringComparer.Ordinal) ? null : $"no period is labelled '{wanted}'; the periods are {Listed(labels)}";
    }

    private string? NeedsMedium(SimulationCase simulation, Side side) => !simulation.Face(side).IsOpen
        ? $"{Name} needs a medium on the {Words(side)}; the {Words(side)} face is closed"
        : null;

    private string? NeedsSchedule(SimulationCase simulation) => simulation.Schedule is null ? $"{Name} needs $.schedule" : null;

    private static string Words(Side side) => side == Side.Left ? "left" : "right";

    /// <summary>
    /// The labels quoted and joined; beyond twelve, the first six and the last three around a count of those left
    /// out, so that a schedule of a year of daily doses does not fill the screen.
    /// </summary>
    private static string Listed(List<string> labels)
    {
        const int head = 6, tail = 3;
        static string Quoted(IEnumerable<string> items) => string.Join(", ", items.Select(label => $"'{label}'"));
        return labels.Count <= head + tail + 3
            ? Quoted(labels)
            : string.Create(CultureInfo.InvariantCulture, $"{Quoted(labels.Take(head))}, ... ({labels.Count - head - tail} more), {Quoted(labels.Skip(labels.Count - tail))}");
    }

    private MediumInPeriod? InPeriod(SimulationResult result, Side side)
    {
        if (result.Schedule?.Periods is not { Count: > 0 } periods)
        {
            return null;
        }

        var outcome = Period is { } wanted ? periods.FirstOrDefault(outcome => outcome.Period.Label == wanted) : periods[^1];
        return outcome?.Media.FirstOrDefault(medium => medium.Side == side);
    }

    private static FaceSample? Face(SimulationResult result, Side side, double at) =>
        TimeSeriesValues.At(result.TimeSeries, at) is { } sample ? (side == Side.Left ? sample.Left : sample.Right) : null;

    /// <summary>
    /// The food's concentration as a mass fraction: at a time given, or at the end; at the end of an article tested in
    /// repeated contacts with fresh food, that of the judged contact, as the limit verdict and a batch summary read it.
    /// </summary>
    private double? Food(SimulationResult result, double at)
    {
        if (result.FoodContact is not { } food)
        {
            return null;
        }

        if (AtSeconds is null && result.Schedule?.RepeatedUse is { } verdict)
        {
            return verdict.JudgedValue;
        }

        var face = Face(result, food.FoodSide, at);
        return face is null ? null : face.ConcentrationKgPerCubicMeter / food.FoodDensityKgPerCubicMeter;
    }
}
