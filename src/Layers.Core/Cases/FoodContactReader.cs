using System.Globalization;
using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads <c>foodContact</c>: the time-temperature stages, where each layer's D comes from, the food face, the
/// limits, a test condition and a worst-case partition convention. Read in two passes: <see cref="Read"/> before
/// the layers (the layers need to know which of them have an estimated D and what the duration is),
/// <see cref="Resolve"/> after them (names are checked and turned into layer indices and face sides). A layer's D
/// source (an estimate, an Arrhenius law) is handed to <see cref="LayerReader"/> through the <see cref="ReadContext"/>,
/// so that every layer is read with its source.
/// </summary>
internal static class FoodContactReader
{
    private static readonly string[] Keys =
    [
        "food", "stages", "layerDiffusion", "specificMigrationLimit", "detectionLimit", "testCondition",
        "equivalenceActivationEnergy", "partitionConvention",
    ];

    private static readonly string[] StageKeys = ["name", "duration", "temperature", "diffusionCoefficients", "partitionCoefficients"];
    private static readonly string[] TestKeys = ["duration", "temperature"];
    private static readonly string[] ArrheniusKeys = ["referenceTemperature", "activationEnergy"];
    private static readonly string[] EstimateKeys = ["polymer", "relativeMolarMass"];

    /// <summary>What the first pass found, with the JSON paths needed to report problems in the second.</summary>
    internal sealed class Input
    {
        public string? Food { get; set; }

        public List<(TemperatureStage Stage, string Path, Dictionary<string, string> OverridePaths, Dictionary<string, double> Diffusivities)> Stages { get; } = [];

        /// <summary>Per stage (same order as <see cref="Stages"/>), the partition coefficients as written, with their paths.</summary>
        public List<Dictionary<string, (double Written, string Path)>> StagePartitions { get; } = [];

        /// <summary>The layers named in <c>layerDiffusion</c>, with the path of each entry.</summary>
        public Dictionary<string, string> Layers { get; } = [];

        public double? Limit { get; set; }

        public double DetectionLimit { get; set; } = FoodContactSettings.DefaultDetectionLimit;

        public TemperatureStage? Test { get; set; }

        public double ActivationEnergy { get; set; } = Arrhenius.RegulatoryActivationEnergy;

        public string? Convention { get; set; }

        public string Path { get; set; } = "$.foodContact";

        public double TotalSeconds => Stages.Sum(stage => stage.Stage.DurationSeconds);
    }

