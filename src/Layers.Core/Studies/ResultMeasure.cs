using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Units;

namespace Layers.Core.Studies;

/// <summary>
/// A named result read from a solved case, in SI units: what a design aims at and what an uncertainty study
/// reports. Results "at" a time are read at an output time of the run (studies add that time to the outputs, see
/// <see cref="CaseVariation.Read"/>); without a time they are read at the end of the duration.
/// </summary>
/// <param name="Kind">Which result.</param>
/// <param name="AtSeconds">The time at which a time-dependent result is read, s; null for the end of the duration.</param>
/// <param name="AtText">That time as written; empty when not given.</param>
public sealed record ResultMeasure(NamedResult Kind, double? AtSeconds = null, string AtText = "")
{
    /// <summary>The case-file name, e.g. <c>rightReceived</c>.</summary>
    public string Name => NamedResults.Name(Kind);

    /// <summary>True for the results that are read at a time (and accept <c>at</c>).</summary>
    public bool IsAtTime => NamedResults.IsReadAtTime(Kind);

    /// <summary>The dimension of the result, for parsing targets and limits.</summary>
    public Dimension Dimension => NamedResults.Dimension(Kind);

    /// <summary>The SI unit of the result, as in summary files.</summary>
    public string SiUnit => NamedResults.SiUnit(Kind).Symbol;

    /// <summary>
    /// The result in words with its time, for tables and plots people read: "mass per area received by the right
    /// medium at 10 d", "... at the end", "lag time".
    /// </summary>
    public string Label => IsAtTime ? $"{NamedResults.Quantity(Kind)} at {(AtText.Length > 0 ? AtText : "the end")}" : NamedResults.Quantity(Kind);

    /// <summary>The case-file name with its time, e.g. "rightReceived at 10 d", for files read by programs.</summary>
    public string Describe() => AtText.Length > 0 ? $"{Name} at {AtText}" : Name;

    /// <summary>
    /// The result of a solved case, SI; null when the case does not define it (no bath pair for a lag time, the
    /// limit never reached, a time after the duration).
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
        };
    }

    /// <summary>
    /// Why this result cannot be read from a case of this shape (a closed face, no food contact), or null when it
    /// can. Checked against the base case when a study is read.
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
            NamedResult.LeftReceived or NamedResult.LeftConcentration => !simulation.Left.IsOpen
                ? $"{Name} needs a medium on the left; the left face is closed"
                : null,
            NamedResult.RightReceived or NamedResult.RightConcentration => !simulation.Right.IsOpen
                ? $"{Name} needs a medium on the right; the right face is closed"
                : null,
            NamedResult.FoodConcentration => simulation.FoodContact is null ? $"{Name} needs $.foodContact" : null,
            NamedResult.TimeToLimit => simulation.FoodContact?.SpecificMigrationLimit is null
                ? $"{Name} needs $.foodContact.specificMigrationLimit"
                : null,
            NamedResult.SteadyFlux or NamedResult.LagTime => !simulation.Left.IsUnlimited || !simulation.Right.IsUnlimited
                ? $"{Name} needs a bath on each face"
                : null,
            NamedResult.TimeTo90Percent => null,
        };
    }

    private static FaceSample? Face(SimulationResult result, Side side, double at) =>
        TimeSeriesValues.At(result.TimeSeries, at) is { } sample ? (side == Side.Left ? sample.Left : sample.Right) : null;

    private static double? Food(SimulationResult result, double at)
    {
        if (result.FoodContact is not { } food)
        {
            return null;
        }

        var face = Face(result, food.FoodSide, at);
        return face is null ? null : face.ConcentrationKgPerCubicMeter / food.FoodDensityKgPerCubicMeter;
    }
}
