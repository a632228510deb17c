using System.Text.Json;
using Layers.Core.Results;

namespace Layers.Core.Batch;

/// <summary>The key results of one solved case that a batch summary lists, in SI units (names carry them).</summary>
/// <param name="FinalState">closedEquilibrium, bathEquilibrium, steadyPermeation or allRemoved.</param>
/// <param name="LeftReceivedKgPerSquareMeter">Mass per area received by the left medium at the end of the duration; null when closed.</param>
/// <param name="RightReceivedKgPerSquareMeter">The same for the right medium.</param>
/// <param name="SteadyFluxKgPerSquareMeterSecond">Steady flux between two baths, left to right; null otherwise.</param>
/// <param name="LagTimeSeconds">Lag time of the amount received; null when not a permeation case or not reached.</param>
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
    /// <summary>The key results of a solved case.</summary>
    public static BatchKeyResults From(SimulationResult result)
    {
        // The sample at the end of the duration: the time series continues beyond it while thresholds are ahead.
        var end = result.TimeSeries.Last(sample => sample.TimeSeconds <= result.Case.DurationSeconds * (1 + 1e-12));
        return new BatchKeyResults(
            JsonNamingPolicy.CamelCase.ConvertName(result.FinalState.Kind.ToString()),
            end.Left?.TransferredIntoMediumPerArea,
            end.Right?.TransferredIntoMediumPerArea,
            result.Permeation?.SteadyFluxKgPerSquareMeterSecond,
            result.Permeation?.LagTimeSeconds,
            result.FinalState.System.NinetyPercent,
            result.WorstMassBalanceError,
            result.NumericalError?.WorstRelativeError,
            result.NumericalError?.AboveAccuracy.Count);
    }

    /// <summary>The value of a named result, or null for one the batch summary does not list.</summary>
    public double? Pick(NamedResult which) => which switch
    {
        NamedResult.LeftReceived => LeftReceivedKgPerSquareMeter,
        NamedResult.RightReceived => RightReceivedKgPerSquareMeter,
        NamedResult.SteadyFlux => SteadyFluxKgPerSquareMeterSecond,
        NamedResult.LagTime => LagTimeSeconds,
        NamedResult.TimeTo90Percent => TimeTo90PercentSeconds,
        NamedResult.LeftConcentration or NamedResult.RightConcentration or NamedResult.FoodConcentration or NamedResult.TimeToLimit => null,
    };
}
