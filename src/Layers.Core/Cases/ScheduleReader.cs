using System.Globalization;
using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads <c>schedule</c>: an array of periods, each <c>{ "name", "duration", "renew", "repeat" }</c>, or blocks
/// <c>{ "name", "repeat", "periods": [ ... ] }</c> of periods run together several times. Repetitions are unrolled
/// into the <see cref="ContactSchedule"/> the solver runs. The faces a period renews are checked once the faces are
/// read (<see cref="CheckFaces"/>).
/// </summary>
internal static class ScheduleReader
{
    /// <summary>Most periods a schedule may run, repetitions counted (each writes a row to the period table).</summary>
    public const int MaxPeriods = 1000;

    private static readonly string[] PeriodKeys = ["name", "duration", "renew", "temperature", "remove", "apply", "close", "open", "repeat"];
    private static readonly string[] BlockKeys = ["name", "repeat", "periods"];
    private const string Example = "[ { \"name\": \"contact\", \"duration\": \"10 d\", \"renew\": [\"right\"], \"repeat\": 3 } ]";

    /// <summary>A period as written, with the paths its faces are named at.</summary>
    internal sealed record Written(
        string Name,
        double DurationSeconds,
        IReadOnlyList<(Side Side, string Path)> Renewed,
        double? TemperatureKelvin,
        string Path,
        IReadOnlyList<(string Layer, string Path)> Removed,
        IReadOnlyList<(string Layer, string Path)> Applied)
    {
        /// <summary>The faces taken out of contact at the start, with their paths.</summary>
        public IReadOnlyList<(Side Side, string Path)> Closed { get; init; } = [];

        /// <summary>The faces brought back into contact at the start, with their paths.</summary>
        public IReadOnlyList<(Side Side, string Path)> Opened { get; init; } = [];

        /// <summary>
        /// The renewals that give the fresh portion other properties (<c>{ "face": "right", "volume": "200 mL" }</c>),
        /// read once the faces are (<see cref="ScheduleMedia"/>).
        /// </summary>
        public IReadOnlyList<(Side Side, JsonFields Fields)> NewProperties { get; init; } = [];
    }

    /// <summary>What <see cref="Read"/> found.</summary>
    /// <param name="Schedule">The schedule; null when it has errors.</param>
    /// <param name="NamedFaces">
    /// Every face a period renews, with its path and whether the renewal gives the fresh portion other properties (also
    /// when other parts have errors).
    /// </param>
    /// <param name="Stages">
    /// The time-temperature stages the periods give when some period gives a temperature (consecutive periods at one
    /// temperature make one stage); null when none does.
    /// </param>
    /// <param name="PerPeriod">For each period run, the period as written (its layer changes by name, with paths).</param>
    public sealed record Result(
        ContactSchedule? Schedule, IReadOnlyList<(Side Side, string Path, bool NewProperties)> NamedFaces, IReadOnlyList<TemperatureStage>? Stages, IReadOnlyList<Written> PerPeriod);

