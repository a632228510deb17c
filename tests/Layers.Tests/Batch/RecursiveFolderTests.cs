using Layers.Cli;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary><c>layers run --recursive</c> enters each real folder once, whatever symbolic links lead back into the tree.</summary>
public sealed class RecursiveFolderTests
{
    [Fact]
    public void A_symbolic_link_back_to_a_parent_folder_is_not_followed_again()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("in", "a.json"), CaseJson.Minimal);
        temp.WriteFile(Path.Combine("in", "sub", "b.json"), CaseJson.Minimal);
        Directory.CreateSymbolicLink(temp.Combine("in", "sub", "loop"), temp.Combine("in"));

        var outcome = CliRun.Invoke("run", temp.Combine("in"), "--recursive", "--out", temp.Combine("out"), "--no-plots", "-q");

        Assert.True(outcome.ExitCode == ExitCodes.Success, outcome.Error);
        var rows = SummaryCsv.Read(temp.Combine("out", "summary.csv"));
        Assert.Equal(["a", "b"], rows.Select(row => row["case"]));
        Assert.Equal([Path.Combine(temp.Path, "in", "a.json"), Path.Combine(temp.Path, "in", "sub", "b.json")], rows.Select(row => row["file"]));
    }
}
