using Layers.Tests.TestSupport;

namespace Layers.Tests.Batch;

/// <summary>Invented, small and quick cases for the batch tests.</summary>
internal static class BatchCases
{
    /// <summary>Invented: one membrane between a donor bath and a sink, 2 h; a few hundred steps.</summary>
    public const string Membrane = """
        {
          "title": "Invented membrane",
          "layers": [
            { "name": "membrane", "thickness": "20 um", "diffusionCoefficient": "1e-8 cm2/s", "partitionCoefficient": 1 }
          ],
          "left": { "kind": "bath", "name": "donor", "concentration": "1 mg/mL" },
          "right": { "kind": "bath", "name": "receiver", "concentration": "0 mg/mL" },
          "duration": "2 h",
          "numerics": { "cells": 60 }
        }
        """;

    /// <summary>The membrane with a thickness sweep over the given values and its lag time as the plotted result.</summary>
    public static string ThicknessSweep(params string[] thicknesses) => CaseJson.With(
        Membrane,
        ("$.sweep", $$"""{ "parameters": [ { "path": "$.layers[0].thickness", "values": [{{string.Join(", ", thicknesses.Select(t => $"\"{t}\""))}}] } ], "result": "lagTime" }"""));

    /// <summary>A folder with three good cases (one a two-value sweep), one invalid, one not JSON.</summary>
    public static void WriteMixedFolder(TempFolder temp, string folder)
    {
        temp.WriteFile(Path.Combine(folder, "b-good.json"), Membrane);
        temp.WriteFile(Path.Combine(folder, "a-sweep.json"), ThicknessSweep("10 um", "30 um"));
        temp.WriteFile(Path.Combine(folder, "c-negative.json"), CaseJson.With(Membrane, ("$.layers[0].thickness", "\"-5 um\"")));
        temp.WriteFile(Path.Combine(folder, "d-broken.json"), "{ \"layers\": [");
        temp.WriteFile(Path.Combine(folder, "sub", "e-deeper.json"), CaseJson.With(Membrane, ("$.duration", "\"1 h\"")));
    }
}
