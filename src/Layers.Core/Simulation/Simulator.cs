using Layers.Core.Analytics;
using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// The one entry point for a forward simulation: mesh, assemble, integrate, collect results.
/// </summary>
public static class Simulator
{
    /// <summary>How far beyond the duration the solver may look for the times to equilibrium, as a multiple of it.</summary>
    public const double HorizonFactor = 1000;

    /// <summary>
    /// Solves a validated case by the method its numerics choose (<see cref="MethodChoice"/>), with the error of its key
    /// figures estimated (and, for the finite volumes, controlled) as its numerics say (<see cref="NumericsSettings.ErrorControl"/>),
    /// and checked by the other method where it applies.
    /// </summary>
    /// <param name="simulation">The case.</param>
    /// <param name="checkExactByFiniteVolumes">
    /// Whether a case the exact method solved is also solved by the finite volumes and compared (the independent
    /// check of a single run; a study that solves a case many times leaves it out). A case the finite volumes solved is
    /// always checked by the exact method where it applies: that check costs a few per cent.
    /// </param>
    /// <param name="cancellation">Ends the run early with a cancelled result.</param>
    public static SimulationResult Run(SimulationCase simulation, bool checkExactByFiniteVolumes, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var choice = MethodChoice.For(simulation);
        if (choice.Method == SolutionMethod.Laplace)
        {
            var (exact, fallback) = RunExact(simulation, cancellation);
            if (exact is not null)
            {
                var check = checkExactByFiniteVolumes && exact.Completed && exact.NumericalError is { Unavailable: null }
                    ? FiniteVolumeCheck.Of(exact, solved => Solve(solved, cancellation))
                    : null;

                // A run cancelled while the finite volumes check it is cancelled, not reported without its check.
                return cancellation.IsCancellationRequested && check is not null
                    ? exact with { Statistics = exact.Statistics with { StopReason = StopReason.Cancelled }, FailureReason = "the run was cancelled", MethodReason = choice.Reason }
                    : exact with { MethodReason = choice.Reason, CrossCheck = check };
            }

            choice = new MethodChoice(SolutionMethod.FiniteVolume, fallback);
        }

        return RunFiniteVolumes(simulation, cancellation) with { MethodReason = choice.Reason };
    }

    /// <summary>
    /// The exact method's run, or, under "auto", null with why it is not kept: it failed its own checks, missed the
    /// accuracy, or met a value it could not represent (an exception of arithmetic or arguments deep in an extreme stack),
    /// in which case the finite volumes take over instead of the run failing.
    /// </summary>
    private static (SimulationResult? Exact, string Fallback) RunExact(SimulationCase simulation, CancellationToken cancellation)
    {
        var auto = simulation.Numerics.Method == SolutionMethod.Auto;
        try
        {
            var exact = ExactEstimation.Run(simulation, cancellation);
            return (auto ? ExactEstimation.WhyNotKept(exact) : null) is { } reason ? (null, reason) : (exact, string.Empty);
        }
        catch (Exception problem) when (auto && problem is ArithmeticException or ArgumentException or InvalidOperationException)
        {
            return (null, "the exact method could not solve this case (" + problem.Message + ")");
        }
    }

    /// <summary>Solves a validated case as <see cref="Run(SimulationCase, bool, CancellationToken)"/> does, with the independent check.</summary>
    public static SimulationResult Run(SimulationCase simulation, CancellationToken cancellation = default) => Run(simulation, true, cancellation);

    /// <summary>The finite volumes, with the error estimated and controlled as the numerics say, checked by the exact method where it applies.</summary>
    private static SimulationResult RunFiniteVolumes(SimulationCase simulation, CancellationToken cancellation)
    {
        if (simulation.Numerics.ErrorControl == ErrorControl.None)
        {
            return Solve(simulation, cancellation);
        }

        var result = ErrorEstimation.Run(simulation, solved => Solve(solved, cancellation));
        return result.Completed ? result with { CrossCheck = ExactCrossCheck.Of(result) } : result;
    }

