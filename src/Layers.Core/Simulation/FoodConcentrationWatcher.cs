using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Watches the food's concentration (mass fraction) step by step during the run: its value at every stage end,
/// and, for each limit, the time it first reaches the limit: the accepted step over which it crosses, then the time
/// within that step on the step's own interpolant (<see cref="DenseCrossing"/>), as accurate as the step.
/// </summary>
internal sealed class FoodConcentrationWatcher : ITimeLoopObserver
{
    private readonly double[] _toMassFraction;
    private readonly int _node;
    private readonly IReadOnlyList<StageSystem> _stages;
    private readonly double[] _stageEnds;
    private readonly StateMeasure _measure;
    private double _previousTime;
    private int _stage;

    private FoodConcentrationWatcher(int node, double[] toMassFraction, IReadOnlyList<StageSystem> stages, double[] levels)
    {
        _node = node;
        _toMassFraction = toMassFraction;
        _stages = stages;
        Levels = levels;
        CrossingSeconds = new double?[levels.Length];
        _stageEnds = new double[stages.Count];
        _measure = ValueOf;
    }

    /// <summary>The limits watched, kg/kg: the detection limit first, then the specific migration limit when given.</summary>
    public double[] Levels { get; }

    /// <summary>For each level, the time the food first reached it within the history (run clock, s), or null.</summary>
    public double?[] CrossingSeconds { get; }

    /// <summary>Food concentration at the end of the run, kg/kg.</summary>
    public double FinalValue => _stageEnds[^1];

    /// <summary>
    /// Food concentration at a stage's end, kg/kg: the end of the stage of the run (stages split where a schedule changes
    /// the system) that ends at <paramref name="endSeconds"/>.
    /// </summary>
    public double ValueAtStageEnd(double endSeconds)
    {
        for (var index = 0; index < _stages.Count; index++)
        {
            if (Math.Abs(endSeconds - _stages[index].EndSeconds) <= 1e-12 * endSeconds)
            {
                return _stageEnds[index];
            }
        }

        throw new ArgumentOutOfRangeException(nameof(endSeconds), endSeconds, "no stage of the run ends there");
    }

    /// <inheritdoc />
    public bool WantsMoreTime => false;

    /// <summary>Creates the watcher for a case with food-contact settings.</summary>
    public static FoodConcentrationWatcher For(DiscreteModel model, IReadOnlyList<StageSystem> stages)
    {
        var simulation = model.Case;
        var settings = simulation.FoodContact!;
        var food = (CompartmentFace)simulation.Face(settings.FoodSide);
        var density = food.DensityKgPerCubicMeter ?? FoodContactSettings.DefaultFoodDensity;
        var levels = settings.SpecificMigrationLimit is { } limit
            ? new[] { settings.DetectionLimit, limit }
            : new[] { settings.DetectionLimit };
        var node = model.System.CompartmentNode(settings.FoodSide);

        // The food's mass fraction is K u over the density in the stage's own variable, whatever portion of food is in
        // contact: a state in the case's variable is turned into the stage's first.
        var factors = stages.Select(stage => stage.System.PartitionCoefficient[node] * (stage.ToStage?[node] ?? 1) / density).ToArray();
        return new FoodConcentrationWatcher(node, factors, stages, levels);
    }

    /// <summary>The food's mass fraction for a state at the end of the run (in the last stage's portion of food).</summary>
    public double ValueAtEnd(ReadOnlySpan<double> state) => state[_node] * _toMassFraction[^1];

    /// <summary>The food's mass fraction for a state in the stage the watcher is in.</summary>
    private double ValueOf(ReadOnlySpan<double> state) => state[_node] * _toMassFraction[_stage];

    /// <inheritdoc />
    public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
    {
        if (timeSeconds != 0)
        {
            return;
        }

        var value = ValueOf(state);
        for (var level = 0; level < Levels.Length; level++)
        {
            if (value >= Levels[level])
            {
                CrossingSeconds[level] = 0;
            }
        }
    }

    /// <inheritdoc />
    public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
    {
        var end = _stages[^1].EndSeconds;
        if (_previousTime >= end * (1 - 1e-12))
        {
            return;
        }

        while (_stage < _stages.Count - 1 && timeSeconds > _stages[_stage].EndSeconds * (1 + 1e-12))
        {
            _stage++;
        }

        var value = ValueOf(state);
        for (var level = 0; level < Levels.Length; level++)
        {
            if (CrossingSeconds[level] is null && value >= Levels[level])
            {
                CrossingSeconds[level] = DenseCrossing.Time(dense, _measure, Levels[level]);
            }
        }

        for (var index = 0; index < _stages.Count; index++)
        {
            if (Math.Abs(timeSeconds - _stages[index].EndSeconds) <= 1e-12 * _stages[index].EndSeconds)
            {
                _stageEnds[index] = value;
            }
        }

        _previousTime = timeSeconds;
    }
}
