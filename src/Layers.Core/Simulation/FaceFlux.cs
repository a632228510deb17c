using Layers.Core.Domain;

namespace Layers.Core.Simulation;

/// <summary>
/// The flux across a face into its medium at an output time, from the system of the stage that time lies in (a
/// temperature stage has its own D, so its own conductances, and may have its own K, so its own u = c/K).
/// </summary>
internal sealed class FaceFlux
{
    private readonly IReadOnlyList<StageSystem> _stages;

    public FaceFlux(IReadOnlyList<StageSystem> stages)
    {
        ArgumentNullException.ThrowIfNull(stages);
        _stages = stages;
    }

    /// <summary>
    /// Flux into the medium on a side, kg/(m2 s), for a state in the case's own u = c/K. An output at the boundary of
    /// two stages reads the stage that ends there (the flux jumps with D at that instant); a time past the last stage
    /// (the search beyond the duration) reads the last.
    /// </summary>
    public double IntoMedium(Side side, double timeSeconds, ReadOnlySpan<double> state)
    {
        var stage = StageAt(timeSeconds);
        if (stage.ToStage is null)
        {
            return stage.System.FluxIntoMedium(side, state);
        }

        var inStage = state.ToArray();
        stage.IntoStage(inStage);
        return stage.System.FluxIntoMedium(side, inStage);
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
