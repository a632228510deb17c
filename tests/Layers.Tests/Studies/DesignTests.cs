using Layers.Cli;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;
using MathNet.Numerics.RootFinding;

namespace Layers.Tests.Studies;

/// <summary>Solving for an input: the answers against analytic inversions, and the clear failure when out of reach.</summary>
public sealed class DesignTests
{
    [Fact]
    public void The_thickness_for_a_target_lag_time_is_the_analytic_inversion_of_the_time_lag_law()
    {
        // Daynes-Barrer time lag of a membrane between a constant source and a sink: t_lag = L^2 / (6 D)
        // (Crank, The Mathematics of Diffusion, 2nd ed., section 4.3.3, eq. 4.24b, from memory), so the thickness
        // for a lag of t is L = sqrt(6 D t). D = 1e-8 cm2/s = 1e-12 m2/s, t = 100 s: L = 24.49 um.
        var (document, _, design) = StudyCases.Design(StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[0].thickness", "from": "5 um", "to": "200 um" }, "result": "lagTime", "target": "100 s" }
            """));

        var outcome = DesignSolver.Solve(document, "study.json", design, jobs: 2);

        Assert.Equal(StudyStatus.Done, outcome.Status);
        Assert.True(design.LogScale, "a range spanning more than a decade is searched on a log scale");
        var expected = Math.Sqrt(6 * 1e-12 * 100) * 1e6;
        // The solver's lag time is within about 1 % (see SweepTimeLagTests), i.e. 0.5 % in the thickness, plus the
        // answer's own tolerance.
        Assert.InRange(outcome.Answer!.Value, expected * (1 - 0.005) - outcome.Tolerance!.Value, expected * (1 + 0.005) + outcome.Tolerance.Value);
        Assert.True(outcome.Bracketed, "the results on either side of the answer straddle the target");
        Assert.InRange(outcome.Tolerance.Value, 0, 2e-3 * outcome.Answer.Value);
        Assert.Equal(1, outcome.Crossings);
    }

    [Fact]
    public void The_diffusion_coefficient_that_releases_half_the_content_matches_the_inverted_plane_sheet_series()
    {
        // Desorption from a plane sheet into a sink (Crank, 2nd ed., eq. 4.18, from memory): for a sheet of
        // thickness 2l losing its content from both faces, M_t/M_inf = 1 - sum 8/((2n+1)^2 pi^2)
        // exp(-D (2n+1)^2 pi^2 t / (4 l^2)); our 200 um sheet sealed on one face is half of it, l = 200 um.
        // M_inf = C0 l = 1 kg/m3 x 2e-4 m = 2e-4 kg/m2 = 20 ug/cm2; the design asks for half of it after 1 h.
        var (document, _, design) = StudyCases.Design(StudyCases.Sheet("""
            "design": { "input": { "path": "$.layers[0].diffusionCoefficient", "from": "1e-11 cm2/s", "to": "1e-6 cm2/s" }, "result": { "name": "rightReceived", "at": "1 h" }, "target": "10 ug/cm2" }
            """));
        const double l = 200e-6;
        const double t = 3600;
        static double Fraction(double d)
        {
            var sum = 0.0;
            for (var n = 0; n < 200; n++)
            {
                var k = (2 * n) + 1;
                sum += 8 / (k * k * Math.PI * Math.PI) * Math.Exp(-d * k * k * Math.PI * Math.PI * t / (4 * l * l));
            }

            return 1 - sum;
        }

        var expected = Brent.FindRoot(d => Fraction(d) - 0.5, 1e-16, 1e-10, 1e-24) * 1e4; // cm2/s

        var outcome = DesignSolver.Solve(document, "study.json", design, jobs: 2);

        Assert.Equal(StudyStatus.Done, outcome.Status);
        // Dt/l^2 = 0.1967 at half release (0.0492 for the full thickness 2l, Crank's t_1/2 = 0.049 (2l)^2/D).
        Assert.Equal(0.1967, expected * 1e-4 * t / (l * l), 3);
        // Near half release M goes roughly as sqrt(D), so 0.5 % in the amount is about 1 % in D.
        Tolerance.Relative(expected, outcome.Answer!.Value, 0.01 + (outcome.Tolerance!.Value / outcome.Answer.Value), "D for half release in 1 h");
    }

    [Fact]
    public void A_target_out_of_reach_is_reported_with_the_range_of_results_found()
    {
        // Lag times over 5-20 um at D = 1e-12 m2/s are 4 s to 67 s; a 10 h lag cannot be reached.
        var (document, _, design) = StudyCases.Design(StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[0].thickness", "from": "5 um", "to": "20 um" }, "result": "lagTime", "target": "10 h", "points": 4 }
            """));

        var outcome = DesignSolver.Solve(document, "study.json", design, jobs: 2);

        Assert.Equal(StudyStatus.NotReached, outcome.Status);
        Assert.Null(outcome.Answer);
        Assert.Equal(4, outcome.Points.Count);
        Assert.StartsWith("no value of membrane thickness from 5 µm to 20 µm gives lag time = 10 h: over that range it lies between", outcome.Message);
        Assert.Contains("widen the range or change the target", outcome.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_design_command_exits_with_its_own_code_when_the_target_is_out_of_reach()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("reach.json", StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[0].thickness", "from": "5 um", "to": "20 um" }, "result": "lagTime", "target": "10 h", "points": 3 }
            """));

        var outcome = CliRun.Invoke("design", file, "--out", temp.Combine("out"), "--plot-width", "400", "--plot-height", "300");

        Assert.Equal(ExitCodes.NoTrustworthyAnswer, outcome.ExitCode);
        Assert.Contains("no value of membrane thickness from 5 µm to 20 µm gives lag time = 10 h", outcome.Error, StringComparison.Ordinal);
        var json = File.ReadAllText(temp.Combine("out", "reach.design", "design.json"));
        Assert.Contains("\"status\": \"notReached\"", json, StringComparison.Ordinal);
        Assert.True(Plotting.PngImage.HasSignature(File.ReadAllBytes(temp.Combine("out", "reach.design", "design.png"))));
    }

    [Fact]
    public void Mistakes_in_the_design_section_are_reported_at_their_paths_when_the_case_is_read()
    {
        var errors = StudyCases.Errors(StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[1].thickness", "from": "5 um", "to": "1 mm" }, "result": "lagTime", "target": "3 mg/L", "speed": 1 }
            """));

        Assert.Contains("$.design.speed: unknown key; expected one of input, result, target, tolerance, points", errors);
        Assert.Contains("$.design.input.path: '$.layers[1].thickness' is not in this case; a varied value must be written in the case", errors);
        Assert.Contains(errors, error => error.StartsWith("$.design.target: '3 mg/L' is a mass concentration", StringComparison.Ordinal));
    }

    [Fact]
    public void A_range_end_that_breaks_a_rule_of_the_case_is_reported_with_the_rule()
    {
        var errors = StudyCases.Errors(StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[0].thickness", "from": "-5 um", "to": "20 um" }, "result": "lagTime", "target": "1 min" }
            """));

        Assert.Contains(errors, error => error.StartsWith("$.design.input.from: -5 um at $.layers[0].thickness: must be > 0", StringComparison.Ordinal));
    }
}
