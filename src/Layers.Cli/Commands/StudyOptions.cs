using System.CommandLine;
using Layers.Core.Batch;
using Layers.Plotting;

namespace Layers.Cli.Commands;

/// <summary>The options the study commands share: where to write, how many runs at once, what to print, the plots.</summary>
internal sealed class StudyOptions
{
    private readonly Option<string> _outputRoot = new("--out", "-o")
    {
        Description = "Folder that receives the study's folder, <case name>.<study>.",
        DefaultValueFactory = _ => "results",
    };

    private readonly Option<int> _jobs = new("--jobs", "-j")
    {
        Description = "How many runs go at once.",
        DefaultValueFactory = _ => Environment.ProcessorCount,
    };

    private readonly Option<bool> _quiet = new("--quiet", "-q") { Description = "Print nothing on success (errors still go to stderr)." };
    private readonly Option<bool> _json = new("--json") { Description = "Print the study's JSON file to stdout instead of the text, for scripts." };
    private readonly Option<bool> _noPlots = new("--no-plots") { Description = "Skip the PNG plot." };
    private readonly Option<int> _width = new("--plot-width") { Description = "Width of the plot in pixels.", DefaultValueFactory = _ => 1200 };
    private readonly Option<int> _height = new("--plot-height") { Description = "Height of the plot in pixels.", DefaultValueFactory = _ => 800 };

    /// <summary>Adds the options and their range checks to a command.</summary>
    public void AddTo(Command command)
    {
        foreach (var option in new Option[] { _outputRoot, _jobs, _quiet, _json, _noPlots, _width, _height })
        {
            command.Options.Add(option);
        }

        CommandLineRules.NonEmptyPath(_outputRoot);
        CommandLineRules.WholeNumber(_jobs, 1, 1024);
        CommandLineRules.WholeNumber(_width, 200, 10000, " pixels");
        CommandLineRules.WholeNumber(_height, 200, 10000, " pixels");
    }

    /// <summary>The values given.</summary>
    public Values Read(ParseResult parseResult) => new(
        parseResult.GetValue(_outputRoot)!,
        parseResult.GetValue(_jobs),
        parseResult.GetValue(_quiet),
        parseResult.GetValue(_json),
        !parseResult.GetValue(_noPlots),
        new PlotOptions(parseResult.GetValue(_width), parseResult.GetValue(_height)));

    /// <summary>The parsed options.</summary>
    public sealed record Values(string OutputRoot, int Jobs, bool Quiet, bool Json, bool Plots, PlotOptions PlotOptions)
    {
        /// <summary>A study of a case, written as one folder <c>OUT/&lt;case name&gt;.&lt;study&gt;/</c> beside the forward runs' folders.</summary>
        public CaseRunRequest Request(string casePath, string study) =>
            new(casePath, $"{Path.GetFileNameWithoutExtension(casePath)}.{study}", OutputRoot);
    }
}
