using Layers.Core.Simulation;
using Layers.Core.TimeStepping;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Robustness;

/// <summary>
/// A run whose own mass balance or sign check fails is refused, not reported as a success: the thresholds are
/// 1e-9 of the mass (docs/numerics.md; common practice, no source: a conservative scheme conserves mass to round-off,
/// about 1e-14 here, so 1e-9 leaves room for round-off over a million steps and none for a real loss).
/// </summary>
public sealed class SelfCheckTests
{
    [Theory]
    [InlineData(1e-14, 0, StopReason.Completed)]
    [InlineData(1e-9, -1e-9, StopReason.Completed)]
    [InlineData(2e-9, 0, StopReason.MassBalanceNotClosed)]
    [InlineData(double.NaN, 0, StopReason.MassBalanceNotClosed)]
    [InlineData(0, -2e-9, StopReason.NegativeAmount)]
    public void Runs_beyond_the_thresholds_are_refused_with_the_reason(double massBalance, double lowestAmount, StopReason expected)
    {
        var (reason, message) = SelfChecks.Judge(massBalance, lowestAmount);

        Assert.Equal(expected, reason);
        Assert.Equal(expected == StopReason.Completed, message.Length == 0);
    }

    [Fact]
    public void A_run_that_fails_its_mass_balance_exits_with_code_3_and_says_why()
    {
        // A 7 um layer between a bath and a small compartment, run for 1e12 times its cells' diffusion time: at
        // equilibrium the bath exchange is G (u_bath - u), a round-off difference times a conductance-step product
        // 1e12 times the cell's storage, so the balance cannot close to 1e-9 and the run must say so.
        using var temp = new TempFolder();
        var path = temp.WriteFile("bath-and-compartment.json", """
            {
              "layers": [ { "name": "l0", "thickness": "7.23752e-06 m", "diffusionCoefficient": "1.7824e-09 m2/s", "partitionCoefficient": 3864.056679848597, "initialConcentration": "313.741 kg/m3" } ],
              "left": { "kind": "bath", "name": "b", "concentration": "92.6301 kg/m3", "partitionCoefficient": 145.55618622671835 },
              "right": { "kind": "compartment", "name": "c", "volume": "0.0893754 mL", "area": "1 cm2", "partitionCoefficient": 4.344953631088589 },
              "duration": "2.99729e+09 s",
              "numerics": { "cells": 8, "minimumCellsPerLayer": 4, "relativeTolerance": 1e-3 }
            }
            """);

        var outcome = CliRun.Invoke("run", path, "--out", temp.Combine("results"), "--no-plots", "--quiet");

        Assert.Equal(3, outcome.ExitCode);
        Assert.Contains("mass balance", outcome.Error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(temp.Combine("results", "bath-and-compartment")));
    }
}
