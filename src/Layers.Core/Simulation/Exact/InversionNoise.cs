using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// Clears the round-off of the inversion from a run of the exact method. The inverted value at a time carries an
/// absolute error of about 1e-13 of the largest values of its transform, so where a quantity is still in its diffusion
/// tail (an amount that has barely begun to arrive) the inversion returns noise of either sign instead of a tiny
/// positive number. Values of a quantity below <see cref="RelativeFloor"/> of its largest magnitude over the run are
/// written as 0: they are below the round-off of the method, and the finite volumes' positivity shows them as 0 or
/// as tiny positive numbers too.
/// </summary>
internal static class InversionNoise
{
    /// <summary>The floor, relative to a quantity's largest magnitude over the run.</summary>
    public const double RelativeFloor = 1e-11;

    /// <summary>The samples with every layer mass and face quantity below its floor set to 0.</summary>
    public static List<StateSample> Clear(List<StateSample> samples)
    {
        var layers = samples[0].LayerMassPerArea.Count;
        var masses = new double[layers];
        for (var layer = 0; layer < layers; layer++)
        {
            var index = layer;
            masses[layer] = Floor(samples.Select(sample => sample.LayerMassPerArea[index]));
        }

        var left = FaceFloors(samples.Select(sample => sample.Left));
        var right = FaceFloors(samples.Select(sample => sample.Right));
        return [.. samples.Select(sample => sample with
        {
            LayerMassPerArea = [.. sample.LayerMassPerArea.Select((mass, layer) => Cleared(mass, masses[layer]))],
            Left = Face(sample.Left, left),
            Right = Face(sample.Right, right),
        })];
    }

    /// <summary>The profiles of a run with every value below its layer's floor (over all report times) set to 0.</summary>
    public static List<ReportPoint> Clear(List<ReportPoint> reports, IReadOnlyList<StateSample> cleared)
    {
        if (reports.Count == 0)
        {
            return reports;
        }

        var floors = reports[0].Profiles
            .Select((_, layer) => Floor(reports.SelectMany(report => report.Profiles[layer].ConcentrationsKgPerCubicMeter)))
            .ToArray();
        return [.. reports.Select(report => report with
        {
            Sample = cleared.First(sample => sample.TimeSeconds == report.Sample.TimeSeconds),
            Profiles = [.. report.Profiles.Select((profile, layer) => profile with
            {
                ConcentrationsKgPerCubicMeter = [.. profile.ConcentrationsKgPerCubicMeter.Select(value => Cleared(value, floors[layer]))],
            })],
        })];
    }

    private static (double Transferred, double Concentration, double Flux) FaceFloors(IEnumerable<FaceSample?> faces)
    {
        var present = faces.OfType<FaceSample>().ToList();
        return (
            Floor(present.Select(face => face.TransferredIntoMediumPerArea)),
            Floor(present.Select(face => face.ConcentrationKgPerCubicMeter)),
            Floor(present.Select(face => face.FluxIntoMediumKgPerSquareMeterSecond)));
    }

    private static FaceSample? Face(FaceSample? face, (double Transferred, double Concentration, double Flux) floors) => face is null
        ? null
        : face with
        {
            TransferredIntoMediumPerArea = Cleared(face.TransferredIntoMediumPerArea, floors.Transferred),
            ConcentrationKgPerCubicMeter = Cleared(face.ConcentrationKgPerCubicMeter, floors.Concentration),
            FluxIntoMediumKgPerSquareMeterSecond = Cleared(face.FluxIntoMediumKgPerSquareMeterSecond, floors.Flux),
        };

    private static double Floor(IEnumerable<double> values) => RelativeFloor * values.Select(Math.Abs).DefaultIfEmpty(0).Max();

    private static double Cleared(double value, double floor) => Math.Abs(value) < floor ? 0 : value;
}
