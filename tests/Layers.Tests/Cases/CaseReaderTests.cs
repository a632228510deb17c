using Layers.Core.Cases;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

// Not "Layers.Tests.Cases": that namespace would hide the TestSupport.Cases helper from the other test folders.
namespace Layers.Tests.CaseReading;

/// <summary>
/// A valid case maps to the SI domain model. Every expected value is written out from the definitions of the
/// units, independently of the unit table: SI Brochure = BIPM, The International System of Units, 9th ed., 2019
/// (Table 7: prefixes; Table 8: minute, hour, day and litre).
/// </summary>
public sealed class CaseReaderTests
{
    // Invented example data.
    private const string TwoLayerFilm = """
        {
          "title": "Two-layer film on a juice",
          "referenceMedium": { "name": "water" },
          "layers": [
            { "name": "barrier", "thickness": "50 um", "diffusionCoefficient": "1e-9 cm2/s", "partitionCoefficient": 0.2 },
            {
              "name": "sealant", "thickness": "0.03 mm", "diffusionCoefficient": "3.6e-6 cm2/h", "partitionCoefficient": 4,
              "initialConcentration": "1000 mg/kg", "density": "0.92 g/cm3"
            }
          ],
          "left": { "kind": "bath", "name": "air side", "concentration": "2 mg/L", "partitionCoefficient": 0.5, "filmCoefficient": "2e-4 cm/s" },
          "right": {
            "kind": "compartment", "name": "juice", "volume": "1 L", "area": "6 dm2",
            "partitionCoefficient": 1.5, "initialConcentration": "0.5 ug/mL"
          },
          "duration": "10 d",
          "reportTimes": ["2 h", "1 d", "1 wk", "10 d"],
          "extraOutputTimes": ["6 h", "30 min"]
        }
        """;

    private static SimulationCase ReadValid(string json, string fileName = "case.json")
    {
        var result = CaseJson.Read(json, fileName);
        Assert.True(result.IsValid, result.FormatErrors());
        Assert.Empty(result.Errors);
        return result.Case!;
    }

    [Fact]
    public void Layer_thickness_and_diffusion_coefficient_are_converted_to_metres_and_square_metres_per_second()
    {
        var layers = ReadValid(TwoLayerFilm).Stack.Layers;

        Assert.Equal(["barrier", "sealant"], layers.Select(layer => layer.Name));
        // SI Brochure Table 7: micro = 1e-6, so 50 um = 5e-5 m.
        Tolerance.Relative(5e-5, layers[0].ThicknessMeters, 1e-12, "50 um");
        // SI Brochure Table 7: milli = 1e-3, so 0.03 mm = 3e-5 m.
        Tolerance.Relative(3e-5, layers[1].ThicknessMeters, 1e-12, "0.03 mm");
        // SI Brochure Table 7: centi = 1e-2, so 1 cm2 = 1e-4 m2 and 1e-9 cm2/s = 1e-13 m2/s.
        Tolerance.Relative(1e-13, layers[0].DiffusivitySquareMetersPerSecond, 1e-12, "1e-9 cm2/s");
        // SI Brochure Tables 7 and 8: 1 h = 3600 s, so 3.6e-6 cm2/h = 3.6e-10 m2 / 3600 s = 1e-13 m2/s.
        Tolerance.Relative(1e-13, layers[1].DiffusivitySquareMetersPerSecond, 1e-12, "3.6e-6 cm2/h");
    }

    [Fact]
    public void Volume_basis_partition_coefficients_are_kept_as_written_even_when_densities_are_given()
    {
        var simulation = ReadValid(TwoLayerFilm);

        // docs/case-format.md: on the volume basis (the default) K is c_medium / c_reference, the solver's own basis.
        Assert.Equal(0.2, simulation.Stack.Layers[0].PartitionCoefficient);
        Assert.Equal(4, simulation.Stack.Layers[1].PartitionCoefficient);
        Assert.Equal(0.5, Assert.IsType<BathFace>(simulation.Left).PartitionCoefficient);
        Assert.Equal(1.5, Assert.IsType<CompartmentFace>(simulation.Right).PartitionCoefficient);
    }

    [Fact]
    public void A_mass_fraction_is_multiplied_by_the_density_of_its_medium()
    {
        var sealant = ReadValid(TwoLayerFilm).Stack.Layers[1];

        // SI Brochure Table 7: 0.92 g/cm3 = 0.92e-3 kg / 1e-6 m3 = 920 kg/m3.
        Tolerance.Relative(920, sealant.DensityKgPerCubicMeter!.Value, 1e-12, "0.92 g/cm3");
        // 1000 mg/kg = 1e-3 kg/kg; c = w * rho = 1e-3 * 920 kg/m3 = 0.92 kg/m3 (mass fraction times density,
        // docs/case-format.md "Partition coefficients and conversions").
        Tolerance.Relative(0.92, sealant.InitialConcentrationKgPerCubicMeter, 1e-12, "1000 mg/kg at 0.92 g/cm3");
    }

