using System.Globalization;
using System.Net;
using System.Text;
using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Core.Reports;

/// <summary>
/// report.html: one self-contained page per case (styles inline, pictures embedded as data URIs) that a
/// practitioner can attach to a file note: inputs with units, key results, plots, assumptions and the caution.
/// </summary>
public static class HtmlReport
{
    private const string Style =
        "body{font-family:'DejaVu Sans',Verdana,sans-serif;max-width:1100px;margin:2em auto;color:#1b1b1b;line-height:1.45}" +
        "h1{font-size:1.5em}h2{font-size:1.15em;margin-top:1.8em;border-bottom:1px solid #ccc}" +
        "table{border-collapse:collapse;margin:0.6em 0;font-size:0.92em}th,td{border:1px solid #d0d0d0;padding:3px 8px}" +
        "th{background:#f1f1f1;text-align:left}td{text-align:right}td:first-child{text-align:left}" +
        ".caution{border-left:5px solid #b35900;background:#fff4e5;padding:0.6em 1em}" +
        "img{max-width:100%;border:1px solid #e0e0e0;margin:0.5em 0}.meta{color:#555;font-size:0.9em}";

    /// <summary>The page for a solved case.</summary>
    /// <param name="result">The result.</param>
    /// <param name="caseFile">The case file as given.</param>
    /// <param name="pictures">PNG pictures by file name, embedded in this order.</param>
    /// <param name="captions">
    /// What each picture shows and how to read it, by file name; a picture without one is captioned with its file name.
    /// </param>
    public static string Write(
        SimulationResult result,
        string caseFile,
        IReadOnlyDictionary<string, byte[]> pictures,
        IReadOnlyDictionary<string, string>? captions = null)
    {
        var simulation = result.Case;
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>")
            .Append(Encode(simulation.Title)).Append("</title><style>").Append(Style).Append("</style></head><body>\n");
        html.Append("<h1>").Append(Encode(simulation.Title)).Append("</h1>\n");
        html.Append(CultureInfo.InvariantCulture, $"<p class=\"meta\">Case file {Encode(Path.GetFileName(caseFile))}; computed by {ToolInfo.Name} {ToolInfo.Version}.</p>\n");
        html.Append("<p class=\"caution\"><strong>Caution.</strong> ").Append(Encode(CautionText.For(result))).Append("</p>\n");
        html.Append("<h2>Inputs</h2>\n");
        AppendTable(html, InputTables.Layers(simulation));
        AppendTable(html, InputTables.Conditions(simulation));
        html.Append("<h2>Results</h2>\n");
        AppendTable(html, ResultTables.AtReportTimes(result));
        AppendTable(html, ResultTables.KeyFigures(result));
        if (AccuracyTables.Shortfalls(result) is { } shortfalls)
        {
            AppendTable(html, shortfalls);
        }

        foreach (var table in ScheduleTables.For(result).Concat(FoodContactTables.For(result)).Concat(DiffusionCellTables.For(result)))
        {
            AppendTable(html, table);
        }

        if (result.FoodContact is not null)
        {
            html.Append("<p class=\"caution\">").Append(Encode(FoodContactTables.Caution)).Append("</p>\n");
        }
        foreach (var warning in CaseCautions.UnverifiedConstants(simulation).Concat(DiffusionCellTables.Warnings(result)))
        {
            html.Append("<p class=\"caution\">").Append(Encode(warning)).Append("</p>\n");
        }

        foreach (var (name, png) in pictures)
        {
            // The caption says what the figure shows; the file name follows it so that the reader can find the file.
            var described = captions is not null && captions.TryGetValue(name, out var text) ? text : null;
            var caption = described is null ? Encode(name) : $"{Encode(described)} ({Encode(name)})";
            html.Append(CultureInfo.InvariantCulture, $"<figure><img alt=\"{Encode(described ?? name)}\" src=\"data:image/png;base64,{Convert.ToBase64String(png)}\"><figcaption class=\"meta\">{caption}</figcaption></figure>\n");
        }

        html.Append("<h2>Assumptions</h2>\n<ul>\n");
        foreach (var assumption in Assumptions(result))
        {
            html.Append("<li>").Append(Encode(assumption)).Append("</li>\n");
        }

        html.Append("</ul>\n</body></html>\n");
        return html.ToString();
    }

    private static IEnumerable<string> Assumptions(SimulationResult result)
    {
        yield return "Diffusion is one-dimensional, across the stack; edges and lateral diffusion are ignored.";
        yield return "Each layer is homogeneous with a constant diffusion coefficient and partition coefficient (within each stage of a history); no swelling, reaction or concentration dependence.";
        yield return $"At every interface the flux is continuous and the concentrations are in partition equilibrium (c_i / c_j = K_i / K_j, K relative to {result.Case.ReferenceMedium}).";
        yield return "Compartments are perfectly mixed apart from any film resistance given; baths hold a fixed concentration.";
        if (result.FoodContact is not null)
        {
            foreach (var assumption in FoodContactResult.Assumptions)
            {
                yield return $"Food contact: {assumption}.";
            }
        }

        yield return result.Method == SolutionMethod.Laplace
            ? string.Create(CultureInfo.InvariantCulture,
                $"Numerics: the exact solution in the Laplace domain, inverted on a Talbot contour ({result.MethodReason}); profiles read at {result.Grid.CellCount} places; worst mass-balance error {result.WorstMassBalanceError:G2}.")
            : string.Create(CultureInfo.InvariantCulture,
                $"Numerics: finite volumes ({result.Grid.CellCount} cells, graded toward interfaces), TR-BDF2 time steps ({result.Statistics.AcceptedSteps} accepted, relative tolerance {result.Case.Numerics.Solver.RelativeTolerance:G2}); worst mass-balance error {result.WorstMassBalanceError:G2}.");
    }

    private static void AppendTable(StringBuilder html, TextTable table)
    {
        html.Append("<table><caption>").Append(Encode(table.Title)).Append("</caption>\n<tr>");
        foreach (var header in table.Headers)
        {
            html.Append("<th>").Append(Encode(header)).Append("</th>");
        }

        html.Append("</tr>\n");
        foreach (var row in table.Rows)
        {
            html.Append("<tr>");
            foreach (var cell in row)
            {
                html.Append("<td>").Append(Encode(cell)).Append("</td>");
            }

            html.Append("</tr>\n");
        }

        html.Append("</table>\n");
    }

    private static string Encode(string text) => WebUtility.HtmlEncode(text);
}
