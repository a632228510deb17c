using System.Collections.Concurrent;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;
using Layers.Core.Units;
using MathNet.Numerics.RootFinding;

namespace Layers.Core.Studies;

/// <summary>
/// Solves a design: tries evenly spaced values over the allowed range (in parallel) to bracket the first value at
/// which the result crosses the target, then refines it with Brent's method (Math.NET Numerics) on the relative
/// miss result/target - 1, in the logarithm of the input on a log scale. Finally it solves just below and above the
/// answer, by the tolerance, to confirm that the target lies between: the tolerance reported is then a bracket of
/// the simulated result, not a promise of the root finder. Every run is a full forward simulation of the case with
/// the value written in (<see cref="CaseVariation"/>), so its accuracy is that of the solver settings of the case.
/// </summary>
public static class DesignSolver
{
    private const int MaximumIterations = 60;

    /// <summary>Answers the design question of a case.</summary>
    /// <param name="document">The whole case document.</param>
    /// <param name="fileName">The case file.</param>
    /// <param name="settings">The question, from <see cref="DesignReader"/>.</param>
    /// <param name="jobs">How many runs go at once while bracketing.</param>
    /// <param name="cancellation">Stops the runs.</param>
    public static DesignOutcome Solve(JsonObject document, string fileName, DesignSettings settings, int jobs, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var runs = new Runs(document, fileName, settings, cancellation);
        try
        {
            return Search(settings, runs, jobs);
        }
        catch (StopException stop)
        {
            return new DesignOutcome
            {
                Settings = settings,
                Status = stop.Status,
                Message = stop.Message,
                Errors = stop.Errors,
                Points = runs.Points(),
            };
        }
    }

    private static DesignOutcome Search(DesignSettings settings, Runs runs, int jobs)
    {
        var values = settings.BracketValues();
        runs.EvaluateAll(values.Select(settings.ToSearch).ToArray(), jobs);
        var misses = values.Select(value => (Search: settings.ToSearch(value), Miss: runs.Miss(settings.ToSearch(value))))
            .Where(point => double.IsFinite(point.Miss))
            .ToList();
        var crossings = Enumerable.Range(0, Math.Max(0, misses.Count - 1))
            .Where(i => misses[i].Miss == 0 || Math.Sign(misses[i].Miss) != Math.Sign(misses[i + 1].Miss))
            .ToList();
        if (misses.Count > 0 && misses[^1].Miss == 0)
        {
            crossings.Add(misses.Count - 1);
        }

        if (crossings.Count == 0)
        {
            return NotReached(settings, runs);
        }

        var first = crossings[0];
        var root = misses[first].Miss == 0
            ? misses[first].Search
            : FindRoot(settings, runs, misses[first].Search, misses[first + 1].Search);
        var (tolerance, bracketed) = Confirm(settings, runs, root);
        return new DesignOutcome
        {
            Settings = settings,
            Status = StudyStatus.Done,
            Points = runs.Points(),
            Answer = settings.FromSearch(root),
            Tolerance = tolerance,
            Bracketed = bracketed,
            ResultAtAnswerSi = runs.Result(root),
            RunAtAnswer = runs.Run(root),
            Crossings = crossings.Count,
        };
    }

    private static double FindRoot(DesignSettings settings, Runs runs, double low, double high)
    {
        // The stopping rule of Brent's method also accepts |f| below the accuracy, so f is the relative miss: the
        // answer then stops either within the input tolerance or with the result within that fraction of the target.
        return Brent.TryFindRoot(runs.Miss, low, high, settings.SearchAccuracy, MaximumIterations, out var root)
            ? root
            : throw new StopException(StudyStatus.SolverFailed, $"the root finder did not settle within {MaximumIterations} runs; the result may not be continuous in {settings.Input.Label}");
    }

    /// <summary>The tolerance of the answer, and whether results on either side of the target confirm it.</summary>
    private static (double Tolerance, bool Bracketed) Confirm(DesignSettings settings, Runs runs, double root)
    {
        var step = settings.SearchAccuracy;
        var low = Math.Max(settings.ToSearch(settings.Lowest), root - step);
        var high = Math.Min(settings.ToSearch(settings.Highest), root + step);
        runs.EvaluateAll([low, high, root], 3);
        var answer = settings.FromSearch(root);
        var width = Math.Max(answer - settings.FromSearch(low), settings.FromSearch(high) - answer);
        var (missLow, missHigh) = (runs.Miss(low), runs.Miss(high));
        if (missLow * missHigh <= 0)
        {
            return (width, true);
        }

        // Not confirmed (a flat or noisy result): widen by the input change that the remaining miss stands for.
        var slope = (missHigh - missLow) / (settings.FromSearch(high) - settings.FromSearch(low));
        var extra = slope != 0 && double.IsFinite(slope) ? Math.Abs(runs.Miss(root) / slope) : double.PositiveInfinity;
        return (width + extra, false);
    }

