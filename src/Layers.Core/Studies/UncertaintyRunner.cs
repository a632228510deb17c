using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.TimeStepping;

namespace Layers.Core.Studies;

/// <summary>
/// Runs an uncertainty study (Monte Carlo): draws every sample's inputs first (<see cref="SampleDesign"/>), reads
/// every sample's case and stops before any solve when one is invalid, then solves the samples in parallel and
/// gathers, per sample index, the amounts and concentrations at the output times of the case as written and the
/// results asked for. Percentiles and the chance of exceeding the limit follow from those values alone, so they do
/// not depend on the number of jobs.
/// </summary>
public static class UncertaintyRunner
{
    private const double WilsonZ = 1.959963984540054;

    /// <summary>Runs the study.</summary>
    /// <param name="document">The whole case document.</param>
    /// <param name="fileName">The case file.</param>
    /// <param name="baseCase">The case as written (valid).</param>
    /// <param name="settings">The study, from <see cref="UncertaintyReader"/>.</param>
    /// <param name="jobs">How many samples are solved at once.</param>
    /// <param name="cancellation">Stops the runs.</param>
    public static UncertaintyOutcome Run(
        JsonObject document, string fileName, SimulationCase baseCase, UncertaintySettings settings, int jobs, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(baseCase);
        ArgumentNullException.ThrowIfNull(settings);
        var probabilities = SampleDesign.Draw(settings.Samples, settings.Inputs.Count, settings.Sampling, settings.Seed);
        var values = probabilities
            .Select(row => (IReadOnlyList<double>)settings.Inputs.Select((input, i) => input.Distribution.Quantile(row[i])).ToArray())
            .ToArray();
        var times = OutputSchedule.For(baseCase);
        var series = SeriesOf(baseCase, times);
        var extra = times
            .Concat(settings.Results.Concat(settings.Limit is { } limit ? [limit.Result] : []).Select(result => result.AtSeconds ?? 0))
            .ToArray();
        var outcome = new UncertaintyOutcome { Settings = settings, BaseCase = baseCase, Status = StudyStatus.Done, InputValues = values, TimesSeconds = times };

        var cases = new SimulationCase?[settings.Samples];
        var reads = new CaseReadResult[settings.Samples];
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, jobs), CancellationToken = cancellation };
        try
        {
            Parallel.For(0, settings.Samples, options, i =>
            {
                reads[i] = CaseVariation.Read(document, fileName, settings.Inputs.Select((input, k) => (input.Input, values[i][k])), extra);
                cases[i] = reads[i].Case;
            });
        }
        catch (OperationCanceledException)
        {
            return outcome with { Status = StudyStatus.Cancelled, Message = "cancelled" };
        }

        if (Array.FindIndex(cases, simulation => simulation is null) is var invalid and >= 0)
        {
            return outcome with
            {
                Status = StudyStatus.Invalid,
                Message = $"sample {invalid + 1} of {settings.Samples} ({Describe(settings, values[invalid])}) is not a valid case; " +
                    "narrow the distribution or choose one that stays within the rules (logNormal for values that must be > 0)",
                Errors = reads[invalid].Errors,
            };
        }

        var samples = new SampleValues?[settings.Samples];
        var failures = new string?[settings.Samples];
        try
        {
            Parallel.For(0, settings.Samples, options, i =>
            {
                var run = Simulator.Run(cases[i]!, checkExactByFiniteVolumes: false, cancellation);
                if (run.Completed)
                {
                    samples[i] = Extract(run, series, settings);
                    cases[i] = null; // only the extracted values are kept
                }
                else if (run.Statistics.StopReason != StopReason.Cancelled)
                {
                    failures[i] = run.FailureReason;
                }
            });
        }
        catch (OperationCanceledException)
        {
            return outcome with { Status = StudyStatus.Cancelled, Message = "cancelled" };
        }

        if (cancellation.IsCancellationRequested)
        {
            return outcome with { Status = StudyStatus.Cancelled, Message = "cancelled" };
        }

        if (Array.FindIndex(failures, failure => failure is not null) is var failed and >= 0)
        {
            return outcome with
            {
                Status = StudyStatus.SolverFailed,
                Message = $"sample {failed + 1} of {settings.Samples} ({Describe(settings, values[failed])}): {failures[failed]}",
            };
        }

        return Summarise(outcome, settings, series, samples.Select(sample => sample!).ToArray());
    }

    private static UncertaintyOutcome Summarise(UncertaintyOutcome outcome, UncertaintySettings settings, IReadOnlyList<ResultMeasure[]> series, SampleValues[] samples)
    {
        var spreads = series.Select((measures, s) => new SeriesSpread(
            measures[0].Kind,
            measures.Select((_, t) => (IReadOnlyList<double>)Percentile.Of(samples.Select(sample => sample.Series[s][t]), settings.Percentiles)).ToArray()))
            .ToArray();
        var results = settings.Results.Select((result, r) =>
        {
            var column = samples.Select(sample => sample.Results[r]).ToArray();
            return new ResultSpread(result, column, Percentile.Of(column, settings.Percentiles));
        }).ToArray();
        Exceedance? exceedance = null;
        var limitValues = samples.Select(sample => sample.Limit).ToArray();
        if (settings.Limit is { } limit)
        {
            var counted = limitValues.Count(value => !double.IsNaN(value));
            var above = limitValues.Count(value => value > limit.ValueSi);
            var (low, high) = Wilson(above, counted);
            exceedance = new Exceedance(limit, above, counted, low, high);
        }

        return outcome with { Series = spreads, Results = results, Exceedance = exceedance, LimitValues = settings.Limit is null ? [] : limitValues };
    }

    /// <summary>
    /// The 95 % Wilson score interval of a binomial proportion (Wilson, J. Am. Stat. Assoc. 22 (1927) 209-212),
    /// which stays inside [0, 1] and is sensible at 0 or N successes, unlike p +- 1.96 sqrt(p(1-p)/N).
    /// </summary>
    public static (double Low, double High) Wilson(int successes, int trials)
    {
        if (trials == 0)
        {
            return (double.NaN, double.NaN);
        }

        var p = (double)successes / trials;
        var z2 = WilsonZ * WilsonZ;
        var centre = (p + (z2 / (2.0 * trials))) / (1 + (z2 / trials));
        var half = WilsonZ * Math.Sqrt((p * (1 - p) / trials) + (z2 / (4.0 * trials * trials))) / (1 + (z2 / trials));
        return (Math.Max(0, centre - half), Math.Min(1, centre + half));
    }

    /// <summary>For each face medium, its amount and concentration at every time (and the food's concentration).</summary>
    private static List<ResultMeasure[]> SeriesOf(SimulationCase baseCase, IReadOnlyList<double> times)
    {
        var kinds = new List<NamedResult>();
        if (baseCase.Left.IsOpen)
        {
            kinds.AddRange([NamedResult.LeftReceived, NamedResult.LeftConcentration]);
        }

        if (baseCase.Right.IsOpen)
        {
            kinds.AddRange([NamedResult.RightReceived, NamedResult.RightConcentration]);
        }

        if (baseCase.FoodContact is not null)
        {
            kinds.Add(NamedResult.FoodConcentration);
        }

        return kinds.Select(kind => times.Select(time => new ResultMeasure(kind, time)).ToArray()).ToList();
    }

    private static SampleValues Extract(SimulationResult run, IReadOnlyList<ResultMeasure[]> series, UncertaintySettings settings) => new(
        series.Select(measures => measures.Select(measure => measure.Read(run) ?? double.NaN).ToArray()).ToArray(),
        settings.Results.Select(result => Value(result, run)).ToArray(),
        settings.Limit is { } limit ? Value(limit.Result, run) : double.NaN);

    /// <summary>A result of a run; a time never reached counts as infinitely late, so it still ranks.</summary>
    private static double Value(ResultMeasure result, SimulationResult run) =>
        result.Read(run) ?? (result.Dimension == Units.Dimension.Time ? double.PositiveInfinity : double.NaN);

    private static string Describe(UncertaintySettings settings, IReadOnlyList<double> values) =>
        string.Join("; ", settings.Inputs.Select((input, i) => $"{input.Input.Label} = {input.Input.Show(values[i])}"));

    /// <summary>What one sample gave: [series][time], the results, and the result compared with the limit.</summary>
    private sealed record SampleValues(double[][] Series, double[] Results, double Limit);
}
