using Layers.Core.Batch;
using Layers.Core.Fitting;
using Layers.Core.Studies;
using Layers.Tests.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// The studies (design, uncertainty, fit) go through the pipeline of a case run: the case file read once with its
/// study checked, the same statuses and messages as a run, and the study's folder committed as a whole, so that a
/// cancellation (Ctrl+C, SIGTERM) in any phase leaves nothing written. What is checked here is the handling of the
/// files and messages; the studies' numbers are checked against published solutions in tests/Layers.Tests/Studies.
/// </summary>
public sealed class StudyRunTests
{
    // Three thicknesses of a membrane whose Daynes-Barrer lag time L^2/(6D) (Crank, The Mathematics of Diffusion, 2nd ed., section 4.3.3, eq. 4.24b, from memory) stays far
    // below the target over the range: the design ends "not reached" and writes its files.
    private static readonly string OutOfReach = StudyCases.Membrane("""
        "design": { "input": { "path": "$.layers[0].thickness", "from": "5 um", "to": "20 um" }, "result": "lagTime", "target": "10 h", "points": 3 }
        """);

    [Fact]
    public void A_design_cancelled_while_its_files_are_made_writes_nothing_and_says_what_a_cancelled_run_says()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("reach.json", OutOfReach);
        var root = temp.Combine("out");
        using var cancellation = new CancellationTokenSource();

        var run = StudyRun.Execute(
            new CaseRunRequest(file, "reach.design", root),
            "design",
            (simulation, document, token) => DesignSolver.Solve(document, file, DesignReader.Read(document, file, simulation, [])!, 1, token),
            (_, _, _) =>
            {
                cancellation.Cancel(); // as if Ctrl+C came while the plot was drawn
                return new Dictionary<string, byte[]> { ["design.json"] = [1], ["design.png"] = [2] };
            },
            cancellation.Token);

        Assert.Equal(CaseRunStatus.Cancelled, run.Run.Status);
        Assert.Equal(CaseRun.CancelledMessage, run.Run.Message);
        Assert.Equal(StudyStatus.NotReached, run.Study!.Status);
        Assert.True(!Directory.Exists(root) || Directory.GetFileSystemEntries(root).Length == 0);
    }

    [Fact]
    public void A_finished_design_is_committed_as_one_folder_named_for_the_study()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("reach.json", OutOfReach);
        var root = temp.Combine("out");

        var run = StudyRun.Execute(
            new CaseRunRequest(file, "reach.design", root),
            "design",
            (simulation, document, token) => DesignSolver.Solve(document, file, DesignReader.Read(document, file, simulation, [])!, 1, token),
            (_, _, _) => new Dictionary<string, byte[]> { ["design.json"] = [1, 2, 3] },
            CancellationToken.None);

        Assert.Equal(CaseRunStatus.Succeeded, run.Run.Status);
        Assert.Equal(Path.Combine(root, "reach.design"), run.Run.Folder);
        Assert.Equal([1, 2, 3], File.ReadAllBytes(Path.Combine(root, "reach.design", "design.json")));
        Assert.Equal(["reach.design"], Directory.GetFileSystemEntries(root).Select(Path.GetFileName));
    }

    [Fact]
    public void A_study_cancelled_before_it_starts_solves_nothing_and_writes_nothing()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("reach.json", OutOfReach);
        using var cancellation = new CancellationTokenSource();
        cancellation.Cancel();
        var solved = false;

        var run = StudyRun.Execute<DesignOutcome>(
            new CaseRunRequest(file, "reach.design", temp.Combine("out")),
            "design",
            (_, _, _) =>
            {
                solved = true;
                throw new InvalidOperationException("must not be solved");
            },
            (_, _, _) => throw new InvalidOperationException("must not be written"),
            cancellation.Token);

        Assert.Equal(CaseRunStatus.Cancelled, run.Run.Status);
        Assert.False(solved);
        Assert.False(Directory.Exists(temp.Combine("out")));
    }

    [Fact]
    public void A_case_without_the_study_asked_for_is_invalid_and_names_the_missing_section()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("reach.json", OutOfReach);

        var run = NeverSolved<UncertaintyOutcome>(new CaseRunRequest(file, "reach.uncertainty", temp.Combine("out")), "uncertainty");

        Assert.Equal(CaseRunStatus.Invalid, run.Run.Status);
        Assert.StartsWith("$.uncertainty: the case declares no uncertainty study", run.Run.Heading, StringComparison.Ordinal);
        Assert.Empty(run.Run.Errors);
        Assert.False(Directory.Exists(temp.Combine("out")));
    }

    [Fact]
    public void An_invalid_case_file_gives_a_study_the_heading_and_errors_a_run_gives()
    {
        using var temp = new TempFolder();
        var file = temp.WriteFile("broken.json", StudyCases.Membrane("\"design\": {}", thickness: "-5 um"));

        var run = NeverSolved<DesignOutcome>(new CaseRunRequest(file, "broken.design", temp.Combine("out")), "design");
        var alone = CaseRun.Execute(new CaseRunRequest(file, "broken", temp.Combine("out")), (_, _) => new Dictionary<string, byte[]>(), null, CancellationToken.None);

        Assert.Equal(CaseRunStatus.Invalid, run.Run.Status);
        Assert.Equal(alone.Heading, run.Run.Heading);
        Assert.Equal(alone.Errors, run.Run.Errors);
        Assert.StartsWith("invalid case (", run.Run.Heading, StringComparison.Ordinal);
    }

    [Fact]
    public void A_fit_cancelled_before_it_starts_ends_cancelled_and_writes_nothing()
    {
        using var temp = new TempFolder();
        var casePath = RepoRoot.File("cases", "membrane-time-lag.json");
        var data = MeasuredSeries.Read(RepoRoot.File("cases", "membrane-time-lag-measured.csv"), out var problem) ?? throw new InvalidOperationException(problem);
        var errors = new List<string>();
        var prepared = CaseFitter.Prepare(new FitRequest(casePath, data, Layers.Core.Domain.Side.Right, ["$.layers[0].diffusionCoefficient"]), errors);
        Assert.NotNull(prepared);
        using var cancellation = new CancellationTokenSource();
        cancellation.Cancel();

        var fit = CaseFitter.Run(prepared, cancellation.Token);
        var run = StudyRun.Finish(new CaseRunRequest(casePath, "membrane-time-lag.fit", temp.Path), _ => fit, (_, _) => new Dictionary<string, byte[]> { ["fit.json"] = [1] }, CancellationToken.None);

        Assert.Equal(StudyStatus.Cancelled, fit.Status);
        Assert.Null(fit.Result);
        Assert.Equal(CaseRunStatus.Cancelled, run.Run.Status);
        Assert.Equal(CaseRun.CancelledMessage, run.Run.Message);
        Assert.Empty(Directory.GetFileSystemEntries(temp.Path));
    }

    /// <summary>A study run whose case must not get as far as its solve.</summary>
    private static StudyRunOutcome<T> NeverSolved<T>(CaseRunRequest request, string section)
        where T : class, IStudyOutcome =>
        StudyRun.Execute<T>(
            request,
            section,
            (_, _, _) => throw new InvalidOperationException("must not be solved"),
            (_, _, _) => throw new InvalidOperationException("must not be written"),
            CancellationToken.None);
}
