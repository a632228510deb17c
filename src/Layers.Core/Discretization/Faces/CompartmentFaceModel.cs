using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// A finite well-mixed compartment: one more node of storage (V/A) K, linked to the end cell through the half cell
/// and the film 1 / (k K) in series; a first-order removal is a link from that node to a bath at u = 0.
/// </summary>
public sealed class CompartmentFaceModel : FaceModel
{
    private readonly CompartmentFace _compartment;

    /// <summary>The model of one compartment face.</summary>
    public CompartmentFaceModel(CompartmentFace compartment)
    {
        ArgumentNullException.ThrowIfNull(compartment);
        _compartment = compartment;
    }

    /// <inheritdoc />
    public override bool AddsNode => true;

    /// <inheritdoc />
    public override double NodeCapacity => _compartment.VolumePerAreaMeters * _compartment.PartitionCoefficient;

    /// <inheritdoc />
    public override double NodePartitionCoefficient => _compartment.PartitionCoefficient;

    /// <inheritdoc />
    public override double NodeInitialValue => _compartment.InitialConcentrationKgPerCubicMeter / _compartment.PartitionCoefficient;

    /// <inheritdoc />
    public override double FilmResistance => SeriesResistance.Film(_compartment.FilmCoefficientMetersPerSecond, _compartment.PartitionCoefficient);

    /// <summary>
    /// First-order removal, k V c per area and time = k (V/A) K u, as a link of conductance k (V/A) K from the
    /// compartment node to a bath at u = 0: the loss sits on the diagonal, the system stays tridiagonal, and the
    /// removed mass is counted by the bath quadrature, so the balance closes to round-off. None without removal.
    /// </summary>
    /// <param name="endHalfCellResistance">Not used: the link starts at the compartment node.</param>
    public override BathCoupling OuterCoupling(double endHalfCellResistance)
        => _compartment.RemovalRatePerSecond > 0 ? new BathCoupling(_compartment.RemovalRatePerSecond * NodeCapacity, 0) : BathCoupling.None;

    private protected override double OutsideValue(double cellValue, double endNodeValue) => endNodeValue;
}
