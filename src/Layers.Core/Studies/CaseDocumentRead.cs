using System.Text.Json.Nodes;
using Layers.Core.Cases;

namespace Layers.Core.Studies;

/// <summary>
/// A case file read once: the case (checked with its study sections) and, when it is valid, the document as a JSON
/// object for what varies it (a study, a fit), so that the two always come from the same text.
/// </summary>
/// <param name="Read">The case, or every error found.</param>
/// <param name="Root">The document; null unless the case is valid.</param>
public sealed record CaseDocumentRead(CaseReadResult Read, JsonObject? Root);
