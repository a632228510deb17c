using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>
/// docs/case-format.md against the reader: every example message of "Validation messages" is what the reader
/// says in that situation, and the worked examples convert to the numbers the document states.
/// </summary>
public sealed class CaseFormatReferenceTests
{
    // Invented: the three-layer film the example messages talk about, valid as it stands.
    private const string Film = """
        {
          "layers": [
            { "name": "outer layer", "thickness": "12 um", "diffusionCoefficient": "5e-13 cm2/s" },
            { "name": "core layer", "thickness": "40 um", "diffusionCoefficient": "2e-9 cm2/s" },
            { "name": "sealing layer", "thickness": "25 um", "diffusionCoefficient": "1e-8 cm2/s" }
          ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "volume": "150 mL", "area": "1 dm2" },
          "duration": "10 d",
          "reportTimes": ["2 h", "1 d", "3 d", "10 d"]
        }
        """;

    // For each documented path, the one mistake that the example line describes.
    private static readonly Dictionary<string, Func<string>> Situations = new(StringComparer.Ordinal)
    {
        ["$.layers[1].thickness"] = () => CaseJson.With(Film, ("$.layers[1].thickness", "\"-5 um\"")),
        ["$.layers[0].diffusionCoefficient"] = () => CaseJson.With(Film, ("$.layers[0].diffusionCoefficient", "\"2 mm\"")),
        ["$.layers[0].thickness"] = () => CaseJson.With(Film, ("$.layers[0].thickness", "\"50\"")),
        ["$.layers[2].initialConcentration"] = () => CaseJson.With(Film, ("$.layers[2].initialConcentration", "\"600 mg/kg\"")),
        ["$.layers[2].name"] = () => CaseJson.With(Film, ("$.layers[2].name", "\"core layer\"")),
        ["$.right.kind"] = () => CaseJson.With(Film, ("$.right.kind", "\"pipe\"")),
        ["$.right"] = () => CaseJson.With(Film, ("$.right.mass", "\"150 g\"")),
        ["$.reportTimes[3]"] = () => CaseJson.With(Film, ("$.reportTimes[3]", "\"12 d\"")),
        ["$.numerics.cells"] = () => CaseJson.With(Film, ("$.numerics.cells", "4")),
        ["$.foodContact.layerDiffusion.core"] = () => CaseJson.With(
            Film,
            ("$.duration", null),
            ("$.foodContact", """{ "stages": [{ "duration": "10 d", "temperature": "25 degC" }], "layerDiffusion": { "core": { "referenceTemperature": "23 degC", "activationEnergy": "80 kJ/mol" } } }""")),
        ["$.duration"] = () => CaseJson.With(Film, ("$.foodContact", """{ "stages": [{ "duration": "10 d", "temperature": "25 degC" }] }""")),
        // A missing comma after the thickness: the parser stops at the next key, line 5, column 7.
        ["$"] = () =>
            "{\n  \"layers\": [\n    {\n      \"thickness\": \"50 um\"\n      \"name\": \"film\"\n    }\n  ]\n}\n",
    };

    public static TheoryData<string> DocumentedMessages => new(FormatReference.ExampleMessages());

    [Fact]
    public void The_validation_section_shows_example_messages_of_the_documented_shape()
    {
        var lines = FormatReference.ExampleMessages();

        Assert.True(lines.Count >= 5, "docs/case-format.md, Validation messages: expected a block of example lines");
        // The shape the section documents: "<file>: <path>: <what is wrong>".
        Assert.All(lines, line => Assert.Matches(@"^film\.json: \$[^ :]*( \(line \d+, column \d+\))?: \S.*$", line));
    }

    [Theory]
    [MemberData(nameof(DocumentedMessages))]
    public void Each_documented_example_message_is_what_the_reader_says(string documentedLine)
    {
        var bare = WithoutPosition(documentedLine);
        var path = bare["film.json: ".Length..bare.IndexOf(": ", "film.json: ".Length, StringComparison.Ordinal)];
        Assert.True(Situations.TryGetValue(path, out var situation), $"No situation in this test for the documented path {path}");

        var result = CaseJson.Read(situation(), "film.json");

        if (path == "$")
        {
            // A syntax error: the situation is the documented file itself, position included.
            Assert.Equal([documentedLine], result.Errors.Select(error => error.Format("film.json")));
            return;
        }

        // The documented lines show where in the documented file; the situation is a shorter file, so compare the rest.
        Assert.Equal([bare], result.Errors.Select(error => (error with { Line = null, Column = null }).Format("film.json")));
    }

