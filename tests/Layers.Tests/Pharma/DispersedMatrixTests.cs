using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;
using MathNet.Numerics;

namespace Layers.Tests.Pharma;

/// <summary>
/// A layer loaded above its solubility (a dispersed-drug matrix): release into a sink against the Higuchi law and the
/// exact moving-front solution, mass balance to round-off with dissolution, and the linear solver's result where
/// nothing exceeds the solubility.
/// </summary>
public sealed class DispersedMatrixTests
{
    // A planar matrix on a perfect sink, closed behind (all values invented for the check).
    private const double Thickness = 1e-3;
    private const double Diffusivity = 1e-10;
    private const double Solubility = 1;
    private const double Hour = 3600;

    private static readonly double[] Times = [1 * Hour, 2 * Hour, 4 * Hour, 8 * Hour, 16 * Hour, 24 * Hour];

    [Theory]
    [InlineData(50)]
    [InlineData(100)]
    public void Release_into_a_sink_follows_the_Higuchi_square_root_law_when_the_loading_is_far_above_solubility(double loadingOverSolubility)
    {
        var loading = loadingOverSolubility * Solubility;
        var result = Simulator.Run(Matrix(loading, Times));

        foreach (var (time, released) in Released(result))
        {
            // T. Higuchi, J. Pharm. Sci. 50 (1961) 874 and 52 (1963) 1145: Q = sqrt(D (2A - Cs) Cs t) per area for a planar
            // matrix into a perfect sink, from a pseudo-steady (linear) profile behind the front. That assumption is
            // off by O(Cs/A): the exact moving-front solution (next test) exceeds it by 0.084 Cs/A (computed: 0.17 % at
            // A/Cs = 50, 0.084 % at 100). Allowed: 0.1 Cs/A for the approximation plus 1e-3 for the mesh.
            var higuchi = Math.Sqrt(Diffusivity * ((2 * loading) - Solubility) * Solubility * time);
            Tolerance.Relative(higuchi, released, (0.1 * Solubility / loading) + 1e-3, $"Q at {time / Hour} h, A/Cs = {loadingOverSolubility}");
        }
    }

    [Theory]
    [InlineData(10)]
    [InlineData(50)]
    public void Release_into_a_sink_matches_the_exact_moving_front_solution_until_the_front_reaches_the_backing(double loadingOverSolubility)
    {
        var loading = loadingOverSolubility * Solubility;
        var result = Simulator.Run(Matrix(loading, Times));
        var lambda = FrontConstant(loading);

        // Only while the front is short of the backing (at A/Cs = 10 it gets there after about 10 h).
        foreach (var (time, released) in Released(result).Where(point => 2 * lambda * Math.Sqrt(Diffusivity * point.Time) < 0.9 * Thickness))
        {
            // Neumann's similarity solution of the one-phase Stefan problem (Carslaw and Jaeger, Conduction of Heat in
            // Solids, 2nd ed., ch. 11, from memory), written here for dissolution: behind the front X = 2 lambda sqrt(Dt)
            // c = Cs erf(x / 2 sqrt(Dt)) / erf(lambda); the front balance (A - Cs) dX/dt = D dc/dx gives
            // (A - Cs)/Cs = exp(-lambda^2) / (sqrt(pi) lambda erf(lambda)), and the released amount is
            // Q = D int dc/dx(0) dt = 2 Cs sqrt(Dt/pi) / erf(lambda). Ahead of the front the matrix is uniform, so the
            // closed backing does not matter until the front reaches it (X = 0.6 L at 24 h for A/Cs = 50). This holds
            // for any loading, also where the Higuchi law does not. The front moves one cell at a time; on 120 cells
            // the error measured 4e-4 at most (6e-5 on 240), so 1e-3 is allowed.
            var exact = 2 * Solubility * Math.Sqrt(Diffusivity * time / Math.PI) / SpecialFunctions.Erf(lambda);
            Tolerance.Relative(exact, released, 1e-3, $"Q at {time / Hour} h, A/Cs = {loadingOverSolubility}");
        }
    }

    [Fact]
    public void The_undissolved_drug_runs_out_and_the_mass_balance_closes_to_round_off_through_dissolution()
    {
        const double loading = 5 * Solubility;
        var duration = 20 * Thickness * Thickness / Diffusivity;
        var result = Simulator.Run(Matrix(loading, [duration]));

        // The discrete update is in conserved form: what left the matrix is what the sink received (exact balance).
        Assert.True(result.WorstMassBalanceError < 1e-10, $"mass balance: {result.WorstMassBalanceError:G3}");
        var matrix = Assert.Single(result.DispersedLayers);
        Assert.Equal((loading - Solubility) * Thickness, matrix.InitialUndissolvedPerArea, 15);
        Assert.Equal(0, matrix.UndissolvedAtEndPerArea);
        // The exact moving-front solution (see above) holds in the finite matrix until its front X = 2 lambda sqrt(Dt)
        // reaches the closed backing, which is when the last solid dissolves: t = L^2 / (4 lambda^2 D). The cells at
        // the backing are the narrowest of the graded mesh; the error measured 4e-6, and 1e-3 is allowed.
        var lambda = FrontConstant(loading);
        var exhausted = Thickness * Thickness / (4 * lambda * lambda * Diffusivity);
        Tolerance.Relative(exhausted, matrix.ExhaustedSeconds!.Value, 1e-3, "time the undissolved drug runs out");
    }

