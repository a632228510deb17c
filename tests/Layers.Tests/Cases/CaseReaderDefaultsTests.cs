using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>The defaults of docs/case-format.md ("Defaults" table) for keys a case leaves out.</summary>
public sealed class CaseReaderDefaultsTests
{
    private static SimulationCase ReadValid(string json, string fileName = "case.json")
    {
        var result = CaseJson.Read(json, fileName);
        Assert.True(result.IsValid, result.FormatErrors());
        return result.Case!;
    }

    [Fact]
    public void A_layer_without_partition_coefficient_or_initial_concentration_has_K_1_and_starts_empty()
    {
        var layer = ReadValid(CaseJson.Minimal).Stack.Layers[0];

        Assert.Equal(1, layer.PartitionCoefficient);
        Assert.Equal(0, layer.InitialConcentrationKgPerCubicMeter);
        Assert.Null(layer.DensityKgPerCubicMeter);
    }

    [Fact]
    public void A_compartment_without_optional_keys_has_K_1_starts_empty_and_has_no_film()
    {
        var right = Assert.IsType<CompartmentFace>(ReadValid(CaseJson.Minimal).Right);

        Assert.Equal(1, right.PartitionCoefficient);
        Assert.Equal(0, right.InitialConcentrationKgPerCubicMeter);
        Assert.Null(right.FilmCoefficientMetersPerSecond);
        Assert.Null(right.DensityKgPerCubicMeter);
    }

    [Fact]
    public void A_bath_without_optional_keys_is_a_perfect_sink_with_K_1_and_no_film()
    {
        var bath = Assert.IsType<BathFace>(ReadValid(CaseJson.MinimalWith(("$.right", """{ "kind": "bath" }"""))).Right);

        Assert.Equal(0, bath.ConcentrationKgPerCubicMeter);
        Assert.Equal(1, bath.PartitionCoefficient);
        Assert.Null(bath.FilmCoefficientMetersPerSecond);
    }

    [Fact]
    public void Default_report_times_are_1_10_25_50_and_100_percent_of_the_duration()
    {
        var simulation = ReadValid(CaseJson.Minimal);

        // docs/case-format.md: for "10 d": 0.1 d, 1 d, 2.5 d, 5 d and 10 d; 1 d = 86400 s (SI Brochure 9th ed., Table 8).
        double[] expected = [0.1 * 86400, 86400, 2.5 * 86400, 5 * 86400, 10 * 86400];
        Assert.Equal(expected.Length, simulation.ReportTimesSeconds.Count);
        for (var i = 0; i < expected.Length; i++)
        {
            Tolerance.Relative(expected[i], simulation.ReportTimesSeconds[i], 1e-12, $"default report time {i}");
        }
    }

    [Fact]
    public void There_are_no_extra_output_times_by_default() =>
        Assert.Empty(ReadValid(CaseJson.Minimal).ExtraOutputTimesSeconds);

    [Theory]
    [InlineData("bath", "$.left", "left bath")]
    [InlineData("bath", "$.right", "right bath")]
    [InlineData("compartment", "$.left", "left compartment")]
    [InlineData("compartment", "$.right", "right compartment")]
    public void Unnamed_faces_are_named_by_side_and_kind(string kind, string face, string expected)
    {
        var faceJson = kind == "bath" ? """{ "kind": "bath" }""" : """{ "kind": "compartment", "volume": "1 L", "area": "6 dm2" }""";

        var simulation = ReadValid(CaseJson.MinimalWith((face, faceJson)));

        var condition = face == "$.left" ? simulation.Left : simulation.Right;
        var name = condition switch
        {
            BathFace bath => bath.Name,
            CompartmentFace compartment => compartment.Name,
            _ => null,
        };
        Assert.Equal(expected, name);
    }

    [Theory]
    [InlineData("film-a.json", "film-a")]
    [InlineData("cases/lid film.json", "lid film")]
    [InlineData("/tmp/runs/case.v2.json", "case.v2")]
    public void Without_a_title_the_file_name_without_json_is_the_title(string fileName, string expected) =>
        Assert.Equal(expected, ReadValid(CaseJson.Minimal, fileName).Title);

