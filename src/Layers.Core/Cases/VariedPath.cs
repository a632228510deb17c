using System.Text.Json;
using System.Text.Json.Nodes;

namespace Layers.Core.Cases;

/// <summary>
/// Reads the <c>path</c> of a value that a sweep or a study changes: a JSON path in the notation of the error
/// messages that names a quantity or number written in the case.
/// </summary>
internal static class VariedPath
{
    /// <summary>Top-level members that hold studies or names, never a value to vary.</summary>
    private static readonly string[] Fixed = ["sweep", "title", "design", "uncertainty"];

    /// <summary>The path and its steps; the steps are null (with an error added) when the path is unusable.</summary>
    /// <param name="root">The whole case document.</param>
    /// <param name="holder">The object whose <c>path</c> member is read.</param>
    /// <param name="at">JSON path of <paramref name="holder"/>, for messages.</param>
    /// <param name="participle">How the value is changed, for messages: "swept", "varied".</param>
    /// <param name="errors">Receives the problems.</param>
    public static (string Path, IReadOnlyList<object>? Steps) Read(JsonObject root, JsonObject holder, string at, string participle, List<CaseError> errors)
    {
        if (holder["path"] is not JsonValue value || !value.TryGetValue<string>(out var path))
        {
            errors.Add(new CaseError($"{at}.path", "is required: the JSON path of a value in this case, e.g. \"$.layers[0].thickness\""));
            return (string.Empty, null);
        }

        var steps = JsonPathSteps.Parse(path);
        if (steps is null)
        {
            errors.Add(new CaseError($"{at}.path", $"'{path}' is not a path of the form $.layers[0].thickness"));
            return (path, null);
        }

        if (steps[0] is string first && Fixed.Contains(first))
        {
            errors.Add(new CaseError($"{at}.path", $"'{path}' cannot be {participle}"));
            return (path, null);
        }

        var target = JsonPathSteps.Find(root, steps);
        if (target is not JsonValue found || found.GetValueKind() is not (JsonValueKind.String or JsonValueKind.Number))
        {
            errors.Add(new CaseError($"{at}.path", target is null
                ? $"'{path}' is not in this case; a {participle} value must be written in the case"
                : $"'{path}' is not a quantity or number"));
            return (path, null);
        }

        return (path, steps);
    }
}
