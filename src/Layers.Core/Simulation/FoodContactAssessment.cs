using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Results;
using Layers.Core.TimeStepping;
using MathNet.Numerics.RootFinding;

namespace Layers.Core.Simulation;

/// <summary>
/// Turns a run with food-contact settings into the engineer's figures: concentration in the food, verdict against
/// the limit and when it is reached, functional-barrier times, test versus shelf life, maximum loading.
/// </summary>
/// <remarks>
/// Times at which a limit is reached are found by the watcher during the run (<see cref="FoodConcentrationWatcher"/>):
/// the root of c_food(t) - limit on the interpolant of the accepted step over which the food crossed the limit. The
/// interpolant is as accurate as the step (O(h^3)), so the time is as accurate as the integration: a relative error e
/// in c_food moves it by about e c / (dc/dt); the root finder's own tolerance is 1e-13 of the step.
/// </remarks>
internal static class FoodContactAssessment
{
    public static FoodContactResult Assess(
        SimulationCase simulation,
        DiscreteModel model,
        IReadOnlyList<StageSystem> stages,
        FoodConcentrationWatcher watcher,
        RepeatedUseVerdict? repeatedUse,
        CancellationToken cancellation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        ArgumentNullException.ThrowIfNull(model);
        var (grid, own, initial) = (model.Grid, model.System, model.InitialState);
        var settings = simulation.FoodContact!;
        var food = (CompartmentFace)simulation.FaceAtEnd(settings.FoodSide);
        var density = food.DensityKgPerCubicMeter ?? FoodContactSettings.DefaultFoodDensity;
        var final = watcher.FinalValue;
        var foodMassPerArea = food.VolumePerAreaMeters * density;
        var detection = watcher.CrossingSeconds[0];
        var limit = watcher.Levels.Length > 1 ? watcher.CrossingSeconds[1] : null;

        return new FoodContactResult
        {
            FoodName = food.Name,
            FoodSide = settings.FoodSide,
            FoodDensityKgPerCubicMeter = density,
            FoodDensityAssumed = food.DensityKgPerCubicMeter is null,
            AreaPerFoodMassSquareMetersPerKilogram = food.ContactAreaSquareMeters / (food.VolumeCubicMeters * density),
            Stages = StageReports(simulation, settings, watcher),
            DiffusivityOrigins = simulation.Stack.Layers
                .Select((layer, index) => (layer.Name, Origin(layer, index, settings)))
                .ToArray(),
            FinalConcentration = final,
            FinalMigrationPerArea = (final - (food.InitialConcentrationKgPerCubicMeter / density)) * foodMassPerArea,
            SpecificMigrationLimit = settings.SpecificMigrationLimit,
            LimitReachedSeconds = limit,
            DetectionLimit = settings.DetectionLimit,
            DetectionReachedSeconds = detection,
            BarrierLags = BarrierLags(simulation, settings),
            Test = settings.TestCondition is { } test ? Compare(simulation, grid, own, settings, test, initial, watcher, cancellation) : null,
            MaximumLoading = settings.SpecificMigrationLimit is { } sml
                ? Loading(simulation, grid, stages, repeatedUse?.JudgedValue ?? final, sml, watcher, cancellation)
                : null,
            PartitionConvention = settings.PartitionConvention,
        };
    }

    /// <summary>Food concentration at the end of integrating the stages from a state, kg/kg.</summary>
    internal static double FinalValue(
        IReadOnlyList<StageSystem> stages, double[] start, Grid grid, SimulationCase simulation, FoodConcentrationWatcher watcher, CancellationToken cancellation)
    {
        var outcome = StagedIntegration.Run(
            stages, start, [], 0, (stage, first) => Simulator.InitialStep(stage.Case, grid, first), simulation.Numerics.Solver, NullObserver.Instance, cancellation: cancellation);
        return outcome.Statistics.StopReason == StopReason.Completed ? watcher.ValueAtEnd(outcome.FinalState) : double.NaN;
    }

