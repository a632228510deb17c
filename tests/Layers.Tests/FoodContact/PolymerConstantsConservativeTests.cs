using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using Layers.Core.FoodContact;
using Layers.Tests.TestSupport;

namespace Layers.Tests.FoodContact;

/// <summary>
/// The polymer table feeds an upper-bound estimate of D, so where the recollections of a constant differ every row
/// must keep the end that gives the larger D (common practice, no source: an upper bound takes the conservative end
/// of what is uncertain). Which end that is comes from the correlation itself, evaluated at both ends, not from an
/// assumed sign: D_P = 1e4 exp(A_P' - tau/T - 0.1351 Mr^(2/3) + 0.003 Mr - 10454/T) cm2/s (Begley et al., Food
/// Addit. Contam. 22 (2005) 73-90; constants from memory).
/// </summary>
public sealed class PolymerConstantsConservativeTests
{
    private static readonly string DataFile = RepoRoot.File("src", "Layers.Core", "FoodContact", "polymer-constants.json");

    public static TheoryData<string> Rows()
    {
        using var document = JsonDocument.Parse(File.ReadAllText(DataFile));
        var rows = new TheoryData<string>();
        foreach (var row in document.RootElement.GetProperty("polymers").EnumerateArray())
        {
            rows.Add(row.GetProperty("name").GetString()!);
        }

        return rows;
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void Every_polymer_row_keeps_the_end_of_its_recalled_range_that_gives_the_larger_diffusion_coefficient(string name)
    {
        using var document = JsonDocument.Parse(File.ReadAllText(DataFile));
        var row = document.RootElement.GetProperty("polymers").EnumerateArray().Single(item => item.GetProperty("name").GetString() == name);
        var kept = PolymerTable.Find(name)!;
        var note = row.GetProperty("source").GetString()!;

        foreach (var (symbol, key, value) in new[] { ("A_P'", "aPrimeRecalled", kept.APrime), ("tau", "tauKelvinRecalled", kept.TauKelvin) })
        {
            // Every value the note recalls ("A_P' = -0.7", "A_P' = 3.1 to 6.35"), and the structured range where the
            // row gives one.
            var recalled = Regex.Matches(note, Regex.Escape(symbol) + @"\s*=\s*(-?\d+(?:\.\d+)?)(?:\s+to\s+(-?\d+(?:\.\d+)?))?")
                .SelectMany(match => match.Groups.Values.Skip(1).Where(group => group.Success))
                .Select(group => double.Parse(group.Value, CultureInfo.InvariantCulture))
                .ToList();
            if (row.TryGetProperty(key, out var range))
            {
                var ends = range.EnumerateArray().Select(end => end.GetDouble()).ToArray();
                Assert.Equal(2, ends.Length);
                Assert.All(recalled, number => Assert.InRange(number, ends.Min(), ends.Max()));
                recalled.AddRange(ends);
            }

            recalled.Add(value);
            foreach (var other in recalled)
            {
                var alternative = symbol == "A_P'" ? kept with { APrime = other } : kept with { TauKelvin = other };
                foreach (var (mr, kelvin) in new[] { (100.0, 278.15), (531.0, 298.15), (1000.0, 393.15) })
                {
                    Assert.True(
                        UpperBoundDiffusivity.SquareMetersPerSecond(kept, mr, kelvin) >= UpperBoundDiffusivity.SquareMetersPerSecond(alternative, mr, kelvin),
                        $"{name}: {symbol} = {value} is kept, but the recalled {other} gives a larger D (Mr {mr}, {kelvin} K)");
                }
            }
        }
    }

    [Fact]
    public void The_table_says_which_end_of_a_recalled_range_it_keeps()
    {
        using var document = JsonDocument.Parse(File.ReadAllText(DataFile));
        var about = document.RootElement.GetProperty("about").GetString()!;

        Assert.Contains("larger D", about, StringComparison.Ordinal);
        foreach (var row in document.RootElement.GetProperty("polymers").EnumerateArray()
            .Where(row => row.TryGetProperty("aPrimeRecalled", out _) || row.TryGetProperty("tauKelvinRecalled", out _)))
        {
            Assert.Contains("kept", row.GetProperty("source").GetString()!, StringComparison.Ordinal);
        }
    }
}
