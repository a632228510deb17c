namespace Layers.Core.Domain;

/// <summary>
/// Asks for the permeation metrics of a diffusion-cell or patch case: the cumulative amount per area received by the
/// right-hand face medium, its steady flux, lag time and permeability coefficient, optionally compared with measured
/// data.
/// </summary>
public sealed record PermeationTest
{
    /// <summary>
    /// Donor concentration for k_p = J_ss / C_donor, kg/m3; null to take the left bath's concentration or the left
    /// compartment's initial concentration (none for a closed left face).
    /// </summary>
    public double? DonorConcentrationKgPerCubicMeter { get; init; }

    /// <summary>Measured cumulative amounts per area, SI (s, kg/m2), or null.</summary>
    public MeasuredPermeation? Measured { get; init; }

    /// <summary>Delivery rate the product should hold, kg/(m2 s), or null.</summary>
    public double? TargetFluxKgPerSquareMeterSecond { get; init; }

    /// <summary>Delivery area for amounts per day per product, m2, or null (amounts per area only).</summary>
    public double? DeliveryAreaSquareMeters { get; init; }
}

/// <summary>Measured cumulative amount per area against time, as read from the user's CSV file.</summary>
/// <param name="FileName">The file as named in the case.</param>
/// <param name="TimesSeconds">Times, s, ascending.</param>
/// <param name="CumulativePerArea">Cumulative amount permeated per area, kg/m2, already corrected for sampling.</param>
public sealed record MeasuredPermeation(string FileName, IReadOnlyList<double> TimesSeconds, IReadOnlyList<double> CumulativePerArea);
