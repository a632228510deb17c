using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Studies;

namespace Layers.Tests.CaseReading;

/// <summary>
/// The words shown for a varied input (issue #20, point 3: no JSON paths on tables and plots meant for people): the
/// owner's own name from the case document, or its place, and the key in words. The expected texts are the names the
/// case format (docs/case-format.md, "Key reference") gives these values.
/// </summary>
public sealed class InputLabelsTests
{
    private static readonly JsonObject Document = JsonNode.Parse("""
        {
          "layers": [ { "name": "sealant", "thickness": "20 um" }, { "name": "PET barrier", "thickness": "12 um" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "olive oil", "volume": "1 L", "area": "6 dm2" },
          "foodContact": {
            "stages": [ { "name": "hot fill", "duration": "2 h", "temperature": "70 degC", "diffusionCoefficients": { "sealant": "1e-9 cm2/s" } } ],
            "layerDiffusion": { "sealant": { "referenceTemperature": "23 degC", "activationEnergy": "80 kJ/mol" } }
          },
          "reportTimes": [ "1 d", "10 d" ],
          "schedule": [
            { "name": "first fill", "duration": "5 d" },
            { "name": "refill", "duration": "5 d", "renew": [ { "face": "right", "volume": "2 L" } ] },
            { "repeat": 2, "periods": [ { "duration": "1 d", "renew": [ { "face": "right", "partitionCoefficient": 2 } ] } ] }
          ],
          "duration": "10 d"
        }
        """)!.AsObject();

    [Theory]
    [InlineData("$.layers[0].thickness", "sealant thickness")]
    [InlineData("$.layers[1].diffusionCoefficient", "PET barrier diffusion coefficient")]
    [InlineData("$.right.volume", "olive oil volume")]
    [InlineData("$.right.initialConcentration", "olive oil initial concentration")]
    [InlineData("$.left.partitionCoefficient", "left medium partition coefficient")]
    [InlineData("$.duration", "duration")]
    [InlineData("$.reportTimes[1]", "report times 2")]
    [InlineData("$.foodContact.stages[0].temperature", "hot fill temperature")]
    [InlineData("$.foodContact.stages[0].diffusionCoefficients.sealant", "sealant diffusion coefficient in hot fill")]
    [InlineData("$.foodContact.layerDiffusion.sealant.activationEnergy", "sealant activation energy")]
    [InlineData("$.schedule[0].duration", "first fill duration")]
    [InlineData("$.schedule[1].renew[0].volume", "olive oil volume at refill")]
    [InlineData("$.schedule[2].periods[0].renew[0].partitionCoefficient", "olive oil partition coefficient at period 1")]
    public void Names_the_owner_and_the_quantity_in_words(string path, string expected) =>
        Assert.Equal(expected, InputLabels.Of(Document, path));

    [Fact]
    public void Without_the_document_the_owner_is_named_by_its_place() =>
        Assert.Equal("layer 2 thickness", InputLabels.Of(null, "$.layers[1].thickness"));

    [Fact]
    public void Sweep_values_carry_the_words_and_keep_the_path_for_files()
    {
        var expansion = SweepExpander.Expand("""
            {
              "layers": [ { "name": "membrane", "thickness": "100 um", "diffusionCoefficient": "1e-7 cm2/s" } ],
              "left": { "kind": "bath", "concentration": "1 mg/mL" }, "right": { "kind": "bath" }, "duration": "2 h",
              "sweep": { "result": "lagTime", "parameters": [ { "path": "$.layers[0].thickness", "values": ["25 um", "50 um"] } ] }
            }
            """, "labels.json");

        var value = Assert.Single(expansion.Variants[0].Values);
        Assert.Equal("membrane thickness", value.Label);
        Assert.Equal("$.layers[0].thickness", value.Path);
        Assert.EndsWith("thickness-25um", expansion.Variants[0].Name, StringComparison.Ordinal);
    }

    [Fact]
    public void A_study_input_is_labelled_from_the_case_it_varies()
    {
        var (_, _, design) = Studies.StudyCases.Design(Studies.StudyCases.Membrane("""
            "design": { "input": { "path": "$.layers[0].thickness", "from": "20 um", "to": "200 um" }, "result": "lagTime", "target": "1 h" }
            """));

        Assert.Equal("membrane thickness", design.Input.Label);
        Assert.Equal("lag time", design.Result.Label);
    }
}
