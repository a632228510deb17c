using Layers.Core.Domain;

namespace Layers.Core.Results;

/// <summary>Diffusion-cell and patch figures of one run.</summary>
/// <param name="Sampling">One entry per sampled compartment.</param>
/// <param name="SinkChecks">One entry per compartment with a solubility.</param>
/// <param name="RemovedByFirstOrderPerArea">Mass per contact area removed by first-order removal over the duration, per side (left, right), kg/m2.</param>
/// <param name="Simulated">Metrics of the simulated cumulative amount received by the right face medium, or null when not asked for.</param>
/// <param name="Measured">The same metrics from the measured data, or null.</param>
/// <param name="Delivery">Delivered amounts per day and the time a target rate is held, or null.</param>
public sealed record DiffusionCellSummary(
    IReadOnlyList<CompartmentSampling> Sampling,
    IReadOnlyList<SinkCheck> SinkChecks,
    IReadOnlyList<double> RemovedByFirstOrderPerArea,
    PermeationMetrics? Simulated,
    PermeationMetrics? Measured,
    DeliverySummary? Delivery);

/// <summary>The samples taken from one compartment and the cumulative amount corrected for them.</summary>
/// <param name="Side">Which face the compartment is on.</param>
/// <param name="Name">Name of the compartment.</param>
/// <param name="Points">One point per sampling time.</param>
/// <param name="WithdrawnPerArea">Mass per contact area withdrawn in all samples, kg/m2.</param>
public sealed record CompartmentSampling(Side Side, string Name, IReadOnlyList<SamplingPoint> Points, double WithdrawnPerArea);

/// <summary>One sample.</summary>
/// <param name="TimeSeconds">Sampling time, s.</param>
/// <param name="ConcentrationKgPerCubicMeter">Concentration in the sample (just before withdrawal), kg/m3.</param>
/// <param name="CorrectedCumulativePerArea">Q_n = (V C_n + v sum_{i&lt;n} C_i) / A, kg/m2: the amount received, corrected for earlier samples.</param>
public sealed record SamplingPoint(double TimeSeconds, double ConcentrationKgPerCubicMeter, double CorrectedCumulativePerArea);

/// <summary>The sink-condition check of one compartment.</summary>
/// <param name="Name">Name of the compartment.</param>
/// <param name="SolubilityKgPerCubicMeter">Solubility in the medium, kg/m3.</param>
/// <param name="Fraction">Fraction of the solubility allowed.</param>
/// <param name="HighestConcentrationKgPerCubicMeter">Highest concentration at the output times within the duration, kg/m3.</param>
/// <param name="FirstExceededSeconds">First output time at which the concentration exceeded the fraction, s, or null.</param>
public sealed record SinkCheck(
    string Name,
    double SolubilityKgPerCubicMeter,
    double Fraction,
    double HighestConcentrationKgPerCubicMeter,
    double? FirstExceededSeconds)
{
    /// <summary>True when sink conditions were lost at some output time.</summary>
    public bool Exceeded => FirstExceededSeconds is not null;
}

/// <summary>
/// Steady flux, lag time and permeability coefficient from a cumulative amount per area Q(t); valid as such only when
/// <see cref="IsSteady"/>.
/// </summary>
/// <param name="Source">"simulated" or "measured".</param>
/// <param name="SteadyFluxKgPerSquareMeterSecond">Slope of the straight line through the steady part, kg/(m2 s).</param>
/// <param name="LagTimeSeconds">Time-axis intercept of that line, s.</param>
/// <param name="PermeabilityCoefficientMetersPerSecond">k_p = J_ss / C_donor, m/s, or null without a donor concentration.</param>
/// <param name="DonorConcentrationKgPerCubicMeter">The C_donor used, kg/m3, or null.</param>
/// <param name="PointsUsed">Number of points in the steady part.</param>
/// <param name="FromSeconds">First time of the steady part, s.</param>
/// <param name="ToSeconds">Last time of the steady part, s.</param>
/// <param name="RSquared">R^2 of the fitted line.</param>
/// <param name="CumulativeAtEndPerArea">Q at the last time, kg/m2.</param>
public sealed record PermeationMetrics(
    string Source,
    double SteadyFluxKgPerSquareMeterSecond,
    double LagTimeSeconds,
    double? PermeabilityCoefficientMetersPerSecond,
    double? DonorConcentrationKgPerCubicMeter,
    int PointsUsed,
    double FromSeconds,
    double ToSeconds,
    double RSquared,
    double CumulativeAtEndPerArea)
{
    /// <summary>
    /// Why the fitted line is not a steady flux (a depleting donor, a curved Q(t), a negative lag time), or null when
    /// it is. When set, the flux, lag time and k_p above are those of the fitted line only and are not reported as
    /// results.
    /// </summary>
    public string? NoSteadyLineReason { get; init; }

    /// <summary>True when the run reached a steady line by the criteria of <c>SteadyLine</c>.</summary>
    public bool IsSteady => NoSteadyLineReason is null;
}

/// <summary>How much the product delivers per day and how long it holds a target rate.</summary>
/// <param name="PerDayPerArea">Amount received per area in each whole day of the duration, kg/m2.</param>
/// <param name="AreaSquareMeters">Delivery area, m2, or null.</param>
/// <param name="TargetFluxKgPerSquareMeterSecond">Target delivery rate, kg/(m2 s), or null.</param>
/// <param name="TargetReachedSeconds">First output time at which the mean rate since the previous output reaches the target, s, or null.</param>
/// <param name="TargetHeldUntilSeconds">Last output time of the first run at or above the target, s, or null.</param>
public sealed record DeliverySummary(
    IReadOnlyList<double> PerDayPerArea,
    double? AreaSquareMeters,
    double? TargetFluxKgPerSquareMeterSecond,
    double? TargetReachedSeconds,
    double? TargetHeldUntilSeconds);
