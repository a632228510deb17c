using System.Text;

namespace Layers.Core.Reports;

/// <summary>
/// Text from the user (case and file names, messages) inside a Markdown table: shown as written, never as markup.
/// Markdown viewers render inline HTML and act on emphasis, links and code marks, so a file named
/// <c>&lt;img src=x onerror=...&gt;.json</c> or <c>[x](http://...)</c> must not become an element or a link.
/// </summary>
internal static class MarkdownText
{
    // The characters with a meaning in CommonMark inline text and GitHub tables; a backslash before any ASCII
    // punctuation character makes it literal (CommonMark 0.31, section 2.4, "Backslash escapes").
    private const string Punctuation = "\\`*_[]()#!~|";

    /// <summary>One table cell: HTML's three special characters as entities, Markdown punctuation escaped, line breaks as spaces.</summary>
    public static string Cell(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var cell = new StringBuilder(text.Length + 8);
        foreach (var c in text)
        {
            _ = c switch
            {
                '&' => cell.Append("&amp;"),
                '<' => cell.Append("&lt;"),
                '>' => cell.Append("&gt;"),
                '\r' or '\n' => cell.Append(' '),
                _ when Punctuation.Contains(c, StringComparison.Ordinal) => cell.Append('\\').Append(c),
                _ => cell.Append(c),
            };
        }

        return cell.ToString();
    }
}