    /// <summary>First pass; null when the case has no <c>foodContact</c>.</summary>
    /// <param name="root">The case document.</param>
    /// <param name="context">Errors and what the layers need to know.</param>
    /// <param name="scheduleStages">
    /// The stages the schedule's periods give by their temperatures, or null when none gives one; then
    /// <c>stages</c> must be left out.
    /// </param>
    /// <param name="schedulePath">Where the schedule is, for messages.</param>
    public static Input? Read(JsonFields root, ReadContext context, IReadOnlyList<TemperatureStage>? scheduleStages = null, string schedulePath = "$.schedule")
    {
        if (root.Member("foodContact") is not { } element
            || JsonFields.Open(element, root.PathOf("foodContact"), context.Errors, Keys) is not { } fields)
        {
            return null;
        }

        var input = new Input { Path = fields.Path };
        input.Food = fields.Text("food");
        if (input.Food is not (null or "left" or "right"))
        {
            fields.Error("food", $"expected \"left\" or \"right\"; got \"{input.Food}\"");
        }

        if (scheduleStages is null)
        {
            ReadStages(fields, input, context);
        }
        else if (fields.Has("stages"))
        {
            fields.Error("stages", $"must be left out: the periods of {schedulePath} give the temperatures");
        }
        else
        {
            foreach (var stage in scheduleStages)
            {
                input.Stages.Add((stage, schedulePath, [], []));
                input.StagePartitions.Add([]);
            }
        }

        ReadLayerDiffusion(fields, input, context);
        input.Limit = ReadContext.Positive(fields, "specificMigrationLimit", Dimension.MassFraction, required: false);
        input.DetectionLimit = ReadContext.Positive(fields, "detectionLimit", Dimension.MassFraction, required: false) ?? input.DetectionLimit;
        if (fields.Member("testCondition") is { } testElement
            && JsonFields.Open(testElement, fields.PathOf("testCondition"), context.Errors, TestKeys) is { } test)
        {
            var duration = ReadContext.Positive(test, "duration", Dimension.Time, required: true);
            var temperature = ReadContext.Positive(test, "temperature", Dimension.Temperature, required: true);
            input.Test = duration is { } d && temperature is { } t ? new TemperatureStage("test", d, t) : null;
        }

        input.ActivationEnergy = ReadContext.Positive(fields, "equivalenceActivationEnergy", Dimension.MolarEnergy, required: false)
            ?? input.ActivationEnergy;
        input.Convention = fields.Text("partitionConvention");
        if (input.Convention is { } convention && !PartitionConvention.Values.ContainsKey(convention))
        {
            fields.Error("partitionConvention", $"expected one of {string.Join(", ", PartitionConvention.Values.Keys.Select(key => $"\"{key}\""))}; got \"{convention}\"");
            input.Convention = null;
        }

        return input;
    }

    /// <summary>
    /// Second pass: checks names against the layers and the food face, applies the partition convention, and
    /// returns the settings with the layers.
    /// </summary>
    public static (FoodContactSettings? Settings, List<Layer> Layers) Resolve(
        Input input, JsonFields root, List<Layer> layers, FaceCondition? left, FaceCondition? right, ReadContext context)
    {
        // Names as written, so that a layer dropped for an error of its own is still known here.
        var written = WrittenLayerNames(root);
        var names = written.ToHashSet(StringComparer.Ordinal);
        var known = string.Join(", ", written.Select(name => $"'{name}'"));
        foreach (var (name, path) in input.Layers.Where(pair => !names.Contains(pair.Key)))
        {
            context.Errors.Add(new CaseError(path, $"no layer is named '{name}'; the layers are {known}"));
        }

        foreach (var (_, _, overrides, _) in input.Stages)
        {
            foreach (var (name, path) in overrides.Where(pair => !names.Contains(pair.Key)))
            {
                context.Errors.Add(new CaseError(path, $"no layer is named '{name}'; the layers are {known}"));
            }
        }

        var partitions = StagePartitions(input, layers, left, right, context);

        var side = FoodSide(input, left, right, context);
        var convention = ApplyConvention(input, root, layers, side is { } s ? (s == Side.Left ? left : right) : null, context);
        if (side is not { } foodSide || input.Stages.Count == 0 || context.Errors.Count > 0)
        {
            return (null, layers);
        }

        // Names are turned into layer indices and face sides here, once; everything after reads the typed keys.
        var stages = input.Stages.Select((entry, index) => entry.Stage with
        {
            DiffusivityOverrides = entry.Diffusivities.ToDictionary(pair => IndexOf(convention, pair.Key), pair => pair.Value),
            LayerPartitionOverrides = partitions[index].Layers,
            FacePartitionOverrides = partitions[index].Faces,
        }).ToArray();
        return (new FoodContactSettings
        {
            Stages = stages,
            FoodSide = foodSide,
            SpecificMigrationLimit = input.Limit,
            DetectionLimit = input.DetectionLimit,
            TestCondition = input.Test,
            EquivalenceActivationEnergy = input.ActivationEnergy,
            PartitionConvention = input.Convention,
        }, convention);
    }

    private static List<string> WrittenLayerNames(JsonFields root)
    {
        var names = new List<string>();
        if (root.Member("layers") is { ValueKind: JsonValueKind.Array } array)
        {
            foreach (var element in array.EnumerateArray())
            {
                if (element.ValueKind == JsonValueKind.Object
                    && element.TryGetProperty("name", out var name)
                    && name.ValueKind == JsonValueKind.String)
                {
                    names.Add(name.GetString()!);
                }
            }
        }

        return names;
    }

    private static void ReadStages(JsonFields fields, Input input, ReadContext context)
    {
        if (fields.Member("stages", required: true) is not { } array)
        {
            return;
        }

        if (array.ValueKind != JsonValueKind.Array || array.GetArrayLength() == 0)
        {
            fields.Error("stages", $"expected a non-empty array of stages such as {{ \"duration\": \"10 d\", \"temperature\": \"25 degC\" }}; found {JsonFields.Describe(array)}");
            return;
        }

        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{fields.PathOf("stages")}[{index++}]";
            if (JsonFields.Open(element, path, context.Errors, StageKeys) is not { } stage)
            {
                continue;
            }

            var name = stage.Text("name") ?? $"stage {index}";
            var duration = ReadContext.Positive(stage, "duration", Dimension.Time, required: true);
            var temperature = ReadContext.Positive(stage, "temperature", Dimension.Temperature, required: true);
            var overrides = new Dictionary<string, double>(StringComparer.Ordinal);
            var paths = new Dictionary<string, string>(StringComparer.Ordinal);
            if (stage.Member("diffusionCoefficients") is { } map)
            {
                if (map.ValueKind != JsonValueKind.Object)
                {
                    stage.Error("diffusionCoefficients", $"expected an object of layer name to diffusion coefficient, e.g. {{ \"core layer\": \"1e-9 cm2/s\" }}; found {JsonFields.Describe(map)}");
                }
                else
                {
                    foreach (var member in map.EnumerateObject())
                    {
                        var memberPath = $"{stage.PathOf("diffusionCoefficients")}.{member.Name}";
                        paths[member.Name] = memberPath;
                        if (JsonFields.ParseQuantity(member.Value, memberPath, [Dimension.Diffusivity], context.Errors) is { } value)
                        {
                            if (value.SiValue > 0)
                            {
                                overrides[member.Name] = value.SiValue;
                            }
                            else
                            {
                                context.Errors.Add(new CaseError(memberPath, $"must be > 0; got '{member.Value.GetString()?.Trim()}'"));
                            }
                        }
                    }
                }
            }

            var partitions = ReadStagePartitions(stage, context);
            if (duration is { } d && temperature is { } t)
            {
                input.Stages.Add((new TemperatureStage(name, d, t), path, paths, overrides));
                input.StagePartitions.Add(partitions);
            }
        }
    }

    private static Dictionary<string, (double Written, string Path)> ReadStagePartitions(JsonFields stage, ReadContext context)
    {
        var written = new Dictionary<string, (double, string)>(StringComparer.Ordinal);
        if (stage.Member("partitionCoefficients") is not { } map)
        {
            return written;
        }

        if (map.ValueKind != JsonValueKind.Object)
        {
            stage.Error("partitionCoefficients", $"expected an object of layer or face name to partition coefficient, e.g. {{ \"sealant\": 1000 }}; found {JsonFields.Describe(map)}");
            return written;
        }

        foreach (var member in map.EnumerateObject())
        {
            var path = $"{stage.PathOf("partitionCoefficients")}.{member.Name}";
            if (member.Value.ValueKind == JsonValueKind.Number && member.Value.GetDouble() is var k && k > 0 && double.IsFinite(k))
            {
                written[member.Name] = (k, path);
            }
            else
            {
                context.Errors.Add(new CaseError(path, $"expected a number > 0 (a partition coefficient has no unit); found {JsonFields.Describe(member.Value)}"));
            }
        }

        return written;
    }

    /// <summary>
    /// The stages' partition coefficients on the volume basis, checked against the layer and face names; a stage
    /// cannot change K while a partition convention sets it.
    /// </summary>
    private static int IndexOf(List<Layer> layers, string name) => layers.FindIndex(layer => string.Equals(layer.Name, name, StringComparison.Ordinal));

    /// <summary>
    /// Per stage, the partition coefficients it gives, by layer index and by face side. A name shared by a layer
    /// and a face gives its value to both, as the file cannot tell them apart.
    /// </summary>
    private static List<(Dictionary<int, double> Layers, Dictionary<Side, double> Faces)> StagePartitions(
        Input input, List<Layer> layers, FaceCondition? left, FaceCondition? right, ReadContext context)
    {
        var media = layers.Select(layer => (layer.Name, layer.DensityKgPerCubicMeter))
            .Concat(new[] { left, right }.Select(Medium).OfType<(string, double?)>())
            .GroupBy(medium => medium.Item1, StringComparer.Ordinal)
            .ToDictionary(group => group.Key, group => group.First().Item2, StringComparer.Ordinal);
        var known = string.Join(", ", media.Keys.Select(name => $"'{name}'"));
        var result = new List<(Dictionary<int, double> Layers, Dictionary<Side, double> Faces)>();
        foreach (var written in input.StagePartitions)
        {
            var stage = new Dictionary<string, double>(StringComparer.Ordinal);
            foreach (var (name, (k, path)) in written)
            {
                if (input.Convention is not null)
                {
                    context.Errors.Add(new CaseError(path, $"must be left out when {input.Path}.partitionConvention is given (the convention sets K for the whole history)"));
                }
                else if (!media.TryGetValue(name, out var density))
                {
                    context.Errors.Add(new CaseError(path, $"no layer or face is named '{name}'; the names are {known}"));
                }
                else if (context.Basis == PartitionBasis.Volume)
                {
                    stage[name] = k;
                }
                else if (density is { } rho && context.ReferenceDensity is { } reference)
                {
                    stage[name] = k * rho / reference;
                }
                else
                {
                    context.Errors.Add(new CaseError(path, $"needs the density of '{name}' (and of the reference medium) because partitionBasis is \"mass\""));
                }
            }

            result.Add((
                stage.SelectMany(pair => Enumerable.Range(0, layers.Count).Where(index => layers[index].Name == pair.Key).Select(index => (index, pair.Value)))
                    .ToDictionary(entry => entry.index, entry => entry.Value),
                stage.SelectMany(pair => new[] { (Side.Left, left), (Side.Right, right) }.Where(face => Medium(face.Item2)?.Name == pair.Key).Select(face => (face.Item1, pair.Value)))
                    .ToDictionary(entry => entry.Item1, entry => entry.Value)));
        }

        return result;
    }

    private static (string Name, double? Density)? Medium(FaceCondition? face) => face switch
    {
        CompartmentFace compartment => (compartment.Name, compartment.DensityKgPerCubicMeter),
        BathFace bath => (bath.Name, null),
        _ => null,
    };

    private static void ReadLayerDiffusion(JsonFields fields, Input input, ReadContext context)
    {
        if (fields.Member("layerDiffusion") is not { } map)
        {
            return;
        }

        if (map.ValueKind != JsonValueKind.Object)
        {
            fields.Error("layerDiffusion", $"expected an object of layer name to settings; found {JsonFields.Describe(map)}");
            return;
        }

        foreach (var member in map.EnumerateObject())
        {
            var path = $"{fields.PathOf("layerDiffusion")}.{member.Name}";
            var isEstimate = member.Value.ValueKind == JsonValueKind.Object && member.Value.TryGetProperty("polymer", out _);
            if (JsonFields.Open(member.Value, path, context.Errors, isEstimate ? EstimateKeys : ArrheniusKeys) is not { } entry)
            {
                continue;
            }

            if (isEstimate)
            {
                // Even with a mistake in the estimate, the layer is meant to give no D of its own: say so only once.
                var polymerName = entry.Text("polymer", required: true);
                var polymer = polymerName is null ? null : PolymerTable.Find(polymerName);
                if (polymerName is not null && polymer is null)
                {
                    entry.Error("polymer", $"unknown polymer '{polymerName}'; known: {string.Join(", ", PolymerTable.All.Select(row => row.Name))}");
                }

                var molarMass = entry.Number("relativeMolarMass", required: true);
                if (molarMass is { } mass && !(mass > 0))
                {
                    entry.Error("relativeMolarMass", $"must be > 0; got {mass.ToString(CultureInfo.InvariantCulture)}");
                    molarMass = null;
                }

                input.Layers[member.Name] = path;
                context.EstimatedDiffusivities[member.Name] = polymer is not null && molarMass is { } m ? new EstimatedDiffusivity(polymer, m) : null;
                continue;
            }

            var reference = ReadContext.Positive(entry, "referenceTemperature", Dimension.Temperature, required: true);
            var energy = entry.Quantity("activationEnergy", [Dimension.MolarEnergy], required: true);
            if (energy is { } e && !(e.SiValue >= 0))
            {
                entry.Error("activationEnergy", $"must be >= 0; got '{entry.Written("activationEnergy")}'");
                energy = null;
            }

            input.Layers[member.Name] = path;
            if (reference is { } r && energy is { } ea)
            {
                context.ArrheniusLaws[member.Name] = (r, ea.SiValue);
            }
        }
    }

    private static Side? FoodSide(Input input, FaceCondition? left, FaceCondition? right, ReadContext context)
    {
        var path = $"{input.Path}.food";
        switch (input.Food)
        {
            case "left" when left is { HasFiniteVolume: true }:
                return Side.Left;
            case "right" when right is { HasFiniteVolume: true }:
                return Side.Right;
            case "left" or "right":
                if ((input.Food == "left" ? left : right) is not null)
                {
                    context.Errors.Add(new CaseError(path, $"the food must be a compartment; $.{input.Food} is not"));
                }

                return null;
            case null when left is { HasFiniteVolume: true } && right is { HasFiniteVolume: true }:
                context.Errors.Add(new CaseError(path, "is required: both faces are compartments; say which one is the food (\"left\" or \"right\")"));
                return null;
            case null when left is { HasFiniteVolume: true }:
                return Side.Left;
            case null when right is { HasFiniteVolume: true }:
                return Side.Right;
            case null when left is not null && right is not null:
                context.Errors.Add(new CaseError(input.Path, "needs the food as a compartment on one face; neither $.left nor $.right is a compartment"));
                return null;
            default:
                return null;
        }
    }

    /// <summary>
    /// A worst-case convention gives every layer K = K_P,F relative to the food (the food's own K stays 1), so a K
    /// written in the case would be silently overruled: that is an error instead.
    /// </summary>
    private static List<Layer> ApplyConvention(Input input, JsonFields root, List<Layer> layers, FaceCondition? food, ReadContext context)
    {
        if (input.Convention is not { } convention)
        {
            return layers;
        }

        var conventionPath = $"{input.Path}.partitionConvention";
        if (root.Member("layers") is { ValueKind: JsonValueKind.Array } array)
        {
            var index = 0;
            foreach (var element in array.EnumerateArray())
            {
                if (element.ValueKind == JsonValueKind.Object && element.TryGetProperty("partitionCoefficient", out _))
                {
                    context.Errors.Add(new CaseError($"$.layers[{index}].partitionCoefficient", $"must be left out when {conventionPath} is given (the convention sets it)"));
                }

                index++;
            }
        }

        if (food is CompartmentFace compartment && compartment.PartitionCoefficient != 1)
        {
            context.Errors.Add(new CaseError(conventionPath, "needs the food's partition coefficient to be 1 (the food is what K_P,F refers to)"));
        }

        var k = PartitionConvention.Values[convention];
        return layers.Select(layer => layer with { PartitionCoefficient = k }).ToList();
    }
}
