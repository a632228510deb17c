using System.Globalization;
using System.Text;
using System.Text.Json;
using Layers.Core.Files;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Simulation;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads a JSON case file into a validated <see cref="SimulationCase"/> in SI units, or into the complete list of
/// its errors, each with its JSON path. The format is described in docs/case-format.md and docs/case.schema.json.
/// </summary>
public static class CaseReader
{
    private static readonly string[] TopKeys =
    [
        "$schema", "title", "description", "partitionBasis", "referenceMedium", "layers", "left", "right",
        "duration", "reportTimes", "extraOutputTimes", "depths", "numerics", "display", "sweep", "foodContact", "permeationTest",
        "design", "uncertainty", "schedule",
    ];

    private static readonly string[] ReferenceKeys = ["name", "density"];
    private static readonly string[] NumericsKeys = ["accuracy", "cells", "method", "minimumCellsPerLayer", "negligibleAmount", "relativeTolerance"];

    // Standard JSON only, as docs/case-format.md promises: a case file must also open in editors, schema
    // validators and scripts, which reject comments and trailing commas.
    private static readonly JsonDocumentOptions ParseOptions = new()
    {
        AllowTrailingCommas = false,
        CommentHandling = JsonCommentHandling.Disallow,
    };

    /// <summary>Reads a case file from disk (<see cref="InputFile"/>: a regular UTF-8 file within the size limit).</summary>
    /// <param name="path">The case file.</param>
    /// <param name="access">Which files the case may name; by default only those in its own folder.</param>
    /// <param name="studySections">Checks the study sections of the document, if it declares any; see <see cref="ReadText"/>.</param>
    public static CaseReadResult ReadFile(string path, CaseFileAccess access = CaseFileAccess.InsideCaseFolder, StudySectionCheck? studySections = null)
    {
        if (ReadDocument(path, out var error) is not { } text)
        {
            return new CaseReadResult(path, null, [error!]);
        }

        return ReadText(text, path, access, studySections);
    }

    /// <summary>The text of a case file, or null with the error that says why it cannot be read.</summary>
    public static string? ReadDocument(string path, out CaseError? error)
    {
        var text = InputFile.ReadText(path, InputFile.CaseLimitBytes, out var problem);
        error = problem is null ? null : new CaseError("$", problem.StartsWith("cannot read the file", StringComparison.Ordinal) ? problem : $"cannot read the file: {problem}");
        return text;
    }

    /// <summary>Reads a case from JSON text; <paramref name="fileName"/> names it in messages and gives the default title.</summary>
    /// <param name="json">The case document.</param>
    /// <param name="fileName">The case file: named in messages, gives the default title, and is where the files the case names are looked for.</param>
    /// <param name="access">Which files the case may name; by default only those in its own folder.</param>
    /// <param name="studySections">
    /// Checks the study sections (<c>design</c>, <c>uncertainty</c>) of a document that declares one, once the case
    /// itself is valid; null leaves them unchecked. Studies sit above case reading, so they hand their check in:
    /// Studies.CaseDocument reads a case file with it.
    /// </param>
    public static CaseReadResult ReadText(string json, string fileName, CaseFileAccess access = CaseFileAccess.InsideCaseFolder, StudySectionCheck? studySections = null)
    {
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(json, ParseOptions);
        }
        catch (JsonException exception)
        {
            var reason = FirstSentence(exception.Message);
            var hint = reason.StartsWith("'/'", StringComparison.Ordinal)
                ? " Comments are not allowed in a case file; put notes in \"description\"."
                : string.Empty;
            var line = exception.LineNumber ?? 0;
            var column = CharacterColumn(json, line, exception.BytePositionInLine ?? 0);
            var error = new CaseError("$", $"not valid JSON: {reason}{hint}", line + 1, column);
            return new CaseReadResult(fileName, null, [error]);
        }

