namespace Layers.Core.Results;

/// <summary>Steady permeation between two baths.</summary>
/// <param name="SteadyFluxKgPerSquareMeterSecond">Series-resistance steady flux from the left to the right face, kg/m2/s.</param>
/// <param name="FluxAtEndKgPerSquareMeterSecond">Flux into the receiving bath at the end of the duration, kg/m2/s.</param>
/// <param name="LagTimeSeconds">
/// Intercept on the time axis of the steady-state asymptote of the cumulative amount received, t - Q(t)/J, evaluated
/// once the system is within 0.01 % of steady state; null if it did not get there within the horizon.
/// </param>
/// <param name="AnalyticLagTimeSeconds">L^2/(6D) when the case is a single membrane that starts empty between a source and a sink.</param>
public sealed record PermeationSummary(
    double SteadyFluxKgPerSquareMeterSecond,
    double FluxAtEndKgPerSquareMeterSecond,
    double? LagTimeSeconds,
    double? AnalyticLagTimeSeconds);
