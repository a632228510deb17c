using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// Steady permeation through three layers with partition jumps and liquid films between two baths, against the
/// series-resistance law written out here: J = (c_L/K_L - c_R/K_R) / (1/(k_L K_L) + sum h_i/(D_i K_i) + 1/(k_R K_R)).
/// Reference: Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 12 (composite membranes, steady state; section from memory);
/// Cussler, Diffusion: Mass Transfer in Fluid Systems, 3rd ed. (2009), ch. 13.2 (overall coefficients with a
/// partition coefficient in one resistance).
/// </summary>
public sealed class SteadyStateStackTests
{
    [Fact]
    public void Steady_flux_and_interface_concentrations_follow_the_series_resistance_law()
    {
        var layers = new[]
        {
            Cases.Layer("outer", 30e-6, 2e-12, k: 0.05),
            Cases.Layer("core", 200e-6, 5e-11, k: 20),
            Cases.Layer("inner", 10e-6, 1e-13, k: 3),
        };
        double kLeft = 1, kRight = 0.5, filmLeft = 2e-6, filmRight = 5e-7, cLeft = 8, cRight = 0.5;
        var total = (1 / (filmLeft * kLeft)) + (1 / (filmRight * kRight))
            + layers.Sum(layer => layer.ThicknessMeters / (layer.DiffusivitySquareMetersPerSecond * layer.PartitionCoefficient));
        var expectedFlux = ((cLeft / kLeft) - (cRight / kRight)) / total;
        // Slowest relaxation is bounded by (total storage) x (total resistance); 40 of those is steady to round-off.
        var longEnough = 40 * total * layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient);
        var simulation = Cases.Make(Cases.Bath(cLeft, kLeft, filmLeft), Cases.Bath(cRight, kRight, filmRight), longEnough, layers: layers);

        var result = Simulator.Run(simulation);

        Tolerance.Relative(expectedFlux, result.Permeation!.FluxAtEndKgPerSquareMeterSecond, 1e-4, "flux into the right bath");
        // At the interface between outer and core, c_outer / c_core = K_outer / K_core (the partition jump).
        var profiles = result.Reports[^1].Profiles;
        var outerRight = profiles[0].ConcentrationsKgPerCubicMeter[^1];
        var coreLeft = profiles[1].ConcentrationsKgPerCubicMeter[0];
        Tolerance.Relative(0.05 / 20, outerRight / coreLeft, 1e-9, "partition jump at the outer/core interface");
        // The left face of the stack: c = K_outer (c_L/K_L - J / (k_L K_L)).
        var expectedLeftFace = 0.05 * ((cLeft / kLeft) - (expectedFlux / (filmLeft * kLeft)));
        Tolerance.Relative(expectedLeftFace, profiles[0].ConcentrationsKgPerCubicMeter[0], 1e-4, "concentration at the left face");
    }
}
