using Layers.Core.Discretization;

namespace Layers.Core.TimeStepping;

/// <summary>
/// One step of TR-BDF2 for Cap du/dt = s - A u: a trapezoidal stage to t + gamma h, then a BDF2 stage to t + h,
/// with gamma = 2 - sqrt(2) so that both stages share the matrix Cap + (gamma/2) h A (one factorisation per step).
/// The method is second order, L-stable (no ringing after a step change in the initial concentration) and, with a
/// direct solve, conserves mass to round-off. With dispersed layers the stage equations are nonlinear (the
/// dissolved value is capped) and are solved by <see cref="CappedStageSolver"/> inside each stage, so the step is
/// still fully implicit and in conserved form.
/// </summary>
/// <remarks>
/// Bank, Coughran, Fichtner, Grosse, Rose and Smith, IEEE Trans. Electron Devices 32 (1985) 1992-2007 (the method
/// and its local truncation error k h^3 u''' with k = (-3 gamma^2 + 4 gamma - 2) / (12 (2 - gamma)));
/// Hosea and Shampine, Appl. Numer. Math. 20 (1996) 21-37 (the error estimate from the three stage derivatives,
/// filtered through (Cap + (gamma/2) h A)^-1 so that stiff components do not inflate it).
/// The mass exchanged with baths over a step is integrated with the same quadrature as the stages, so the discrete
/// mass balance closes exactly.
/// </remarks>
internal sealed partial class TrBdf2Stepper
{
    /// <summary>Where the trapezoidal stage ends, as a fraction of the step: gamma = 2 - sqrt(2).</summary>
    public static readonly double Gamma = 2 - Math.Sqrt(2);
    private static readonly double StageWeight = Gamma / 2;
    private static readonly double BdfWeightOfStage = 1 / (Gamma * (2 - Gamma));
    private static readonly double BdfWeightOfStart = (1 - Gamma) * (1 - Gamma) / (Gamma * (2 - Gamma));
    private static readonly double ErrorConstant = ((-3 * Gamma * Gamma) + (4 * Gamma) - 2) / (12 * (2 - Gamma));

    // The weights of the three rates in the error estimate, r_n / gamma - r_g / (gamma (1 - gamma)) + r_n+1 / (1 - gamma).
    private static readonly double ErrorWeightOfStart = 1 / Gamma;
    private static readonly double ErrorWeightOfStage = -1 / (Gamma * (1 - Gamma));
    private static readonly double ErrorWeightOfEnd = 1 / (1 - Gamma);

    private readonly DiffusionSystem _system;
    private readonly IStageSolver? _solver;
    private readonly ImplicitMatrix? _matrix;
    private readonly double[] _stage;
    private readonly double[] _work;

    /// <summary>s: the bath terms G_bath u_bath of the end nodes, zero elsewhere.</summary>
    private readonly double[] _source;
    private readonly double[] _dissolvedAtStage;
    private readonly double[] _rateAtStage;
    private double[] _dissolvedAtStart;
    private double[] _dissolvedAtEnd;
    private double[] _rateAtStart;
    private double[] _rateAtEnd;

    // The arrays whose dissolved values and rates s - A u are held: a step that starts from the previous candidate
    // (it was accepted) or from the previous start (the step was rejected) reuses them instead of recomputing them.
    private double[]? _rateAtStartOf;
    private double[]? _rateAtEndOf;

    /// <summary>
    /// A stepper for the system: with the linear stage solve when no layer has a solubility, else with the capped one,
    /// whose state is each node's content w and whose fluxes are driven by the dissolved u = min(w, u_sat).
    /// </summary>
    public TrBdf2Stepper(DiffusionSystem system)
    {
        _system = system;
        var n = system.NodeCount;
        _source = new double[n];
        _source[0] += system.LeftBath.Conductance * system.LeftBath.BathValue;
        _source[n - 1] += system.RightBath.Conductance * system.RightBath.BathValue;
        if (system.Saturation is null)
        {
            _matrix = new ImplicitMatrix(system);
        }
        else
        {
            _solver = new CappedStageSolver(system);
        }

        _stage = new double[n];
        _work = new double[n];

        // Where nothing is capped the dissolved values are the states themselves and need no arrays of their own.
        var dissolved = _solver is null ? 0 : n;
        _dissolvedAtStart = new double[dissolved];
        _dissolvedAtStage = new double[dissolved];
        _dissolvedAtEnd = new double[dissolved];
        _rateAtStart = new double[n];
        _rateAtStage = new double[n];
        _rateAtEnd = new double[n];
    }

