using System.Security.Cryptography;
using System.Text;
using Layers.Core.Cases;
using Layers.Core.Reports;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Robustness;

/// <summary>
/// Seeded random damage to the shipped cases (deleted, inserted and swapped characters, numbers replaced by extreme
/// or invalid values) never escapes as an exception: the reader either returns a valid case or a list of errors,
/// each with a JSON path and a position (common practice, no source: input validation never throws).
/// </summary>
public sealed class MutatedCaseTests
{
    private static readonly string[] Replacements =
    [
        "-1", "0", "1e308", "1e-308", "\"NaN um\"", "\"Infinity d\"", "\"\"", "null", "true", "[]", "{}", "\"5 furlongs\"",
        "\"1e-9 cm2/s\"", "\"50 um\"", "\"-0 mg/L\"", "\"1e999 d\"", "\"\\u00b5m\"",
    ];

    public static TheoryData<string> DemoFiles()
    {
        var data = new TheoryData<string>();
        foreach (var file in Directory.EnumerateFiles(RepoRoot.File("cases"), "*.json").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(file));
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(DemoFiles))]
    public void Damaged_case_files_give_errors_with_paths_and_positions_never_exceptions(string demo)
    {
        var original = File.ReadAllText(RepoRoot.File("cases", demo));
        var random = new Random(demo.Length * 7919);
        for (var trial = 0; trial < 150; trial++)
        {
            var damaged = Damage(original, random);

            var result = CaseDocument.ReadText(damaged, demo);

            Assert.True(result.IsValid || result.Errors.Count > 0);
            Assert.All(result.Errors, error =>
            {
                Assert.StartsWith("$", error.JsonPath, StringComparison.Ordinal);
                Assert.False(string.IsNullOrWhiteSpace(error.Message));
                Assert.NotNull(error.Line);
            });
        }
    }

    [Fact]
    public void The_summary_records_the_SHA_256_of_the_case_file()
    {
        var path = RepoRoot.File("cases", "membrane-time-lag.json");
        var read = CaseDocument.ReadFile(path);

        var summary = SummaryJson.Write(Simulator.Run(read.Case!), path);

        // FIPS 180-4 SHA-256 of the file's bytes, by the platform's implementation.
        var expected = Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(path)));
        Assert.Contains($"\"sha256\": \"{expected}\"", summary, StringComparison.Ordinal);
    }

    private static string Damage(string text, Random random)
    {
        var builder = new StringBuilder(text);
        for (var edit = random.Next(1, 4); edit > 0; edit--)
        {
            var position = random.Next(builder.Length);
            switch (random.Next(4))
            {
                case 0:
                    builder.Remove(position, Math.Min(random.Next(1, 6), builder.Length - position));
                    break;
                case 1:
                    builder.Insert(position, "{}[],:\"-1e x"[random.Next(12)]);
                    break;
                case 2:
                    var other = random.Next(builder.Length);
                    (builder[position], builder[other]) = (builder[other], builder[position]);
                    break;
                default:
                    ReplaceValue(builder, position, Replacements[random.Next(Replacements.Length)]);
                    break;
            }
        }

        return builder.ToString();
    }

    /// <summary>Replaces the JSON value after the next colon (a string or a bare token) by another value.</summary>
    private static void ReplaceValue(StringBuilder builder, int from, string replacement)
    {
        var text = builder.ToString();
        var colon = text.IndexOf(':', from);
        if (colon < 0)
        {
            return;
        }

        var start = colon + 1;
        while (start < text.Length && text[start] == ' ')
        {
            start++;
        }

        var end = start;
        if (end < text.Length && text[end] == '"')
        {
            end = text.IndexOf('"', end + 1) + 1;
        }
        else
        {
            while (end < text.Length && ",}]\n".IndexOf(text[end], StringComparison.Ordinal) < 0)
            {
                end++;
            }
        }

        if (end > start)
        {
            builder.Remove(start, end - start).Insert(start, replacement);
        }
    }
}
