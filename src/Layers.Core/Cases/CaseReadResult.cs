using Layers.Core.Domain;

namespace Layers.Core.Cases;

/// <summary>The outcome of reading a case file: a valid case, or every error found (never both).</summary>
/// <param name="FileName">The file that was read, as given.</param>
/// <param name="Case">The case, when there were no errors.</param>
/// <param name="Errors">All errors, in document order.</param>
public sealed record CaseReadResult(string FileName, SimulationCase? Case, IReadOnlyList<CaseError> Errors)
{
    /// <summary>True when the case is valid.</summary>
    public bool IsValid => Case is not null && Errors.Count == 0;

    /// <summary>All errors, one per line, each naming the file and the JSON path.</summary>
    public string FormatErrors() => string.Join(Environment.NewLine, Errors.Select(error => error.Format(FileName)));
}
