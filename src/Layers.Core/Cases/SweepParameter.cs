using System.Text.Json.Nodes;

namespace Layers.Core.Cases;

/// <summary>One swept parameter: where it goes in the document and the values it takes, in order.</summary>
/// <param name="Path">The JSON path as written.</param>
/// <param name="Steps">The parsed path.</param>
/// <param name="Values">The values with the JSON node substituted for each.</param>
internal sealed record SweepParameter(string Path, IReadOnlyList<object> Steps, IReadOnlyList<SweepParameter.Choice> Values)
{
    /// <summary>One value: the JSON node to substitute and its description.</summary>
    /// <param name="Node">A JSON string ("20 um") or number (0.5).</param>
    /// <param name="Value">The same value, described for tables, names and plots.</param>
    internal sealed record Choice(JsonNode Node, SweepValue Value);
}
