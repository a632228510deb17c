using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>
/// Every rule of docs/case-format.md ("Key reference", "General rules"): the minimal valid case is broken in one
/// place and the reader must report exactly one error, at the path of that key, saying what is wrong.
/// </summary>
public sealed class CaseReaderRuleTests
{
    private const string Bath = """{ "kind": "bath" }""";
    private const string SecondLayer = """{ "name": "second", "thickness": "10 um", "diffusionCoefficient": "1e-9 cm2/s" }""";

    /// <summary>(rule, path to edit, new JSON value or null to remove, expected error path, expected text in the message).</summary>
    public static TheoryData<string, string, string?, string, string> SingleMistakes => new()
    {
        // Strictly positive quantities ("> 0").
        { "thickness zero", "$.layers[0].thickness", "\"0 um\"", "$.layers[0].thickness", "must be > 0; got '0 um'" },
        { "thickness negative", "$.layers[0].thickness", "\"-5 um\"", "$.layers[0].thickness", "must be > 0; got '-5 um'" },
        { "diffusion coefficient zero", "$.layers[0].diffusionCoefficient", "\"0 cm2/s\"", "$.layers[0].diffusionCoefficient", "must be > 0; got '0 cm2/s'" },
        { "diffusion coefficient negative", "$.layers[0].diffusionCoefficient", "\"-1e-9 cm2/s\"", "$.layers[0].diffusionCoefficient", "must be > 0; got '-1e-9 cm2/s'" },
        { "layer density zero", "$.layers[0].density", "\"0 g/cm3\"", "$.layers[0].density", "must be > 0; got '0 g/cm3'" },
        { "compartment volume zero", "$.right.volume", "\"0 mL\"", "$.right.volume", "must be > 0; got '0 mL'" },
        { "compartment volume negative", "$.right.volume", "\"-1 L\"", "$.right.volume", "must be > 0; got '-1 L'" },
        { "compartment area zero", "$.right.area", "\"0 cm2\"", "$.right.area", "must be > 0; got '0 cm2'" },
        { "compartment area negative", "$.right.area", "\"-6 dm2\"", "$.right.area", "must be > 0; got '-6 dm2'" },
        { "compartment density zero", "$.right.density", "\"0 kg/m3\"", "$.right.density", "must be > 0; got '0 kg/m3'" },
        { "film coefficient zero", "$.right.filmCoefficient", "\"0 cm/s\"", "$.right.filmCoefficient", "must be > 0; got '0 cm/s'" },
        { "reference density zero", "$.referenceMedium", """{ "density": "0 g/cm3" }""", "$.referenceMedium.density", "must be > 0; got '0 g/cm3'" },
        { "duration zero", "$.duration", "\"0 d\"", "$.duration", "must be > 0; got '0 d'" },
        { "duration negative", "$.duration", "\"-1 h\"", "$.duration", "must be > 0; got '-1 h'" },

        // Partition coefficients: plain numbers > 0.
        { "layer K zero", "$.layers[0].partitionCoefficient", "0", "$.layers[0].partitionCoefficient", "must be > 0; got 0" },
        { "layer K negative", "$.layers[0].partitionCoefficient", "-2", "$.layers[0].partitionCoefficient", "must be > 0; got -2" },
        { "compartment K zero", "$.right.partitionCoefficient", "0", "$.right.partitionCoefficient", "must be > 0; got 0" },
        { "K as a string", "$.layers[0].partitionCoefficient", "\"2\"", "$.layers[0].partitionCoefficient", "expected a finite number; found the string \"2\"" },

        // Concentrations ">= 0".
        { "layer concentration negative", "$.layers[0].initialConcentration", "\"-1 mg/L\"", "$.layers[0].initialConcentration", "must be >= 0; got '-1 mg/L'" },
        { "compartment concentration negative", "$.right.initialConcentration", "\"-0.5 ug/mL\"", "$.right.initialConcentration", "must be >= 0; got '-0.5 ug/mL'" },

        // Solubility of a dispersed layer: a concentration > 0.
        { "solubility zero", "$.layers[0].solubility", "\"0 mg/mL\"", "$.layers[0].solubility", "must be > 0; got '0 mg/mL'" },
        { "solubility negative", "$.layers[0].solubility", "\"-2 mg/mL\"", "$.layers[0].solubility", "must be > 0; got '-2 mg/mL'" },
        { "solubility without unit", "$.layers[0].solubility", "5", "$.layers[0].solubility", "'5' has no unit" },
        { "solubility as a length", "$.layers[0].solubility", "\"5 um\"", "$.layers[0].solubility", "'5 um' is a length" },

        // Units: required, known, of the right dimension.
        { "thickness as a bare JSON number", "$.layers[0].thickness", "50", "$.layers[0].thickness", "'50' has no unit; a unit is required" },
        { "thickness as a string without unit", "$.layers[0].thickness", "\"50\"", "$.layers[0].thickness", "'50' has no unit; a unit is required" },
        { "zero concentration without unit", "$.layers[0].initialConcentration", "0", "$.layers[0].initialConcentration", "'0' has no unit" },
        { "duration without unit", "$.duration", "\"10\"", "$.duration", "'10' has no unit" },
        { "length where a diffusion coefficient belongs", "$.layers[0].diffusionCoefficient", "\"2 mm\"", "$.layers[0].diffusionCoefficient", "'2 mm' is a length; expected a diffusion coefficient (area per time)" },
        { "area where a volume belongs", "$.right.volume", "\"1 dm2\"", "$.right.volume", "'1 dm2' is an area; expected a volume" },
        { "length where a time belongs", "$.duration", "\"10 m\"", "$.duration", "'10 m' is a length; expected a time" },
        { "diffusion coefficient where a thickness belongs", "$.layers[0].thickness", "\"1e-9 cm2/s\"", "$.layers[0].thickness", "is a diffusion coefficient (area per time); expected a length" },
        { "unknown unit", "$.layers[0].thickness", "\"50 furlong\"", "$.layers[0].thickness", "unknown unit 'furlong'" },
        { "upper-case unit", "$.right.volume", "\"1 ML\"", "$.right.volume", "unknown unit 'ML'" },
        { "bare percent", "$.layers[0].initialConcentration", "\"2 %\"", "$.layers[0].initialConcentration", "unknown unit '%'" },
        { "decimal comma", "$.layers[0].thickness", "\"1,5 um\"", "$.layers[0].thickness", "',' is not allowed in numbers" },

        // Mass fractions need the density of their medium.
        { "layer mass fraction without density", "$.layers[0].initialConcentration", "\"1000 mg/kg\"", "$.layers[0].initialConcentration", "a mass fraction needs $.layers[0].density" },
        { "compartment mass fraction without density", "$.right.initialConcentration", "\"5 ppm\"", "$.right.initialConcentration", "a mass fraction needs $.right.density" },
        { "bath mass fraction without density", "$.right", """{ "kind": "bath", "concentration": "2 % w/w" }""", "$.right.concentration", "a mass fraction needs $.right.density" },

        // Compartment volume: exactly one of volume and mass; mass needs density.
        { "volume and mass both", "$.right.mass", "\"1 kg\"", "$.right", "give either volume or mass, not both" },
        { "neither volume nor mass", "$.right.volume", null, "$.right", "give volume, or mass with density" },

        // Keys.
        { "unknown top-level key close to a known one", "$.Duration", "\"1 d\"", "$.Duration", "unknown key \"Duration\"; did you mean \"duration\"?" },
        { "unknown layer key close to a known one", "$.layers[0].thicknes", "\"50 um\"", "$.layers[0].thicknes", "unknown key \"thicknes\"; did you mean \"thickness\"?" },
        { "unknown face key close to a known one", "$.right.volumen", "\"1 L\"", "$.right.volumen", "unknown key \"volumen\"; did you mean \"volume\"?" },
        { "unknown numerics key close to a known one", "$.numerics.cell", "100", "$.numerics.cell", "unknown key \"cell\"; did you mean \"cells\"?" },
        { "unknown key far from any known one", "$.temperature", "\"40 degC\"", "$.temperature", "unknown key \"temperature\". Known keys here: " },
        { "any key but kind on a closed face", "$.left.name", "\"air\"", "$.left.name", "unknown key \"name\"" },
        { "missing duration", "$.duration", null, "$.duration", "is required" },
        { "missing layers", "$.layers", null, "$.layers", "is required" },
        { "missing left face", "$.left", null, "$.left", "is required" },
        { "missing thickness", "$.layers[0].thickness", null, "$.layers[0].thickness", "is required" },
        { "missing diffusion coefficient", "$.layers[0].diffusionCoefficient", null, "$.layers[0].diffusionCoefficient", "is required" },
        { "missing layer name", "$.layers[0].name", null, "$.layers[0].name", "is required" },
        { "missing compartment area", "$.right.area", null, "$.right.area", "is required" },
        { "missing face kind", "$.left.kind", null, "$.left.kind", "is required: one of closed, bath, compartment" },
        { "face that is not an object", "$.left", "\"closed\"", "$.left", "expected an object with \"kind\"" },

        // Face kinds, layers, names.
        { "unknown face kind", "$.right.kind", "\"pipe\"", "$.right.kind", "must be one of closed, bath, compartment; got 'pipe'" },
        { "face kind in capitals", "$.left.kind", "\"Closed\"", "$.left.kind", "must be one of closed, bath, compartment; got 'Closed'" },
        { "empty layers array", "$.layers", "[]", "$.layers", "expected a non-empty array of layers" },
        { "layers not an array", "$.layers", """{ "name": "film" }""", "$.layers", "expected a non-empty array of layers" },
        { "empty layer name", "$.layers[0].name", "\"   \"", "$.layers[0].name", "must not be empty" },
        { "same layer name in other letter case", "$.layers[1]", SecondLayer.Replace("\"second\"", "\"FILM\"", StringComparison.Ordinal), "$.layers[1].name", "'FILM' is already used by $.layers[0]" },
        { "same layer name with surrounding spaces", "$.layers[1]", SecondLayer.Replace("\"second\"", "\" film \"", StringComparison.Ordinal), "$.layers[1].name", "' film ' is already used by $.layers[0]" },

        // Times.
        { "report time beyond the duration", "$.reportTimes", """["1 d", "12 d"]""", "$.reportTimes[1]", "must be <= duration (10 d); got '12 d'" },
        { "report times descending", "$.reportTimes", """["2 d", "1 d"]""", "$.reportTimes[1]", "must be later than the previous time; got '1 d'" },
        { "report times equal in value", "$.reportTimes", """["1 d", "24 h"]""", "$.reportTimes[1]", "must be later than the previous time; got '24 h'" },
        { "report time zero", "$.reportTimes", """["0 h", "1 d"]""", "$.reportTimes[0]", "must be > 0; got '0 h'" },
        { "report time that is not a time", "$.reportTimes", """["1 d", "2 um"]""", "$.reportTimes[1]", "'2 um' is a length; expected a time" },
        { "empty report times", "$.reportTimes", "[]", "$.reportTimes", "must hold at least one time" },
        { "report times not an array", "$.reportTimes", "\"1 d\"", "$.reportTimes", "expected an array of times" },
        { "extra output time beyond the duration", "$.extraOutputTimes", """["6 h", "11 d"]""", "$.extraOutputTimes[1]", "must be <= duration (10 d); got '11 d'" },
        { "extra output time negative", "$.extraOutputTimes", """["-6 h"]""", "$.extraOutputTimes[0]", "must be > 0; got '-6 h'" },

        // Depths (the minimal case's stack is 50 um thick).
        { "depth beyond the stack", "$.depths", """["10 um", "60 um"]""", "$.depths[1]", "must be at most the thickness of the stack (50 um, its right face); got '60 um'" },
        { "depth negative", "$.depths", """["-1 um"]""", "$.depths[0]", "must be >= 0 (a depth from the left face of the stack); got '-1 um'" },
        { "depth that is not a length", "$.depths", """["1 d"]""", "$.depths[0]", "'1 d' is a time; expected a length" },
        { "empty depths", "$.depths", "[]", "$.depths", "must hold at least one depth" },
        { "depths not an array", "$.depths", "\"10 um\"", "$.depths", "expected an array of depths" },

        // Numerics ranges: cells 8 to 200000, minimumCellsPerLayer 4 to 10000, relativeTolerance 1e-10 to 1e-2, accuracy 1e-6 to 1e-2.
        { "cells below range", "$.numerics.cells", "7", "$.numerics.cells", "must be from 8 to 200000; got 7" },
        { "cells above range", "$.numerics.cells", "200001", "$.numerics.cells", "must be from 8 to 200000; got 200001" },
        { "cells not whole", "$.numerics.cells", "240.5", "$.numerics.cells", "expected a whole number; found the number 240.5" },
        { "minimum cells below range", "$.numerics.minimumCellsPerLayer", "3", "$.numerics.minimumCellsPerLayer", "must be from 4 to 10000; got 3" },
        { "minimum cells above range", "$.numerics.minimumCellsPerLayer", "10001", "$.numerics.minimumCellsPerLayer", "must be from 4 to 10000; got 10001" },
        { "tolerance below range", "$.numerics.relativeTolerance", "1e-11", "$.numerics.relativeTolerance", "must be from 1e-10 to 1e-2; got " },
        { "tolerance above range", "$.numerics.relativeTolerance", "0.1", "$.numerics.relativeTolerance", "must be from 1e-10 to 1e-2; got 0.1" },
        { "accuracy below range", "$.numerics.accuracy", "1e-7", "$.numerics.accuracy", "must be from 1e-6 to 1e-2 (a relative accuracy such as 1e-4); got 1E-07" },
        { "accuracy above range", "$.numerics.accuracy", "0.05", "$.numerics.accuracy", "must be from 1e-6 to 1e-2 (a relative accuracy such as 1e-4); got 0.05" },
        { "negligible amount not positive", "$.numerics.negligibleAmount", "\"0 ng/dm2\"", "$.numerics.negligibleAmount", "must be a positive mass per area such as \"1 ng/dm2\"; got 0 ng/dm2" },
        { "negligible amount not a mass per area", "$.numerics.negligibleAmount", "\"1 ng\"", "$.numerics.negligibleAmount", "mass per area" },

        // Partition basis.
        { "unknown partition basis", "$.partitionBasis", "\"weight\"", "$.partitionBasis", "expected \"volume\" or \"mass\"; got \"weight\"" },

        // Whole document.
        { "root not an object", "$", "[]", "$", "expected an object" },
    };