    [Fact]
    public void The_reference_medium_is_called_reference_medium_by_default() =>
        Assert.Equal("reference medium", ReadValid(CaseJson.Minimal).ReferenceMedium);

    [Fact]
    public void A_reference_medium_without_name_keeps_the_default_name() =>
        Assert.Equal("reference medium", ReadValid(CaseJson.MinimalWith(("$.referenceMedium", """{ "density": "1 g/cm3" }"""))).ReferenceMedium);

    [Fact]
    public void Numerics_default_to_the_accuracy_target_of_1e_4()
    {
        // docs/case-format.md, $.numerics: without numerics the run aims at 1e-4 (cells by diffusion length, 0.05 of it
        // at the edges, at least 4 per layer, step tolerance 1e-4).
        var simulation = ReadValid(CaseJson.Minimal);

        var mesh = Assert.IsType<DiffusionLengthMesh>(simulation.Numerics.Grid);
        Assert.Equal(0.05, mesh.WidthPerDiffusionLength, 15);
        Assert.Equal(4, mesh.MinimumCellsPerLayer);
        Assert.Equal(1e-4, simulation.Numerics.Solver.RelativeTolerance, 15);
    }

    [Fact]
    public void A_case_built_in_code_gets_the_same_numerics_as_a_case_file_that_names_none()
    {
        // docs/case-format.md, $.numerics: one default, accuracy 1e-4, whoever builds the case; the mesh is the same
        // for the same stack (a case built in code used to get 240 shared cells at tolerance 1e-6 instead).
        var read = ReadValid(CaseJson.Minimal);
        var built = Cases.Make(read.Left, read.Right, read.DurationSeconds, read.ReportTimesSeconds, numerics: NumericsSettings.Default, layers: [.. read.Stack.Layers]);

        Assert.Equal(read.Numerics, built.Numerics);
        Assert.Equal(SolutionMethod.Auto, read.Numerics.Method);
        Assert.Equal(GridBuilder.Build(read).WidthsMeters.ToArray(), GridBuilder.Build(built).WidthsMeters.ToArray());
    }

    [Fact]
    public void A_cell_count_without_an_accuracy_asks_for_the_shared_count_mesh_with_its_own_defaults()
    {
        var simulation = ReadValid(CaseJson.MinimalWith(("$.numerics", """{ "cells": 480 }""")));

        var mesh = Assert.IsType<CellCountMesh>(simulation.Numerics.Grid);
        Assert.Equal(480, mesh.TotalCells);
        Assert.Equal(12, mesh.MinimumCellsPerLayer);
        Assert.Equal(1e-6, simulation.Numerics.Solver.RelativeTolerance);
        Assert.Equal(ErrorControl.EstimateOnly, simulation.Numerics.ErrorControl);
    }

    [Fact]
    public void Numerics_promise_the_accuracy_with_refinement_and_the_default_floor_unless_the_case_names_one()
    {
        // docs/case-format.md, $.numerics.accuracy and $.numerics.negligibleAmount; 1 ng/dm2 = 1e-12 kg / 1e-2 m2.
        var plain = ReadValid(CaseJson.Minimal).Numerics;
        var named = ReadValid(CaseJson.MinimalWith(("$.numerics", """{ "accuracy": 1e-3, "negligibleAmount": "1 ng/dm2" }"""))).Numerics;

        Assert.Equal((1e-4, ErrorControl.EstimateAndRefine, null), (plain.Accuracy, plain.ErrorControl, plain.NegligibleAmountPerArea));
        Assert.Equal(1e-3, named.Accuracy);
        Assert.Equal(1e-10, named.NegligibleAmountPerArea!.Value, 1e-22);
    }

    [Fact]
    public void The_partition_basis_is_volume_by_default_so_K_is_not_converted_with_densities()
    {
        var json = CaseJson.MinimalWith(
            ("$.referenceMedium", """{ "density": "0.5 g/cm3" }"""),
            ("$.layers[0].partitionCoefficient", "3"),
            ("$.layers[0].density", "\"2 g/cm3\""));

        Assert.Equal(3, ReadValid(json).Stack.Layers[0].PartitionCoefficient);
    }
}