    [Fact]
    public void Faces_are_converted_to_SI()
    {
        var simulation = ReadValid(TwoLayerFilm);

        var bath = Assert.IsType<BathFace>(simulation.Left);
        Assert.Equal("air side", bath.Name);
        // SI Brochure Tables 7 and 8: 2 mg/L = 2e-6 kg / 1e-3 m3 = 2e-3 kg/m3.
        Tolerance.Relative(2e-3, bath.ConcentrationKgPerCubicMeter, 1e-12, "2 mg/L");
        // SI Brochure Table 7: 2e-4 cm/s = 2e-6 m/s.
        Tolerance.Relative(2e-6, bath.FilmCoefficientMetersPerSecond!.Value, 1e-12, "2e-4 cm/s");

        var juice = Assert.IsType<CompartmentFace>(simulation.Right);
        Assert.Equal("juice", juice.Name);
        // SI Brochure Table 8: 1 L = 1 dm3 = 1e-3 m3.
        Tolerance.Relative(1e-3, juice.VolumeCubicMeters, 1e-12, "1 L");
        // SI Brochure Table 7: deci = 1e-1, so 6 dm2 = 6 * 1e-2 m2 = 0.06 m2.
        Tolerance.Relative(0.06, juice.ContactAreaSquareMeters, 1e-12, "6 dm2");
        // SI Brochure Tables 7 and 8: 0.5 ug/mL = 0.5e-9 kg / 1e-6 m3 = 5e-4 kg/m3.
        Tolerance.Relative(5e-4, juice.InitialConcentrationKgPerCubicMeter, 1e-12, "0.5 ug/mL");
        Assert.Null(juice.FilmCoefficientMetersPerSecond);
    }

    [Fact]
    public void Duration_and_times_are_converted_to_seconds_and_extra_times_are_sorted()
    {
        var simulation = ReadValid(TwoLayerFilm);

        // SI Brochure Table 8: 1 d = 86400 s, so 10 d = 864000 s.
        Tolerance.Relative(864000, simulation.DurationSeconds, 1e-12, "10 d");
        // SI Brochure Table 8: 1 h = 3600 s, 1 d = 86400 s; 1 wk = 7 d (common practice, no source).
        double[] reports = [2 * 3600, 86400, 7 * 86400, 864000];
        Assert.Equal(reports.Length, simulation.ReportTimesSeconds.Count);
        for (var i = 0; i < reports.Length; i++)
        {
            Tolerance.Relative(reports[i], simulation.ReportTimesSeconds[i], 1e-12, $"report time {i}");
        }

        // SI Brochure Table 8: 1 min = 60 s. docs/case-format.md: extra times may be given in any order.
        double[] extra = [30 * 60, 6 * 3600];
        Assert.Equal(extra.Length, simulation.ExtraOutputTimesSeconds.Count);
        for (var i = 0; i < extra.Length; i++)
        {
            Tolerance.Relative(extra[i], simulation.ExtraOutputTimesSeconds[i], 1e-12, $"extra time {i}");
        }
    }

    [Fact]
    public void Title_and_reference_medium_name_are_taken_from_the_file()
    {
        var simulation = ReadValid(TwoLayerFilm);

        Assert.Equal("Two-layer film on a juice", simulation.Title);
        Assert.Equal("water", simulation.ReferenceMedium);
    }

