using System.Text;
using Layers.Core.Cases;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>
/// A case file is UTF-8 (docs/case-format.md). A file saved in Latin-1 holds bytes that are not UTF-8; they must be
/// reported, with their offset, rather than silently read as replacement characters.
/// </summary>
public sealed class CaseEncodingTests
{
    [Fact]
    public void A_title_in_latin_1_is_reported_at_its_byte_offset_and_line()
    {
        using var temp = new TempFolder();
        // 'é' is the single byte 0xE9 in ISO 8859-1 (Latin-1) and two bytes, C3 A9, in UTF-8 (RFC 3629, section 3).
        var before = "{\n  \"title\": \"Caf";
        var bytes = Encoding.ASCII.GetBytes(before).Append((byte)0xE9).Concat(Encoding.ASCII.GetBytes("\",\n" + CaseJson.Minimal.TrimStart()[1..])).ToArray();
        var path = temp.Combine("latin.json");
        File.WriteAllBytes(path, bytes);

        var read = CaseDocument.ReadFile(path);

        var error = Assert.Single(read.Errors);
        Assert.Equal("$", error.JsonPath);
        // The offset counted by hand: "{\n" is 2 bytes, "  \"title\": \"Caf" 15, so the bad byte is at offset 17, on line 2.
        Assert.Equal("cannot read the file: not UTF-8: byte 0xE9 at offset 17 (line 2) is not valid UTF-8; save the file as UTF-8", error.Message);
    }

    [Fact]
    public void The_same_title_in_utf_8_is_read_as_written()
    {
        using var temp = new TempFolder();
        var path = temp.WriteFile("utf8.json", CaseJson.With(CaseJson.Minimal, ("$.title", "\"Café\"")));

        var read = CaseDocument.ReadFile(path);

        Assert.True(read.IsValid, read.FormatErrors());
        Assert.Equal("Café", read.Case!.Title);
    }
}
