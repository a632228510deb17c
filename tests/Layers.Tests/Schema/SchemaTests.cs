using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Json.Schema;
using Layers.Core.Studies;

namespace Layers.Tests.Schema;

/// <summary>
/// Checks docs/case.schema.json: that it is a well-formed draft 2020-12 schema with help text on every property,
/// that the shipped cases and the examples in docs/case-format.md satisfy it, and that typical mistakes do not.
/// </summary>
public class SchemaTests
{
    private const string Draft202012 = "https://json-schema.org/draft/2020-12/schema";
    private const string SchemaId = "https://layers.invalid/case.schema.json";

    // A small case that satisfies the schema; the broken documents below are variations of it.
    private const string MinimalCase = """
        {
          "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "bath" },
          "duration": "10 d"
        }
        """;

    private static readonly Lazy<string> _repoRoot = new(FindRepoRoot);
    private static readonly Lazy<string> _schemaText = new(
        () => File.ReadAllText(Path.Combine(_repoRoot.Value, "docs", "case.schema.json")));
    private static readonly Lazy<JsonSchema> _schema = new(() => JsonSchema.FromText(_schemaText.Value));

    public static TheoryData<string, string> BrokenCases => new()
    {
        {
            "unknown top-level key",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d", "temperature": "40 degC" }"""
        },
        {
            "unknown key in a layer (misspelt thickness)",
            """{ "layers": [ { "name": "film", "thicknes": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "missing thickness",
            """{ "layers": [ { "name": "film", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "unknown face kind",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "pipe" }, "duration": "10 d" }"""
        },
        {
            "number where a quantity string is expected",
            """{ "layers": [ { "name": "film", "thickness": 50, "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "empty layers array",
            """{ "layers": [], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "missing duration",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" } }"""
        },
        {
            "quantity without unit",
            """{ "layers": [ { "name": "film", "thickness": "50", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "exponent without unit",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "decimal comma",
            """{ "layers": [ { "name": "film", "thickness": "1,5 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "quantity string where a partition coefficient number is expected",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "partitionCoefficient": "2" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "partition coefficient zero",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "partitionCoefficient": 0 } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "empty layer name",
            """{ "layers": [ { "name": "", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "extra key on a closed face",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed", "concentration": "0 mg/L" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "face without kind",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "concentration": "0 mg/L" }, "duration": "10 d" }"""
        },
        {
            "compartment with both volume and mass",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "compartment", "volume": "1 L", "mass": "1 kg", "density": "1 g/cm3", "area": "6 dm2" }, "duration": "10 d" }"""
        },
        {
            "compartment with neither volume nor mass",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "compartment", "area": "6 dm2" }, "duration": "10 d" }"""
        },
        {
            "compartment mass without density",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "compartment", "mass": "1 kg", "area": "6 dm2" }, "duration": "10 d" }"""
        },
        {
            "compartment without area",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "compartment", "volume": "1 L" }, "duration": "10 d" }"""
        },
        {
            "mass basis without reference density",
            """{ "partitionBasis": "mass", "referenceMedium": { "name": "water" }, "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "density": "0.9 g/cm3" } ], "left": { "kind": "closed" }, "right": { "kind": "bath", "density": "1 g/cm3" }, "duration": "10 d" }"""
        },
        {
            "mass basis without layer density",
            """{ "partitionBasis": "mass", "referenceMedium": { "density": "1 g/cm3" }, "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath", "density": "1 g/cm3" }, "duration": "10 d" }"""
        },
        {
            "mass basis without bath density",
            """{ "partitionBasis": "mass", "referenceMedium": { "density": "1 g/cm3" }, "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "density": "0.9 g/cm3" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "unknown partition basis",
            """{ "partitionBasis": "molar", "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d" }"""
        },
        {
            "empty report times",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d", "reportTimes": [] }"""
        },
        {
            "too few cells",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d", "numerics": { "cells": 4 } }"""
        },
        {
            "fractional cell count",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d", "numerics": { "cells": 240.5 } }"""
        },
        {
            "tolerance too loose",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d", "numerics": { "relativeTolerance": 0.1 } }"""
        },
        {
            "unknown numerics key",
            """{ "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s" } ], "left": { "kind": "closed" }, "right": { "kind": "bath" }, "duration": "10 d", "numerics": { "timeStep": "1 s" } }"""
        },
    };

    // Spellings the tool accepts must not be refused by the schema's quantity pattern.
    public static TheoryData<string> AcceptedQuantities => new()
    {
        "50 um", "50um", "  50 um  ", "-5 um", "+5 um", ".5 mm", "5. mm", "1.5E+3um", "1e-9 cm2/s",
        "2e-9 cm^2/s", "2e-9 cm\u00B2/s", "3 \u00B5m", "3 \u03BCm", "2 % w/w", "2 %w/w", "2 wt%", "0.5 mg/ml",
        "5 days", "1 year",
    };

    [Fact]
    public void Schema_parses_and_declares_draft_2020_12()
    {
        var schema = _schema.Value;

        var declared = schema.Keywords!.OfType<SchemaKeyword>().Single().Schema;
        Assert.Equal(new Uri(Draft202012), declared);
        var id = schema.Keywords!.OfType<IdKeyword>().Single().Id;
        Assert.Equal(new Uri(SchemaId), id);
    }

    [Fact]
    public void Schema_is_valid_against_the_draft_2020_12_meta_schema()
    {
        var document = JsonNode.Parse(_schemaText.Value);
        var results = MetaSchemas.Draft202012.Evaluate(document, ListOutput());

        if (!results.IsValid)
        {
            Assert.Fail(Describe("case.schema.json against the meta-schema", document, MetaSchemas.Draft202012));
        }
    }

    [Fact]
    public void Every_object_forbids_unknown_keys_and_every_property_has_help_text()
    {
        var problems = new List<string>();
        CheckObjectSchemas(JsonNode.Parse(_schemaText.Value)!, "#", problems);

        Assert.True(problems.Count == 0, string.Join(Environment.NewLine, problems));
    }

    [Fact]
    public void Minimal_case_is_valid()
    {
        AssertValid("minimal case", MinimalCase);
    }

    [Fact]
    public void Every_case_in_the_cases_folder_is_valid()
    {
        var casesFolder = Path.Combine(_repoRoot.Value, "cases");
        if (!Directory.Exists(casesFolder))
        {
            return;
        }

        var invalidFolder = Path.Combine(casesFolder, "invalid") + Path.DirectorySeparatorChar;
        var failures = Directory
            .EnumerateFiles(casesFolder, "*.json", SearchOption.AllDirectories)
            .Where(path => !path.StartsWith(invalidFolder, StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)
            .Select(path => (Path: path, Json: File.ReadAllText(path)))
            .Where(file => !Evaluate(file.Json).IsValid)
            .Select(file => Describe(
                Path.GetRelativePath(_repoRoot.Value, file.Path), JsonNode.Parse(file.Json), _schema.Value))
            .ToList();

        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
    }

    [Fact]
    public void Every_benchmark_case_is_valid_against_the_schema_and_the_reader()
    {
        var folder = Path.Combine(_repoRoot.Value, "tests", "Layers.Benchmarks", "cases");
        var files = Directory.EnumerateFiles(folder, "*.json").Order(StringComparer.Ordinal).ToList();

        Assert.NotEmpty(files);
        Assert.All(files, path =>
        {
            var json = File.ReadAllText(path);
            Assert.True(Evaluate(json).IsValid, Describe(Path.GetRelativePath(_repoRoot.Value, path), JsonNode.Parse(json), _schema.Value));
            var read = CaseDocument.ReadText(json, path);
            Assert.True(read.IsValid, read.FormatErrors());
        });
    }

    [Fact]
    public void First_example_in_the_format_reference_is_a_complete_valid_case()
    {
        var blocks = JsonBlocksOfFormatReference();

        Assert.NotEmpty(blocks);
        var first = JsonNode.Parse(blocks[0])!.AsObject();
        Assert.True(first.ContainsKey("layers"), "The first ```json block of docs/case-format.md must be a complete case.");
        AssertValid("first example of docs/case-format.md", blocks[0]);
    }

    [Fact]
    public void Every_json_block_in_the_format_reference_parses_and_complete_cases_are_valid()
    {
        var blocks = JsonBlocksOfFormatReference();

        for (var i = 0; i < blocks.Count; i++)
        {
            JsonNode? node;
            try
            {
                node = JsonNode.Parse(blocks[i]);
            }
            catch (JsonException exception)
            {
                Assert.Fail($"```json block {i + 1} of docs/case-format.md is not valid JSON: {exception.Message}");
                return;
            }

            if (node is JsonObject block && block.ContainsKey("layers"))
            {
                AssertValid($"```json block {i + 1} of docs/case-format.md", blocks[i]);
            }
        }
    }

    [Theory]
    [MemberData(nameof(BrokenCases))]
    public void Broken_case_is_rejected(string mistake, string json)
    {
        var results = Evaluate(json);

        Assert.False(results.IsValid, $"The schema accepted a case with this mistake: {mistake}");
    }

    [Theory]
    [MemberData(nameof(AcceptedQuantities))]
    public void Accepted_quantity_spellings_match_the_pattern(string quantity)
    {
        var json = MinimalCase.Replace("\"50 um\"", JsonSerializer.Serialize(quantity), StringComparison.Ordinal);

        AssertValid($"thickness {quantity}", json);
    }

    private static string FindRepoRoot()
    {
        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null;
             directory = directory.Parent)
        {
            if (File.Exists(Path.Combine(directory.FullName, "Layers.sln")))
            {
                return directory.FullName;
            }
        }

        var fromEnvironment = Environment.GetEnvironmentVariable("LAYERS_REPO_ROOT");
        if (!string.IsNullOrWhiteSpace(fromEnvironment) && File.Exists(Path.Combine(fromEnvironment, "Layers.sln")))
        {
            return Path.GetFullPath(fromEnvironment);
        }

        throw new InvalidOperationException(
            $"No Layers.sln above {AppContext.BaseDirectory}; set LAYERS_REPO_ROOT to the repository root.");
    }

    private static EvaluationOptions ListOutput() => new() { OutputFormat = OutputFormat.List };

    private static EvaluationResults Evaluate(string json) => _schema.Value.Evaluate(JsonNode.Parse(json), ListOutput());

    private static void AssertValid(string what, string json)
    {
        if (!Evaluate(json).IsValid)
        {
            Assert.Fail(Describe(what, JsonNode.Parse(json), _schema.Value));
        }
    }

    // Lists why a document failed. The hierarchical output is used here because the flat list also holds the
    // failures of oneOf branches that did not need to match, which would bury the real cause.
    private static string Describe(string what, JsonNode? document, JsonSchema schema)
    {
        var results = schema.Evaluate(document, new EvaluationOptions { OutputFormat = OutputFormat.Hierarchical });
        var text = new StringBuilder();
        text.Append(what).Append(results.IsValid ? ": valid" : ": invalid");
        AppendFailures(results, text);
        return text.ToString();
    }

    private static void AppendFailures(EvaluationResults node, StringBuilder text)
    {
        if (node.IsValid)
        {
            return;
        }

        foreach (var error in node.Errors ?? new Dictionary<string, string>())
        {
            text.AppendLine()
                .Append("  #").Append(node.InstanceLocation)
                .Append(" (schema #").Append(node.EvaluationPath).Append(") ")
                .Append(error.Key).Append(": ").Append(error.Value);
        }

        foreach (var detail in node.Details)
        {
            AppendFailures(detail, text);
        }
    }

    // The contents of every ```json fenced block, in order of appearance.
    private static List<string> JsonBlocksOfFormatReference()
    {
        var lines = File.ReadAllLines(Path.Combine(_repoRoot.Value, "docs", "case-format.md"));
        var blocks = new List<string>();
        StringBuilder? current = null;
        foreach (var line in lines)
        {
            var trimmed = line.Trim();
            if (current is null)
            {
                if (trimmed == "```json")
                {
                    current = new StringBuilder();
                }
            }
            else if (trimmed == "```")
            {
                blocks.Add(current.ToString());
                current = null;
            }
            else
            {
                current.AppendLine(line);
            }
        }

        return blocks;
    }

    // Every subschema declared as an object must close itself, and every property must carry help text.
    private static void CheckObjectSchemas(JsonNode node, string location, List<string> problems)
    {
        switch (node)
        {
            case JsonObject subschema:
                if (subschema["type"] is JsonValue type && type.GetValue<string>() == "object")
                {
                    CheckObjectSchema(subschema, location, problems);
                }

                foreach (var (key, child) in subschema)
                {
                    if (child is not null)
                    {
                        CheckObjectSchemas(child, location + "/" + key, problems);
                    }
                }

                break;
            case JsonArray items:
                for (var i = 0; i < items.Count; i++)
                {
                    if (items[i] is { } child)
                    {
                        CheckObjectSchemas(child, location + "/" + i, problems);
                    }
                }

                break;
        }
    }

    private static void CheckObjectSchema(JsonObject subschema, string location, List<string> problems)
    {
        if (subschema["properties"] is not JsonObject properties)
        {
            // A dispatcher such as the face schema: its oneOf branches are the closed objects. A map keyed by layer
            // names (foodContact.layerDiffusion) has no fixed keys: its values' schema is additionalProperties.
            if (subschema["oneOf"] is null && subschema["additionalProperties"] is not JsonObject)
            {
                problems.Add($"{location}: an object schema without properties or oneOf");
            }

            return;
        }

        if (subschema["additionalProperties"] is not JsonValue closed || closed.GetValueKind() != JsonValueKind.False)
        {
            problems.Add($"{location}: additionalProperties must be false");
        }

        foreach (var (name, property) in properties)
        {
            foreach (var help in new[] { "title", "description" })
            {
                if (property?[help] is not JsonValue value || string.IsNullOrWhiteSpace(value.GetValue<string>()))
                {
                    problems.Add($"{location}/properties/{name}: no {help}");
                }
            }
        }
    }
}
