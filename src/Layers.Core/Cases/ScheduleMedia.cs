using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Turns the renewals that give the fresh portion other properties (<c>{ "face": "right", "volume": "200 mL" }</c>)
/// into the media each period runs with, once the faces are read. What a renewal does not give is that of the medium
/// before it, so a later plain renewal brings the new portion again. A face keeps its kind: a compartment's portion
/// may take another volume (or mass), K, film or fresh concentration; a bath another level, K or film. Its name,
/// contact area and density stay those the case gives, as every table and unit of the run is written for them.
/// </summary>
internal static class ScheduleMedia
{
    private static readonly string[] CompartmentKeys = ["face", "volume", "mass", "partitionCoefficient", "initialConcentration", "filmCoefficient"];
    private static readonly string[] BathKeys = ["face", "concentration", "partitionCoefficient", "filmCoefficient", "density"];

    /// <summary>Every key a renewal object may hold, whatever the face's kind (checked per kind once the faces are read).</summary>
    public static readonly string[] Keys = [.. CompartmentKeys.Union(BathKeys)];

    /// <summary>
    /// The schedule with the media its periods bring (<see cref="SchedulePeriod.NewMedia"/>), or null when there are
    /// errors (added to the context). A period lists a face only when its portion differs from the one before.
    /// </summary>
    /// <param name="schedule">The schedule read so far, or null when it has errors.</param>
    /// <param name="read">The schedule as written.</param>
    /// <param name="left">The left face as read.</param>
    /// <param name="right">The right face as read.</param>
    /// <param name="stages">The food-contact stages, whose K overrides of a face may not meet a renewal that gives its K.</param>
    /// <param name="context">Units, the partition basis and the errors.</param>
    public static ContactSchedule? Resolve(
        ContactSchedule? schedule, ScheduleReader.Result read, FaceCondition left, FaceCondition right, IReadOnlyList<TemperatureStage>? stages, ReadContext context)
    {
        if (schedule is null || read.PerPeriod.All(period => period.NewProperties.Count == 0))
        {
            return schedule;
        }

        var errorsBefore = context.Errors.Count;
        var changes = new Dictionary<JsonFields, Func<FaceCondition, FaceCondition>?>();
        var current = new[] { left, right };
        var periods = new List<SchedulePeriod>();
        for (var p = 0; p < schedule.Periods.Count; p++)
        {
            var fresh = new Dictionary<Side, FaceCondition>();
            foreach (var (side, fields) in read.PerPeriod[p].NewProperties)
            {
                // A repeated period is written once: read its renewal once, not once per repetition.
                if (!changes.TryGetValue(fields, out var change))
                {
                    change = Read(fields, side == Side.Left ? left : right, stages, context);
                    changes[fields] = change;
                }

                if (change?.Invoke(current[(int)side]) is { } next && next != current[(int)side])
                {
                    fresh[side] = next;
                    current[(int)side] = next;
                }
            }

            periods.Add(schedule.Periods[p] with { NewMedia = fresh });
        }

        return context.Errors.Count == errorsBefore ? new ContactSchedule(periods) : null;
    }

    /// <summary>
    /// What a renewal changes in the medium before it, or null when it has errors. The face's kind was checked with the
    /// plain renewals (<see cref="ScheduleReader.CheckFaces"/>).
    /// </summary>
    private static Func<FaceCondition, FaceCondition>? Read(JsonFields fields, FaceCondition face, IReadOnlyList<TemperatureStage>? stages, ReadContext context)
    {
        var side = fields.Member("face")!.Value.GetString()!;
        var (allowed, other, own) = face is BathFace ? (BathKeys, "a compartment", "a bath") : (CompartmentKeys, "a bath", "a compartment");
        var misplaced = Keys.Where(key => fields.Has(key) && !allowed.Contains(key)).ToArray();
        foreach (var key in misplaced)
        {
            fields.Error(key, $"is for {other}; the {side} face holds {own}, whose fresh portion may give {string.Join(", ", allowed.Skip(1))}");
        }

        if (misplaced.Length > 0 || face is not (BathFace or CompartmentFace))
        {
            return null;
        }

        if (fields.Has("partitionCoefficient") && stages is not null
            && stages.FirstOrDefault(stage => stage.FacePartitionOverrides.ContainsKey(side == "left" ? Side.Left : Side.Right)) is { } overriding)
        {
            fields.Error("partitionCoefficient", $"the food-contact stage '{overriding.Name}' gives the {side} medium's K too; give it in one place");
            return null;
        }

        var errorsBefore = context.Errors.Count;
        var density = face is CompartmentFace compartment ? compartment.DensityKgPerCubicMeter : ReadContext.Positive(fields, "density", Dimension.MassConcentration, required: false);
        var k = fields.Has("partitionCoefficient") ? context.PartitionCoefficient(fields, density) : null;
        var film = ReadContext.Positive(fields, "filmCoefficient", Dimension.Velocity, required: false);
        if (face is BathFace)
        {
            var level = fields.Has("concentration") ? context.Concentration(fields, "concentration", density) : null;
            return context.Errors.Count > errorsBefore
                ? null
                : medium => (BathFace)medium with
                {
                    ConcentrationKgPerCubicMeter = level ?? ((BathFace)medium).ConcentrationKgPerCubicMeter,
                    PartitionCoefficient = k ?? ((BathFace)medium).PartitionCoefficient,
                    FilmCoefficientMetersPerSecond = film ?? ((BathFace)medium).FilmCoefficientMetersPerSecond,
                };
        }

        var volume = Volume(fields, density, side);
        var initial = fields.Has("initialConcentration") ? context.Concentration(fields, "initialConcentration", density) : null;
        return context.Errors.Count > errorsBefore
            ? null
            : medium => (CompartmentFace)medium with
            {
                VolumeCubicMeters = volume ?? ((CompartmentFace)medium).VolumeCubicMeters,
                PartitionCoefficient = k ?? ((CompartmentFace)medium).PartitionCoefficient,
                InitialConcentrationKgPerCubicMeter = initial ?? ((CompartmentFace)medium).InitialConcentrationKgPerCubicMeter,
                FilmCoefficientMetersPerSecond = film ?? ((CompartmentFace)medium).FilmCoefficientMetersPerSecond,
            };
    }

    /// <summary>The fresh portion's volume, given directly or as a mass with the compartment's density; null when not given.</summary>
    private static double? Volume(JsonFields fields, double? density, string side)
    {
        if (fields.Has("volume") && fields.Has("mass"))
        {
            fields.Error("mass", "give either volume or mass, not both");
            return null;
        }

        if (!fields.Has("mass"))
        {
            return ReadContext.Positive(fields, "volume", Dimension.Volume, required: false);
        }

        if (density is null)
        {
            fields.Error("mass", $"needs the density of the {side} compartment to turn the mass into a volume; give volume, or give the compartment's density in the case");
            return null;
        }

        return ReadContext.Positive(fields, "mass", Dimension.Mass, required: false) / density;
    }
}