    [Theory]
    [MemberData(nameof(SingleMistakes))]
    public void One_mistake_gives_one_error_at_its_path(string rule, string path, string? value, string expectedPath, string expectedText)
    {
        var json = path == "$" ? value! : CaseJson.MinimalWith((path, value));

        var result = CaseJson.Read(json);

        Assert.False(result.IsValid, $"{rule}: the reader accepted the case");
        Assert.Null(result.Case);
        var error = Assert.Single(result.Errors);
        Assert.Equal(expectedPath, error.JsonPath);
        Assert.Contains(expectedText, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_compartment_mass_without_density_asks_for_the_density()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(("$.right.volume", null), ("$.right.mass", "\"150 g\"")));

        var error = Assert.Single(result.Errors);
        Assert.Equal("$.right.density", error.JsonPath);
        Assert.Contains("is required with mass", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_negative_compartment_mass_is_refused()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(
            ("$.right.volume", null), ("$.right.mass", "\"-150 g\""), ("$.right.density", "\"1 g/cm3\"")));

        var error = Assert.Single(result.Errors);
        Assert.Equal("$.right.mass", error.JsonPath);
        Assert.Equal("must be > 0; got '-150 g'", error.Message);
    }

    [Fact]
    public void A_negative_bath_concentration_is_refused()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(("$.right", Bath), ("$.right.concentration", "\"-2 mg/L\"")));

        var error = Assert.Single(result.Errors);
        Assert.Equal("$.right.concentration", error.JsonPath);
        Assert.Equal("must be >= 0; got '-2 mg/L'", error.Message);
    }

    [Fact]
    public void A_zero_bath_partition_coefficient_is_refused()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(("$.right", Bath), ("$.right.partitionCoefficient", "0")));

        Assert.Equal(["$.right.partitionCoefficient: must be > 0; got 0"], CaseJson.ErrorLines(result));
    }

    [Fact]
    public void The_mass_basis_without_a_reference_density_is_refused()
    {
        // Every medium has a density, so the only thing missing is the reference medium's.
        var json = CaseJson.MinimalWith(
            ("$.partitionBasis", "\"mass\""),
            ("$.layers[0].density", "\"0.92 g/cm3\""),
            ("$.right.density", "\"1 g/cm3\""));

        var error = Assert.Single(CaseJson.Read(json).Errors);

        Assert.Equal("$.referenceMedium.density", error.JsonPath);
        Assert.Contains("is required because partitionBasis is \"mass\"", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_key_given_twice_in_one_object_is_refused()
    {
        // RFC 8259, section 4: the names within an object SHOULD be unique; a second value would silently win.
        var json = CaseJson.MinimalWith(("$.title", "\"first\"")).Replace("\"title\": \"first\"", "\"title\": \"first\", \"title\": \"second\"", StringComparison.Ordinal);

        var error = Assert.Single(CaseJson.Read(json).Errors);

        Assert.Equal("$.title", error.JsonPath);
        Assert.Contains("more than once", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_mass_basis_needs_the_density_of_every_layer_and_face_medium_even_for_a_default_K()
    {
        // docs/case-format.md, partitionBasis: a K left at its default of 1 is a mass-basis value too.
        var json = CaseJson.MinimalWith(
            ("$.partitionBasis", "\"mass\""),
            ("$.referenceMedium", """{ "density": "0.9 g/cm3" }"""));

        var result = CaseJson.Read(json);

        Assert.Equal(["$.layers[0].density", "$.right.density"], result.Errors.Select(error => error.JsonPath));
        Assert.All(result.Errors, error => Assert.Contains("partitionBasis is \"mass\"", error.Message, StringComparison.Ordinal));
    }

    [Fact]
    public void A_closed_face_needs_no_density_on_the_mass_basis()
    {
        var json = CaseJson.MinimalWith(
            ("$.partitionBasis", "\"mass\""),
            ("$.referenceMedium", """{ "density": "0.9 g/cm3" }"""),
            ("$.layers[0].density", "\"0.92 g/cm3\""),
            ("$.right", """{ "kind": "closed" }"""));

        var result = CaseJson.Read(json);

        Assert.True(result.IsValid, result.FormatErrors());
    }

    [Fact]
    public void Three_layers_with_the_same_name_report_both_repeats_against_the_first()
    {
        var json = CaseJson.MinimalWith(
            ("$.layers[1]", SecondLayer.Replace("\"second\"", "\"Film\"", StringComparison.Ordinal)),
            ("$.layers[2]", SecondLayer.Replace("\"second\"", "\"film\"", StringComparison.Ordinal)));

        var result = CaseJson.Read(json);

        Assert.Equal(
            ["$.layers[1].name: 'Film' is already used by $.layers[0]", "$.layers[2].name: 'film' is already used by $.layers[0]"],
            CaseJson.ErrorLines(result));
    }

    [Fact]
    public void Distinct_layer_names_are_accepted()
    {
        var result = CaseJson.Read(CaseJson.MinimalWith(("$.layers[1]", SecondLayer)));

        Assert.True(result.IsValid, result.FormatErrors());
        Assert.Equal(["film", "second"], result.Case!.Stack.Layers.Select(layer => layer.Name));
    }

    [Fact]
    public void The_suggestion_lists_the_keys_known_at_that_place()
    {
        var error = Assert.Single(CaseJson.Read(CaseJson.MinimalWith(("$.layers[0].difusionCoefficient", "\"1 cm2/s\""))).Errors);

        Assert.Contains("did you mean \"diffusionCoefficient\"?", error.Message, StringComparison.Ordinal);
        foreach (var key in new[] { "name", "thickness", "diffusionCoefficient", "partitionCoefficient", "initialConcentration", "density" })
        {
            Assert.Contains(key, error.Message, StringComparison.Ordinal);
        }
    }
}