    private static TestComparison Compare(
        SimulationCase simulation, Grid grid, DiffusionSystem own, FoodContactSettings settings, TemperatureStage test, double[] initial,
        FoodConcentrationWatcher watcher, CancellationToken cancellation)
    {
        var stages = StageSystem.For(simulation, grid, own, [test]);
        var value = FinalValue(stages, initial, grid, simulation, watcher, cancellation);
        var equivalent = settings.Stages.Sum(stage => Arrhenius.EquivalentTestSeconds(
            stage.DurationSeconds, stage.TemperatureKelvin, test.TemperatureKelvin, settings.EquivalenceActivationEnergy));
        return new TestComparison(test, value, equivalent, settings.EquivalenceActivationEnergy);
    }

    /// <summary>
    /// The problem is linear in the initial state, so the judged food concentration is affine in a factor s on the
    /// loaded layers' initial concentrations: offset from a run with them empty (skipped when everything else starts
    /// empty, where the offset is exactly zero), slope from the actual run. The judged concentration is the food's at
    /// the end, or, for an article in repeated use, at the end of the judged contact (renewals bring fresh portions at
    /// fixed concentrations and layers put on come as the case loads them, so it stays affine in s).
    /// </summary>
    /// <param name="simulation">The case as read.</param>
    /// <param name="grid">Its grid.</param>
    /// <param name="stages">Its stages.</param>
    /// <param name="judged">The judged food concentration of the actual run, kg/kg.</param>
    /// <param name="limit">The specific migration limit, kg/kg.</param>
    /// <param name="watcher">The run's watcher of the food.</param>
    /// <param name="cancellation">Stops the offset run.</param>
    private static MaximumLoading? Loading(
        SimulationCase simulation, Grid grid, IReadOnlyList<StageSystem> stages, double judged, double limit,
        FoodConcentrationWatcher watcher, CancellationToken cancellation)
    {
        var loaded = simulation.Stack.Layers.Where(layer => layer.InitialConcentrationKgPerCubicMeter > 0).ToArray();
        if (loaded.Length == 0)
        {
            return null;
        }

        var offset = 0.0;
        if (!OnlyLoadedLayersCarrySubstance(simulation))
        {
            // Renewals and layers put on are state events of a whole run: the offset then comes from one, judged the same
            // way; otherwise the stages are integrated from the emptied state alone.
            var emptied = new LayerStack(simulation.Stack.Layers.Select(layer => layer with { InitialConcentrationKgPerCubicMeter = 0 }));
            offset = simulation.Schedule is { ChangesMass: true }
                ? JudgedValue(simulation with { Stack = emptied }, cancellation)
                : FinalValue(stages, DiffusionSystemBuilder.Build(simulation.WithFirstStageDiffusivities() with { Stack = emptied }, grid).InitialState, grid, simulation, watcher, cancellation);
        }

        var slope = judged - offset;
        var factor = slope > 0 ? Math.Max(0, (limit - offset) / slope) : double.PositiveInfinity;
        return new MaximumLoading(
            offset,
            slope,
            factor,
            loaded.Select(layer => (
                layer.Name,
                layer.InitialConcentrationKgPerCubicMeter * factor,
                layer.DensityKgPerCubicMeter is { } rho ? layer.InitialConcentrationKgPerCubicMeter * factor / rho : (double?)null))
            .ToArray());
    }

    /// <summary>
    /// The judged food concentration of a run of the case with its schedule's events, kg/kg: at the judged contact for an
    /// article in repeated use, else at the end; NaN when the run does not complete.
    /// </summary>
    private static double JudgedValue(SimulationCase simulation, CancellationToken cancellation)
    {
        var (samples, statistics) = Simulator.RunTimeSeries(simulation, cancellation);
        if (statistics.StopReason != StopReason.Completed)
        {
            return double.NaN;
        }

        if (ScheduleAnalysis.Of(simulation, samples)?.RepeatedUse is { } verdict)
        {
            return verdict.JudgedValue;
        }

        var food = simulation.FoodContact!;
        var density = ((CompartmentFace)simulation.Face(food.FoodSide)).DensityKgPerCubicMeter ?? FoodContactSettings.DefaultFoodDensity;
        var end = samples[^1];
        return (food.FoodSide == Side.Left ? end.Left : end.Right)!.ConcentrationKgPerCubicMeter / density;
    }