    /// <summary>One solve at the case's own numerics.</summary>
    private static SimulationResult Solve(SimulationCase simulation, CancellationToken cancellation)
    {
        var massLeft = MassLeftAfterSampling(simulation, cancellation);
        // The case as read keeps where each D comes from, for the result and the assessment; everything that reads a
        // layer's D is given its own case, with its first stage's D.
        var (model, final, sampling, recorder, stages) = Assemble(simulation, massLeft);
        var grid = model.Grid;
        var outputs = OutputSchedule.For(simulation);
        var horizon = simulation.DurationSeconds * HorizonFactor;
        var watcher = simulation.FoodContact is null ? null : FoodConcentrationWatcher.For(model, stages);
        ITimeLoopObserver observer = watcher is null ? recorder : new ObserverPair(recorder, watcher);
        var undissolved = model.System.Saturation is null ? null : new UndissolvedTracker(model);
        observer = undissolved is null ? observer : new ObserverPair(observer, undissolved);
        var statistics = StagedIntegration.Run(
            stages, model.InitialState, outputs, horizon, (stage, firstOutput) => InitialStep(stage.Case, grid, firstOutput),
            simulation.Numerics.Solver, observer, sampling, cancellation).Statistics;
        var failure = statistics.StopReason == StopReason.Completed ? string.Empty : $"the solver stopped early ({statistics})";
        if (statistics.StopReason == StopReason.Completed)
        {
            (var reason, failure) = SelfChecks.Judge(recorder.WorstMassBalanceError, recorder.LowestAmountRelative);
            statistics = statistics with { StopReason = reason };
        }

        var schedule = ScheduleAnalysis.Of(simulation, recorder.Samples);
        return new SimulationResult
        {
            Case = simulation,
            Grid = grid,
            TimeSeries = recorder.Samples,
            Reports = recorder.Reports,
            FinalState = recorder.Summary(horizon, sampling.TimesSeconds.Count > 0 ? sampling.TimesSeconds[^1] : null),
            // With first-order removal the receiving "bath" is the removal itself, whose intake is not the amount
            // permeated; the diffusion-cell metrics report that case instead.
            Permeation = final.Kind == FinalStateKind.SteadyPermeation && !simulation.Left.HasFiniteVolume && !simulation.Right.HasFiniteVolume
                ? new PermeationSummary(
                    final.Steady!.FluxKgPerSquareMeterSecond,
                    recorder.FluxAtEnd,
                    LagTimeDefined(simulation) ? recorder.LagTimeSeconds : null,
                    LagTimeDefined(simulation) ? SingleMembrane.LagTimeSeconds(model.Case) : null)
                : null,
            WorstMassBalanceError = recorder.WorstMassBalanceError,
            DispersedLayers = undissolved?.Summaries ?? [],
            DiffusionCell = DiffusionCellAnalysis.Of(model.Case, recorder.Samples, sampling),
            Schedule = schedule,
            Statistics = statistics,
            FailureReason = failure,
            FoodContact = watcher is null || statistics.StopReason != StopReason.Completed
                ? null
                : FoodContactAssessment.Assess(simulation, model, stages, watcher, schedule?.RepeatedUse, cancellation),
        };
    }

    /// <summary>
    /// Whether the lag time of the amount received means anything: not when a schedule changes a medium during the run
    /// (a donor raised in steps), as the straight line it is the intercept of belongs to one level from t = 0.
    /// </summary>
    public static bool LagTimeDefined(SimulationCase simulation) => simulation.Schedule is not { ChangesMedia: true };

    /// <summary>
    /// Solves a case up to its duration and no further, and returns only the integral quantities at its output
    /// times: the lean form of <see cref="Run(SimulationCase, CancellationToken)"/> for callers that solve one case many times (fitting), with no
    /// search for the times to equilibrium and no food-contact assessment.
    /// </summary>
    public static (IReadOnlyList<StateSample> Samples, SolverStatistics Statistics) RunTimeSeries(
        SimulationCase simulation,
        CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (MethodChoice.For(simulation).Method == SolutionMethod.Laplace)
        {
            return (ExactRun.TimeSeries(simulation, ExactEstimation.ContourPoints), new SolverStatistics { StopReason = StopReason.Completed });
        }

        var (model, _, sampling, recorder, stages) = Assemble(simulation);
        var statistics = StagedIntegration.Run(
            stages, model.InitialState, OutputSchedule.For(simulation), simulation.DurationSeconds,
            (stage, firstOutput) => InitialStep(stage.Case, model.Grid, firstOutput), simulation.Numerics.Solver, recorder, sampling, cancellation).Statistics;
        return (recorder.Samples, statistics);
    }

