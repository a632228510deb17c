using System.Diagnostics;
using Layers.Cli;
using Layers.Core.Cases;
using Layers.Core.Files;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>
/// A file named in a case (<c>permeationTest.measured</c>) is read only when it lies in the case file's folder or below
/// it (unless the user allows more), is a regular file, and is within the size limit; messages never quote more of
/// such a file than the one cell at fault. Common practice, no source: a document received from someone else must
/// not make a tool read, or echo into its results, files the user did not mean to give it.
/// </summary>
public sealed class CaseFilePathTests
{
    private const string Secret = "SECRET-4f9d";
    private const string GoodData = "time [h],cumulative amount [ug/cm2]\n1,1\n2,3\n3,5\n4,7\n";

    private static string CaseNaming(string measured) =>
        CaseJson.MinimalWith(("$.permeationTest", $$"""{ "measured": {{System.Text.Json.JsonSerializer.Serialize(measured)}} }"""));

    private static CaseError MeasuredError(CaseReadResult read)
    {
        var error = Assert.Single(read.Errors);
        Assert.Equal("$.permeationTest.measured", error.JsonPath);
        return error;
    }

    [Theory]
    [InlineData("../outside.csv")]
    [InlineData("inner/../../outside.csv")]
    public void A_relative_path_that_leaves_the_case_folder_is_refused(string written)
    {
        using var temp = new TempFolder();
        temp.WriteFile("outside.csv", GoodData);
        var caseFile = temp.WriteFile(Path.Combine("cases", "case.json"), CaseNaming(written));

        var error = MeasuredError(CaseDocument.ReadFile(caseFile));

        Assert.Equal($"'{written}' is outside the folder of case.json; a file named there must be in that folder or below it (the command line's --allow-outside-files lifts this)", error.Message);
    }

    [Fact]
    public void An_absolute_path_outside_the_case_folder_is_refused_and_its_content_never_shown()
    {
        using var temp = new TempFolder();
        var outside = temp.WriteFile("passwd", $"root:x:0:0:{Secret}:/root:/bin/bash\n");
        var caseFile = temp.WriteFile(Path.Combine("cases", "case.json"), CaseNaming(outside));

        var read = CaseDocument.ReadFile(caseFile);

        Assert.Contains("is outside the folder of case.json", MeasuredError(read).Message, StringComparison.Ordinal);
        Assert.DoesNotContain(Secret, read.FormatErrors(), StringComparison.Ordinal);
    }

    [Fact]
    public void A_file_in_a_sub_folder_of_the_case_folder_is_read()
    {
        using var temp = new TempFolder();
        temp.WriteFile(Path.Combine("cases", "data", "q.csv"), GoodData);
        var caseFile = temp.WriteFile(Path.Combine("cases", "case.json"), CaseNaming("data/q.csv"));

        var read = CaseDocument.ReadFile(caseFile);

        Assert.True(read.IsValid, read.FormatErrors());
        Assert.Equal(4, read.Case!.PermeationTest!.Measured!.TimesSeconds.Count);
    }

    [Fact]
    public void With_leave_from_the_user_a_file_outside_the_case_folder_is_read()
    {
        using var temp = new TempFolder();
        temp.WriteFile("outside.csv", GoodData);
        var caseFile = temp.WriteFile(Path.Combine("cases", "case.json"), CaseNaming("../outside.csv"));

        var read = CaseDocument.ReadFile(caseFile, CaseFileAccess.Anywhere);

        Assert.True(read.IsValid, read.FormatErrors());
    }

