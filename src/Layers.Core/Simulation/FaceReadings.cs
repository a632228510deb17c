using Layers.Core.Domain;

namespace Layers.Core.Simulation;

/// <summary>
/// What a face medium reads at an output time, from the stage that time lies in: the flux into it (a temperature stage
/// has its own D, so its own conductances, and may have its own K, so its own u = c/K) and its concentration (a
/// schedule may bring a portion with another volume or K, or a bath at another level).
/// </summary>
internal sealed class FaceReadings
{
    private readonly IReadOnlyList<StageSystem> _stages;

    public FaceReadings(IReadOnlyList<StageSystem> stages)
    {
        ArgumentNullException.ThrowIfNull(stages);
        _stages = stages;
    }

    /// <summary>
    /// The flux into the medium on a side, kg/(m2 s), and its concentration, kg/m3 (a compartment's content over the
    /// volume of the portion in contact, a bath's own level; null for a closed face), for a state in the case's own
    /// u = c/K. An output at the boundary of two stages reads the stage that ends there (the flux jumps with D at that
    /// instant, and the state is the one before that moment's changes); a time past the last stage (the search beyond
    /// the duration) reads the last.
    /// </summary>
    public (double FluxKgPerSquareMeterSecond, double? ConcentrationKgPerCubicMeter) Read(Side side, double timeSeconds, ReadOnlySpan<double> state)
    {
        var stage = StageAt(timeSeconds);
        var inStage = InStage(stage, state);
        var node = stage.System.CompartmentNode(side);
        var concentration = node >= 0
            ? stage.System.ConcentrationOf(node, inStage[node])
            : (stage.Case.Face(side) as BathFace)?.ConcentrationKgPerCubicMeter;
        return (stage.System.FluxIntoMedium(side, inStage), concentration);
    }

    private static ReadOnlySpan<double> InStage(StageSystem stage, ReadOnlySpan<double> state)
    {
        if (stage.ToStage is null)
        {
            return state;
        }

        var inStage = state.ToArray();
        stage.IntoStage(inStage);
        return inStage;
    }

    private StageSystem StageAt(double timeSeconds)
    {
        foreach (var stage in _stages)
        {
            if (timeSeconds <= stage.EndSeconds * (1 + 1e-12))
            {
                return stage;
            }
        }

        return _stages[^1];
    }
}
