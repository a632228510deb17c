namespace Layers.Core.Domain;

/// <summary>
/// One period of a contact schedule, as run: its place on the run's clock and the face media replaced by fresh ones
/// at its start. A period that the schedule repeats appears once per repetition.
/// </summary>
/// <param name="Name">The period's name as the case gives it, for reports.</param>
/// <param name="Slot">Which entry of the schedule it comes from, and which period of that entry's block (from 0 each):
/// the repetitions of one period share it.</param>
/// <param name="Repetition">Which repetition of its block this is, from 1; 1 for a period that is not repeated.</param>
/// <param name="RepetitionCount">How many times its block runs; 1 for a period that is not repeated.</param>
/// <param name="StartSeconds">Start on the run's clock, s.</param>
/// <param name="DurationSeconds">Duration, s, &gt; 0.</param>
/// <param name="Renewed">The faces whose compartment is emptied and refilled with fresh medium at the start.</param>
public sealed record SchedulePeriod(
    string Name, (int Entry, int Period) Slot, int Repetition, int RepetitionCount, double StartSeconds, double DurationSeconds, IReadOnlyList<Side> Renewed)
{
    /// <summary>
    /// The outer layers taken off at the start (a patch removed), by index in the stack, with the face they are taken
    /// off from: what they hold leaves the system, and they stay off until applied again.
    /// </summary>
    public IReadOnlyList<LayerChange> RemovedLayers { get; init; } = [];

    /// <summary>
    /// The outer layers put on at the start fresh, loaded as the case writes them (a new patch): a layer that is on
    /// already is replaced by a fresh one, and what the old one held leaves the system.
    /// </summary>
    public IReadOnlyList<LayerChange> AppliedLayers { get; init; } = [];

    /// <summary>
    /// The faces whose medium is taken out of contact at the start (a film in a reel before filling): nothing passes
    /// there until a later period opens the face again; the medium keeps what it holds.
    /// </summary>
    public IReadOnlyList<Side> ClosedFaces { get; init; } = [];

    /// <summary>The faces whose medium is brought back into contact at the start.</summary>
    public IReadOnlyList<Side> OpenedFaces { get; init; } = [];

    /// <summary>
    /// The faces whose fresh portion at the start has other properties than the medium before it (another volume, K,
    /// film or fresh concentration; a bath at another level), with the medium that stands on the face from this period
    /// on, until a later period brings another. A face whose fresh portion is like the one before is not listed.
    /// </summary>
    public IReadOnlyDictionary<Side, FaceCondition> NewMedia { get; init; } = new Dictionary<Side, FaceCondition>();

    /// <summary>True when layers are taken off or put on at the start.</summary>
    public bool ChangesLayers => RemovedLayers.Count > 0 || AppliedLayers.Count > 0;

    /// <summary>True when the stack or its contacts change at the start: layers off or on, faces closed or opened.</summary>
    public bool ChangesContacts => ChangesLayers || ClosedFaces.Count > 0 || OpenedFaces.Count > 0;

    /// <summary>
    /// True when the discrete system changes at the start: the contacts change (<see cref="ChangesContacts"/>) or a face
    /// takes a medium with other properties.
    /// </summary>
    public bool ChangesSystem => ChangesContacts || NewMedia.Count > 0;

    /// <summary>End on the run's clock, s.</summary>
    public double EndSeconds => StartSeconds + DurationSeconds;

    /// <summary>"contact 2 of 3", or the name alone for a period that is not repeated.</summary>
    public string Label => RepetitionCount > 1 ? $"{Name} {Repetition} of {RepetitionCount}" : Name;
}

/// <summary>A layer taken off or put on at the start of a period, and the face of the stack it is taken off or put on at.</summary>
/// <param name="Layer">Index of the layer in the stack.</param>
/// <param name="Side">The outer face its block of removable layers touches.</param>
public sealed record LayerChange(int Layer, Side Side);
