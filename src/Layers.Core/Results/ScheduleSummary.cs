using Layers.Core.Domain;

namespace Layers.Core.Results;

/// <summary>What each period of a schedule delivered, and the verdicts that read the periods (docs/outputs.md, "Periods").</summary>
/// <param name="Periods">One entry per period run, in order.</param>
/// <param name="PeriodicSteadyStates">For each repeated period, where successive repetitions stop differing.</param>
/// <param name="RepeatedUse">The repeated-use verdict of a food-contact case whose food is renewed; null otherwise.</param>
/// <param name="Renewed">Each renewed medium and what its replaced portions carried out of the system.</param>
public sealed record ScheduleSummary(
    IReadOnlyList<PeriodOutcome> Periods,
    IReadOnlyList<PeriodicSteadyState> PeriodicSteadyStates,
    RepeatedUseVerdict? RepeatedUse,
    IReadOnlyList<RenewedMedium> Renewed)
{
    /// <summary>Each taking off or putting on of layers, in order: with what it took away and brought, the mass balance closes.</summary>
    public IReadOnlyList<LayerMove> LayerMoves { get; init; } = [];
}

/// <summary>Layers taken off or put on at the start of a period, and the mass per contact area that left and came with them.</summary>
/// <param name="PeriodLabel">The period they start.</param>
/// <param name="TimeSeconds">When, s.</param>
/// <param name="TakenOff">The layers taken off (also those replaced by fresh ones).</param>
/// <param name="PutOn">The layers put on fresh.</param>
/// <param name="TakenAwayKgPerSquareMeter">What the layers taken off held, kg/m2.</param>
/// <param name="BroughtKgPerSquareMeter">What the fresh layers hold as loaded, kg/m2.</param>
public sealed record LayerMove(
    string PeriodLabel, double TimeSeconds, IReadOnlyList<string> TakenOff, IReadOnlyList<string> PutOn, double TakenAwayKgPerSquareMeter, double BroughtKgPerSquareMeter);

/// <summary>
/// A medium the schedule renews: how often, and the mass per contact area its replaced portions took away, net of what
/// the fresh portions brought (kg/m2). With it the mass balance closes across every renewal.
/// </summary>
/// <param name="Side">Its face.</param>
/// <param name="Name">The medium's name.</param>
/// <param name="Renewals">How many times it was replaced.</param>
/// <param name="CarriedAwayKgPerSquareMeter">Mass per area the replaced portions carried away, net, kg/m2.</param>
public sealed record RenewedMedium(Side Side, string Name, int Renewals, double CarriedAwayKgPerSquareMeter);

/// <summary>One period's results.</summary>
/// <param name="Period">The period.</param>
/// <param name="Media">Each face medium (compartment or bath), over this period.</param>
public sealed record PeriodOutcome(SchedulePeriod Period, IReadOnlyList<MediumInPeriod> Media);

/// <summary>A face medium over one period.</summary>
/// <param name="Side">Its face.</param>
/// <param name="Name">The medium's name.</param>
/// <param name="FreshAtStart">True when a compartment starts the period with a fresh portion (the first period, or a renewal); false for a bath.</param>
/// <param name="ReceivedKgPerSquareMeter">Mass per contact area that crossed into it during the period, kg/m2.</param>
/// <param name="ConcentrationAtEndKgPerCubicMeter">Its concentration at the period's end, before any renewal, kg/m3 (a bath's own).</param>
/// <param name="MassFractionAtEnd">The same as a mass fraction (kg/kg) for a compartment whose density is known; else null.</param>
/// <param name="HighestFluxKgPerSquareMeterSecond">
/// The highest flux into the medium at the period's output times (its end and evenly spaced times within it), kg/(m2 s):
/// the peak of a dose as sampled, no higher than the true peak.
/// </param>
/// <param name="LowestFluxKgPerSquareMeterSecond">The lowest flux at the same times, kg/(m2 s): the trough before the next dose.</param>
public sealed record MediumInPeriod(
    Side Side,
    string Name,
    bool FreshAtStart,
    double ReceivedKgPerSquareMeter,
    double ConcentrationAtEndKgPerCubicMeter,
    double? MassFractionAtEnd,
    double HighestFluxKgPerSquareMeterSecond,
    double LowestFluxKgPerSquareMeterSecond);

/// <summary>
/// Where the repetitions of one period settle: the first repetition whose amount into each medium differs from the
/// previous repetition's by no more than the run's accuracy (relative), or null when none does within the schedule.
/// </summary>
/// <param name="PeriodName">The repeated period's name.</param>
/// <param name="Repetitions">How many times it runs.</param>
/// <param name="SettledAtRepetition">The first repetition within the accuracy of the one before; null when not reached.</param>
/// <param name="LastRelativeChange">The relative change between the last two repetitions.</param>
public sealed record PeriodicSteadyState(string PeriodName, int Repetitions, int? SettledAtRepetition, double LastRelativeChange);

/// <summary>
/// The verdict on an article for repeated use, tested with a fresh portion of food or simulant at each contact: the
/// contact judged against the specific migration limit is the third (the last when there are fewer), and migration
/// must not rise from one contact to the next (Regulation (EU) No 10/2011, Article 17; from memory, to be checked
/// against the Regulation's text).
/// </summary>
/// <param name="Contacts">The food's concentration at the end of each contact, kg/kg, in order.</param>
/// <param name="JudgedContact">Which contact is judged, from 1.</param>
/// <param name="LimitKgPerKg">The specific migration limit, kg/kg; null when the case gives none.</param>
/// <param name="RisingFrom">The contacts after which migration rose (k where contact k + 1 exceeds contact k), from 1.</param>
/// <param name="ContactMigrationKgPerSquareMeter">What the food held at the end of each contact per contact area, kg/m2.</param>
public sealed record RepeatedUseVerdict(
    IReadOnlyList<double> Contacts, int JudgedContact, double? LimitKgPerKg, IReadOnlyList<int> RisingFrom, IReadOnlyList<double> ContactMigrationKgPerSquareMeter)
{
    /// <summary>The judged contact's concentration, kg/kg.</summary>
    public double JudgedValue => Contacts[JudgedContact - 1];

    /// <summary>The judged contact's migration per contact area, kg/m2.</summary>
    public double JudgedMigrationKgPerSquareMeter => ContactMigrationKgPerSquareMeter[JudgedContact - 1];

    /// <summary>True when the judged contact exceeds the limit.</summary>
    public bool LimitExceeded => LimitKgPerKg is { } limit && JudgedValue > limit;

    /// <summary>True when the judged contact is within the limit and migration never rises between contacts.</summary>
    public bool Complies => !LimitExceeded && RisingFrom.Count == 0;
}
