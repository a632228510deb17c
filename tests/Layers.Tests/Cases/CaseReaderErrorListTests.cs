using Layers.Core.Cases;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>
/// How errors are collected and presented: all of them at once, in document order, with file and path
/// (docs/case-format.md, "Validation messages"); JSON syntax errors with line and column; unreadable files as
/// errors, never exceptions.
/// </summary>
public sealed class CaseReaderErrorListTests
{
    [Fact]
    public void Several_independent_mistakes_are_all_reported_in_document_order()
    {
        var json = """
            {
              "layers": [
                { "name": "outer", "thickness": "-12 um", "diffusionCoefficient": "5e-13 cm2/s" },
                { "name": "core", "thickness": "40 um", "diffusionCoefficient": "2 mm", "partitionCoefficient": 0.5 },
                { "name": "Outer", "thicknes": "25 um", "diffusionCoefficient": "1e-8 cm2/s", "initialConcentration": "600 mg/kg" }
              ],
              "left": { "kind": "closed" },
              "right": { "kind": "pipe", "volume": "1 L" },
              "duration": "10 d",
              "reportTimes": ["1 d", "12 h", "3 d"],
              "numerics": { "cells": 4 }
            }
            """;

        var result = CaseJson.Read(json);

        Assert.Null(result.Case);
        Assert.False(result.IsValid);
        Assert.Equal(
            [
                "$.layers[0].thickness",
                "$.layers[1].diffusionCoefficient",
                "$.layers[2].thicknes",
                "$.layers[2].name",
                "$.layers[2].thickness",
                "$.layers[2].initialConcentration",
                "$.right.kind",
                "$.reportTimes[1]",
                "$.numerics.cells",
            ],
            result.Errors.Select(error => error.JsonPath));
    }

    [Fact]
    public void Formatted_errors_name_the_file_and_the_path_one_per_line()
    {
        var json = CaseJson.MinimalWith(("$.layers[0].thickness", "\"-5 um\""), ("$.right.kind", "\"pipe\""));

        var result = CaseJson.Read(json, "cases/film.json");

        var lines = result.FormatErrors().Split(Environment.NewLine);
        Assert.Equal(
            [
                $"cases/film.json: $.layers[0].thickness {At(json, "\"thickness\"")}: must be > 0; got '-5 um'",
                $"cases/film.json: $.right.kind {At(json, "\"kind\": \"pipe\"")}: must be one of closed, bath, compartment; got 'pipe'",
            ],
            lines);
    }

    [Fact]
    public void Every_error_points_at_the_line_and_column_of_its_key()
    {
        var json = "{\n  \"title\": \"t\",\n  \"duraton\": \"1 d\"\n}\n";

        var error = CaseJson.Read(json).Errors.First(error => error.JsonPath == "$.duraton");

        // Line 3, column 3: where "duraton" starts, as an editor counts (1-based).
        Assert.Equal((3L, 3L), (error.Line!.Value, error.Column!.Value));
    }

    private static string At(string json, string text)
    {
        var offset = json.IndexOf(text, StringComparison.Ordinal);
        var line = json[..offset].Count(character => character == '\n') + 1;
        var column = offset - json.LastIndexOf('\n', Math.Max(offset - 1, 0)) ;
        return FormattableString.Invariant($"(line {line}, column {(line == 1 ? offset + 1 : column)})");
    }

    [Fact]
    public void A_syntax_error_gives_the_line_and_column_of_the_mistake()
    {
        // Line 4 lacks the comma after the thickness; the parser trips over the next key, at line 5, column 7.
        var json = "{\n  \"layers\": [\n    {\n      \"thickness\": \"50 um\"\n      \"name\": \"film\"\n    }\n  ]\n}\n";

        var result = CaseJson.Read(json, "broken.json");

        var error = Assert.Single(result.Errors);
        Assert.Equal("$", error.JsonPath);
        Assert.Equal(5, error.Line);
        Assert.Equal(7, error.Column);
        Assert.StartsWith("not valid JSON", error.Message, StringComparison.Ordinal);
        Assert.StartsWith("broken.json: $ (line 5, column 7): not valid JSON", error.Format("broken.json"), StringComparison.Ordinal);
    }

    [Fact]
    public void The_column_of_a_syntax_error_counts_characters_not_bytes()
    {
        // "µ" is one character but two bytes in UTF-8; editors count characters. The stray "x" starts at
        // character 34 of line 2 (index 33), where a byte count would say 38.
        var json = "{\n  \"layers\": [ { \"name\": \"µµµ µm\" \"x\" } ]\n}";
        Assert.Equal(33, json.Split('\n')[1].IndexOf("\"x\"", StringComparison.Ordinal));

        var error = Assert.Single(CaseJson.Read(json).Errors);

        Assert.Equal(2, error.Line);
        Assert.Equal(34, error.Column);
    }

    [Theory]
    // docs/case-format.md, General rules: standard JSON, no comments, no trailing commas.
    [InlineData("{ \"duration\": \"10 d\" // until the end\n }")]
    [InlineData("/* note */ { \"duration\": \"10 d\" }")]
    [InlineData("{ \"duration\": \"10 d\", }")]
    [InlineData("{ \"layers\": [ 1, ] }")]
    [InlineData("")]
    [InlineData("{ \"duration\": '10 d' }")]
    public void Anything_but_standard_JSON_is_a_syntax_error(string json)
    {
        var error = Assert.Single(CaseJson.Read(json).Errors);

        Assert.Equal("$", error.JsonPath);
        Assert.StartsWith("not valid JSON", error.Message, StringComparison.Ordinal);
        Assert.NotNull(error.Line);
        Assert.NotNull(error.Column);
    }

    [Fact]
    public void A_comment_is_refused_with_a_pointer_to_description()
    {
        var error = Assert.Single(CaseJson.Read("{ // note\n }").Errors);

        Assert.Contains("description", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_file_is_an_error_not_an_exception()
    {
        using var folder = new TempFolder();
        var path = folder.Combine("no-such-case.json");

        var result = CaseDocument.ReadFile(path);

        Assert.False(result.IsValid);
        Assert.Null(result.Case);
        var error = Assert.Single(result.Errors);
        Assert.Equal("$", error.JsonPath);
        Assert.StartsWith("cannot read the file", error.Message, StringComparison.Ordinal);
        Assert.StartsWith($"{path}: $: cannot read the file", result.FormatErrors(), StringComparison.Ordinal);
    }

    [Fact]
    public void A_folder_given_as_the_case_file_is_an_error_not_an_exception()
    {
        using var folder = new TempFolder();

        var result = CaseDocument.ReadFile(folder.Path);

        var error = Assert.Single(result.Errors);
        Assert.Equal("$", error.JsonPath);
        Assert.StartsWith("cannot read the file", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_valid_case_has_no_errors_and_formats_to_nothing()
    {
        var result = CaseJson.Read(CaseJson.Minimal);

        Assert.True(result.IsValid);
        Assert.Empty(result.Errors);
        Assert.Equal(string.Empty, result.FormatErrors());
    }
}