    /// <summary>The schedule, the faces it renews and the stages its temperatures give; null when the case has no schedule.</summary>
    public static Result? Read(JsonFields root, ReadContext context)
    {
        if (root.Member("schedule") is not { } array)
        {
            return null;
        }

        if (array.ValueKind != JsonValueKind.Array || array.GetArrayLength() == 0)
        {
            var found = array.ValueKind == JsonValueKind.Array ? "an empty array" : JsonFields.Describe(array);
            root.Error("schedule", $"expected a non-empty array of periods such as {Example}; found {found}");
            return null;
        }

        var errorsBefore = context.Errors.Count;
        var periods = new List<SchedulePeriod>();
        var written = new List<Written>();
        var named = new List<(Side, string, bool)>();
        var start = 0.0;
        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{root.PathOf("schedule")}[{index++}]";
            var isBlock = element.ValueKind == JsonValueKind.Object && element.TryGetProperty("periods", out _);
            var entry = JsonFields.Open(element, path, context.Errors, isBlock ? BlockKeys : PeriodKeys);
            if (entry is null)
            {
                continue;
            }

            var repeat = Repeat(entry, required: isBlock);
            var block = isBlock ? BlockPeriods(entry, context) : Period(entry, context, $"period {index}") is { } one ? [one] : [];
            named.AddRange(block.SelectMany(period => period.Renewed.Select(face =>
                (face.Side, face.Path, period.NewProperties.Any(renewal => renewal.Fields.Path == face.Path)))));
            if (repeat is not { } count || block.Count == 0)
            {
                continue;
            }

            if (periods.Count + (count * block.Count) > MaxPeriods)
            {
                context.Errors.Add(new CaseError(path, string.Create(CultureInfo.InvariantCulture,
                    $"the schedule would run more than {MaxPeriods} periods (repetitions counted); shorten it or run it in parts")));
                return new Result(null, named, null, []);
            }

            for (var repetition = 1; repetition <= count; repetition++)
            {
                foreach (var (period, slot) in block.Select((period, slot) => (period, slot)))
                {
                    periods.Add(new SchedulePeriod(period.Name, (index - 1, slot), repetition, count, start, period.DurationSeconds, period.Renewed.Select(face => face.Side).Distinct().ToArray()));
                    written.Add(period);
                    start += period.DurationSeconds;
                }
            }
        }

