using Layers.Core.Domain;

namespace Layers.Core.Cases;

/// <summary>
/// Turns the faces a schedule's periods close and open (<c>close</c>, <c>open</c>) and the layers they take off
/// (<c>remove</c>) or put on (<c>apply</c>) into the schedule's changes once the layers and faces are read, and checks
/// that the run can follow them: faces as <see cref="Faces"/> says; for layers, every layer is on at the start; only outer
/// layers are ever off, in one block from a face inward, and that face is closed (nothing is left touching air or a
/// medium through a gap); a layer is taken off only while on; some layer always stays on.
/// </summary>
internal static class ScheduleLayerChanges
{
    /// <summary>The schedule with its layer changes, or null when there are errors (added to the context).</summary>
    public static ContactSchedule? Resolve(ScheduleReader.Result read, IReadOnlyList<Layer> layers, FaceCondition left, FaceCondition right, ReadContext context)
    {
        if (read.Schedule is not { } schedule)
        {
            return null;
        }

        var withFaces = Faces(read, schedule, left, right, context);
        if (withFaces is null || read.PerPeriod.All(period => period.Removed.Count == 0 && period.Applied.Count == 0))
        {
            return withFaces;
        }

        schedule = withFaces;

        var errorsBefore = context.Errors.Count;
        var known = string.Join(", ", layers.Select(layer => $"'{layer.Name}'"));
        var off = new HashSet<int>();
        var periods = new List<SchedulePeriod>();
        for (var p = 0; p < schedule.Periods.Count; p++)
        {
            var written = read.PerPeriod[p];
            var changes = written.Removed.Concat(written.Applied).ToList();
            if (p == 0 && changes.Count > 0)
            {
                context.Errors.Add(new CaseError(changes[0].Path, "every layer is on at the start: take layers off or put them on from the second period on"));
                return null;
            }

            var removed = Indices(written.Removed, layers, known, context);
            var applied = Indices(written.Applied, layers, known, context);
            if (removed is null || applied is null)
            {
                return null;
            }

            foreach (var (layer, path) in removed.Where(pair => off.Contains(pair.Layer)))
            {
                context.Errors.Add(new CaseError(path, $"'{layers[layer].Name}' is off already at the start of {schedule.Periods[p].Label}; put it on again with \"apply\" first"));
            }

            foreach (var (layer, path) in removed.Concat(applied).Where(pair => layers[pair.Layer].SolubilityKgPerCubicMeter is not null))
            {
                context.Errors.Add(new CaseError(path, $"'{layers[layer].Name}' has a solubility; a layer with undissolved substance cannot be taken off or put on"));
            }

            var after = off.Union(removed.Select(pair => pair.Layer)).Except(applied.Select(pair => pair.Layer)).ToHashSet();
            var involved = off.Union(removed.Select(pair => pair.Layer)).Union(applied.Select(pair => pair.Layer)).ToHashSet();
            var fromLeft = Enumerable.Range(0, layers.Count).TakeWhile(involved.Contains).Count();
            var fromRight = Enumerable.Range(0, layers.Count).Reverse().TakeWhile(involved.Contains).Count();
            if (fromLeft == layers.Count)
            {
                // Every layer is involved (a single layer replaced, say): they are taken off at the closed face.
                (fromLeft, fromRight) = left is ClosedFace ? (layers.Count, 0) : (0, layers.Count);
            }

            var at = changes.Count > 0 ? changes[0].Path : written.Path;
            if (after.Count >= layers.Count)
            {
                context.Errors.Add(new CaseError(at, $"would take every layer off at the start of {schedule.Periods[p].Label}; some layer must stay on"));
            }
            else if (fromLeft + fromRight < involved.Count)
            {
                context.Errors.Add(new CaseError(at, $"only outer layers can be taken off or put on: those involved at the start of {schedule.Periods[p].Label} must run from a face of the stack inward, with no layer on between them and the face"));
            }
            else
            {
                CheckClosed(fromLeft > 0, left, "left", at, context);
                CheckClosed(fromRight > 0, right, "right", at, context);
            }

            Side SideOf(int layer) => layer < fromLeft ? Side.Left : Side.Right;
            periods.Add(schedule.Periods[p] with
            {
                RemovedLayers = [.. removed.Select(pair => new LayerChange(pair.Layer, SideOf(pair.Layer)))],
                AppliedLayers = [.. applied.Select(pair => new LayerChange(pair.Layer, SideOf(pair.Layer)))],
            });
            off = after;
        }

        return context.Errors.Count == errorsBefore ? new ContactSchedule(periods) : null;
    }