    /// <summary>
    /// Tells the stepper that the caller changed a state array between steps (an event), so the rates it remembers
    /// for its arrays must be recomputed.
    /// </summary>
    public void StateChanged()
    {
        _rateAtStartOf = null;
        _rateAtEndOf = null;
    }

    /// <summary>w at t + gamma h of the last step tried (the end of its trapezoidal stage).</summary>
    public ReadOnlySpan<double> Stage => _stage;

    /// <summary>Tries a step of size h from w; writes the candidate into <paramref name="next"/>.</summary>
    /// <param name="start">State at the start of the step.</param>
    /// <param name="stepSeconds">Step size h.</param>
    /// <param name="next">Candidate state at t + h.</param>
    /// <param name="weights">Per-node tolerance scale used to normalise the error.</param>
    /// <returns>The error and bath exchange of the step; an infinite error when a stage solve did not converge.</returns>
    public StepTrial Try(double[] start, double stepSeconds, double[] next, ErrorWeights weights)
        => _matrix is null ? TryCapped(_solver!, start, stepSeconds, next, weights) : TryLinear(_matrix, start, stepSeconds, next, weights);

    private StepTrial TryCapped(IStageSolver solver, double[] start, double stepSeconds, double[] next, ErrorWeights weights)
    {
        var capacity = _system.Capacity;
        var n = capacity.Length;
        var c = StageWeight * stepSeconds;
        solver.Prepare(c);
        RatesAtStart(start, solver);

        // Trapezoidal stage: Cap w_g + c A u_g = Cap w_n + c (s - A u_n) + c s. The right-hand sides and the error are
        // formed as in the linear step's sweeps, so that where nothing saturates both give the same numbers.
        for (var i = 0; i < n; i++)
        {
            _work[i] = (capacity[i] * start[i]) + (c * (_rateAtStart[i] + _source[i]));
        }

        start.CopyTo(_stage);
        if (!solver.Solve(_work, _stage, _dissolvedAtStage))
        {
            return StepTrial.NotConverged;
        }

        _system.Residual(_dissolvedAtStage, _rateAtStage);

        // BDF2 stage: Cap w_n+1 + c A u_n+1 = Cap (w1 w_g - w0 w_n) + c s.
        for (var i = 0; i < n; i++)
        {
            _work[i] = (capacity[i] * ((BdfWeightOfStage * _stage[i]) - (BdfWeightOfStart * start[i]))) + (c * _source[i]);
        }

        _stage.CopyTo(next);
        if (!solver.Solve(_work, next, _dissolvedAtEnd))
        {
            return StepTrial.NotConverged;
        }

        _system.Residual(_dissolvedAtEnd, _rateAtEnd);
        _rateAtEndOf = next;

        var error = FilteredError(solver, start, next, stepSeconds, weights);
        var (leftToStage, left) = BathInflow(_system.LeftBath, _dissolvedAtStart[0], _dissolvedAtStage[0], _dissolvedAtEnd[0], c);
        var (rightToStage, right) = BathInflow(_system.RightBath, _dissolvedAtStart[n - 1], _dissolvedAtStage[n - 1], _dissolvedAtEnd[n - 1], c);
        return new StepTrial(error, left, right, new BathTotals(leftToStage, rightToStage));
    }

