namespace Layers.Core.Discretization;

/// <summary>
/// A closed face: no node, no link; the face value is what the end cells extrapolate to with no flux (zero slope): the
/// end cell's own, or the quadratic with zero slope through the two end cells (<see cref="CellSide"/>).
/// </summary>
public sealed class ClosedFaceModel : FaceModel
{
    private ClosedFaceModel()
    {
    }

    /// <summary>The one closed face: it carries no data.</summary>
    public static ClosedFaceModel Instance { get; } = new();

    private protected override double OutsideValue(double cellValue, double endNodeValue) => cellValue;
}
