using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// The flux into each face medium (positive into the medium, so a medium that gives has a negative one) and the
/// concentration at named depths across partition jumps, where the exact profile is linear.
/// </summary>
public sealed class FaceFluxAndDepthTests
{
    /// <summary>
    /// At steady state between two baths through three layers with films, the flux into the right bath is the
    /// series-resistance flux and the left bath gives the same (its flux into itself is its negative); the
    /// concentration is linear within each layer, so the depth readings (linear between cell centres and the face
    /// values) hold it to round-off of the steady state, on both sides of an interface. Reference: Crank, The
    /// Mathematics of Diffusion, 2nd ed. (1975), ch. 12 (composite membranes, steady state; section from memory);
    /// Cussler, Diffusion: Mass Transfer in Fluid Systems, 3rd ed. (2009), ch. 13.2 (overall coefficients).
    /// </summary>
    [Fact]
    public void At_steady_state_the_face_fluxes_and_the_depth_readings_follow_the_series_resistance_law()
    {
        var layers = new[]
        {
            Cases.Layer("outer", 30e-6, 2e-12, k: 0.05),
            Cases.Layer("core", 200e-6, 5e-11, k: 20),
            Cases.Layer("inner", 10e-6, 1e-13, k: 3),
        };
        double kLeft = 1, kRight = 0.5, filmLeft = 2e-6, filmRight = 5e-7, cLeft = 8, cRight = 0.5;
        var resistances = layers.Select(layer => layer.ThicknessMeters / (layer.DiffusivitySquareMetersPerSecond * layer.PartitionCoefficient)).ToArray();
        var total = (1 / (filmLeft * kLeft)) + (1 / (filmRight * kRight)) + resistances.Sum();
        var flux = ((cLeft / kLeft) - (cRight / kRight)) / total;
        var longEnough = 40 * total * layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient);

        // u = c/K on every edge from the left bath on, dropping J R across each resistance.
        var edges = new double[layers.Length + 1];
        edges[0] = (cLeft / kLeft) - (flux / (filmLeft * kLeft));
        for (var i = 0; i < layers.Length; i++)
        {
            edges[i + 1] = edges[i] - (flux * resistances[i]);
        }

        // Inside the outer layer, on the outer/core interface (both sides), inside the core, both outer faces.
        double[] depths = [0, 12e-6, 30e-6, 130e-6, 240e-6];
        var simulation = Cases.Make(Cases.Bath(cLeft, kLeft, filmLeft), Cases.Bath(cRight, kRight, filmRight), longEnough, layers: layers)
            with { ReportDepthsMeters = depths };

        var result = Simulator.Run(simulation);

        var end = result.Reports[^1];
        Tolerance.Relative(flux, end.Sample.Right!.FluxIntoMediumKgPerSquareMeterSecond, 1e-6, "flux into the right bath");
        Tolerance.Relative(-flux, end.Sample.Left!.FluxIntoMediumKgPerSquareMeterSecond, 1e-6, "flux into the left bath (it gives)");
        Assert.Equal(result.Permeation!.FluxAtEndKgPerSquareMeterSecond, end.Sample.Right.FluxIntoMediumKgPerSquareMeterSecond);
        (double Depth, int Layer, double Expected)[] expected =
        [
            (0, 0, 0.05 * edges[0]),
            (12e-6, 0, 0.05 * (edges[0] + (0.4 * (edges[1] - edges[0])))),
            (30e-6, 0, 0.05 * edges[1]),
            (30e-6, 1, 20 * edges[1]),
            (130e-6, 1, 20 * (edges[1] + (0.5 * (edges[2] - edges[1])))),
            (240e-6, 2, 3 * edges[3]),
        ];
        Assert.Equal(expected.Select(row => (row.Depth, row.Layer)), end.Depths.Select(reading => (reading.DepthMeters, reading.LayerIndex)));
        for (var i = 0; i < expected.Length; i++)
        {
            Tolerance.Relative(expected[i].Expected, end.Depths[i].ConcentrationKgPerCubicMeter, 1e-6, $"c at {expected[i].Depth * 1e6} um in layer {expected[i].Layer}");
        }
    }
}