        ShortPeriods(periods, written, context);
        var stages = Stages(periods, written, context);
        return context.Errors.Count == errorsBefore && periods.Count > 0
            ? new Result(new ContactSchedule(periods), named, stages, written)
            : new Result(null, named, null, []);
    }

    /// <summary>
    /// A period shorter than <see cref="ShortestPeriodFraction"/> of the whole schedule is refused at its duration: the
    /// run finds each period's results by its end time to 1e-9 of the time, so a shorter one could not be told from its
    /// neighbours. Reported once per period as written, not once per repetition.
    /// </summary>
    private static void ShortPeriods(List<SchedulePeriod> periods, List<Written> written, ReadContext context)
    {
        if (periods.Count == 0)
        {
            return;
        }

        var total = periods[^1].EndSeconds;
        foreach (var period in written.Where(period => period.DurationSeconds < ShortestPeriodFraction * total).Distinct())
        {
            context.Errors.Add(new CaseError(period.Path + ".duration", string.Create(CultureInfo.InvariantCulture,
                $"is {period.DurationSeconds:G3} s, less than {ShortestPeriodFraction:G1} of the whole schedule ({total:G3} s), too short for the run to tell it from its neighbours; merge it into the next period or run that part as a case of its own")));
        }
    }

    /// <summary>The shortest period a schedule may hold, as a fraction of the whole schedule.</summary>
    public const double ShortestPeriodFraction = 1e-6;

    /// <summary>
    /// The stages the periods' temperatures give: a period without one keeps the temperature of the period before,
    /// so the first must give one when any does; consecutive periods at one temperature make one stage, named after
    /// the periods it spans.
    /// </summary>
    private static List<TemperatureStage>? Stages(List<SchedulePeriod> periods, List<Written> written, ReadContext context)
    {
        if (written.Count == 0 || written.All(period => period.TemperatureKelvin is null))
        {
            return null;
        }

        if (written[0].TemperatureKelvin is null)
        {
            context.Errors.Add(new CaseError(written[0].Path + ".temperature",
                "is required in the first period, since a later period gives a temperature (each period keeps the temperature of the one before unless it gives its own)"));
            return null;
        }

        var stages = new List<TemperatureStage>();
        var first = 0;
        var temperature = written[0].TemperatureKelvin!.Value;
        for (var i = 1; i <= written.Count; i++)
        {
            var next = i < written.Count ? written[i].TemperatureKelvin ?? temperature : double.NaN;
            if (next == temperature)
            {
                continue;
            }

            var name = i - first == 1 ? periods[first].Label : $"{periods[first].Label} to {periods[i - 1].Label}";
            stages.Add(new TemperatureStage(name, periods[i - 1].EndSeconds - periods[first].StartSeconds, temperature));
            first = i;
            temperature = next;
        }

        return stages;
    }

    /// <summary>
    /// Checks that each face a period renews holds a medium that can be replaced: a compartment without sampling or a
    /// solubility of its own, or a bath given new properties (a bath never changes otherwise, a closed face holds nothing).
    /// </summary>
    public static void CheckFaces(IReadOnlyList<(Side Side, string Path, bool NewProperties)> named, FaceCondition left, FaceCondition right, ReadContext context)
    {
        foreach (var (side, path, newProperties) in named)
        {
            var face = side == Side.Left ? left : right;
            var problem = face switch
            {
                CompartmentFace { Sampling: not null } => "its compartment is sampled, and renewing a sampled compartment is not supported; give one or the other",
                CompartmentFace { SolubilityKgPerCubicMeter: not null } => "its compartment has a solubility, and renewing a medium with undissolved substance is not supported",
                CompartmentFace => null,
                BathFace when newProperties => null,
                BathFace => "it is a bath, whose concentration never changes unless the renewal gives it another, e.g. { \"face\": \"left\", \"concentration\": \"2 mg/mL\" }",
                _ => $"it is {face.KindName}; only a compartment's medium, or a bath's with new properties, can be renewed",
            };
            if (problem is not null)
            {
                context.Errors.Add(new CaseError(path, $"cannot renew the {SideName(side)} face: {problem}"));
            }
        }
    }

    /// <summary>The duration of the schedule checked against the one the case gives otherwise (error when they differ).</summary>
    public static void CheckDuration(ContactSchedule schedule, double givenSeconds, string givenPath, string givenText, ReadContext context)
    {
        if (Math.Abs(schedule.DurationSeconds - givenSeconds) > 1e-9 * givenSeconds)
        {
            context.Errors.Add(new CaseError(givenPath, string.Create(CultureInfo.InvariantCulture,
                $"is {givenText} but the schedule's periods last {schedule.DurationSeconds / 86400:0.######} d in all; they must agree")));
        }
    }

    private static List<Written> BlockPeriods(JsonFields block, ReadContext context)
    {
        var array = block.Member("periods")!.Value;
        if (array.ValueKind != JsonValueKind.Array || array.GetArrayLength() == 0)
        {
            block.Error("periods", $"expected a non-empty array of periods such as [ {{ \"name\": \"wear\", \"duration\": \"1 d\" }} ]; found {JsonFields.Describe(array)}");
            return [];
        }

        var blockName = block.Text("name");
        var result = new List<Written>();
        var index = 0;
        var failed = false;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{block.PathOf("periods")}[{index++}]";
            if (element.ValueKind == JsonValueKind.Object && element.TryGetProperty("periods", out _))
            {
                context.Errors.Add(new CaseError(path, "a block's periods cannot hold another block; repeat the inner periods in the outer block instead"));
                failed = true;
                continue;
            }

            if (JsonFields.Open(element, path, context.Errors, PeriodKeys.Where(key => key != "repeat").ToArray()) is not { } fields
                || Period(fields, context, blockName is null ? $"period {index}" : $"{blockName}, period {index}") is not { } period)
            {
                failed = true;
                continue;
            }

            result.Add(period);
        }

        return failed ? [] : result;
    }

    private static Written? Period(JsonFields period, ReadContext context, string defaultName)
    {
        var name = period.Text("name") ?? defaultName;
        var duration = ReadContext.Positive(period, "duration", Dimension.Time, required: true);
        var renewals = Renewals(period, context);
        var renewed = renewals?.Select(renewal => (renewal.Side, renewal.Path)).ToList();
        var closed = Faces(period, "close", "faces whose medium is taken out of contact at the period's start", context);
        var opened = Faces(period, "open", "faces whose medium is brought back into contact at the period's start", context);
        var temperature = ReadContext.Positive(period, "temperature", Dimension.Temperature, required: false);
        var removed = LayerNames(period, "remove", context);
        var applied = LayerNames(period, "apply", context);
        return duration is { } seconds && renewed is not null && removed is not null && applied is not null && closed is not null && opened is not null
            ? new Written(name, seconds, renewed, temperature, period.Path, removed, applied)
            {
                Closed = closed,
                Opened = opened,
                NewProperties = [.. renewals!.Where(renewal => renewal.Fields is not null).Select(renewal => (renewal.Side, renewal.Fields!))],
            }
            : null;
    }

    /// <summary>
    /// <c>renew</c>: faces, each <c>"left"</c> or <c>"right"</c> for a fresh portion like the one before, or an object
    /// <c>{ "face": "right", ... }</c> that gives the fresh portion other properties.
    /// </summary>
    private static List<(Side Side, string Path, JsonFields? Fields)>? Renewals(JsonFields period, ReadContext context)
    {
        if (period.Member("renew") is not { } array)
        {
            return [];
        }

        if (array.ValueKind != JsonValueKind.Array)
        {
            period.Error("renew", $"expected an array of faces whose medium is replaced by a fresh one at the period's start, e.g. [\"right\"] or [{{ \"face\": \"right\", \"volume\": \"200 mL\" }}]; found {JsonFields.Describe(array)}");
            return null;
        }

        var renewals = new List<(Side, string, JsonFields?)>();
        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{period.PathOf("renew")}[{index++}]";
            if (element.ValueKind != JsonValueKind.Object)
            {
                if (FaceSide(element, path, context) is not { } side)
                {
                    return null;
                }

                renewals.Add((side, path, null));
                continue;
            }

            if (JsonFields.Open(element, path, context.Errors, ScheduleMedia.Keys) is not { } fields)
            {
                return null;
            }

            if (!fields.Has("face"))
            {
                fields.Error("face", "is required: \"left\" or \"right\", the face whose medium is renewed");
                return null;
            }

            if (FaceSide(fields.Member("face")!.Value, fields.PathOf("face"), context) is not { } named)
            {
                return null;
            }

            renewals.Add((named, path, fields));
        }

        return renewals;
    }

    private static Side? FaceSide(JsonElement element, string path, ReadContext context)
    {
        switch (element.ValueKind == JsonValueKind.String ? element.GetString() : null)
        {
            case "left":
                return Side.Left;
            case "right":
                return Side.Right;
            default:
                context.Errors.Add(new CaseError(path, $"expected \"left\" or \"right\"; found {JsonFields.Describe(element)}"));
                return null;
        }
    }

    private static List<(string, string)>? LayerNames(JsonFields period, string key, ReadContext context)
    {
        if (period.Member(key) is not { } array)
        {
            return [];
        }

        if (array.ValueKind != JsonValueKind.Array)
        {
            period.Error(key, $"expected an array of layer names, e.g. [\"patch\"]; found {JsonFields.Describe(array)}");
            return null;
        }

        var names = new List<(string, string)>();
        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{period.PathOf(key)}[{index++}]";
            if (element.ValueKind != JsonValueKind.String)
            {
                context.Errors.Add(new CaseError(path, $"expected a layer name; found {JsonFields.Describe(element)}"));
                return null;
            }

            names.Add((element.GetString()!, path));
        }

        return names;
    }

    private static List<(Side, string)>? Faces(JsonFields period, string key, string what, ReadContext context)
    {
        if (period.Member(key) is not { } array)
        {
            return [];
        }

        if (array.ValueKind != JsonValueKind.Array)
        {
            period.Error(key, $"expected an array of {what}, e.g. [\"right\"]; found {JsonFields.Describe(array)}");
            return null;
        }

        var faces = new List<(Side, string)>();
        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{period.PathOf(key)}[{index++}]";
            if (FaceSide(element, path, context) is not { } side)
            {
                return null;
            }

            faces.Add((side, path));
        }

        return faces;
    }

    private static int? Repeat(JsonFields entry, bool required)
    {
        if (!entry.Has("repeat"))
        {
            if (required)
            {
                entry.Error("repeat", "is required in a block of periods: how many times the block runs, e.g. 3");
                return null;
            }

            return 1;
        }

        var count = entry.Integer("repeat");
        if (count is < 1 or > MaxPeriods)
        {
            entry.Error("repeat", string.Create(CultureInfo.InvariantCulture, $"must be a whole number from 1 to {MaxPeriods}; got {count}"));
            return null;
        }

        return count;
    }

    private static string SideName(Side side) => side == Side.Left ? "left" : "right";
}
