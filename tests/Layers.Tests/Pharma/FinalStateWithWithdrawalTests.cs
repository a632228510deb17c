using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Reports;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Pharma;

/// <summary>
/// The final state of a closed system that samples take mass out of, and of one that first-order removal empties,
/// against hand calculations: a loaded gel that equilibrates with its receptor in minutes, sampled hours apart, so
/// that each sample takes the same share of whatever the system holds (the closed-system equilibrium u = M / sum of
/// capacities, Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.37, from memory); and a system that loses
/// mass like dM/dt = -k f M (the exact solution of a linear first-order equation, common practice, no source).
/// </summary>
public sealed class FinalStateWithWithdrawalTests
{
    private const double Hour = 3600;
    private const double GelThickness = 1e-3;
    private const double GelDiffusivity = 1e-9;
    private const double GelConcentration = 1;
    private const double ReceptorVolume = 1e-6;
    private const double Area = 1e-4;
    private const double SampleVolume = 1e-7;

    [Fact]
    public void A_sampled_closed_system_ends_at_the_equilibrium_of_the_mass_the_samples_left_and_reaches_it()
    {
        // By hand: capacities h K = 1e-3 m (gel) and (V/A) K = 1e-2 m (receptor), 0.011 m in all; M0 = 1e-3 kg/m2.
        // The slowest mode of the gel into the receptor decays in h^2 / (D q1^2) with tan q1 = -10 q1, q1 about 1.63
        // (Crank ch. 4, limited volume, from memory): about 380 s, so at each sample, 6 h apart, the system is at
        // equilibrium and the sample takes (v/A) K u of the C u it holds: 1e-3 / 0.011 = 1/11 of the mass. Four
        // samples leave M0 (10/11)^4 = 6.8301e-4 kg/m2, whose equilibrium puts 0.062092 kg/m3 in the receptor
        // (against 0.090909 for the initial mass, which the samples make unreachable).
        var result = Simulator.Run(SampledGel());

        var left = 1e-3 * Math.Pow(10.0 / 11.0, 4);
        Tolerance.Relative(left, result.FinalState.MassLeftAfterSamplingPerArea!.Value, 1e-3, "mass left after the last sample");
        Tolerance.Relative(left / 0.011, result.FinalState.RightConcentrationKgPerCubicMeter!.Value, 1e-3, "receptor at the final state");
        // The same mass from what the tool reports the samples took out.
        var withdrawn = result.DiffusionCell!.Sampling.Single().WithdrawnPerArea;
        Tolerance.Relative(1e-3 - withdrawn, result.FinalState.MassLeftAfterSamplingPerArea!.Value, 1e-9, "initial mass less the samples");
        Assert.Equal(24 * Hour, result.FinalState.LastSampleSeconds);

        // Before the last sample the system is 95.6 % of the way (by hand: M3 - M4 = M3/11 of a start distance of
        // 1.559e-3 kg/m2), after it the last 4 % go within minutes: every threshold is reached, 99 % after 18 h.
        var times = result.FinalState.System;
        Assert.NotNull(times.NinetyPercent);
        Assert.True(times.NinetyNinePercent is > 18 * Hour and < 25 * Hour, $"99 % at {times.NinetyNinePercent} s");
        Assert.True(result.TimeSeries[^1].FractionOfFinalState > 0.95, $"fraction at the end {result.TimeSeries[^1].FractionOfFinalState}");
    }

    [Fact]
    public void With_first_order_removal_and_no_bath_everything_ends_in_the_removal_and_progress_is_the_fraction_removed()
    {
        const double halfLife = Hour;
        const double volumePerArea = 1e-2;
        const double thickness = 1e-6;
        var rate = Math.Log(2) / halfLife;
        var receptor = new CompartmentFace("receptor", volumePerArea, 1, 1, 1, null) { RemovalRatePerSecond = rate };
        var duration = 2 * halfLife;
        var simulation = Cases.Make(Cases.Closed, receptor, duration, numerics: Cases.FixedFineMesh, layers: Cases.Layer("thin fast layer", thickness, 1e-9, 1, 1));

        var result = Simulator.Run(simulation);

        Assert.Equal(FinalStateKind.AllRemoved, result.FinalState.Kind);
        Assert.Equal(0, result.FinalState.RightConcentrationKgPerCubicMeter!.Value, 12);
        // M(t) = M0 exp(-k f t), f the compartment's share of the capacity (by hand): the share removed at the end.
        var share = volumePerArea / (volumePerArea + thickness);
        Tolerance.Relative(1 - Math.Exp(-rate * share * duration), result.TimeSeries[^1].FractionOfFinalState, 1e-4, "fraction removed at the end");
        using var summary = JsonDocument.Parse(SummaryJson.Write(result, "case.json"));
        var final = summary.RootElement.GetProperty("finalState");
        Assert.Equal("allRemoved", final.GetProperty("kind").GetString());
        Assert.Contains("everything ends in the first-order removal", final.GetProperty("description").GetString(), StringComparison.Ordinal);
    }

    private static SimulationCase SampledGel()
    {
        var receptor = new CompartmentFace("receptor", ReceptorVolume, Area, 1, 0, null)
        {
            Sampling = new ReceptorSampling(SampleVolume, [6 * Hour, 12 * Hour, 18 * Hour, 24 * Hour]),
        };
        return Cases.Make(
            Cases.Closed,
            receptor,
            24 * Hour,
            layers: Cases.Layer("gel", GelThickness, GelDiffusivity, 1, GelConcentration));
    }
}
