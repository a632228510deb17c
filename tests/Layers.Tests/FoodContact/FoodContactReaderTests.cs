using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>Reading <c>foodContact</c>: conversions to SI, where D comes from, and every rule with its JSON path.</summary>
public sealed class FoodContactReaderTests
{
    // Invented: a two-layer film on 1 kg of food on 6 dm2, valid as it stands.
    private const string Film = """
        {
          "layers": [
            { "name": "core", "thickness": "40 um", "initialConcentration": "1000 mg/kg", "density": "0.92 g/cm3" },
            { "name": "skin", "thickness": "10 um", "diffusionCoefficient": "1e-10 cm2/s" }
          ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "mass": "1 kg", "density": "1 g/cm3", "area": "6 dm2" },
          "foodContact": {
            "stages": [
              { "name": "fill", "duration": "2 h", "temperature": "70 degC" },
              { "name": "storage", "duration": "10 d", "temperature": "25 degC", "diffusionCoefficients": { "skin": "2e-10 cm2/s" } }
            ],
            "layerDiffusion": { "core": { "polymer": "LDPE", "relativeMolarMass": 531 } },
            "specificMigrationLimit": "0.05 mg/kg",
            "testCondition": { "duration": "10 d", "temperature": "60 degC" }
          }
        }
        """;

    [Fact]
    public void Stages_limits_and_sources_are_read_in_SI()
    {
        var result = CaseJson.Read(Film);

        Assert.True(result.IsValid, result.FormatErrors());
        var food = result.Case!.FoodContact!;
        Assert.Equal(2, food.Stages.Count);
        Assert.Equal(343.15, food.Stages[0].TemperatureKelvin, 9);
        Assert.Equal(7200, food.Stages[0].DurationSeconds, 9);
        Assert.Equal((7200 + (10 * 86400.0)), result.Case.DurationSeconds, 6);
        Tolerance.Relative(2e-14, food.Stages[1].DiffusivityOverrides[1], 1e-12, "per-stage D");
        Assert.Equal(0.05e-6, food.SpecificMigrationLimit!.Value, 15);
        Assert.Equal(0.01e-6, food.DetectionLimit, 15);
        Assert.Equal(333.15, food.TestCondition!.TemperatureKelvin, 9);
        Assert.Equal(Side.Right, food.FoodSide);
        Assert.IsType<EstimatedDiffusivity>(result.Case.Stack.Layers[0].Diffusivity);
        Assert.IsType<GivenDiffusivity>(result.Case.Stack.Layers[1].Diffusivity);
    }

    [Fact]
    public void An_estimated_layer_starts_with_D_at_the_first_stage_temperature()
    {
        // By hand, LDPE (A_P' = 11.5, tau = 0, constants flagged unverified), Mr 531, 70 C = 343.15 K:
        // exponent = 11.5 - 8.8590 + 1.593 - 10454/343.15 (= 30.4648) = -26.2308; D = 1e4 exp(-26.2308) cm2/s
        // = 4.055e-8 cm2/s = 4.055e-12 m2/s (equation: Begley et al. 2005, constants from memory).
        var result = CaseJson.Read(Film);

        Tolerance.Relative(4.055e-12, result.Case!.WithFirstStageDiffusivities().Stack.Layers[0].DiffusivitySquareMetersPerSecond, 1e-3, "estimated D at 70 C");
    }

    [Fact]
    public void A_partition_convention_sets_every_layer_K()
    {
        var result = CaseJson.Read(CaseJson.With(Film, ("$.foodContact.partitionConvention", "\"poorlySoluble\"")));

        Assert.True(result.IsValid, result.FormatErrors());
        Assert.All(result.Case!.Stack.Layers, layer => Assert.Equal(1000, layer.PartitionCoefficient));
    }

