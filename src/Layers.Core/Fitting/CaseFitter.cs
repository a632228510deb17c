using System.Globalization;
using System.Text.Json.Nodes;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Studies;

namespace Layers.Core.Fitting;

/// <summary>A fit whose case, data and inputs have been checked, ready to run.</summary>
public sealed class PreparedFit
{
    internal PreparedFit(FitRequest request, FitModel model, IReadOnlyList<FitParameter> parameters)
    {
        Request = request;
        Model = model;
        Parameters = parameters;
    }

    /// <summary>The request.</summary>
    public FitRequest Request { get; }

    /// <summary>The inputs to estimate, with their starting values.</summary>
    public IReadOnlyList<FitParameter> Parameters { get; }

    internal FitModel Model { get; }
}

/// <summary>
/// Estimates inputs of a case from measurements by weighted nonlinear least squares in log10 space
/// (<see cref="LevenbergMarquardt"/>): residuals (measured - model) / sd, or measured - model without standard
/// deviations; standard errors, intervals and correlations from the Jacobian at the estimate
/// (<see cref="LeastSquaresStatistics"/>); and the inputs the data do not determine named
/// (<see cref="Identifiability"/>).
/// </summary>
public static class CaseFitter
{
    /// <summary>Reads the case of the request and checks the request; on failure returns null and adds every problem found to <paramref name="errors"/>.</summary>
    public static PreparedFit? Prepare(FitRequest request, List<string> errors)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(errors);
        var read = CaseDocument.ReadFileWithRoot(request.CasePath);
        if (read.Read.Case is null)
        {
            errors.Add(read.Read.FormatErrors());
            return null;
        }