    [Fact]
    public void The_film_the_messages_talk_about_is_valid_without_the_mistakes()
    {
        var result = CaseJson.Read(Film, "film.json");

        Assert.True(result.IsValid, result.FormatErrors());
    }

    [Fact]
    public void The_first_example_converts_to_the_numbers_the_reference_states()
    {
        var simulation = ReadExample("Lid film on a fatty food simulant");

        // docs/case-format.md, "What each part says" and "Partition coefficients and conversions".
        var layers = simulation.Stack.Layers;
        Tolerance.Relative(0.552, layers[1].InitialConcentrationKgPerCubicMeter, 1e-12, "600 mg/kg x 0.92 g/cm3 = 0.552 kg/m3");
        Assert.Equal(0, layers[0].InitialConcentrationKgPerCubicMeter);
        Assert.Equal(0, layers[2].InitialConcentrationKgPerCubicMeter);
        var simulant = Assert.IsType<CompartmentFace>(simulation.Right);
        // The document rounds (166.7 mL; K 1.533, 0.511, 0.506), so compare at the digits it states.
        // 150 g / 0.9 g/cm3 in mL: 1 mL = 1e-6 m3 (SI Brochure 9th ed., Tables 7 and 8).
        Assert.Equal(166.7, simulant.VolumeCubicMeters / 1e-6, 1);
        Assert.Equal(1.533, layers[0].PartitionCoefficient, 3); // outer: K 1 x 1.38 / 0.9
        Assert.Equal(0.511, layers[1].PartitionCoefficient, 3); // core: K 0.5 x 0.92 / 0.9
        Assert.Equal(0.506, layers[2].PartitionCoefficient, 3); // sealing: K 0.5 x 0.91 / 0.9
        Tolerance.Relative(1, simulant.PartitionCoefficient, 1e-12, "simulant is the reference medium");
        Assert.IsType<ClosedFace>(simulation.Left);
        Assert.Equal("Lid film on a fatty food simulant", simulation.Title);
        Assert.Equal("food simulant", simulation.ReferenceMedium);
    }

    [Fact]
    public void The_second_example_gets_the_default_report_times_the_reference_lists()
    {
        var simulation = ReadExample("Membrane between donor and receptor solutions");

        // docs/case-format.md: "Report times are left at their defaults (14.4 min, 2.4 h, 6 h, 12 h and 24 h)";
        // 1 min = 60 s, 1 h = 3600 s (SI Brochure 9th ed., Table 8).
        double[] expected = [14.4 * 60, 2.4 * 3600, 6 * 3600, 12 * 3600, 24 * 3600];
        Assert.Equal(expected.Length, simulation.ReportTimesSeconds.Count);
        for (var i = 0; i < expected.Length; i++)
        {
            Tolerance.Relative(expected[i], simulation.ReportTimesSeconds[i], 1e-12, $"report time {i}");
        }

        var donor = Assert.IsType<CompartmentFace>(simulation.Left);
        // 5 mg/mL = 5e-6 kg / 1e-6 m3 = 5 kg/m3; 2 mL = 2e-6 m3; 1.8 cm2 = 1.8e-4 m2 (SI Brochure Tables 7 and 8).
        Tolerance.Relative(5, donor.InitialConcentrationKgPerCubicMeter, 1e-12, "5 mg/mL");
        Tolerance.Relative(2e-6, donor.VolumeCubicMeters, 1e-12, "2 mL");
        Tolerance.Relative(1.8e-4, donor.ContactAreaSquareMeters, 1e-12, "1.8 cm2");
        var receptor = Assert.IsType<BathFace>(simulation.Right);
        Assert.Equal(0, receptor.ConcentrationKgPerCubicMeter);
        Tolerance.Relative(2e-6, receptor.FilmCoefficientMetersPerSecond!.Value, 1e-12, "2e-4 cm/s");
    }

    /// <summary>Reads the ```json example of docs/case-format.md that has the given title.</summary>
    private static SimulationCase ReadExample(string title)
    {
        var block = Assert.Single(FormatReference.Blocks("json"), text => text.Contains($"\"title\": \"{title}\"", StringComparison.Ordinal));
        var result = CaseJson.Read(block, "example.json");
        Assert.True(result.IsValid, result.FormatErrors());
        return result.Case!;
    }

    private static string WithoutPosition(string line) => System.Text.RegularExpressions.Regex.Replace(line, @" \(line \d+, column \d+\)", string.Empty);
}
