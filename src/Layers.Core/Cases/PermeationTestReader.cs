using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads <c>permeationTest</c>: the request for permeation metrics of the medium on the right face, with an
/// optional donor concentration, measured data file, target delivery rate and delivery area.
/// </summary>
internal static class PermeationTestReader
{
    private static readonly string[] Keys = ["donorConcentration", "measured", "targetFlux", "deliveryArea"];

    public static PermeationTest? Read(JsonFields root, ReadContext context, string caseFile, FaceCondition? right)
    {
        if (root.Member("permeationTest") is not { } element
            || JsonFields.Open(element, root.PathOf("permeationTest"), context.Errors, Keys) is not { } test)
        {
            return null;
        }

        if (right is { IsOpen: false })
        {
            context.Errors.Add(new CaseError(
                test.Path,
                "needs a medium on the right face that receives the permeant (a compartment or a bath); right is closed"));
        }

        var donor = test.Has("donorConcentration")
            ? ReadContext.Positive(test, "donorConcentration", Dimension.MassConcentration, required: true)
            : null;
        var target = ReadContext.Positive(test, "targetFlux", Dimension.MassFlux, required: false);
        var area = ReadContext.Positive(test, "deliveryArea", Dimension.Area, required: false);
        MeasuredPermeation? measured = null;
        if (test.Text("measured") is { } file)
        {
            measured = MeasuredCsv.Read(caseFile, file, context.Access, test.PathOf("measured"), context.Errors);
        }

        return new PermeationTest
        {
            DonorConcentrationKgPerCubicMeter = donor,
            Measured = measured,
            TargetFluxKgPerSquareMeterSecond = target,
            DeliveryAreaSquareMeters = area,
        };
    }
}