    [Theory]
    [InlineData("$.layers[0].diffusionCoefficient", "\"1e-9 cm2/s\"", "$.layers[0].diffusionCoefficient: must be left out: $.foodContact.layerDiffusion.core estimates it")]
    [InlineData("$.foodContact.layerDiffusion.core.polymer", "\"kevlar\"", "$.foodContact.layerDiffusion.core.polymer: unknown polymer 'kevlar'; known: LDPE, LLDPE, HDPE, PP, PP rubber, PS, HIPS, PET, PEN, PA")]
    [InlineData("$.foodContact.stages[1].diffusionCoefficients.core2", "\"1e-9 cm2/s\"", "$.foodContact.stages[1].diffusionCoefficients.core2: no layer is named 'core2'; the layers are 'core', 'skin'")]
    [InlineData("$.foodContact.stages[0].temperature", "\"-300 degC\"", "$.foodContact.stages[0].temperature: must be > 0; got '-300 degC'")]
    [InlineData("$.foodContact.food", "\"left\"", "$.foodContact.food: the food must be a compartment; $.left is not")]
    [InlineData("$.foodContact.specificMigrationLimit", "\"0.05 mg/L\"", "$.foodContact.specificMigrationLimit:")]
    [InlineData("$.foodContact.partitionConvention", "\"sticky\"", "$.foodContact.partitionConvention: expected one of \"readilySoluble\", \"poorlySoluble\"; got \"sticky\"")]
    [InlineData("$.foodContact.stages", "[]", "$.foodContact.stages: expected a non-empty array of stages")]
    [InlineData("$.duration", "\"10 d\"", "$.duration: must be left out: $.foodContact.stages give the duration")]
    [InlineData("$.foodContact.stages[1].partitionCoefficients", "{ \"lid\": 5 }", "$.foodContact.stages[1].partitionCoefficients.lid: no layer or face is named 'lid'; the names are 'core', 'skin', ")]
    [InlineData("$.foodContact.stages[1].partitionCoefficients", "{ \"skin\": \"5 mg/kg\" }", "$.foodContact.stages[1].partitionCoefficients.skin: expected a number > 0 (a partition coefficient has no unit)")]
    [InlineData("$.foodContact.stages[1].partitionCoefficients", "{ \"skin\": 0 }", "$.foodContact.stages[1].partitionCoefficients.skin: expected a number > 0")]
    [InlineData("$.foodContact.stages[1].partitionCoefficients", "[1000]", "$.foodContact.stages[1].partitionCoefficients: expected an object of layer or face name to partition coefficient")]
    [InlineData("$.layers[1].diffusionCoefficientOrigin", "\"guessed\"", "$.layers[1].diffusionCoefficientOrigin: expected one of \"given\", \"measured\", \"fitted\"; got \"guessed\"")]
    [InlineData("$.layers[0].diffusionCoefficientOrigin", "\"measured\"", "$.layers[0].diffusionCoefficientOrigin: must be left out: $.foodContact.layerDiffusion.core estimates D")]
    public void Each_rule_is_reported_at_its_path(string path, string value, string expectedStart)
    {
        var result = CaseJson.Read(CaseJson.With(Film, (path, value)));

        Assert.False(result.IsValid);
        Assert.Contains(result.Errors, error => $"{error.JsonPath}: {error.Message}".StartsWith(expectedStart, StringComparison.Ordinal));
    }

    [Fact]
    public void Where_a_given_D_comes_from_is_carried_into_its_description()
    {
        var result = CaseJson.Read(CaseJson.With(Film, ("$.layers[1].diffusionCoefficientOrigin", "\"measured\"")));

        Assert.True(result.IsValid, result.FormatErrors());
        Assert.Equal("measured", result.Case!.Stack.Layers[1].DiffusivityOrigin);
        Assert.StartsWith("measured;", result.Case.Stack.Layers[1].Diffusivity.Describe(), StringComparison.Ordinal);
        Assert.Equal("estimated", Layers.Core.Reports.InputTables.OriginOf(result.Case, 0));
    }

