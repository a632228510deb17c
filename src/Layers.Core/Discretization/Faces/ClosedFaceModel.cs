namespace Layers.Core.Discretization;

/// <summary>A closed face: no node, no link; the face value is the end cell's own (no flux, no gradient).</summary>
public sealed class ClosedFaceModel : FaceModel
{
    private ClosedFaceModel()
    {
    }

    /// <summary>The one closed face: it carries no data.</summary>
    public static ClosedFaceModel Instance { get; } = new();

    private protected override double OutsideValue(double cellValue, double endNodeValue) => cellValue;
}
