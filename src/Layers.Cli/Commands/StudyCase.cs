using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Reports;
using Layers.Core.Studies;

namespace Layers.Cli.Commands;

/// <summary>
/// What the study commands share: reading a case that declares a study (errors reported like every other command),
/// and writing the study's files as one folder, <c>DIR/&lt;case name&gt;.&lt;study&gt;/</c>, beside the forward runs' folders.
/// </summary>
internal static class StudyCase
{
    /// <summary>The valid case and its document; null after reporting why not.</summary>
    /// <param name="path">The case file.</param>
    /// <param name="section">The study key the case must declare: "design" or "uncertainty".</param>
    /// <param name="error">Receives the problems.</param>
    public static (SimulationCase Case, JsonObject Document)? Read(string path, string section, TextWriter error)
    {
        if (CaseArgument.ReadOrReport(path, error)?.Case is not { } simulation)
        {
            return null;
        }

        // The reader has parsed the file already, so it is a JSON object here.
        var document = CaseVariation.Parse(CaseReader.ReadDocument(path, out _) ?? string.Empty);
        if (document is null)
        {
            error.WriteLine($"{path}: $: cannot read the file again after reading it once; was it changed?");
            return null;
        }

        if (!document.ContainsKey(section))
        {
            error.WriteLine($"{path}: $.{section}: the case declares no {section} study; see docs/case-format.md, section \"{char.ToUpperInvariant(section[0])}{section[1..]}\"");
            return null;
        }

        return (simulation, document);
    }

    /// <summary>Writes the files; returns the folder, or null after reporting a failure.</summary>
    public static string? Write(string outputRoot, string casePath, string study, IReadOnlyDictionary<string, byte[]> files, TextWriter error)
    {
        try
        {
            return CaseOutputFolder.Write(outputRoot, $"{Path.GetFileNameWithoutExtension(casePath)}.{study}", files);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"{casePath}: cannot write results under '{outputRoot}': {exception.Message}");
            return null;
        }
    }

    /// <summary>
    /// For a study that could not finish, reports why (an invalid value with the reader's errors, like those of a
    /// case file) and returns the exit code; null when it finished (with or without reaching a design's target).
    /// </summary>
    public static int? Failure(string casePath, StudyStatus status, string? message, IReadOnlyList<CaseError> errors, TextWriter error)
    {
        switch (status)
        {
            case StudyStatus.Cancelled:
                error.WriteLine($"{casePath}: cancelled; no results were written.");
                return ExitCodes.Cancelled;
            case StudyStatus.Invalid:
                error.WriteLine($"{casePath}: {message}; no results were written.");
                error.WriteLine(new CaseReadResult(casePath, null, errors).FormatErrors());
                return ExitCodes.InvalidInput;
            case StudyStatus.SolverFailed:
                error.WriteLine($"{casePath}: {message}; no results were written.");
                return ExitCodes.SolverFailed;
            default:
                return null;
        }
    }
}
