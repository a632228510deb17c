using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// Checks a finite-volume result against the exact solution in the Laplace domain (src/Layers.Core/Laplace) where the
/// case allows it: every key figure above its floor that the exact method gives at a report time (amounts, medium
/// concentrations and fluxes, edge and depth concentrations) and the steady flux and lag time. Times to a fraction of
/// the final state are not checked: each would cost a root search on the inverted solution.
/// </summary>
/// <remarks>
/// The inversion on a Talbot contour is accurate to about 1e-11 of the largest values of the transform, so a figure
/// deep in a diffusion tail can carry a larger relative error than the finite volumes; each value is therefore
/// inverted with two contour sizes and left out where the two differ by more than a thousandth of the accuracy.
/// </remarks>
public static class ExactCrossCheck
{
    /// <summary>The contour sizes compared, the first being the one whose values are used.</summary>
    private const int ContourPoints = 48;

    private const int ComparisonContourPoints = 32;

    /// <summary>The check of a completed result whose error was estimated.</summary>
    public static CrossCheckSummary Of(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var simulation = result.Case;
        var accuracy = simulation.Numerics.Accuracy;
        var applicability = LaplaceApplicability.Of(simulation);
        if (!applicability.IsApplicable)
        {
            return new CrossCheckSummary(string.Join("; ", applicability.Reasons), accuracy, []);
        }

        if (result.NumericalError is not { Unavailable: null } error)
        {
            return new CrossCheckSummary("no error estimate to judge the differences by", accuracy, []);
        }

        var exact = ExactValues(simulation, LaplaceSolution.For(simulation, ContourPoints), result);
        var check = ExactValues(simulation, LaplaceSolution.For(simulation, ComparisonContourPoints), result);
        var figures = error.Figures
            .Where(figure => !figure.Figure.IsNegligible
                && exact.TryGetValue(figure.Figure.Path, out var value)
                && Math.Abs(value - check[figure.Figure.Path]) <= 1e-3 * accuracy * Math.Abs(value))
            .Select(figure => new FigureComparison(figure, exact[figure.Figure.Path]))
            .ToList();
        return new CrossCheckSummary(null, accuracy, figures);
    }

    /// <summary>The exact value of every key figure the method gives, by its summary.json path (as in <see cref="KeyFigures"/>).</summary>
    private static Dictionary<string, double> ExactValues(SimulationCase simulation, LaplaceSolution solution, SimulationResult result)
    {
        var values = new Dictionary<string, double>(StringComparer.Ordinal);
        var layers = simulation.Stack.Layers;
        for (var i = 0; i < result.Reports.Count; i++)
        {
            var time = result.Reports[i].Sample.TimeSeconds;
            if (time <= 0)
            {
                continue;
            }

            var snapshot = solution.At(time);
            for (var layer = 0; layer < layers.Count; layer++)
            {
                var k = layers[layer].PartitionCoefficient;
                values[$"$.layers[{layer}].massPerAreaKgPerSquareMeter[{i}]"] = snapshot.LayerMassPerArea[layer];
                values[$"$.layers[{layer}].leftEdgeConcentrationKgPerCubicMeter[{i}]"] = k * snapshot.ContinuousValueAtInterfaces[layer];
                values[$"$.layers[{layer}].rightEdgeConcentrationKgPerCubicMeter[{i}]"] = k * snapshot.ContinuousValueAtInterfaces[layer + 1];
            }

            foreach (var side in new[] { Side.Left, Side.Right })
            {
                if (snapshot.Face(side) is not { } face)
                {
                    continue;
                }

                var path = "$.faces." + (side == Side.Left ? "left" : "right");
                values[$"{path}.fluxIntoMediumKgPerSquareMeterSecond[{i}]"] = face.FluxIntoMediumKgPerSquareMeterSecond;
                values[$"{path}.concentrationKgPerCubicMeter[{i}]"] = face.ConcentrationKgPerCubicMeter;

                // With first-order removal the exact method counts what was removed as transferred; the finite volumes
                // do not, so that figure is not compared there.
                if (face.RemovedPerArea == 0)
                {
                    values[$"{path}.transferredMassPerAreaKgPerSquareMeter[{i}]"] = face.TransferredIntoMediumPerArea;
                }
            }

            AddDepths(values, solution, snapshot, result.Reports[i], i, simulation);
        }

        if (result.Permeation is not null && solution.SteadyLine(Side.Right) is { } line)
        {
            values["$.permeation.steadyFluxKgPerSquareMeterSecond"] = line.FluxKgPerSquareMeterSecond;
            values["$.permeation.lagTimeSeconds"] = line.LagTimeSeconds;
        }

        return values;
    }

    /// <summary>The named depths of one report: inside a layer from the inverted profile, on its edge from the interface value.</summary>
    private static void AddDepths(
        Dictionary<string, double> values, LaplaceSolution solution, LaplaceSnapshot snapshot, ReportPoint report, int index, SimulationCase simulation)
    {
        var readings = report.Depths;
        if (readings.Count == 0)
        {
            return;
        }

        var inside = solution.ConcentrationsAt([.. readings.Select(reading => reading.DepthMeters)], report.Sample.TimeSeconds);
        var slack = DepthReadings.OnEdgeRelative * report.Profiles[^1].PositionsMeters[^1];
        for (var r = 0; r < readings.Count; r++)
        {
            var reading = readings[r];
            var edges = report.Profiles[reading.LayerIndex].PositionsMeters;
            var k = simulation.Stack.Layers[reading.LayerIndex].PartitionCoefficient;
            values[$"$.depths[{r}].concentrationKgPerCubicMeter[{index}]"] = ExactDepthValue.Of(reading, (edges[0], edges[^1]), k, snapshot, inside[r], slack);
        }
    }
}
