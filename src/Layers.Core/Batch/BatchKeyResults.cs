using System.Text.Json;
using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>The key results of one solved case that a batch summary lists, in SI units (names carry them).</summary>
/// <param name="FinalState">closedEquilibrium, bathEquilibrium, steadyPermeation or allRemoved.</param>
/// <param name="LeftReceivedKgPerSquareMeter">Mass per area received by the left medium at the end of the duration; null when closed.</param>
/// <param name="RightReceivedKgPerSquareMeter">The same for the right medium.</param>
/// <param name="SteadyFluxKgPerSquareMeterSecond">
/// Steady flux, left to right: between two baths, or of a diffusion cell's simulated amount received once it runs
/// on a steady line; null otherwise.
/// </param>
/// <param name="LagTimeSeconds">Lag time of the amount received, from the same source; null when not reached.</param>
/// <param name="TimeTo90PercentSeconds">Time for the whole system to go 90 % of the way to its final state; null when not reached.</param>
/// <param name="WorstMassBalanceError">Largest relative mass balance error.</param>
/// <param name="WorstEstimatedError">
/// Largest estimated relative error over the case's key figures above their floor (summary.json numericalError); null
/// without an estimate.
/// </param>
/// <param name="FiguresAboveAccuracy">How many key figures the run lists above its accuracy; null without an estimate.</param>
public sealed record BatchKeyResults(
    string FinalState,
    double? LeftReceivedKgPerSquareMeter,
    double? RightReceivedKgPerSquareMeter,
    double? SteadyFluxKgPerSquareMeterSecond,
    double? LagTimeSeconds,
    double? TimeTo90PercentSeconds,
    double WorstMassBalanceError,
    double? WorstEstimatedError = null,
    int? FiguresAboveAccuracy = null)
{
    /// <summary>Concentration in the left medium at the end of the duration, kg/m3; null when closed.</summary>
    public double? LeftConcentrationKgPerCubicMeter { get; init; }

    /// <summary>The same for the right medium.</summary>
    public double? RightConcentrationKgPerCubicMeter { get; init; }

    /// <summary>Concentration in the food at the end, as a mass fraction, kg/kg; null without food contact.</summary>
    public double? FoodConcentrationKgPerKg { get; init; }

    /// <summary>Mass that reached the food per contact area at the end, kg/m2; null without food contact.</summary>
    public double? FoodMigrationKgPerSquareMeter { get; init; }

    /// <summary>When the food first reached its specific migration limit, s; null when never or without a limit.</summary>
    public double? TimeToLimitSeconds { get; init; }

    /// <summary>The key results of a solved case.</summary>
    public static BatchKeyResults From(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        // The sample at the end of the duration: the time series continues beyond it while thresholds are ahead.
        var end = result.TimeSeries.Last(sample => sample.TimeSeconds <= result.Case.DurationSeconds * (1 + 1e-12));
        var (flux, lag) = SteadyPermeation(result);
        return new BatchKeyResults(
            JsonNamingPolicy.CamelCase.ConvertName(result.FinalState.Kind.ToString()),
            end.Left?.TransferredIntoMediumPerArea,
            end.Right?.TransferredIntoMediumPerArea,
            flux,
            lag,
            result.FinalState.System.NinetyPercent,
            result.WorstMassBalanceError,
            result.NumericalError?.WorstRelativeError,
            result.NumericalError?.AboveAccuracy.Count)
        {
            LeftConcentrationKgPerCubicMeter = end.Left?.ConcentrationKgPerCubicMeter,
            RightConcentrationKgPerCubicMeter = end.Right?.ConcentrationKgPerCubicMeter,
            // The food's figures as the limit verdict reads them: at the end of the history, or for an article tested in
            // repeated contacts with fresh food, at the end of the judged contact.
            FoodConcentrationKgPerKg = result.Schedule?.RepeatedUse?.JudgedValue ?? result.FoodContact?.FinalConcentration,
            FoodMigrationKgPerSquareMeter = result.Schedule?.RepeatedUse?.JudgedMigrationKgPerSquareMeter ?? result.FoodContact?.FinalMigrationPerArea,
            TimeToLimitSeconds = result.FoodContact?.LimitReachedSeconds,
        };
    }

    /// <summary>
    /// Steady flux and lag time as the case's own run reports them: between two baths the series-resistance flux and
    /// the lag of the amount received (summary.json <c>permeation</c>); in a diffusion cell (a finite receiver,
    /// sampling, a permeation test) the straight line through the simulated amount received, when the run reaches
    /// one (summary.json <c>diffusionCell.simulated</c>). Where that line is no steady line, neither is reported.
    /// </summary>
    private static (double? Flux, double? Lag) SteadyPermeation(SimulationResult result)
    {
        if (result.Permeation is { } permeation)
        {
            return (permeation.SteadyFluxKgPerSquareMeterSecond, permeation.LagTimeSeconds);
        }

        return result.DiffusionCell?.Simulated is { IsSteady: true } line
            ? (line.SteadyFluxKgPerSquareMeterSecond, line.LagTimeSeconds)
            : (null, null);
    }

    /// <summary>The value of a named result of <see cref="NamedResults.InBatchSummary"/>, SI.</summary>
    public double? Pick(NamedResult which) => which switch
    {
        NamedResult.LeftReceived => LeftReceivedKgPerSquareMeter,
        NamedResult.RightReceived => RightReceivedKgPerSquareMeter,
        NamedResult.SteadyFlux => SteadyFluxKgPerSquareMeterSecond,
        NamedResult.LagTime => LagTimeSeconds,
        NamedResult.TimeTo90Percent => TimeTo90PercentSeconds,
        NamedResult.LeftConcentration => LeftConcentrationKgPerCubicMeter,
        NamedResult.RightConcentration => RightConcentrationKgPerCubicMeter,
        NamedResult.FoodConcentration => FoodConcentrationKgPerKg,
        NamedResult.TimeToLimit => TimeToLimitSeconds,
        NamedResult.LeftPeriodReceived or NamedResult.RightPeriodReceived or NamedResult.LeftPeriodLowestFlux
            or NamedResult.RightPeriodLowestFlux or NamedResult.LeftPeriodHighestFlux or NamedResult.RightPeriodHighestFlux
            or NamedResult.LeftPeriodEndConcentration or NamedResult.RightPeriodEndConcentration
            => throw new ArgumentOutOfRangeException(nameof(which), which, "a batch row holds no period's figure: it names no period"),
    };
}