    /// <summary>
    /// Makes the start arrays hold the dissolved values and rates s - A u of <paramref name="start"/>, reusing those of
    /// the last candidate (it was accepted) or of the last start (the step was rejected).
    /// </summary>
    private void RatesAtStart(double[] start, IStageSolver? solver)
    {
        if (ReferenceEquals(start, _rateAtEndOf))
        {
            (_rateAtStart, _rateAtEnd) = (_rateAtEnd, _rateAtStart);
            (_dissolvedAtStart, _dissolvedAtEnd) = (_dissolvedAtEnd, _dissolvedAtStart);
            _rateAtStartOf = start;
        }
        else if (!ReferenceEquals(start, _rateAtStartOf))
        {
            if (solver is null)
            {
                _system.Residual(start, _rateAtStart);
            }
            else
            {
                solver.Dissolve(start, _dissolvedAtStart);
                _system.Residual(_dissolvedAtStart, _rateAtStart);
            }

            _rateAtStartOf = start;
        }

        // The end arrays are overwritten next; until they hold this step's end, they belong to no state.
        _rateAtEndOf = null;
    }

    private double FilteredError(IStageSolver solver, ReadOnlySpan<double> start, ReadOnlySpan<double> next, double h, ErrorWeights weights)
    {
        var n = _work.Length;
        var scale = 2 * ErrorConstant * h;
        var weightOfStart = scale * ErrorWeightOfStart;
        var weightOfStage = scale * ErrorWeightOfStage;
        var weightOfEnd = scale * ErrorWeightOfEnd;
        for (var i = 0; i < n; i++)
        {
            _work[i] = (weightOfStart * _rateAtStart[i]) + (weightOfStage * _rateAtStage[i]) + (weightOfEnd * _rateAtEnd[i]);
        }

        solver.Filter(_work);

        // The largest |error| / tolerance, found without a division per node: a division only where a new largest
        // ratio appears.
        var worst = 0.0;
        var absolute = weights.Absolute;
        var relative = weights.Relative;
        ReadOnlySpan<double> error = _work;
        var before = start[..error.Length];
        var after = next[..error.Length];
        for (var i = 0; i < error.Length; i++)
        {
            var size = Math.Abs(error[i]);
            var tolerance = absolute + (relative * Math.Max(Math.Abs(before[i]), Math.Abs(after[i])));
            if (!(size <= worst * tolerance))
            {
                worst = size / tolerance;
            }
        }

        return worst;
    }

    /// <summary>
    /// Mass per area from a bath up to the stage (the trapezoidal quadrature, which is what the trapezoidal stage
    /// adds to the stored mass) and over the whole step (the BDF2 quadrature).
    /// </summary>
    private static (double ToStage, double Step) BathInflow(BathCoupling bath, double start, double stage, double end, double c)
    {
        if (!bath.Exists)
        {
            return (0, 0);
        }

        var trapezoidal = c * (bath.InflowRate(start) + bath.InflowRate(stage));
        return (trapezoidal, (BdfWeightOfStage * trapezoidal) + (c * bath.InflowRate(end)));
    }
}

/// <summary>Outcome of one trial step.</summary>
/// <param name="NormalisedError">Largest local error divided by its tolerance; NaN if the step produced NaN.</param>
/// <param name="LeftBathInflowPerArea">Mass per area that entered the stack from a left bath over the step, kg/m2.</param>
/// <param name="RightBathInflowPerArea">Mass per area that entered the stack from a right bath over the step, kg/m2.</param>
/// <param name="InflowToStage">Mass per area from each bath between the start of the step and its stage, kg/m2.</param>
internal readonly record struct StepTrial(
    double NormalisedError,
    double LeftBathInflowPerArea,
    double RightBathInflowPerArea,
    BathTotals InflowToStage)
{
    /// <summary>A stage solve did not converge: reject the step and retry it smaller.</summary>
    public static StepTrial NotConverged => new(double.PositiveInfinity, 0, 0, default);
}

/// <summary>Per-node tolerance: |error| must stay below Absolute + Relative |u|.</summary>
internal readonly record struct ErrorWeights(double Absolute, double Relative);