    private static bool OnlyLoadedLayersCarrySubstance(SimulationCase simulation)
    {
        static bool Empty(FaceCondition face) => face switch
        {
            BathFace bath => bath.ConcentrationKgPerCubicMeter == 0,
            CompartmentFace compartment => compartment.InitialConcentrationKgPerCubicMeter == 0,
            _ => true,
        };

        return Empty(simulation.Left) && Empty(simulation.Right);
    }

    private static List<StageReport> StageReports(SimulationCase simulation, FoodContactSettings settings, FoodConcentrationWatcher watcher)
    {
        var reports = new List<StageReport>();
        var start = 0.0;
        for (var index = 0; index < settings.Stages.Count; index++)
        {
            var stage = settings.Stages[index];
            var values = simulation.Stack.Layers
                .Select((layer, layerIndex) =>
                {
                    var (value, origin) = stage.DiffusivityOf(layerIndex, layer.Diffusivity);
                    return (layer.Name, value, origin);
                })
                .ToArray();
            var food = (CompartmentFace)simulation.Face(settings.FoodSide);
            var partitions = simulation.Stack.Layers
                .Select((layer, layerIndex) => (layer.Name, stage.LayerPartitionOf(layerIndex, layer.PartitionCoefficient)))
                .Append((food.Name, stage.FacePartitionOf(settings.FoodSide, food.PartitionCoefficient)))
                .ToArray();
            reports.Add(new StageReport(stage.Name, start, start + stage.DurationSeconds, stage.TemperatureKelvin, values, watcher.ValueAtStageEnd(start + stage.DurationSeconds))
            {
                Partitions = partitions,
            });
            start += stage.DurationSeconds;
        }

        return reports;
    }

    private static string Origin(Layer layer, int layerIndex, FoodContactSettings settings)
    {
        var origin = layer.Diffusivity.Describe();
        var overridden = settings.Stages.Where(stage => stage.DiffusivityOverrides.ContainsKey(layerIndex)).Select(stage => stage.Name).ToArray();
        return overridden.Length == 0 ? origin : $"{origin}; given per stage in: {string.Join(", ", overridden)}";
    }

    /// <summary>Layers between the food and the nearest layer that starts loaded, in each stage.</summary>
    private static List<BarrierLag> BarrierLags(SimulationCase simulation, FoodContactSettings settings)
    {
        var layers = simulation.Stack.Layers;
        var loaded = Enumerable.Range(0, layers.Count).Where(index => layers[index].InitialConcentrationKgPerCubicMeter > 0).ToArray();
        var lags = new List<BarrierLag>();
        if (loaded.Length == 0)
        {
            return lags;
        }

        var barrier = settings.FoodSide == Side.Right
            ? Enumerable.Range(loaded.Max() + 1, layers.Count - loaded.Max() - 1)
            : Enumerable.Range(0, loaded.Min());
        foreach (var index in barrier)
        {
            var layer = layers[index];
            foreach (var stage in settings.Stages)
            {
                var diffusivity = stage.DiffusivityOf(index, layer.Diffusivity).Value;
                lags.Add(new BarrierLag(layer.Name, stage.Name, layer.ThicknessMeters * layer.ThicknessMeters / (6 * diffusivity)));
            }
        }

        return lags;
    }

    private sealed class NullObserver : ITimeLoopObserver
    {
        public static readonly NullObserver Instance = new();

        public bool WantsMoreTime => false;

        public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
        {
        }

        public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
        {
        }
    }
}