    private static DesignOutcome NotReached(DesignSettings settings, Runs runs)
    {
        var points = runs.Points();
        var defined = points.Where(point => double.IsFinite(point.ResultSi)).ToList();
        var input = settings.Input;
        var range = $"from {input.Show(settings.Lowest)} to {input.Show(settings.Highest)}";
        string message;
        if (defined.Count == 0)
        {
            message = $"{settings.Result.Label} is not defined for any value of {input.Label} {range} ({points.Count} values tried)";
        }
        else
        {
            var undefined = points.Count - defined.Count;
            message = $"no value of {input.Label} {range} gives {settings.Result.Label} = {Show(settings, settings.TargetSi)}: " +
                $"over that range it lies between {Show(settings, defined.Min(point => point.ResultSi))} and {Show(settings, defined.Max(point => point.ResultSi))} " +
                $"({points.Count} values tried{(undefined > 0 ? $", {undefined} without a result" : string.Empty)}); widen the range or change the target";
        }

        return new DesignOutcome { Settings = settings, Status = StudyStatus.NotReached, Message = message, Points = points };
    }

    /// <summary>A result in the unit the target was written in.</summary>
    public static string Show(DesignSettings settings, double si)
    {
        ArgumentNullException.ThrowIfNull(settings);
        return QuantityParser.FormatSi(si, settings.TargetUnit).Replace(settings.TargetUnit.Symbol, settings.TargetUnit.ForPeople, StringComparison.Ordinal);
    }

    /// <summary>The runs made so far, by value of the search variable, so that no value is solved twice.</summary>
    private sealed class Runs(JsonObject document, string fileName, DesignSettings settings, CancellationToken cancellation)
    {
        private readonly ConcurrentDictionary<double, (double Value, double Result, SimulationResult Run)> _done = new();
        private readonly double[] _extraTimes = settings.Result.AtSeconds is { } at ? [at] : [];

        public double Miss(double search) => (Evaluate(search).Result / settings.TargetSi) - 1;

        public double Result(double search) => Evaluate(search).Result;

        public SimulationResult Run(double search) => Evaluate(search).Run;

        public void EvaluateAll(IReadOnlyList<double> searches, int jobs)
        {
            var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, jobs) };
            try
            {
                Parallel.ForEach(searches, options, search => Evaluate(search));
            }
            catch (AggregateException aggregate) when (aggregate.InnerExceptions.OfType<StopException>().FirstOrDefault() is { } stop)
            {
                throw stop;
            }
        }

        public List<DesignPoint> Points() =>
            _done.Values.Select(done => new DesignPoint(done.Value, done.Result)).OrderBy(point => point.Value).ToList();

        private (double Value, double Result, SimulationResult Run) Evaluate(double search)
        {
            if (_done.TryGetValue(search, out var known))
            {
                return known;
            }

            var value = Math.Clamp(settings.FromSearch(search), settings.Lowest, settings.Highest);
            var read = CaseVariation.Read(document, fileName, [(settings.Input, value)], _extraTimes);
            if (read.Case is not { } simulation)
            {
                throw new StopException(StudyStatus.Invalid, $"with {settings.Input.Write(value)} at {settings.Input.Path} the case is invalid", read.Errors);
            }

            var run = Simulator.Run(simulation, checkExactByFiniteVolumes: false, cancellation);
            if (run.Statistics.StopReason == StopReason.Cancelled)
            {
                throw new StopException(StudyStatus.Cancelled, "cancelled");
            }

            if (!run.Completed)
            {
                throw new StopException(StudyStatus.SolverFailed, $"with {settings.Input.Write(value)} at {settings.Input.Path} {run.FailureReason}");
            }

            var evaluated = (value, settings.Result.Read(run) ?? double.NaN, run);
            _done[search] = evaluated;
            return evaluated;
        }
    }

    /// <summary>Ends the search from inside the root finder's callback; carries a user-facing outcome, not a bug.</summary>
    private sealed class StopException(StudyStatus status, string message, IReadOnlyList<CaseError>? errors = null) : Exception(message)
    {
        public StudyStatus Status { get; } = status;

        public IReadOnlyList<CaseError> Errors { get; } = errors ?? [];
    }
}
