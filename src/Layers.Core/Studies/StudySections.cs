using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;

namespace Layers.Core.Studies;

/// <summary>
/// Checks the study sections of a case document (<c>design</c>, <c>uncertainty</c>) when the case itself is read,
/// so that <c>layers check</c> reports their mistakes too. A case declares at most one study.
/// </summary>
internal static class StudySections
{
    public static IReadOnlyList<CaseError> Check(string json, string fileName, SimulationCase baseCase)
    {
        if (CaseVariation.Parse(json) is not { } root)
        {
            return [];
        }

        var declared = CaseVariation.StudyKeys.Where(root.ContainsKey).ToList();
        if (declared.Count > 1)
        {
            return [new CaseError($"$.{declared[1]}", $"cannot be combined with $.{declared[0]}; put each study in its own case file")];
        }

        var errors = new List<CaseError>();
        if (root.ContainsKey("design"))
        {
            DesignReader.Read(root, fileName, baseCase, errors);
        }

        if (root.ContainsKey("uncertainty"))
        {
            UncertaintyReader.Read(root, fileName, baseCase, errors);
        }

        return errors;
    }
}