        using (document)
        {
            var errors = new List<CaseError>();
            var simulation = Read(document.RootElement, fileName, new ReadContext(errors, access));
            if (errors.Count == 0 && document.RootElement.ValueKind == JsonValueKind.Object && document.RootElement.TryGetProperty("sweep", out _))
            {
                // A sweep document read as one case is its base case; once that is valid its sweep must still
                // expand, so that `layers check` reports the sweep's own mistakes too.
                errors.AddRange(SweepExpander.Expand(json, fileName).Errors);
            }

            if (errors.Count == 0 && studySections is not null && DeclaresStudy(document.RootElement))
            {
                // Likewise the study sections: read as one case the file is its base case, and `layers check`
                // reports the mistakes of its design or uncertainty study. Only then is the document parsed again
                // (as a mutable tree), which a plain case in a large batch need not pay for.
                errors.AddRange(studySections(json, fileName, simulation!));
            }

            if (errors.Count == 0)
            {
                var hash = Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(Encoding.UTF8.GetBytes(json)));
                return new CaseReadResult(fileName, simulation! with { SourceSha256 = hash }, errors);
            }

            var positions = JsonPositions.Of(json);
            var located = errors.Select(error => positions.Find(error.JsonPath) is { } at
                ? error with { Line = at.Line, Column = at.Column }
                : error).ToArray();
            return new CaseReadResult(fileName, null, located);
        }
    }

    private static bool DeclaresStudy(JsonElement root) =>
        root.ValueKind == JsonValueKind.Object && (root.TryGetProperty("design", out _) || root.TryGetProperty("uncertainty", out _));

    private static SimulationCase? Read(JsonElement rootElement, string fileName, ReadContext context)
    {
        if (JsonFields.Open(rootElement, "$", context.Errors, TopKeys) is not { } root)
        {
            return null;
        }

        root.Text("$schema");
        var title = root.Text("title") ?? Path.GetFileNameWithoutExtension(fileName);
        root.Text("description");
        var referenceName = ReadBasisAndReference(root, context);
        // The schedule first: periods that give temperatures stand for the food-contact stages.
        var schedule = ScheduleReader.Read(root, context);
        var food = FoodContactReader.Read(root, context, schedule?.Stages, root.PathOf("schedule"));
        if (schedule?.Stages is not null && food is null)
        {
            root.Error("schedule", "gives temperatures, which only a case with foodContact uses (each layer's D at a temperature); add foodContact or leave the temperatures out");
        }

        var errorsBeforeLayers = context.Errors.Count;
        var layers = LayerReader.Read(root, context);
        var layersRead = context.Errors.Count == errorsBeforeLayers;
        var (duration, durationText) = ReadDuration(root, food, schedule?.Schedule, context);
        context.DurationSeconds = duration;
        context.DurationText = durationText;
        var left = FaceReader.Read(root, "left", context);
        var right = FaceReader.Read(root, "right", context);
        var reports = TimesReader.List(root, "reportTimes", duration, durationText, ascending: true, context, CaseLimits.MaxReportTimes);
        var extra = TimesReader.List(root, "extraOutputTimes", duration, durationText, ascending: false, context);
        var depths = DepthsReader.Read(root, layersRead ? layers : [], context);
        var numerics = ReadNumerics(root, context);
        // Only report times the case writes move the time unit: the default ones are fractions of the duration, which
        // read well in the duration's own unit.
        var display = DisplayReader.Read(root, context, duration ?? 1, reports ?? [], layers);
        FoodContactSettings? foodSettings = null;
        if (food is not null)
        {
            (foodSettings, layers) = FoodContactReader.Resolve(food, root, layers, left, right, context);
        }

        var contactSchedule = schedule?.Schedule;
        if (schedule is { } read && left is not null && right is not null)
        {
            ScheduleReader.CheckFaces(read.NamedFaces, left, right, context);
            contactSchedule = layersRead ? ScheduleLayerChanges.Resolve(read, layers, left, right, context) : null;
            contactSchedule = ScheduleMedia.Resolve(contactSchedule, read, left, right, foodSettings?.Stages, context);
        }

        var permeationTest = PermeationTestReader.Read(root, context, fileName, right);
        if (context.Errors.Count > 0 || left is null || right is null || duration is not { } end)
        {
            return null;
        }

        var simulation = new SimulationCase
        {
            Title = title,
            Stack = new LayerStack(layers),
            Left = left,
            Right = right,
            ReferenceMedium = referenceName,
            DurationSeconds = end,
            ReportTimesSeconds = (IReadOnlyList<double>?)reports ?? TimesReader.DefaultReportFractions.Select(fraction => fraction * end).ToArray(),
            ExtraOutputTimesSeconds = extra?.Order().ToArray() ?? [],
            ReportDepthsMeters = depths,
            Numerics = numerics,
            Display = display,
            FoodContact = foodSettings,
            PermeationTest = permeationTest,
            Schedule = contactSchedule,
        };
        if (numerics.Method == SolutionMethod.Laplace && LaplaceApplicability.Of(simulation) is { IsApplicable: false } applicability)
        {
            context.Errors.Add(new CaseError(
                root.PathOf("numerics") + ".method",
                "\"laplace\" needs a case the exact method can serve, but " + string.Join("; ", applicability.Reasons)
                + "; use \"auto\" or \"finiteVolume\""));
            return null;
        }

        return simulation;
    }

    /// <summary>
    /// The duration: given, or with food-contact stages their sum (then it must not be given as well), or with a
    /// schedule the sum of its periods (given as well, it must agree; with stages, the stages' sum must).
    /// </summary>
    private static (double? Seconds, string Text) ReadDuration(JsonFields root, FoodContactReader.Input? food, ContactSchedule? schedule, ReadContext context)
    {
        if (root.Has("schedule") && food is null && !root.Has("duration"))
        {
            // A schedule with mistakes has no duration to give, and its own errors say why.
            return schedule is null ? (null, string.Empty) : (schedule.DurationSeconds, string.Create(CultureInfo.InvariantCulture, $"{schedule.DurationSeconds / 86400:0.####} d, the sum of the periods"));
        }

        var (seconds, text) = ReadGivenDuration(root, food, context);
        if (schedule is not null && seconds is { } given)
        {
            ScheduleReader.CheckDuration(schedule, given, food is null ? root.PathOf("duration") : root.PathOf("foodContact") + ".stages", text, context);
        }

        return (seconds, text);
    }

    private static (double? Seconds, string Text) ReadGivenDuration(JsonFields root, FoodContactReader.Input? food, ReadContext context)
    {
        if (food is null)
        {
            return (TimesReader.Duration(root, context), root.Written("duration"));
        }

        if (root.Has("duration"))
        {
            root.Error("duration", "must be left out: $.foodContact.stages give the duration");
        }

        var total = food.TotalSeconds;
        return total > 0
            ? (total, string.Create(CultureInfo.InvariantCulture, $"{total / 86400:0.####} d, the sum of the stages"))
            : (null, string.Empty);
    }

    private static string ReadBasisAndReference(JsonFields root, ReadContext context)
    {
        switch (root.Text("partitionBasis"))
        {
            case null or "volume":
                break;
            case "mass":
                context.Basis = PartitionBasis.Mass;
                break;
            case var other:
                root.Error("partitionBasis", $"expected \"volume\" or \"mass\"; got \"{other}\"");
                break;
        }

        var name = "reference medium";
        if (root.Member("referenceMedium") is { } element
            && JsonFields.Open(element, root.PathOf("referenceMedium"), context.Errors, ReferenceKeys) is { } reference)
        {
            name = reference.Text("name") ?? name;
            context.ReferenceDensity = ReadContext.Positive(reference, "density", Dimension.MassConcentration, required: false);
        }

        if (context.Basis == PartitionBasis.Mass && context.ReferenceDensity is null)
        {
            context.Errors.Add(new CaseError($"{root.PathOf("referenceMedium")}.density", "is required because partitionBasis is \"mass\""));
        }

        return name;
    }

    private static NumericsSettings ReadNumerics(JsonFields root, ReadContext context)
    {
        var settings = NumericsSettings.Default;
        if (root.Member("numerics") is not { } element
            || JsonFields.Open(element, root.PathOf("numerics"), context.Errors, NumericsKeys) is not { } numerics)
        {
            return settings;
        }

        // A target accuracy (given, or the default when no cell count is given) picks the mesh and the tolerance;
        // a cell count asks for the shared-count mesh, at the tolerance of the accuracy when one is given. Keys given
        // beside either override their choice.
        var cells = numerics.Integer("cells");
        if (numerics.Number("accuracy") is { } accuracy)
        {
            if (accuracy is >= NumericsSettings.FinestAccuracy and <= NumericsSettings.CoarsestAccuracy)
            {
                settings = NumericsSettings.ForAccuracy(accuracy);
            }
            else
            {
                numerics.Error("accuracy", FormattableString.Invariant(
                    $"must be from {NumericsSettings.FinestAccuracy:0e0} to {NumericsSettings.CoarsestAccuracy:0e0} (a relative accuracy such as 1e-4); got {accuracy}"));
            }
        }
        else if (cells is not null)
        {
            settings = settings with { Solver = settings.Solver with { RelativeTolerance = NumericsSettings.CellCountRelativeTolerance } };
        }

        var minimumCells = numerics.Integer("minimumCellsPerLayer");
        GridOptions grid = cells is { } count ? new CellCountMesh(count) : settings.Grid;
        grid = grid with { MinimumCellsPerLayer = minimumCells ?? grid.MinimumCellsPerLayer };
        settings = new NumericsSettings(
            grid,
            settings.Solver with { RelativeTolerance = numerics.Number("relativeTolerance") ?? settings.Solver.RelativeTolerance })
        {
            Accuracy = settings.Accuracy,
            NegligibleAmountPerArea = NegligibleAmount(numerics),
            Method = ReadMethod(numerics),
        };
        foreach (var (setting, message) in settings.Problems())
        {
            numerics.Error(setting, message);
        }

        return settings;
    }

    private static SolutionMethod ReadMethod(JsonFields numerics)
    {
        switch (numerics.Text("method"))
        {
            case null:
            case "auto":
                return SolutionMethod.Auto;
            case "finiteVolume":
                return SolutionMethod.FiniteVolume;
            case "laplace":
                return SolutionMethod.Laplace;
            default:
                numerics.Error("method", $"must be \"auto\", \"finiteVolume\" or \"laplace\"; got \"{numerics.Written("method")}\"");
                return SolutionMethod.Auto;
        }
    }

    private static double? NegligibleAmount(JsonFields numerics)
    {
        if (numerics.Quantity("negligibleAmount", [Dimension.MassPerArea]) is not { } amount)
        {
            return null;
        }

        if (!(amount.SiValue > 0))
        {
            numerics.Error("negligibleAmount", $"must be a positive mass per area such as \"1 ng/dm2\"; got {numerics.Written("negligibleAmount")}");
            return null;
        }

        return amount.SiValue;
    }

    /// <summary>
    /// The 1-based column, in characters as editors count them, of a position the JSON parser gives in UTF-8 bytes
    /// from the start of a 0-based line; "µm" before the position would otherwise shift it.
    /// </summary>
    private static long CharacterColumn(string json, long lineIndex, long bytePosition)
    {
        var lines = json.Split('\n');
        if (lineIndex >= lines.Length)
        {
            return bytePosition + 1;
        }

        var bytes = Encoding.UTF8.GetBytes(lines[lineIndex]);
        var length = (int)Math.Min(bytePosition, bytes.Length);
        return Encoding.UTF8.GetCharCount(bytes, 0, length) + 1;
    }

    private static string FirstSentence(string message)
    {
        var end = message.IndexOf(". ", StringComparison.Ordinal);
        return end > 0 ? message[..(end + 1)] : message;
    }
}