    /// <summary>
    /// The mass per area left in a sampled closed system after its last sample, kg/m2: the initial mass less what the
    /// samples took (and what renewed media carried away), from a run to the duration (every sample lies within it).
    /// Null when no compartment is sampled or renewed,
    /// when a bath or first-order removal fixes the final state instead, or when that run does not complete.
    /// </summary>
    /// <remarks>
    /// After the last sample nothing more leaves a closed system, so it settles to the equilibrium of this mass. The
    /// mass depends on the run (each sample takes v C at its time), so it is found by solving to the duration first;
    /// the main run then measures its progress against that equilibrium from t = 0 on. Both runs take the same steps
    /// up to the duration, so they take the same samples.
    /// </remarks>
    private static double? MassLeftAfterSampling(SimulationCase simulation, CancellationToken cancellation)
    {
        var faces = new[] { simulation.Left, simulation.Right };
        if (!simulation.IsClosed
            || (faces.OfType<CompartmentFace>().All(compartment => compartment.Sampling is null)
                && simulation.Schedule is not { ChangesMass: true })
            || faces.OfType<CompartmentFace>().Any(compartment => compartment.RemovalRatePerSecond > 0))
        {
            return null;
        }

        var (model, _, sampling, recorder, stages) = Assemble(simulation);
        var statistics = StagedIntegration.Run(
            stages, model.InitialState, OutputSchedule.For(simulation), simulation.DurationSeconds,
            (stage, firstOutput) => InitialStep(stage.Case, model.Grid, firstOutput), simulation.Numerics.Solver, recorder, sampling, cancellation).Statistics;
        return statistics.StopReason == StopReason.Completed
            ? model.System.TotalMass(model.InitialState) - sampling.RemovedPerArea(Side.Left) - sampling.RemovedPerArea(Side.Right)
            : null;
    }

    /// <summary>
    /// The grid and the case's own system, assembled once from the case with its first stage's D (its own K), and
    /// the stages on them; what observes the run is built on that case too.
    /// </summary>
    private static (DiscreteModel Model, FinalStateTarget Final, SamplingEvents Sampling, ResultRecorder Recorder, IReadOnlyList<StageSystem> Stages) Assemble(
        SimulationCase simulation, double? massLeftAfterSamplingPerArea = null)
    {
        var model = DiscreteModel.Build(simulation.WithFirstStageDiffusivities());
        var stages = ScheduleStages.Split(StageSystem.For(simulation, model.Grid, model.System), simulation, model.System);
        var final = FinalStateTarget.ForStages(model, stages, massLeftAfterSamplingPerArea)
            .WithLayersOff(simulation, model.System, simulation.Schedule?.LayersOffAtEnd ?? new HashSet<int>(), massLeftAfterSamplingPerArea);
        var sampling = new SamplingEvents(model);
        var recorder = new ResultRecorder(model, stages, final, sampling);
        return (model, final, sampling, recorder, stages);
    }

    /// <summary>
    /// First trial step: a thousandth of the fastest cell's diffusion time h^2/D, so that the first step resolves
    /// a step change in the initial concentration; the controller grows it geometrically from there.
    /// </summary>
    internal static double InitialStep(SimulationCase simulation, Grid grid, double firstOutput)
    {
        var fastest = double.PositiveInfinity;
        for (var cell = 0; cell < grid.CellCount; cell++)
        {
            var width = grid.WidthsMeters[cell];
            var diffusivity = simulation.Stack.Layers[grid.LayerOfCell[cell]].DiffusivitySquareMetersPerSecond;
            fastest = Math.Min(fastest, width * width / diffusivity);
        }

        return Math.Min(firstOutput, 1e-3 * fastest);
    }
}
