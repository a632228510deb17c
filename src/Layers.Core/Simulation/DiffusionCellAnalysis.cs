using Layers.Core.Domain;
using Layers.Core.Permeation;
using Layers.Core.Results;

namespace Layers.Core.Simulation;

/// <summary>
/// Turns the time series of a diffusion-cell or patch case into its figures: the samples and the corrected
/// cumulative amount, the sink check, what first-order removal took out, the permeation metrics of the simulation
/// and of measured data, and the delivery per day.
/// </summary>
internal static class DiffusionCellAnalysis
{
    /// <summary>Null unless the case asks for metrics or has sampling, a solubility or first-order removal.</summary>
    public static DiffusionCellSummary? Of(SimulationCase simulation, IReadOnlyList<StateSample> series, SamplingEvents sampling)
    {
        var compartments = new[] { simulation.Left, simulation.Right }.OfType<CompartmentFace>().ToArray();
        var relevant = simulation.PermeationTest is not null || compartments.Any(compartment =>
            compartment.Sampling is not null || compartment.SolubilityKgPerCubicMeter is not null || compartment.RemovalRatePerSecond > 0);
        if (!relevant)
        {
            return null;
        }

        var sampled = new List<CompartmentSampling>();
        var sinks = new List<SinkCheck>();
        var removed = new double[2];
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            if (simulation.Face(side) is not CompartmentFace compartment)
            {
                continue;
            }

            if (compartment.Sampling is { } plan)
            {
                var taken = sampling.Samples(side);
                var corrected = SamplingCorrection.CumulativePerArea(
                    taken.Select(sample => sample.ConcentrationKgPerCubicMeter).ToArray(),
                    compartment.VolumeCubicMeters,
                    plan.VolumeCubicMeters,
                    compartment.ContactAreaSquareMeters);
                var points = taken.Select((sample, i) => new SamplingPoint(
                    sample.TimeSeconds, sample.ConcentrationKgPerCubicMeter, corrected[i] - compartment.InitialMassPerArea)).ToArray();
                sampled.Add(new CompartmentSampling(side, compartment.Name, points, sampling.RemovedPerArea(side)));
            }

            if (compartment.SolubilityKgPerCubicMeter is { } solubility)
            {
                sinks.Add(Sink(compartment, solubility, series, side));
            }

            if (compartment.RemovalRatePerSecond > 0)
            {
                var last = series[^1];
                var face = (side == Side.Left ? last.Left : last.Right)!;
                removed[(int)side] = RemovedByFirstOrder(compartment, last, face, sampling, side);
            }
        }

        var test = simulation.PermeationTest;
        PermeationMetrics? simulated = null;
        PermeationMetrics? measured = null;
        DeliverySummary? delivery = null;
        if (test is not null && simulation.Right.IsOpen)
        {
            var donor = test.DonorConcentrationKgPerCubicMeter ?? simulation.Left switch
            {
                BathFace bath => bath.ConcentrationKgPerCubicMeter,
                CompartmentFace compartment => compartment.InitialConcentrationKgPerCubicMeter,
                _ => (double?)null,
            };
            // What the donor starts with: unlimited behind a bath; else all the drug in the system at the start but
            // what the receiving medium itself holds.
            double? donorContent = simulation.Left.IsUnlimited
                ? null
                : simulation.Stack.InitialMassPerArea + simulation.Left.InitialMassPerArea;
            var times = series.Select(sample => sample.TimeSeconds).ToArray();
            var received = series.Select(sample => sample.Right!.TransferredIntoMediumPerArea).ToArray();
            // A matrix loaded above its solubility depletes: its Q(t) has no steady part to fit.
            simulated = simulation.Stack.Layers.Any(layer => layer.InitialUndissolvedPerArea > 0)
                ? null
                : SteadyLine.Fit("simulated", times, received, donor, donorContent);
            if (test.Measured is { } data)
            {
                measured = SteadyLine.Fit("measured", data.TimesSeconds, data.CumulativePerArea, donor, donorContent);
            }

            delivery = Delivery.Of(test, times, received);
        }

        return new DiffusionCellSummary(sampled, sinks, removed, simulated, measured, delivery);
    }

    private static SinkCheck Sink(CompartmentFace compartment, double solubility, IReadOnlyList<StateSample> series, Side side)
    {
        var highest = 0.0;
        double? first = null;
        foreach (var sample in series)
        {
            var concentration = (side == Side.Left ? sample.Left : sample.Right)!.ConcentrationKgPerCubicMeter;
            highest = Math.Max(highest, concentration);
            if (first is null && concentration > compartment.SinkFraction * solubility)
            {
                first = sample.TimeSeconds;
            }
        }

        return new SinkCheck(compartment.Name, solubility, compartment.SinkFraction, highest, first);
    }

    /// <summary>
    /// What removal took out by the last output time: what crossed into the compartment, minus the change of its
    /// content, minus what samples before that time took.
    /// </summary>
    private static double RemovedByFirstOrder(CompartmentFace compartment, StateSample last, FaceSample face, SamplingEvents sampling, Side side)
    {
        var held = (face.ConcentrationKgPerCubicMeter * compartment.VolumePerAreaMeters) - compartment.InitialMassPerArea;
        var withdrawn = compartment.Sampling is { } plan
            ? sampling.Samples(side)
                .Where(sample => sample.TimeSeconds < last.TimeSeconds * (1 - 1e-12))
                .Sum(sample => plan.VolumeCubicMeters * sample.ConcentrationKgPerCubicMeter / compartment.ContactAreaSquareMeters)
            : 0;
        return face.TransferredIntoMediumPerArea - held - withdrawn;
    }
}
