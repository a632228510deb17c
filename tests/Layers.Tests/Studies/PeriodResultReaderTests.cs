using Layers.Tests.TestSupport;

namespace Layers.Tests.Studies;

/// <summary>
/// Reading a figure of one period in a study: the mistakes docs/case-format.md ("Study results") lists are refused
/// with their JSON paths, and its example message is the reader's.
/// </summary>
public sealed class PeriodResultReaderTests
{
    private static string RepeatedDose(string results) => CaseJson.With(
        File.ReadAllText(RepoRoot.File("cases", "repeated-dose-diffusion-cell.json")),
        ("$.uncertainty", $$"""
            { "inputs": [ { "path": "$.layers[0].thickness", "distribution": "uniform", "min": "90 um", "max": "110 um" } ], "results": {{results}} }
            """));

    [Fact]
    public void A_period_no_label_names_is_refused_at_its_path_with_the_labels_as_the_format_page_shows()
    {
        var errors = StudyCases.Errors(RepeatedDose("""[ { "name": "rightPeriodReceived", "period": "dose 8 of 7" } ]"""));

        var documented = FormatReference.Blocks("text", "Study results").SelectMany(block => block.Split('\n'))
            .Single(line => line.StartsWith("dose.json: $.uncertainty.results[0].period: ", StringComparison.Ordinal));
        Assert.Equal(documented["dose.json: ".Length..], Assert.Single(errors));
    }

    [Fact]
    public void A_long_list_of_labels_is_shortened_to_its_first_and_last_ones_with_a_count_of_those_left_out()
    {
        var json = CaseJson.With(RepeatedDose("""[ { "name": "rightPeriodHighestFlux", "period": "dose 31 of 30" } ]"""), ("$.schedule[0].repeat", "30"));

        var error = Assert.Single(StudyCases.Errors(json));

        Assert.Equal(
            "$.uncertainty.results[0].period: no period is labelled 'dose 31 of 30'; the periods are 'dose 1 of 30', 'dose 2 of 30', 'dose 3 of 30', "
            + "'dose 4 of 30', 'dose 5 of 30', 'dose 6 of 30', ... (21 more), 'dose 28 of 30', 'dose 29 of 30', 'dose 30 of 30'",
            error);
    }

    [Fact]
    public void A_period_figure_on_a_case_without_a_schedule_is_refused()
    {
        var errors = StudyCases.Errors(StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[0].thickness", "from": "5 um", "to": "20 um" }, "result": "rightPeriodReceived", "target": "1 ug/cm2" }
            """));

        Assert.Equal(["$.design.result: rightPeriodReceived needs $.schedule"], errors);
    }

    [Fact]
    public void A_period_figure_of_a_side_without_a_medium_is_refused()
    {
        var json = CaseJson.With(
            File.ReadAllText(RepoRoot.File("cases", "daily-patch-week.json")),
            ("$.uncertainty", """
                { "inputs": [ { "path": "$.layers[1].thickness", "distribution": "uniform", "min": "40 um", "max": "60 um" } ],
                  "results": [ { "name": "leftPeriodLowestFlux", "period": "new patch 6 of 6" }, { "name": "rightPeriodLowestFlux", "period": "after removal" } ] }
                """));

        Assert.Equal(["$.uncertainty.results[0]: leftPeriodLowestFlux needs a medium on the left; the left face is closed"], StudyCases.Errors(json));
    }

    [Fact]
    public void A_period_on_a_result_read_at_a_time_and_a_time_on_a_period_figure_are_refused()
    {
        var errors = StudyCases.Errors(RepeatedDose("""
            [ { "name": "rightReceived", "period": "dose 1 of 7" }, { "name": "rightPeriodReceived", "at": "1 d" }, { "name": "rightPeriodReceived", "period": 7 } ]
            """));

        Assert.Equal(
            [
                "$.uncertainty.results[0].period: rightReceived is not a figure of one period; leave out 'period'",
                "$.uncertainty.results[1].at: rightPeriodReceived is not read at a time; leave out 'at'",
                "$.uncertainty.results[2].period: expected a period's label as text, e.g. \"dose 7 of 7\"; got 7",
            ],
            errors);
    }

    [Fact]
    public void A_limit_on_a_period_figure_is_read_with_its_period()
    {
        var json = CaseJson.With(
            RepeatedDose("[]"),
            ("$.uncertainty.limit", """{ "result": { "name": "rightPeriodReceived", "period": "dose 2 of 7" }, "value": "50 ug/cm2" }"""));

        var (_, _, study) = StudyCases.Uncertainty(json);

        Assert.Equal("dose 2 of 7", study.Limit!.Result.Period);
        Assert.Equal("rightPeriodReceived in dose 2 of 7", study.Limit.Result.Describe());
        Assert.Equal("kg/m2", study.Limit.Result.SiUnit);
    }
}
