using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Permeation;

namespace Layers.Core.Reports;

/// <summary>Says which layer parameters were estimated rather than given, and how.</summary>
public static class EstimateNotes
{
    /// <summary>One sentence for a layer with an estimate.</summary>
    public static string Describe(SkinEstimate estimate) => string.Create(
        CultureInfo.InvariantCulture,
        $"estimated, not measured: Potts-Guy k_p = {estimate.PermeabilityCoefficientMetersPerSecond * 3.6e5:G3} cm/h from log K_ow {estimate.LogKow:G4} and MW {estimate.MolarMassGramsPerMole:G4} g/mol; K = K_ow^{PottsGuy.PartitionExponent.ToString(CultureInfo.InvariantCulture)} = {estimate.PartitionCoefficient:G3} (assumed), D = k_p h / K = {estimate.DiffusivitySquareMetersPerSecond * 1e4:G3} cm2/s (equation constants and K scaling recalled, unverified)");

    /// <summary>One line per estimated layer.</summary>
    public static IReadOnlyList<string> For(SimulationCase simulation)
        => simulation.Stack.Layers
            .Where(layer => layer.Estimate is not null)
            .Select(layer => $"note: {layer.Name}: {Describe(layer.Estimate!)}")
            .ToArray();
}