    /// <summary>
    /// The faces each period closes and opens, checked: the first period may close faces (they start closed) but open
    /// none; only an open face is closed, only a face the schedule closed is opened; and every face is open again at
    /// the end, where the final state needs every medium in contact. Null when there are errors.
    /// </summary>
    private static ContactSchedule? Faces(ScheduleReader.Result read, ContactSchedule schedule, FaceCondition left, FaceCondition right, ReadContext context)
    {
        if (read.PerPeriod.All(period => period.Closed.Count == 0 && period.Opened.Count == 0))
        {
            return schedule;
        }

        var errorsBefore = context.Errors.Count;
        var closed = new Dictionary<Side, string>();
        var periods = new List<SchedulePeriod>();
        for (var p = 0; p < schedule.Periods.Count; p++)
        {
            var written = read.PerPeriod[p];
            var label = schedule.Periods[p].Label;
            // A face closed in the first period starts closed (a film in a reel before it is filled).
            foreach (var (_, path) in p == 0 ? written.Opened : [])
            {
                context.Errors.Add(new CaseError(path, "every face with a medium is open at the start unless the first period closes it; open faces from the second period on"));
            }

            foreach (var (side, path) in written.Closed)
            {
                var face = side == Side.Left ? left : right;
                if (!face.IsOpen)
                {
                    context.Errors.Add(new CaseError(path, $"the {Name(side)} face is {face.KindName}; only a face with a medium can be closed"));
                }
                else if (!closed.TryAdd(side, path))
                {
                    context.Errors.Add(new CaseError(path, $"the {Name(side)} face is closed already at the start of {label}"));
                }
            }

            foreach (var (side, path) in written.Opened)
            {
                if (!closed.Remove(side))
                {
                    context.Errors.Add(new CaseError(path, $"the {Name(side)} face is open at the start of {label}; only a face a period closed can be opened"));
                }
            }

            periods.Add(schedule.Periods[p] with
            {
                ClosedFaces = [.. written.Closed.Select(face => face.Side).Distinct()],
                OpenedFaces = [.. written.Opened.Select(face => face.Side).Distinct()],
            });
        }

        foreach (var (side, path) in closed)
        {
            context.Errors.Add(new CaseError(path, $"leaves the {Name(side)} face closed at the end of the schedule; open it again in a later period (the final state needs every medium in contact)"));
        }

        return context.Errors.Count == errorsBefore ? new ContactSchedule(periods) : null;
    }

    private static string Name(Side side) => side == Side.Left ? "left" : "right";

    private static List<(int Layer, string Path)>? Indices(IReadOnlyList<(string Layer, string Path)> names, IReadOnlyList<Layer> layers, string known, ReadContext context)
    {
        var result = new List<(int, string)>();
        foreach (var (name, path) in names)
        {
            var index = layers.Select((layer, i) => (layer, i)).FirstOrDefault(pair => pair.layer.Name == name, (null!, -1)).Item2;
            if (index < 0)
            {
                context.Errors.Add(new CaseError(path, $"no layer is named '{name}'; the layers are {known}"));
                return null;
            }

            result.Add((index, path));
        }

        return result;
    }

    private static void CheckClosed(bool involved, FaceCondition face, string side, string path, ReadContext context)
    {
        if (involved && face is not ClosedFace)
        {
            context.Errors.Add(new CaseError(path, $"layers can be taken off or put on at the {side} face only when it is closed (a patch's outer face); it is {face.KindName}"));
        }
    }
}
