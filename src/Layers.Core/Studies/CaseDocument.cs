using Layers.Core.Cases;

namespace Layers.Core.Studies;

/// <summary>
/// Reads a whole case file: the case (<see cref="CaseReader"/>), its sweep, and the study it may declare, so that a
/// mistake in any part is reported when the file is read. This is how the tool reads a case file it is given.
/// </summary>
public static class CaseDocument
{
    /// <summary>Reads a case file from disk, study sections included.</summary>
    /// <param name="path">The case file.</param>
    /// <param name="access">Which files the case may name; by default only those in its own folder.</param>
    public static CaseReadResult ReadFile(string path, CaseFileAccess access = CaseFileAccess.InsideCaseFolder) =>
        CaseReader.ReadFile(path, access, StudySections.Check);

    /// <summary>Reads a case from JSON text, study sections included.</summary>
    /// <param name="json">The case document.</param>
    /// <param name="fileName">The case file: named in messages, gives the default title, and is where the files the case names are looked for.</param>
    /// <param name="access">Which files the case may name; by default only those in its own folder.</param>
    public static CaseReadResult ReadText(string json, string fileName, CaseFileAccess access = CaseFileAccess.InsideCaseFolder) =>
        CaseReader.ReadText(json, fileName, access, StudySections.Check);

    /// <summary>
    /// Reads a case file from disk once, study sections included, and keeps its document for what varies the case
    /// (a study writes its values into it, a fit its estimates).
    /// </summary>
    /// <param name="path">The case file.</param>
    /// <param name="access">Which files the case may name; by default only those in its own folder.</param>
    public static CaseDocumentRead ReadFileWithRoot(string path, CaseFileAccess access = CaseFileAccess.InsideCaseFolder)
    {
        if (CaseReader.ReadDocument(path, out var error) is not { } text)
        {
            return new CaseDocumentRead(new CaseReadResult(path, null, [error!]), null);
        }

        var read = ReadText(text, path, access);
        // A valid case was parsed as a JSON object, so the document is one too.
        return new CaseDocumentRead(read, read.IsValid ? CaseVariation.Parse(text) : null);
    }
}