    [Fact]
    public void Mass_basis_partition_coefficients_are_converted_with_the_densities()
    {
        // K_mass = w_medium / w_reference at equilibrium, and c = w * rho in each medium, so
        // K_volume = c_medium / c_reference = (w_medium rho_medium) / (w_reference rho_reference)
        //          = K_mass * rho_medium / rho_reference.
        // A K left at its default of 1 is a mass-basis value too (docs/case-format.md, partitionBasis).
        var json = """
            {
              "partitionBasis": "mass",
              "referenceMedium": { "name": "simulant", "density": "0.9 g/cm3" },
              "layers": [
                { "name": "core", "thickness": "40 um", "diffusionCoefficient": "2e-9 cm2/s", "partitionCoefficient": 0.5, "density": "0.92 g/cm3" },
                { "name": "skin", "thickness": "12 um", "diffusionCoefficient": "5e-13 cm2/s", "density": "1380 kg/m3" }
              ],
              "left": { "kind": "bath", "partitionCoefficient": 2, "density": "1 g/mL" },
              "right": { "kind": "compartment", "mass": "150 g", "density": "0.9 g/cm3", "area": "1 dm2", "partitionCoefficient": 3 },
              "duration": "10 d"
            }
            """;

        var simulation = ReadValid(json);

        // Densities in kg/m3 (SI Brochure Tables 7 and 8): 0.9 g/cm3 = 900, 0.92 g/cm3 = 920, 1 g/mL = 1000.
        Tolerance.Relative(0.5 * 920 / 900, simulation.Stack.Layers[0].PartitionCoefficient, 1e-12, "core");
        Tolerance.Relative(1 * 1380.0 / 900, simulation.Stack.Layers[1].PartitionCoefficient, 1e-12, "skin, default K");
        Tolerance.Relative(2 * 1000.0 / 900, Assert.IsType<BathFace>(simulation.Left).PartitionCoefficient, 1e-12, "bath");
        Tolerance.Relative(3 * 900.0 / 900, Assert.IsType<CompartmentFace>(simulation.Right).PartitionCoefficient, 1e-12, "compartment");
    }

    [Fact]
    public void A_compartment_given_by_mass_and_density_gets_the_volume_mass_over_density()
    {
        var json = CaseJson.MinimalWith(
            ("$.right.volume", null),
            ("$.right.mass", "\"150 g\""),
            ("$.right.density", "\"0.9 g/cm3\""),
            ("$.right.initialConcentration", "\"5 ppm\""));

        var right = Assert.IsType<CompartmentFace>(ReadValid(json).Right);

        // V = m / rho = 0.150 kg / 900 kg/m3 = 1.6667e-4 m3 (166.7 mL, as docs/case-format.md states for this pair).
        Tolerance.Relative(0.150 / 900, right.VolumeCubicMeters, 1e-12, "150 g at 0.9 g/cm3");
        Tolerance.Relative(900, right.DensityKgPerCubicMeter!.Value, 1e-12, "density kept");
        // ppm = mg/kg (docs/case-format.md, Units); 5e-6 kg/kg * 900 kg/m3 = 4.5e-3 kg/m3.
        Tolerance.Relative(4.5e-3, right.InitialConcentrationKgPerCubicMeter, 1e-12, "5 ppm at 0.9 g/cm3");
    }

    [Theory]
    // Mass fractions of a bath with a density of 1 g/cm3 = 1000 kg/m3 (SI Brochure Tables 7 and 8).
    [InlineData("\"5 ppm\"", 5e-6 * 1000)] // ppm = mg/kg (docs/case-format.md, Units)
    [InlineData("\"2 % w/w\"", 0.02 * 1000)] // percent by mass: 2 % = 0.02 kg/kg
    [InlineData("\"30 ug/g\"", 30e-9 / 1e-3 * 1000)] // SI Brochure Table 7: micro, milli
    [InlineData("\"4 ppb\"", 4e-9 * 1000)] // ppb = ug/kg (docs/case-format.md, Units)
    public void A_bath_concentration_given_as_a_mass_fraction_uses_the_bath_density(string concentration, double expected)
    {
        var json = CaseJson.MinimalWith(
            ("$.right", """{ "kind": "bath", "density": "1 g/cm3" }"""),
            ("$.right.concentration", concentration));

        var bath = Assert.IsType<BathFace>(ReadValid(json).Right);

        Tolerance.Relative(expected, bath.ConcentrationKgPerCubicMeter, 1e-12, concentration);
    }

    [Theory]
    // docs/case-format.md, General rules: the space between number and unit is optional, spaces around are ignored,
    // and the alternative spellings of Units read as the canonical symbol.
    [InlineData("50um")]
    [InlineData("  50 um  ")]
    [InlineData("50 \u00B5m")]
    [InlineData("5e1 um")]
    [InlineData("0.05 mm")]
    public void Spellings_of_the_same_thickness_read_alike(string thickness)
    {
        var layer = ReadValid(CaseJson.MinimalWith(("$.layers[0].thickness", $"\"{thickness}\""))).Stack.Layers[0];

        // SI Brochure Table 7: 50 um = 0.05 mm = 5e-5 m.
        Tolerance.Relative(5e-5, layer.ThicknessMeters, 1e-12, thickness);
    }

    [Fact]
    public void A_film_gauge_in_mil_is_a_thousandth_of_an_inch()
    {
        var layer = ReadValid(CaseJson.MinimalWith(("$.layers[0].thickness", "\"2 mil\""))).Stack.Layers[0];

        // 1 mil = 0.001 in and 1 in = 25.4 mm exactly (international inch of 1959), so 2 mil = 50.8e-6 m.
        Tolerance.Relative(50.8e-6, layer.ThicknessMeters, 1e-12, "2 mil");
    }

