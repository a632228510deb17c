using Layers.Core.Units;

namespace Layers.Tests.Units;

/// <summary>
/// Every pairing of the basic units must be accepted for the composite dimensions, with the factor that
/// follows from the SI definitions of its parts (see <see cref="SiReference"/>).
/// </summary>
public class UnitCoverageTests
{
    public static TheoryData<string, double> AreaPerTime => Ratios(SiReference.Areas, SiReference.RateTimes);

    public static TheoryData<string, double> MassPerVolume => Ratios(SiReference.Masses, SiReference.Volumes);

    public static TheoryData<string, double> LengthPerTime => Ratios(SiReference.Lengths, SiReference.RateTimes);

    public static TheoryData<string, double> MassPerArea => Ratios(SiReference.Masses, SiReference.Areas);

    public static TheoryData<string, double> MassPerAreaPerTime
    {
        get
        {
            var data = new TheoryData<string, double>();
            foreach (var (mass, massFactor) in SiReference.Masses)
            {
                foreach (var (area, areaFactor) in SiReference.Areas)
                {
                    foreach (var (time, timeFactor) in SiReference.RateTimes)
                    {
                        data.Add($"{mass}/{area}/{time}", massFactor / areaFactor / timeFactor);
                    }
                }
            }

            return data;
        }
    }

    [Theory]
    [MemberData(nameof(AreaPerTime))]
    public void Every_area_over_every_rate_time_is_a_diffusivity(string symbol, double expectedFactor) =>
        AssertUnit(symbol, Dimension.Diffusivity, expectedFactor);

    [Theory]
    [MemberData(nameof(MassPerVolume))]
    public void Every_mass_over_every_volume_is_a_mass_concentration(string symbol, double expectedFactor) =>
        AssertUnit(symbol, Dimension.MassConcentration, expectedFactor);

    [Theory]
    [MemberData(nameof(LengthPerTime))]
    public void Every_length_over_every_rate_time_is_a_velocity(string symbol, double expectedFactor) =>
        AssertUnit(symbol, Dimension.Velocity, expectedFactor);

    [Theory]
    [MemberData(nameof(MassPerArea))]
    public void Every_mass_over_every_area_is_a_mass_per_area(string symbol, double expectedFactor) =>
        AssertUnit(symbol, Dimension.MassPerArea, expectedFactor);

    [Theory]
    [MemberData(nameof(MassPerAreaPerTime))]
    public void Every_mass_over_area_over_time_is_a_mass_flux(string symbol, double expectedFactor) =>
        AssertUnit(symbol, Dimension.MassFlux, expectedFactor);

    private static TheoryData<string, double> Ratios(
        IReadOnlyDictionary<string, double> numerators, IReadOnlyDictionary<string, double> denominators)
    {
        var data = new TheoryData<string, double>();
        foreach (var (top, topFactor) in numerators)
        {
            foreach (var (bottom, bottomFactor) in denominators)
            {
                data.Add(top + "/" + bottom, topFactor / bottomFactor);
            }
        }

        return data;
    }

    private static void AssertUnit(string symbol, Dimension dimension, double expectedFactor)
    {
        Assert.True(UnitTable.TryFind(symbol, out var unit), $"'{symbol}' is not accepted");
        Assert.Equal(symbol, unit.Symbol);
        Assert.Equal(dimension, unit.Dimension);
        SiReference.AssertClose(expectedFactor, unit.FactorToSi);
        Assert.Equal(0, unit.OffsetToSi);
    }
}