        return Prepare(request, read, errors);
    }

    /// <summary>Checks the request against its case, already read and valid; on failure returns null and adds every problem found to <paramref name="errors"/>.</summary>
    public static PreparedFit? Prepare(FitRequest request, CaseDocumentRead document, List<string> errors)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(errors);
        if (document.Read.Case is not { } simulation || document.Root is not { } root)
        {
            throw new ArgumentException("the case must be valid", nameof(document));
        }

        var before = errors.Count;

        if (root.ContainsKey("sweep"))
        {
            errors.Add($"{request.CasePath}: $.sweep: a case with a sweep cannot be fitted; fit a case without \"sweep\"");
        }

        var parameters = new List<FitParameter>();
        foreach (var path in request.Paths)
        {
            if (FitParameter.Read(root, path, out var problem) is { } parameter)
            {
                if (parameters.Any(other => other.Path == parameter.Path))
                {
                    errors.Add($"--estimate: '{path}' is given twice");
                }

                parameters.Add(parameter);
            }
            else
            {
                errors.Add($"{request.CasePath}: {problem}");
            }
        }

        if (request.Paths.Count == 0)
        {
            errors.Add("--estimate: name at least one input to estimate, e.g. --estimate '$.layers[0].diffusionCoefficient'");
        }

        CheckData(request, simulation, errors);
        return errors.Count > before ? null : new PreparedFit(request, new FitModel(root, request.CasePath, parameters, request.Data, request.Face)
        {
            MediumDensityKgPerCubicMeter = (simulation.Face(request.Face) as CompartmentFace)?.DensityKgPerCubicMeter,
        }, parameters);
    }

    /// <summary>Runs the fit, telling how it ended: done, cancelled, or the model cannot be solved at the starting values.</summary>
    public static FitOutcome Run(PreparedFit prepared, CancellationToken cancellation = default)
    {
        try
        {
            return Fit(prepared, cancellation) is { } fit
                ? new FitOutcome(StudyStatus.Done, fit)
                : new FitOutcome(StudyStatus.SolverFailed, null) { Message = "the solver cannot solve the case at its starting values" };
        }
        catch (OperationCanceledException) when (cancellation.IsCancellationRequested)
        {
            return new FitOutcome(StudyStatus.Cancelled, null) { Message = "cancelled" };
        }
    }

    /// <summary>Runs the fit; null when the model cannot be solved at the starting values.</summary>
    public static FitResult? Fit(PreparedFit prepared, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(prepared);
        var request = prepared.Request;
        var data = request.Data;
        var model = prepared.Model;
        var start = prepared.Parameters.Select(parameter => Math.Log10(parameter.StartValue)).ToArray();
        double[]? Residuals(double[] logValues) => model.Values(logValues, cancellation) is { } values
            ? values.Select((value, i) => (data.Values[i] - value) / (data.Deviations?[i] ?? 1)).ToArray()
            : null;

        if (LevenbergMarquardt.Minimize(Residuals, start, request.Options, cancellation) is not { } solution)
        {
            return null;
        }

        var statistics = LeastSquaresStatistics.Of(solution.Jacobian, solution.Residuals, request.Confidence);
        var (estimates, findings) = Identifiability.Judge(prepared.Parameters, solution.Parameters, statistics);
        var samples = model.Samples(solution.Parameters, cancellation)!;
        var points = new List<FitPoint>();
        var values = model.At(samples);
        for (var i = 0; i < values.Length; i++)
        {
            points.Add(new FitPoint(data.TimesSeconds[i], data.Values[i], data.Deviations?[i], values[i]));
        }

        return new FitResult
        {
            FittedCase = model.Read(solution.Parameters).Case!,
            FittedCaseJson = model.Json(solution.Parameters),
            Request = request,
            Estimates = estimates,
            Correlation = statistics.Correlation.ToArray(),
            Findings = findings,
            Points = points,
            Curve = samples.Select(sample => (sample.TimeSeconds, model.Of(sample))).ToArray(),
            SumOfSquares = solution.SumOfSquares,
            DegreesOfFreedom = statistics.DegreesOfFreedom,
            TQuantile = statistics.TQuantile,
            ConditionNumber = statistics.ConditionNumber,
            Iterations = solution.Iterations,
            ModelRuns = solution.Evaluations + 1,
            Stop = solution.Stop,
        };
    }

    private static void CheckData(FitRequest request, SimulationCase simulation, List<string> errors)
    {
        var data = request.Data;
        var side = request.Face == Side.Left ? "left" : "right";
        var medium = simulation.Face(request.Face);
        if (!medium.IsOpen)
        {
            errors.Add($"{request.CasePath}: $.{side}: the {side} face is closed; the data must be measured in the medium on a face (use --face)");
        }
        else if (data.Quantity is MeasuredQuantity.Concentration or MeasuredQuantity.MassFraction && !medium.HasFiniteVolume)
        {
            errors.Add($"{request.CasePath}: $.{side}: '{data.FileName}' holds concentrations, which need a compartment on the {side} face; a bath's concentration is fixed");
        }
        else if (data.Quantity == MeasuredQuantity.MassFraction && (medium as CompartmentFace)?.DensityKgPerCubicMeter is null)
        {
            errors.Add($"{request.CasePath}: $.{side}.density: '{data.FileName}' holds concentrations as a mass fraction ({data.ValueUnit.Symbol}), which need the density of the compartment on the {side} face to compare with the model; give \"density\" (e.g. \"0.92 g/mL\") or write the data as a mass per volume (e.g. mg/L)");
        }

        var last = data.TimesSeconds.Count > 0 ? data.TimesSeconds[^1] : 0;
        if (last > simulation.DurationSeconds * (1 + 1e-9))
        {
            errors.Add(string.Create(CultureInfo.InvariantCulture, $"{request.CasePath}: $.duration: the data run to {data.TimeUnit.FromSi(last):G6} {data.TimeUnit.Symbol}, beyond the duration of the case; make the duration at least that long"));
        }

        if (data.TimesSeconds.Count <= request.Paths.Count)
        {
            errors.Add($"'{data.FileName}': {data.TimesSeconds.Count} measurements cannot determine {request.Paths.Count} inputs; more measurements than inputs are needed");
        }
    }
}
