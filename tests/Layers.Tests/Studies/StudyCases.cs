using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Studies;

namespace Layers.Tests.Studies;

/// <summary>Invented cases for the study tests, and reading a study from a document.</summary>
internal static class StudyCases
{
    /// <summary>A membrane that starts empty between a constant source and a sink (the time-lag experiment).</summary>
    public static string Membrane(string study, string thickness = "50 um", string diffusion = "1e-8 cm2/s") => $$"""
        {
          "layers": [ { "name": "membrane", "thickness": "{{thickness}}", "diffusionCoefficient": "{{diffusion}}" } ],
          "left": { "kind": "bath", "name": "donor", "concentration": "1 mg/mL" },
          "right": { "kind": "bath", "name": "receiver", "concentration": "0 mg/mL" },
          "duration": "1 h",
          {{study}}
        }
        """;

    /// <summary>
    /// A loaded sheet of 200 um, sealed on the left, giving up its content to a sink on the right (desorption from
    /// a plane sheet; by symmetry half of a 400 um sheet desorbing from both faces).
    /// </summary>
    public static string Sheet(string study, string diffusion = "1e-9 cm2/s", string cells = "") => $$"""
        {
          "layers": [ { "name": "sheet", "thickness": "200 um", "diffusionCoefficient": "{{diffusion}}", "initialConcentration": "1 mg/mL" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "bath", "name": "sink", "concentration": "0 mg/mL" },
          "duration": "1 h",
          "reportTimes": ["15 min", "1 h"],
          {{cells}}
          {{study}}
        }
        """;

    /// <summary>The document, the valid base case and the design read from it.</summary>
    public static (JsonObject Document, SimulationCase Case, DesignSettings Design) Design(string json) => Study(json, DesignReader.Read);

    /// <summary>The document, the valid base case and the uncertainty study read from it.</summary>
    public static (JsonObject Document, SimulationCase Case, UncertaintySettings Study) Uncertainty(string json) => Study(json, UncertaintyReader.Read);

    private static (JsonObject, SimulationCase, T) Study<T>(string json, Func<JsonObject, string, SimulationCase, List<CaseError>, T?> read)
        where T : class
    {
        var file = CaseDocument.ReadText(json, "study.json");
        Assert.True(file.IsValid, file.FormatErrors());
        var document = CaseVariation.Parse(json)!;
        var errors = new List<CaseError>();
        var study = read(document, "study.json", file.Case!, errors);
        Assert.Empty(errors);
        return (document, file.Case!, study!);
    }

    /// <summary>The messages of reading a document as "path: message".</summary>
    public static IReadOnlyList<string> Errors(string json) =>
        CaseDocument.ReadText(json, "study.json").Errors.Select(error => $"{error.JsonPath}: {error.Message}").ToList();
}
