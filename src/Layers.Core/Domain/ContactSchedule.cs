namespace Layers.Core.Domain;

/// <summary>
/// A sequence of periods that together make the run, each starting with the face media it names replaced by fresh
/// ones: an article for repeated use tested with a fresh portion of food simulant each time, or a receptor solution
/// exchanged completely at set times. Repeated blocks are unrolled, so <see cref="Periods"/> lists every period run.
/// </summary>
/// <param name="Periods">The periods in order, consecutive from t = 0.</param>
public sealed record ContactSchedule(IReadOnlyList<SchedulePeriod> Periods)
{
    /// <summary>The whole schedule's duration, s.</summary>
    public double DurationSeconds => Periods[^1].EndSeconds;

    /// <summary>
    /// The times at which the medium on a side is replaced, s, ascending: the starts of the periods that renew it,
    /// except t = 0, where every medium is fresh already.
    /// </summary>
    public IReadOnlyList<double> RenewalTimes(Side side) =>
        Periods.Where(period => period.StartSeconds > 0 && period.Renewed.Contains(side)).Select(period => period.StartSeconds).ToArray();

    /// <summary>True when some period renews the medium on a side.</summary>
    public bool Renews(Side side) => RenewalTimes(side).Count > 0;

    /// <summary>
    /// The periods during which the medium on a side is one portion, fresh at the period's start: the first period and
    /// every period that renews it. A portion lasts until the next renewal, so its contact may span several periods.
    /// </summary>
    public IReadOnlyList<(double StartSeconds, double EndSeconds)> Contacts(Side side)
    {
        var starts = RenewalTimes(side).Prepend(0.0).ToArray();
        return starts.Select((start, index) => (start, index + 1 < starts.Length ? starts[index + 1] : DurationSeconds)).ToArray();
    }

    /// <summary>True when some period takes layers off or puts them on.</summary>
    public bool ChangesLayers => Periods.Any(period => period.ChangesLayers);

    /// <summary>
    /// True when some period takes mass out of the system or brings it in: a renewed medium, layers taken off or put
    /// on fresh.
    /// </summary>
    public bool ChangesMass => Renews(Side.Left) || Renews(Side.Right) || ChangesLayers;

    /// <summary>The layers that are off during the period that runs at <paramref name="timeSeconds"/> (the later one at a boundary).</summary>
    public IReadOnlySet<int> LayersOffAt(double timeSeconds)
    {
        var off = new HashSet<int>();
        foreach (var period in Periods.TakeWhile(period => period.StartSeconds <= timeSeconds * (1 + 1e-12)))
        {
            off.UnionWith(period.RemovedLayers.Select(change => change.Layer));
            off.ExceptWith(period.AppliedLayers.Select(change => change.Layer));
        }

        return off;
    }

    /// <summary>The layers off at the end of the schedule.</summary>
    public IReadOnlySet<int> LayersOffAtEnd => LayersOffAt(DurationSeconds);

    /// <summary>True when some period changes the stack or its contacts (layers off or on, faces closed or opened).</summary>
    public bool ChangesContacts => Periods.Any(period => period.ChangesContacts);

    /// <summary>
    /// The period starts at which the discrete system changes (the stack, its contacts or a face's medium), s,
    /// ascending.
    /// </summary>
    public IReadOnlyList<double> SystemChangeTimes => Periods.Where(period => period.ChangesSystem).Select(period => period.StartSeconds).ToArray();

    /// <summary>True when some period brings a face medium with other properties than the one before.</summary>
    public bool ChangesMedia => Periods.Any(period => period.NewMedia.Count > 0);

    /// <summary>
    /// The medium on a side during each period, in the order of <see cref="Periods"/>: the case's own until a period
    /// brings one with other properties (<see cref="SchedulePeriod.NewMedia"/>).
    /// </summary>
    /// <param name="side">The face.</param>
    /// <param name="first">The medium the case writes on that face, which stands from t = 0.</param>
    public IReadOnlyList<FaceCondition> MediaByPeriod(Side side, FaceCondition first)
    {
        var media = new FaceCondition[Periods.Count];
        var medium = first;
        for (var p = 0; p < media.Length; p++)
        {
            medium = Periods[p].NewMedia.GetValueOrDefault(side, medium);
            media[p] = medium;
        }

        return media;
    }

    /// <summary>
    /// Each renewal of the medium on a side after t = 0: its time, the portion that leaves and the fresh one that comes
    /// (the same medium again, or one with other properties).
    /// </summary>
    /// <param name="side">The face.</param>
    /// <param name="first">The medium the case writes on that face.</param>
    public IReadOnlyList<(double TimeSeconds, FaceCondition Old, FaceCondition Fresh)> Renewals(Side side, FaceCondition first)
    {
        var media = MediaByPeriod(side, first);
        return Enumerable.Range(1, Periods.Count - 1)
            .Where(p => Periods[p].Renewed.Contains(side))
            .Select(p => (Periods[p].StartSeconds, media[p - 1], media[p]))
            .ToArray();
    }

    /// <summary>
    /// The medium on a side during the period that runs at <paramref name="timeSeconds"/>, the later one at a boundary
    /// (the medium a period brings stands from its start).
    /// </summary>
    public FaceCondition MediumFrom(Side side, FaceCondition first, double timeSeconds)
    {
        var medium = first;
        foreach (var period in Periods.TakeWhile(period => period.StartSeconds <= timeSeconds * (1 + 1e-12)))
        {
            medium = period.NewMedia.GetValueOrDefault(side, medium);
        }

        return medium;
    }

    /// <summary>The faces the schedule holds closed during the period that runs at <paramref name="timeSeconds"/> (the later one at a boundary).</summary>
    public IReadOnlySet<Side> FacesClosedAt(double timeSeconds)
    {
        var closed = new HashSet<Side>();
        foreach (var period in Periods.TakeWhile(period => period.StartSeconds <= timeSeconds * (1 + 1e-12)))
        {
            closed.UnionWith(period.ClosedFaces);
            closed.ExceptWith(period.OpenedFaces);
        }

        return closed;
    }
}
