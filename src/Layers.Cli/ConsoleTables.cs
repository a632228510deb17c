using Layers.Core.Reports;
using Spectre.Console;

namespace Layers.Cli;

/// <summary>
/// Renders the core's result tables on a console with Spectre.Console: aligned columns and borders without
/// hand-written padding code. Colour and cursor codes are used only when the writer is a terminal.
/// </summary>
internal static class ConsoleTables
{
    /// <summary>Width used when the output is not a terminal (a file, a pipe, a test).</summary>
    private const int RedirectedWidth = 140;

    public static void Write(TextWriter writer, params TextTable[] tables)
    {
        var isTerminal = ReferenceEquals(writer, Console.Out) && !Console.IsOutputRedirected;
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Out = new AnsiConsoleOutput(writer),
            Ansi = isTerminal ? AnsiSupport.Detect : AnsiSupport.No,
            ColorSystem = isTerminal ? ColorSystemSupport.Detect : ColorSystemSupport.NoColors,
            Interactive = InteractionSupport.No,
        });
        if (!isTerminal)
        {
            console.Profile.Width = RedirectedWidth;
        }

        foreach (var table in tables)
        {
            console.Write(Render(table));
        }
    }

    private static Table Render(TextTable source)
    {
        var table = new Table { Border = TableBorder.Simple, Title = new TableTitle(Markup.Escape(source.Title)) };
        foreach (var header in source.Headers)
        {
            table.AddColumn(new TableColumn(Markup.Escape(header)).RightAligned());
        }

        table.Columns[0].LeftAligned();
        foreach (var column in table.Columns.Take(source.WholeColumns))
        {
            column.NoWrap();
        }
        foreach (var row in source.Rows)
        {
            table.AddRow(row.Select(cell => (Spectre.Console.Rendering.IRenderable)new Text(cell)).ToArray());
        }

        return table;
    }
}
