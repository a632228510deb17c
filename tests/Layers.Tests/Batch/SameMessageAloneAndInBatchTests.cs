using Layers.Cli;
using Layers.Cli.Commands;
using Layers.Core.Batch;
using Layers.Core.Results;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>
/// One case pipeline for <c>layers run</c> on one case and for a batch: where both report the same thing, the words
/// are the same (docs/cli.md; common practice, no source: one message per condition, whoever prints it).
/// </summary>
public sealed class SameMessageAloneAndInBatchTests
{
    // A 7 um layer between a bath and a small compartment over 1e12 times its cells' diffusion time: the mass balance
    // cannot close to 1e-9 (the same case as the self-check tests), so the run refuses its result.
    private const string FailsItsOwnCheck = """
        {
          "layers": [ { "name": "l0", "thickness": "7.23752e-06 m", "diffusionCoefficient": "1.7824e-09 m2/s", "partitionCoefficient": 3864.056679848597, "initialConcentration": "313.741 kg/m3" } ],
          "left": { "kind": "bath", "name": "b", "concentration": "92.6301 kg/m3", "partitionCoefficient": 145.55618622671835 },
          "right": { "kind": "compartment", "name": "c", "volume": "0.0893754 mL", "area": "1 cm2", "partitionCoefficient": 4.344953631088589 },
          "duration": "2.99729e+09 s",
          "numerics": { "cells": 8, "minimumCellsPerLayer": 4, "relativeTolerance": 1e-3 }
        }
        """;

    [Fact]
    public void A_case_that_fails_its_own_check_says_the_same_alone_and_in_a_batch()
    {
        using var temp = new TempFolder();
        var path = temp.WriteFile(Path.Combine("cases", "unbalanced.json"), FailsItsOwnCheck);

        var alone = CliRun.Invoke("run", path, "--out", temp.Combine("alone"), "--no-plots", "--quiet");
        var batch = CliRun.Invoke("run", temp.Combine("cases"), "--out", temp.Combine("batch"), "--no-plots", "--quiet");

        Assert.Equal(ExitCodes.SolverFailed, alone.ExitCode);
        Assert.Equal(ExitCodes.InvalidInput, batch.ExitCode);
        var aloneMessage = Assert.Single(Lines(alone.Error)).Replace($"{path}: ", string.Empty, StringComparison.Ordinal);
        var batchMessage = Assert.Single(Lines(batch.Error)).Replace("unbalanced: failed: ", string.Empty, StringComparison.Ordinal);
        Assert.Contains("mass balance", aloneMessage, StringComparison.Ordinal);
        Assert.Equal(aloneMessage, batchMessage);
    }

    [Fact]
    public void A_case_cancelled_after_its_solve_says_the_same_alone_and_in_a_batch()
    {
        using var temp = new TempFolder();
        var path = temp.WriteFile("membrane.json", BatchCases.Membrane);
        using var aloneCancellation = new CancellationTokenSource();
        using var batchCancellation = new CancellationTokenSource();
        using var output = new StringWriter();
        using var error = new StringWriter();
        Dictionary<string, byte[]> CancelAlone(SimulationResult result, RunSettings settings, CancellationToken token)
        {
            aloneCancellation.Cancel();
            return CaseFiles.Build(result, settings, token);
        }

        Dictionary<string, byte[]> CancelInBatch(SimulationResult result, BatchItem item)
        {
            batchCancellation.Cancel();
            return new() { ["summary.json"] = [1] };
        }

        var code = RunCommand.Execute(new RunSettings(path, temp.Combine("alone")) { CasePaths = [path] }, output, error, CancelAlone, aloneCancellation.Token);
        var row = Assert.Single(BatchRunner.Run([new BatchItem("membrane", path, BatchCases.Membrane, [], [])], new BatchRunOptions(temp.Combine("batch"), 1), CancelInBatch, null, batchCancellation.Token));

        Assert.Equal(ExitCodes.Cancelled, code);
        Assert.Equal(BatchStatus.Cancelled, row.Status);
        Assert.Equal($"{path}: {row.Message}", Assert.Single(Lines(error.ToString())));
    }

    private static string[] Lines(string text) => text.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
}
