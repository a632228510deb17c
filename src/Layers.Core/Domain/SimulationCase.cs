namespace Layers.Core.Domain;

/// <summary>
/// Everything the solver needs, already validated and in SI units: the solver's one input.
/// </summary>
public sealed record SimulationCase
{
    /// <summary>Short title for reports.</summary>
    public required string Title { get; init; }

    /// <summary>The stack of layers, left to right.</summary>
    public required LayerStack Stack { get; init; }

    /// <summary>What touches the left face.</summary>
    public required FaceCondition Left { get; init; }

    /// <summary>What touches the right face.</summary>
    public required FaceCondition Right { get; init; }

    /// <summary>Name of the medium the partition coefficients refer to (K = c / c_reference at equilibrium).</summary>
    public string ReferenceMedium { get; init; } = "reference medium";

    /// <summary>Simulated duration, s.</summary>
    public required double DurationSeconds { get; init; }

    /// <summary>Times at which full results (profiles, amounts) are reported, s, ascending, within the duration.</summary>
    public required IReadOnlyList<double> ReportTimesSeconds { get; init; }

    /// <summary>Extra times at which amounts are written to the time series, s, ascending, within the duration.</summary>
    public IReadOnlyList<double> ExtraOutputTimesSeconds { get; init; } = [];

    /// <summary>
    /// Depths from the left face of the stack at which the concentration is reported at every report time, m, in the
    /// order the case gives them, each within [0, total thickness]; empty when the case names none.
    /// </summary>
    public IReadOnlyList<double> ReportDepthsMeters { get; init; } = [];

    /// <summary>Mesh and time-stepping settings; by default those for the accuracy target 1e-4.</summary>
    public NumericsSettings Numerics { get; init; } = NumericsSettings.Default;

    /// <summary>SHA-256 of the case file's text (lowercase hex), recorded with the results; null when built in code.</summary>
    public string? SourceSha256 { get; init; }

    /// <summary>Units the user wrote, used only to present results in familiar units.</summary>
    public DisplayUnits Display { get; init; } = new();

    /// <summary>
    /// The food-contact settings (time-temperature stages, sources of D, limits), or null for a case solved at one
    /// set of coefficients over <see cref="DurationSeconds"/>.
    /// </summary>
    public FoodContactSettings? FoodContact { get; init; }

    /// <summary>
    /// The stages of the run, in order: the temperature history of a food-contact case, else one stage spanning the
    /// duration with no D or K of its own (<see cref="TemperatureStage.Whole"/>).
    /// </summary>
    public IReadOnlyList<TemperatureStage> Stages => FoodContact?.Stages ?? [TemperatureStage.Whole(DurationSeconds)];

    /// <summary>
    /// The case with every layer's D as in its first stage and its own K: the case its grid and its own system (in
    /// whose u = c/K observers read every state) are built from, and whose D the input tables show.
    /// </summary>
    public SimulationCase WithFirstStageDiffusivities() => Stages[0].WithDiffusivities(this);

    /// <summary>
    /// The periods of the run and the face media replaced at their starts, or null for one contact that lasts the whole
    /// duration.
    /// </summary>
    public ContactSchedule? Schedule { get; init; }

    /// <summary>Permeation metrics asked for by the case, or null.</summary>
    public PermeationTest? PermeationTest { get; init; }

    /// <summary>The face condition on the given side, as the case writes it: the medium in contact from t = 0.</summary>
    public FaceCondition Face(Side side) => side == Side.Left ? Left : Right;

    /// <summary>
    /// The medium on a side at the end of the run: the one the case writes, or the last a schedule brings with other
    /// properties.
    /// </summary>
    public FaceCondition FaceAtEnd(Side side) => Schedule is { } schedule ? schedule.MediaByPeriod(side, Face(side))[^1] : Face(side);

    /// <summary>Every medium that stands on a side during the run, once each, the case's own first.</summary>
    public IReadOnlyList<FaceCondition> MediaOn(Side side) =>
        Schedule is { } schedule ? schedule.MediaByPeriod(side, Face(side)).Distinct().ToArray() : [Face(side)];

    /// <summary>
    /// True when a run judges the food at the end of each contact for repeated use: a food-contact case whose food
    /// compartment the schedule renews (each contact then has a fresh portion of food).
    /// </summary>
    public bool JudgesRepeatedUse =>
        FoodContact is { } food && Schedule is { } schedule && schedule.Renews(food.FoodSide) && Face(food.FoodSide) is CompartmentFace;

    /// <summary>True when no mass can enter or leave: no face is a bath.</summary>
    public bool IsClosed => !Left.IsUnlimited && !Right.IsUnlimited;
}
