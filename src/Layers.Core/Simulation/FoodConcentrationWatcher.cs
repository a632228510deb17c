using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// Watches the food's concentration (mass fraction) step by step during the run: its value at every stage end,
/// and, for each limit, the accepted step over which it first reaches the limit, with the state at the start of
/// that step so that the crossing can be located by re-integration.
/// </summary>
internal sealed class FoodConcentrationWatcher : ITimeLoopObserver
{
    private readonly double _toMassFraction;
    private readonly int _node;
    private readonly IReadOnlyList<StageSystem> _stages;
    private readonly double[] _previous;
    private readonly double[] _stageEnds;
    private double _previousTime;
    private double _previousValue;

    private FoodConcentrationWatcher(int node, double toMassFraction, IReadOnlyList<StageSystem> stages, double[] levels, int nodeCount)
    {
        _node = node;
        _toMassFraction = toMassFraction;
        _stages = stages;
        Levels = levels;
        Crossings = new Bracket?[levels.Length];
        _previous = new double[nodeCount];
        _stageEnds = new double[stages.Count];
    }

    /// <summary>The limits watched, kg/kg: the detection limit first, then the specific migration limit when given.</summary>
    public double[] Levels { get; }

    /// <summary>For each level, the step over which the food first reached it within the history, or null.</summary>
    public Bracket?[] Crossings { get; }

    /// <summary>Food concentration at the end of each stage, kg/kg.</summary>
    public IReadOnlyList<double> StageEndValues => _stageEnds;

    /// <summary>Node index of the food compartment.</summary>
    public int Node => _node;

    /// <summary>Factor from the food node's u to its mass fraction: K / density.</summary>
    public double ToMassFraction => _toMassFraction;

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
        return new FoodConcentrationWatcher(
            model.System.CompartmentNode(settings.FoodSide), food.PartitionCoefficient / density, stages, levels, model.InitialState.Length);
    }

    /// <summary>The food's mass fraction for a state.</summary>
    public double ValueOf(ReadOnlySpan<double> state) => state[_node] * _toMassFraction;

    /// <inheritdoc />
    public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
    {
        if (timeSeconds != 0)
        {
            return;
        }

        Remember(0, state);
        for (var level = 0; level < Levels.Length; level++)
        {
            if (_previousValue >= Levels[level])
            {
                Crossings[level] = new Bracket(0, 0, state.ToArray(), 0);
            }
        }
    }

    /// <inheritdoc />
    public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
    {
        var end = _stages[^1].EndSeconds;
        if (_previousTime >= end * (1 - 1e-12))
        {
            return;
        }

        var value = ValueOf(state);
        var stage = StageAt(_previousTime);
        for (var level = 0; level < Levels.Length; level++)
        {
            if (Crossings[level] is null && value >= Levels[level] && _previousValue < Levels[level])
            {
                Crossings[level] = new Bracket(_previousTime, timeSeconds, (double[])_previous.Clone(), stage);
            }
        }

        for (var index = 0; index < _stages.Count; index++)
        {
            if (Math.Abs(timeSeconds - _stages[index].EndSeconds) <= 1e-12 * _stages[index].EndSeconds)
            {
                _stageEnds[index] = value;
            }
        }

        Remember(timeSeconds, state);
    }

    private int StageAt(double time)
    {
        for (var index = 0; index < _stages.Count; index++)
        {
            if (time < _stages[index].EndSeconds * (1 - 1e-12))
            {
                return index;
            }
        }

        return _stages.Count - 1;
    }

    private void Remember(double time, ReadOnlySpan<double> state)
    {
        state.CopyTo(_previous);
        _previousTime = time;
        _previousValue = ValueOf(state);
    }

    /// <summary>An accepted step over which a level was first reached.</summary>
    /// <param name="StartSeconds">Start of the step (run clock).</param>
    /// <param name="EndSeconds">End of the step.</param>
    /// <param name="StartState">u at the start of the step.</param>
    /// <param name="Stage">Index of the stage the step belongs to.</param>
    internal sealed record Bracket(double StartSeconds, double EndSeconds, double[] StartState, int Stage);
}
