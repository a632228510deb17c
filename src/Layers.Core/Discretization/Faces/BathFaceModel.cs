using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// An unlimited bath: no node; the end cell is linked to the bath's fixed u = c / K through its half cell and the
/// film 1 / (k K) in series.
/// </summary>
public sealed class BathFaceModel : FaceModel
{
    private readonly BathFace _bath;

    /// <summary>The model of one bath face.</summary>
    public BathFaceModel(BathFace bath)
    {
        ArgumentNullException.ThrowIfNull(bath);
        _bath = bath;
    }

    /// <inheritdoc />
    public override double FilmResistance => SeriesResistance.Film(_bath.FilmCoefficientMetersPerSecond, _bath.PartitionCoefficient);

    /// <inheritdoc />
    public override BathCoupling OuterCoupling(double endHalfCellResistance)
        => new(1 / (endHalfCellResistance + FilmResistance), _bath.ContinuousVariable);

    private protected override double OutsideValue(double cellValue, double endNodeValue) => _bath.ContinuousVariable;
}