    [Fact]
    public void A_symbolic_link_in_the_case_folder_that_points_out_of_it_is_refused()
    {
        using var temp = new TempFolder();
        var outside = temp.WriteFile("outside.csv", GoodData);
        var caseFile = temp.WriteFile(Path.Combine("cases", "case.json"), CaseNaming("link.csv"));
        File.CreateSymbolicLink(temp.Combine("cases", "link.csv"), outside);

        var error = MeasuredError(CaseDocument.ReadFile(caseFile));

        Assert.StartsWith("'link.csv' is outside the folder of case.json", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_fifo_named_by_a_case_is_refused_before_it_is_opened()
    {
        if (!OperatingSystem.IsLinux())
        {
            return; // FIFOs are made with mkfifo(1), and the file type is asked of Linux's statx(2)
        }

        using var temp = new TempFolder();
        var caseFile = temp.WriteFile("case.json", CaseNaming("pipe"));
        using (var mkfifo = Process.Start("mkfifo", temp.Combine("pipe")))
        {
            mkfifo.WaitForExit();
        }

        // Opening a FIFO for reading blocks until a writer comes, which none will: a task that has not finished in
        // a minute has blocked.
        var reading = Task.Run(() => CaseDocument.ReadFile(caseFile));
        var first = await Task.WhenAny(reading, Task.Delay(TimeSpan.FromMinutes(1)));
        Assert.True(first == reading, "reading the case blocked on the FIFO");

        Assert.Equal("'pipe': not a regular file but a FIFO (named pipe); only regular files are read", MeasuredError(await reading).Message);
    }

    [Fact]
    public void A_device_is_refused_even_with_leave_to_read_outside_the_folder()
    {
        if (!OperatingSystem.IsLinux())
        {
            return; // the file type is asked of Linux's statx(2)
        }

        using var temp = new TempFolder();
        var caseFile = temp.WriteFile("case.json", CaseNaming("/dev/zero"));

        var error = MeasuredError(CaseDocument.ReadFile(caseFile, CaseFileAccess.Anywhere));

        Assert.Equal("'/dev/zero': not a regular file but a device; only regular files are read", error.Message);
    }

    [Fact]
    public void A_file_over_the_size_limit_is_refused_without_reading_it_whole()
    {
        using var temp = new TempFolder();
        var path = temp.WriteFile("big.csv", new string('1', 1001));

        Assert.Null(InputFile.ReadText(path, 1000, out var problem));
        Assert.Equal("larger than the limit of 1000 bytes for this kind of file", problem);
        Assert.NotNull(InputFile.ReadText(path, 1001, out _));
    }

    [Fact]
    public void The_case_limit_is_64_mebibytes_as_docs_cli_md_says()
    {
        Assert.Equal(64L * 1024 * 1024, InputFile.CaseLimitBytes);
        Assert.Contains("64 MiB", File.ReadAllText(RepoRoot.File("docs", "cli.md")), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData($"root:x:0:0:{Secret}:/root:/bin/bash\n1,2\n", "/bin/bash")]
    [InlineData($"time [h],cumulative amount [ug/cm2]\n1,{Secret}-and-much-more-text-after-it\n", "much-more")]
    [InlineData($"time [h],cumulative amount [ug/cm2]\n1,2,{Secret}\n", Secret)]
    public void A_message_about_a_data_file_quotes_at_most_the_cell_at_fault_and_at_most_24_characters_of_it(string content, string neverShown)
    {
        using var temp = new TempFolder();
        temp.WriteFile("q.csv", content);
        var caseFile = temp.WriteFile("case.json", CaseNaming("q.csv"));

        var message = MeasuredError(CaseDocument.ReadFile(caseFile)).Message;

        Assert.DoesNotContain(neverShown, message, StringComparison.Ordinal);
        Assert.StartsWith("'q.csv' line ", message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_batch_case_naming_a_file_outside_its_folder_is_invalid_and_its_row_quotes_nothing_of_the_file()
    {
        using var temp = new TempFolder();
        temp.WriteFile("passwd.csv", $"{Secret}\n");
        var caseFile = temp.WriteFile(Path.Combine("cases", "case.json"), CaseNaming("../passwd.csv"));
        temp.WriteFile(Path.Combine("cases", "other.json"), CaseJson.Minimal);

        var refused = CliRun.Invoke("run", temp.Combine("cases"), "--out", temp.Combine("out"), "--no-plots", "-q");
        var allowed = CliRun.Invoke("check", caseFile, "--allow-outside-files");

        Assert.Equal(ExitCodes.InvalidInput, refused.ExitCode);
        Assert.Contains("'../passwd.csv' is outside the folder of case.json", refused.Error, StringComparison.Ordinal);
        Assert.DoesNotContain(Secret, refused.Error + File.ReadAllText(temp.Combine("out", "summary.csv")), StringComparison.Ordinal);
        // With leave the file is read; it is no measurement file, and the message quotes 24 characters of its one cell at most.
        Assert.Equal(ExitCodes.InvalidInput, allowed.ExitCode);
        Assert.Contains("'../passwd.csv' line 1: expected two columns", allowed.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Merge_reads_no_sweep_file_outside_the_current_folder_that_a_shard_summary_names()
    {
        using var temp = new TempFolder();
        var sweep = temp.WriteFile("sweep.json", Batch.BatchCases.ThicknessSweep("100 um", "200 um"));
        Assert.Equal(ExitCodes.Success, CliRun.Invoke("run", sweep, "--out", temp.Combine("shard"), "--no-plots", "-q").ExitCode);

        // The tests run in their build folder, which the temporary folder is outside of.
        var outcome = CliRun.Invoke("merge", temp.Combine("shard"), "--out", temp.Combine("merged"), "-q");

        Assert.Equal(ExitCodes.Success, outcome.ExitCode);
        Assert.Contains($"sweep file '{sweep}' is outside the current folder", outcome.Error, StringComparison.Ordinal);
        Assert.False(File.Exists(temp.Combine("merged", "sweep.sweep.png")));
    }
}