    [Fact]
    public void Stage_partition_coefficients_written_by_name_are_kept_by_layer_index_and_face_side()
    {
        var json = CaseJson.With(
            Film,
            ("$.right.name", "\"juice\""),
            ("$.foodContact.stages[1].partitionCoefficients", """{ "skin": 1000, "juice": 2 }"""));

        var result = CaseJson.Read(json);

        Assert.True(result.IsValid, result.FormatErrors());
        var stages = result.Case!.FoodContact!.Stages;
        Assert.False(stages[0].HasPartitionOverrides);
        Assert.Equal(1000, Assert.Single(stages[1].LayerPartitionOverrides, pair => pair.Key == 1).Value);
        Assert.Equal(2, Assert.Single(stages[1].FacePartitionOverrides, pair => pair.Key == Side.Right).Value);
        Assert.Single(stages[1].LayerPartitionOverrides);
        Assert.Single(stages[1].FacePartitionOverrides);
    }

    [Fact]
    public void A_stage_partition_coefficient_written_for_a_name_shared_by_a_layer_and_the_food_applies_to_both()
    {
        // The file cannot tell a layer from a face of the same name, so the value is given to both; after reading,
        // the two are told apart by index and side (common practice, no source: the case format's own rule).
        var json = CaseJson.With(
            Film,
            ("$.right.name", "\"skin\""),
            ("$.foodContact.stages[1].partitionCoefficients", """{ "skin": 7 }"""));

        var result = CaseJson.Read(json);

        Assert.True(result.IsValid, result.FormatErrors());
        var stage = result.Case!.FoodContact!.Stages[1];
        Assert.Equal(7, stage.LayerPartitionOf(1, caseValue: 1));
        Assert.Equal(1, stage.LayerPartitionOf(0, caseValue: 1));
        Assert.Equal(7, stage.FacePartitionOf(Side.Right, caseValue: 1));
        Assert.Equal(1, stage.FacePartitionOf(Side.Left, caseValue: 1));
    }

    [Fact]
    public void Stage_partition_coefficients_on_the_mass_basis_are_converted_with_the_densities()
    {
        // K_volume = K_mass x rho_medium / rho_reference (the definition of the two bases; docs/case-format.md).
        var json = CaseJson.With(
            Film,
            ("$.partitionBasis", "\"mass\""),
            ("$.referenceMedium", """{ "name": "food", "density": "1 g/cm3" }"""),
            ("$.layers[1].density", "\"0.9 g/cm3\""),
            ("$.foodContact.stages[1].partitionCoefficients", """{ "core": 10 }"""));

        var result = CaseJson.Read(json);

        Assert.True(result.IsValid, result.FormatErrors());
        Tolerance.Relative(9.2, result.Case!.FoodContact!.Stages[1].LayerPartitionOverrides[0], 1e-12, "10 x 0.92 / 1.0");
    }

    [Fact]
    public void Stage_partition_coefficients_with_a_partition_convention_are_an_error()
    {
        var json = CaseJson.With(
            Film,
            ("$.foodContact.partitionConvention", "\"readilySoluble\""),
            ("$.foodContact.stages[0].partitionCoefficients", """{ "core": 3 }"""));

        var result = CaseJson.Read(json);

        Assert.Contains(result.Errors, error => error.JsonPath == "$.foodContact.stages[0].partitionCoefficients.core"
            && error.Message.Contains("partitionConvention", StringComparison.Ordinal));
    }

    [Fact]
    public void A_layer_K_given_with_a_partition_convention_is_an_error_not_silently_overruled()
    {
        var json = CaseJson.With(Film, ("$.foodContact.partitionConvention", "\"readilySoluble\""), ("$.layers[1].partitionCoefficient", "3"));

        var result = CaseJson.Read(json);

        Assert.Contains(result.Errors, error => error.JsonPath == "$.layers[1].partitionCoefficient"
            && error.Message.Contains("partitionConvention", StringComparison.Ordinal));
    }

    [Fact]
    public void Food_contact_needs_a_compartment_as_food()
    {
        var json = CaseJson.With(Film, ("$.right", """{ "kind": "bath" }"""));

        var result = CaseJson.Read(json);

        Assert.Contains(result.Errors, error => error.JsonPath == "$.foodContact" && error.Message.Contains("compartment", StringComparison.Ordinal));
    }
}
