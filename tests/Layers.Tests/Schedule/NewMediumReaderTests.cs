using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Schedule;

/// <summary>
/// Reading renewals that give the fresh portion other properties (docs/case-format.md, "Schedule", "Renewal"):
/// what is not given stays as the medium before, later plain renewals bring the new portion again, and each mistake is
/// reported at its JSON path.
/// </summary>
public sealed class NewMediumReaderTests
{
    [Fact]
    public void A_renewal_with_properties_brings_a_new_portion_that_later_renewals_bring_again()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(
            ("$.duration", null),
            ("$.right", """{ "kind": "compartment", "name": "juice", "volume": "1 L", "area": "6 dm2", "density": "1.05 g/cm3" }"""),
            ("$.schedule", """
                [
                  { "name": "first", "duration": "2 d" },
                  { "name": "second", "duration": "2 d", "renew": [ { "face": "right", "mass": "2.1 kg", "partitionCoefficient": 3, "filmCoefficient": "1e-4 cm/s" } ] },
                  { "name": "third", "duration": "2 d", "renew": ["right"] },
                  { "name": "fourth", "duration": "2 d", "renew": [ { "face": "right", "initialConcentration": "1 mg/L" } ] }
                ]
                """)));

        Assert.Empty(CaseJson.ErrorLines(read));
        var simulation = read.Case!;
        var schedule = simulation.Schedule!;
        var media = schedule.MediaByPeriod(Side.Right, simulation.Right).Cast<CompartmentFace>().ToArray();
        Assert.Equal(1e-3, media[0].VolumeCubicMeters, 12);
        Assert.Equal(2.1 / 1050, media[1].VolumeCubicMeters, 12);
        Assert.Equal(3, media[1].PartitionCoefficient);
        Assert.Equal(1e-6, media[1].FilmCoefficientMetersPerSecond!.Value, 15);
        Assert.Same(media[1], media[2]);
        Assert.Equal(media[1] with { InitialConcentrationKgPerCubicMeter = 1e-3 }, media[3]);

        // Name, area and density stay the case's; a plain renewal of the same portion changes nothing.
        Assert.All(media, medium => Assert.Equal((media[0].Name, media[0].ContactAreaSquareMeters, media[0].DensityKgPerCubicMeter), (medium.Name, medium.ContactAreaSquareMeters, medium.DensityKgPerCubicMeter)));
        Assert.Equal([1, 0, 1], schedule.Periods.Skip(1).Select(period => period.NewMedia.Count));
        Assert.Same(media[3], simulation.FaceAtEnd(Side.Right));
        Assert.Equal(3, simulation.MediaOn(Side.Right).Count);
    }

    [Fact]
    public void A_bath_may_be_renewed_at_another_level()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(
            ("$.left", """{ "kind": "bath", "name": "donor", "concentration": "1 mg/mL" }"""),
            ("$.schedule", """[ { "duration": "5 d" }, { "duration": "5 d", "renew": [ { "face": "left", "concentration": "2 mg/mL" } ] } ]""")));

        Assert.Empty(CaseJson.ErrorLines(read));
        var bath = (BathFace)read.Case!.Schedule!.Periods[1].NewMedia[Side.Left];
        Assert.Equal(2, bath.ConcentrationKgPerCubicMeter, 12);
        Assert.Equal("donor", bath.Name);
    }

    [Theory]
    [InlineData("""{ "face": "right", "concentration": "1 mg/L" }""", "$.schedule[1].renew[0].concentration: is for a bath; the right face holds a compartment, whose fresh portion may give volume, mass, partitionCoefficient, initialConcentration, filmCoefficient")]
    [InlineData("""{ "face": "right", "area": "1 dm2" }""", "$.schedule[1].renew[0].area")]
    [InlineData("""{ "volume": "1 L" }""", "$.schedule[1].renew[0].face: is required: \"left\" or \"right\", the face whose medium is renewed")]
    [InlineData("""{ "face": "middle" }""", "$.schedule[1].renew[0].face: expected \"left\" or \"right\"; found the string \"middle\"")]
    [InlineData("""{ "face": "right", "mass": "1 kg" }""", "$.schedule[1].renew[0].mass: needs the density of the right compartment to turn the mass into a volume; give volume, or give the compartment's density in the case")]
    [InlineData("""{ "face": "right", "volume": "-1 L" }""", "$.schedule[1].renew[0].volume: must be > 0")]
    [InlineData("""{ "face": "left", "volume": "1 L" }""", "$.schedule[1].renew[0]: cannot renew the left face: it is closed")]
    public void A_mistake_in_a_renewal_is_reported_at_its_path(string renewal, string expected)
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(
            ("$.schedule", $$"""[ { "duration": "5 d" }, { "duration": "5 d", "renew": [ {{renewal}} ] } ]""")));

        Assert.Null(read.Case);
        Assert.Contains(CaseJson.ErrorLines(read), line => line.StartsWith(expected, StringComparison.Ordinal));
    }

    [Fact]
    public void A_stage_and_a_renewal_cannot_both_give_the_food_its_K()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(
            ("$.right", """{ "kind": "compartment", "name": "simulant", "volume": "1 L", "area": "6 dm2" }"""),
            ("$.duration", null),
            ("$.foodContact", """{ "stages": [ { "name": "hot", "duration": "10 d", "temperature": "60 degC", "partitionCoefficients": { "simulant": 2 } } ] }"""),
            ("$.schedule", """[ { "duration": "5 d" }, { "duration": "5 d", "renew": [ { "face": "right", "partitionCoefficient": 3 } ] } ]""")));

        Assert.Equal(
            ["$.schedule[1].renew[0].partitionCoefficient: the food-contact stage 'hot' gives the right medium's K too; give it in one place"],
            CaseJson.ErrorLines(read));
    }

    [Fact]
    public void A_period_too_short_to_tell_from_its_neighbours_is_refused()
    {
        var read = CaseJson.Read(CaseJson.MinimalWith(
            ("$.duration", null),
            ("$.schedule", """[ { "duration": "10 d" }, { "name": "rinse", "duration": "0.1 s", "renew": ["right"] }, { "duration": "10 d" } ]""")));

        Assert.Equal(
            ["$.schedule[1].duration: is 0.1 s, less than 1E-06 of the whole schedule (1.73E+06 s), too short for the run to tell it from its neighbours; merge it into the next period or run that part as a case of its own"],
            CaseJson.ErrorLines(read));
    }
}
