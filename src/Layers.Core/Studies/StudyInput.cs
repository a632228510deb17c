using System.Globalization;
using System.Text.Json.Nodes;
using Layers.Core.Cases;

namespace Layers.Core.Studies;

/// <summary>
/// A value of a case that a study changes: where it is written (a JSON path) and the unit its values are written
/// in. Each value tried is written into the case document as text (<c>"23.5 um"</c>) before the case is read, so
/// every rule of the case format checks every value (see <see cref="CaseVariation"/>).
/// </summary>
/// <param name="Path">The JSON path as written in the study, e.g. <c>$.layers[0].thickness</c>.</param>
/// <param name="Unit">The unit symbol the values are written in, as the user wrote it; empty for a plain number.</param>
public sealed record StudyInput(string Path, string Unit)
{
    /// <summary>The parsed path (member names and indices).</summary>
    internal IReadOnlyList<object> Steps { get; init; } = [];

    /// <summary>
    /// The value in words for tables and plots, e.g. "membrane thickness" (<see cref="InputLabels"/>); the path stays
    /// the key of JSON and CSV files.
    /// </summary>
    public string Label { get; init; } = InputLabels.Of(null, Path);

    /// <summary>A value as written into the case: the number with all its digits and the unit.</summary>
    public string Write(double number)
    {
        var text = number.ToString("R", CultureInfo.InvariantCulture);
        return Unit.Length == 0 ? text : $"{text} {Unit}";
    }

    /// <summary>A value for display: four significant digits and the unit as people spell it ("25 µm").</summary>
    public string Show(double number)
    {
        var text = number.ToString("G4", CultureInfo.InvariantCulture);
        return Unit.Length == 0 ? text : $"{text} {Units.UnitSpelling.ForPeople(Unit)}";
    }

    /// <summary>The JSON node written at <see cref="Path"/> for a value: a string with the unit, or a plain number.</summary>
    internal JsonNode Node(double number) => Unit.Length == 0 ? JsonValue.Create(number) : JsonValue.Create(Write(number));
}