    [Fact]
    public void A_two_layer_closed_system_with_a_partition_jump_keeps_its_mass_and_settles_at_the_solubility()
    {
        // Drug-rich reservoir (K 10, Cs 2 kg/m3, loaded at 20 kg/m3) against an empty adhesive (K 1), closed on both
        // sides. The excess is more than the adhesive can take, so the equilibrium is saturation: u = Cs/K everywhere
        // and the rest stays undissolved (partition equilibrium with a solid phase, common practice, no source).
        var reservoir = new Layer("reservoir", 100e-6, 1e-12, 10, 20) { SolubilityKgPerCubicMeter = 2 };
        var adhesive = Cases.Layer("adhesive", 200e-6, 1e-11, 1, 0);
        var duration = 50 * 200e-6 * 200e-6 / 1e-12;
        var result = Simulator.Run(Cases.Make(Cases.Closed, Cases.Closed, duration, layers: [reservoir, adhesive]));

        Assert.True(result.WorstMassBalanceError < 1e-10, $"mass balance: {result.WorstMassBalanceError:G3}");
        var last = result.TimeSeries[^1];
        Tolerance.Relative(20 * 100e-6, last.LayerMassPerArea.Sum(), 1e-10, "total mass (round-off over the steps, as the mass balance above)");
        var saturated = 2.0 / 10;
        Tolerance.Relative(saturated * 200e-6, last.LayerMassPerArea[1], 1e-6, "adhesive at u = Cs/K");
        var undissolved = Assert.Single(result.DispersedLayers).UndissolvedAtEndPerArea;
        Tolerance.Relative((20 - 2) * 100e-6 - (saturated * 200e-6), undissolved, 1e-6, "undissolved left");
    }

    [Fact]
    public void A_dispersed_layer_on_a_sink_behind_a_membrane_with_a_partition_jump_keeps_its_mass_to_round_off()
    {
        var matrix = new Layer("matrix", 60e-6, 1e-13, 50, 60) { SolubilityKgPerCubicMeter = 6 };
        var membrane = Cases.Layer("membrane", 15e-6, 5e-14, 20);
        var result = Simulator.Run(Cases.Make(Cases.Closed, Cases.Bath(0), 7 * 86400, layers: [matrix, membrane]));

        Assert.True(result.Completed);
        Assert.True(result.WorstMassBalanceError < 1e-10, $"mass balance: {result.WorstMassBalanceError:G3}");
    }

    [Fact]
    public void Below_its_solubility_a_layer_gives_the_linear_solvers_result()
    {
        // The same two-layer case with and without a solubility the loading never reaches.
        var loaded = Cases.Layer("loaded", 50e-6, 1e-12, 5, 3);
        var receiving = Cases.Layer("receiving", 100e-6, 1e-11, 1);
        var plain = Cases.Make(Cases.Closed, Cases.Bath(0), 86400, [3600, 86400], layers: [loaded, receiving]);
        var capped = plain with { Stack = new LayerStack([loaded with { SolubilityKgPerCubicMeter = 4 }, receiving]) };

        var linear = Simulator.Run(plain);
        var dispersed = Simulator.Run(capped);

        Assert.Equal(linear.Statistics.AcceptedSteps, dispersed.Statistics.AcceptedSteps);
        for (var i = 0; i < linear.TimeSeries.Count; i++)
        {
            Assert.Equal(linear.TimeSeries[i].Right!.TransferredIntoMediumPerArea, dispersed.TimeSeries[i].Right!.TransferredIntoMediumPerArea, 15);
        }

        Assert.Equal(0, Assert.Single(dispersed.DispersedLayers).InitialUndissolvedPerArea);
    }

    [Fact]
    public void A_solubility_is_refused_beside_food_contact_settings()
    {
        var json = CaseJson.With(
            CaseJson.Minimal,
            ("$.layers[0].solubility", "\"1 mg/mL\""),
            ("$.duration", null),
            ("$.foodContact", """{ "stages": [{ "duration": "10 d", "temperature": "25 degC" }] }"""));

        var result = CaseJson.Read(json, "film.json");

        var error = Assert.Single(result.Errors);
        Assert.Equal("$.layers[0].solubility", error.JsonPath);
        Assert.Contains("cannot be combined with $.foodContact", error.Message, StringComparison.Ordinal);
    }

    private static SimulationCase Matrix(double loading, IReadOnlyList<double> times)
    {
        var matrix = new Layer("matrix", Thickness, Diffusivity, 1, loading) { SolubilityKgPerCubicMeter = Solubility };
        // 120 cells rather than the default 240: the front crosses each cell in a few short steps, so this halves the run.
        return Cases.Make(Cases.Closed, Cases.Bath(0), times[^1], times, NumericsSettings.FixedCells(120, 1e-6), layers: matrix) with
        {
            ExtraOutputTimesSeconds = times,
        };
    }

    private static IEnumerable<(double Time, double Released)> Released(Layers.Core.Results.SimulationResult result)
        => result.TimeSeries
            .Where(sample => Times.Any(time => Math.Abs(time - sample.TimeSeconds) < 1e-6 * time))
            .Select(sample => (sample.TimeSeconds, sample.Right!.TransferredIntoMediumPerArea));

    /// <summary>Solves (A - Cs)/Cs = exp(-lambda^2) / (sqrt(pi) lambda erf(lambda)) by bisection; the right side falls with lambda.</summary>
    private static double FrontConstant(double loading)
    {
        var target = (loading - Solubility) / Solubility;
        double low = 1e-8, high = 5;
        for (var i = 0; i < 200; i++)
        {
            var middle = (low + high) / 2;
            var value = Math.Exp(-middle * middle) / (Math.Sqrt(Math.PI) * middle * SpecialFunctions.Erf(middle));
            (low, high) = value > target ? (middle, high) : (low, middle);
        }

        return (low + high) / 2;
    }
}
