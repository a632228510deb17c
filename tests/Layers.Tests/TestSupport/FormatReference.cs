namespace Layers.Tests.TestSupport;

/// <summary>Pieces of docs/case-format.md that tests compare the tool against.</summary>
internal static class FormatReference
{
    private static readonly Lazy<string> LazyText = new(() => File.ReadAllText(RepoRoot.File("docs", "case-format.md")));

    public static string Text => LazyText.Value;

    /// <summary>The contents of every fenced block of the given language, in document order.</summary>
    public static IReadOnlyList<string> Blocks(string language, string? withinSection = null)
    {
        var text = withinSection is null ? Text : Section(withinSection);
        var blocks = new List<string>();
        var fence = "```" + language + "\n";
        for (var start = text.IndexOf(fence, StringComparison.Ordinal); start >= 0;
             start = text.IndexOf(fence, start, StringComparison.Ordinal))
        {
            start += fence.Length;
            var end = text.IndexOf("\n```", start, StringComparison.Ordinal);
            blocks.Add(text[start..end]);
            start = end;
        }

        return blocks;
    }

    /// <summary>The text from a "## heading" line to the next "## " heading.</summary>
    public static string Section(string heading)
    {
        var start = Text.IndexOf("\n## " + heading + "\n", StringComparison.Ordinal);
        if (start < 0)
        {
            throw new InvalidOperationException($"docs/case-format.md has no section '## {heading}'.");
        }

        var end = Text.IndexOf("\n## ", start + 1, StringComparison.Ordinal);
        return end < 0 ? Text[start..] : Text[start..end];
    }

    /// <summary>The example error lines of the "Validation messages" section (the text blocks naming film.json).</summary>
    public static IReadOnlyList<string> ExampleMessages() =>
        Blocks("text", "Validation messages")
            .SelectMany(block => block.Split('\n'))
            .Where(line => line.StartsWith("film.json: ", StringComparison.Ordinal))
            .ToList();
}