    [Fact]
    public void Numerics_are_read_into_the_grid_and_solver_settings()
    {
        var json = CaseJson.MinimalWith(("$.numerics", """{ "cells": 480, "minimumCellsPerLayer": 16, "relativeTolerance": 1e-7 }"""));

        var simulation = ReadValid(json);

        var mesh = Assert.IsType<CellCountMesh>(simulation.Numerics.Grid);
        Assert.Equal(480, mesh.TotalCells);
        Assert.Equal(16, mesh.MinimumCellsPerLayer);
        Assert.Equal(1e-7, simulation.Numerics.Solver.RelativeTolerance);
    }

    [Fact]
    public void An_accuracy_target_picks_the_mesh_and_tolerance_and_keys_beside_it_override_them()
    {
        // docs/case-format.md, $.numerics.accuracy: cells by diffusion length, 0.05 of it at 1e-4 (scaling with the
        // square root of the target), tolerance equal to the target; a cell count beside it asks for the shared count,
        // a minimum per layer applies to the diffusion-length mesh.
        var chosen = ReadValid(CaseJson.MinimalWith(("$.numerics", """{ "accuracy": 1e-4 }""")));
        var coarser = ReadValid(CaseJson.MinimalWith(("$.numerics", """{ "accuracy": 1e-2 }""")));
        var counted = ReadValid(CaseJson.MinimalWith(("$.numerics", """{ "accuracy": 1e-4, "cells": 50 }""")));
        var atLeast = ReadValid(CaseJson.MinimalWith(("$.numerics", """{ "accuracy": 1e-4, "minimumCellsPerLayer": 9 }""")));

        Assert.Equal(0.05, Assert.IsType<DiffusionLengthMesh>(chosen.Numerics.Grid).WidthPerDiffusionLength, 15);
        Assert.Equal(0.5, Assert.IsType<DiffusionLengthMesh>(coarser.Numerics.Grid).WidthPerDiffusionLength, 15);
        Assert.Equal(1e-4, chosen.Numerics.Solver.RelativeTolerance, 15);
        Assert.Equal(50, Assert.IsType<CellCountMesh>(counted.Numerics.Grid).TotalCells);
        Assert.Equal(1e-4, counted.Numerics.Solver.RelativeTolerance, 15);
        Assert.Equal(9, Assert.IsType<DiffusionLengthMesh>(atLeast.Numerics.Grid).MinimumCellsPerLayer);
    }

    [Theory]
    // docs/case-format.md: the documented ranges are inclusive at both ends.
    [InlineData("cells", "8")]
    [InlineData("cells", "200000")]
    [InlineData("minimumCellsPerLayer", "4")]
    [InlineData("minimumCellsPerLayer", "10000")]
    [InlineData("relativeTolerance", "1e-10")]
    [InlineData("relativeTolerance", "1e-2")]
    [InlineData("accuracy", "1e-6")]
    [InlineData("accuracy", "1e-2")]
    public void Numerics_at_the_ends_of_their_documented_ranges_are_accepted(string key, string value)
    {
        ReadValid(CaseJson.MinimalWith(($"$.numerics.{key}", value)));
    }

    [Fact]
    public void A_report_time_equal_to_the_duration_in_another_unit_is_accepted()
    {
        // docs/case-format.md: each report time is <= duration; 240 h = 10 d (SI Brochure Table 8).
        var simulation = ReadValid(CaseJson.MinimalWith(("$.reportTimes", """["1 d", "240 h"]""")));

        Tolerance.Relative(864000, simulation.ReportTimesSeconds[^1], 1e-12, "240 h");
    }

    [Fact]
    public void The_schema_key_and_the_description_are_accepted_and_ignored()
    {
        var json = CaseJson.MinimalWith(
            ("$.$schema", "\"../docs/case.schema.json\""),
            ("$.description", "\"Invented numbers.\""));

        ReadValid(json);
    }

    [Fact]
    public void Reading_a_file_from_disk_gives_the_same_case_as_reading_its_text()
    {
        using var folder = new TempFolder();
        var path = folder.WriteFile("film-a.json", TwoLayerFilm);

        var fromFile = CaseDocument.ReadFile(path);
        var fromText = CaseDocument.ReadText(TwoLayerFilm, path);

        Assert.True(fromFile.IsValid, fromFile.FormatErrors());
        Assert.Equal(path, fromFile.FileName);
        Assert.Equal(fromText.Case!.Stack.Layers, fromFile.Case!.Stack.Layers);
        Assert.Equal(fromText.Case.Left, fromFile.Case.Left);
        Assert.Equal(fromText.Case.Right, fromFile.Case.Right);
    }
}
