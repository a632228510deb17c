using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// How one face of the stack enters the discrete model: whether it adds a well-mixed node at its end of the chain
/// (with that node's storage, K and initial u), the links of the chain's end (to the added node, or to an outside
/// value), and the value of u on the face reconstructed from the end cell. One small type per kind of face;
/// <see cref="For"/> is the one place that maps a <see cref="FaceCondition"/> to its model.
/// </summary>
/// <remarks>
/// A node's relaxation time Cap / (sum of its conductances) reads the face's links through
/// <see cref="DiffusionSystem.ConductanceToLeft"/> and <see cref="DiffusionSystem.ConductanceToRight"/>: a face
/// contributes its film (the added node's or the bath's link) and, for a compartment, its first-order removal.
/// </remarks>
public abstract class FaceModel
{
    private protected FaceModel()
    {
    }

    /// <summary>The model of a face condition: the one switch over the kinds of face.</summary>
    public static FaceModel For(FaceCondition face)
    {
        ArgumentNullException.ThrowIfNull(face);
        return face switch
        {
            ClosedFace => ClosedFaceModel.Instance,
            BathFace bath => new BathFaceModel(bath),
            CompartmentFace compartment => new CompartmentFaceModel(compartment),
            _ => throw new ArgumentException($"unknown kind of face: {face.GetType().Name}", nameof(face)),
        };
    }

    /// <summary>Whether the face adds a well-mixed node beyond the end cell.</summary>
    public virtual bool AddsNode => false;

    /// <summary>Storage of the added node per unit contact area, m; 0 when the face adds none.</summary>
    public virtual double NodeCapacity => 0;

    /// <summary>K of the added node's medium (for its c = K u); 1 when the face adds none.</summary>
    public virtual double NodePartitionCoefficient => 1;

    /// <summary>Initial u = c / K of the added node, kg/m3; 0 when the face adds none.</summary>
    public virtual double NodeInitialValue => 0;

    /// <summary>Resistance of the film on the medium's side of the face, 1 / (k K), s/m; 0 for none.</summary>
    public virtual double FilmResistance => 0;

    /// <summary>
    /// Conductance between the end cell and the added node, 1 / (half-cell + film), m/s (the two resistances in
    /// series, <see cref="SeriesResistance"/>).
    /// </summary>
    /// <param name="endHalfCellResistance">Half-cell resistance of the end cell, s/m.</param>
    public double NodeConductance(double endHalfCellResistance) => 1 / (endHalfCellResistance + FilmResistance);

    /// <summary>
    /// The link of the chain's end node (the end cell, or the added node) to an outside value that does not change;
    /// <see cref="BathCoupling.None"/> when there is none.
    /// </summary>
    /// <param name="endHalfCellResistance">Half-cell resistance of the end cell, s/m.</param>
    public virtual BathCoupling OuterCoupling(double endHalfCellResistance) => BathCoupling.None;

    /// <summary>
    /// u on the face, from flux continuity between the end cell and what lies beyond it: the flux
    /// (u_out - u_cell) / (R_half + R_film) crosses the half cell, so u_face = u_cell + flux R_half, the
    /// resistance-weighted mean of the two (<see cref="SeriesResistance"/>).
    /// </summary>
    /// <param name="cellValue">u the end cells extrapolate to at the face with no flux through it: the end cell's own u,
    /// or the second-order value of <see cref="CellSide"/>.</param>
    /// <param name="endHalfCellResistance">Resistance of the cells' side to a flux through the face: the end cell's
    /// half-cell resistance, or that of <see cref="CellSide"/>, s/m.</param>
    /// <param name="endNodeValue">u of the chain's end node (the added node when there is one).</param>
    public double FaceValue(double cellValue, double endHalfCellResistance, double endNodeValue)
    {
        // Without a film the face takes the outside value itself; formed as below it would only do so to round-off,
        // which can leave a face on a zero bath a hair below zero.
        var outside = OutsideValue(cellValue, endNodeValue);
        if (FilmResistance == 0)
        {
            return outside;
        }

        var flux = (outside - cellValue) / (endHalfCellResistance + FilmResistance);
        return cellValue + (flux * endHalfCellResistance);
    }

    /// <summary>u beyond the face that drives the flux through it: the cell's own for no exchange.</summary>
    private protected abstract double OutsideValue(double cellValue, double endNodeValue);
}
