using Layers.Core.Domain;

namespace Layers.Core.Cases;

/// <summary>
/// Checks the study sections of a case document (its design or uncertainty study) against the case read from it:
/// every mistake, each with its JSON path, or none. The study layer supplies it, since studies are read with what
/// they run on.
/// </summary>
/// <param name="json">The whole case document.</param>
/// <param name="fileName">The case file, named in messages and where the files it names are looked for.</param>
/// <param name="baseCase">The case the document describes, already valid.</param>
public delegate IReadOnlyList<CaseError> StudySectionCheck(string json, string fileName, SimulationCase baseCase);
