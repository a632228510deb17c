namespace Layers.Core.TimeStepping;

/// <summary>
/// The step when nothing is capped (state and dissolved value are the same): both stages and the error filter share
/// one factorisation of Cap + c A, and the work that is not a recurrence is done inside the sweeps of the solves.
/// </summary>
/// <remarks>
/// A Thomas sweep is latency-bound: each row waits for the one before, one fused multiply-add per row. The loads,
/// products and sums that build a right-hand side, the residual s - A u of the solution just found, the combination
/// of the three rates in the error estimate and its norm do not lie on that chain, so folded into the sweeps they
/// cost little, whereas as separate passes over the nodes they cost a pass each. The arithmetic is that of the plain
/// passes: the residual is formed from the same differences, the right-hand sides from the same products.
/// </remarks>
internal sealed partial class TrBdf2Stepper
{
    private StepTrial TryLinear(ImplicitMatrix matrix, double[] start, double stepSeconds, double[] next, ErrorWeights weights)
    {
        var c = StageWeight * stepSeconds;
        RatesAtStart(start, null);
        var factors = matrix.Factors;
        var n = start.Length;

        // Trapezoidal stage: (Cap + c A) u_g = Cap u_n + c (s - A u_n) + c s, solved as u_g = 2 z - u_n with
        // (Cap + c A) z = Cap u_n + c s (the trapezoidal rule is a backward Euler half step extrapolated). The right-hand
        // side then holds no rate: c (s - A u_n) is a difference of fluxes of size c G, which at steps far beyond a
        // cell's diffusion time holds round-off far larger than Cap u_n, and would carry it into u_g.
        FactorAndTrapezoidalForward(matrix, start, c);
        BackwardReflectedWithResidual(factors, start, _stage, _rateAtStage);

        // BDF2 stage: (Cap + c A) u_n+1 = Cap (w1 u_g - w0 u_n) + c s.
        BdfForward(factors, start, next, c);
        BackwardWithResidual(factors, next, _rateAtEnd);
        _rateAtEndOf = next;

        var error = FilteredLinearError(factors, start, next, stepSeconds, weights);
        var (leftToStage, left) = BathInflow(_system.LeftBath, start[0], _stage[0], next[0], c);
        var (rightToStage, right) = BathInflow(_system.RightBath, start[n - 1], _stage[n - 1], next[n - 1], c);
        return new StepTrial(error, left, right, new BathTotals(leftToStage, rightToStage));
    }

    /// <summary>
    /// Factors Cap + c A (as <see cref="ImplicitMatrix.Factor(double)"/> does) and, in the same sweep, runs the forward
    /// sweep of the half step's z into the stage array: the substitution's chain does not feed the pivots', so it runs
    /// in the shadow of the division that each pivot waits for.
    /// </summary>
    private void FactorAndTrapezoidalForward(ImplicitMatrix matrix, ReadOnlySpan<double> start, double c)
    {
        var count = start.Length;
        var factors = matrix.Factors;
        var inversePivot = factors.InversePivot[..count];
        var lowerMultiplier = factors.LowerMultiplier[..count];
        var upperMultiplier = factors.UpperMultiplier[..count];
        var capacity = matrix.Capacity[..count];
        var bath = matrix.BathConductance[..count];
        var left = matrix.LeftConductance[..count];
        var right = matrix.RightConductance[..count];
        ReadOnlySpan<double> source = _source.AsSpan(0, count);
        var stage = _stage.AsSpan(0, count);
        var kept = 0.0;
        var previous = 0.0;
        for (var n = 0; n < count; n++)
        {
            var lower = c * left[n];
            var upper = c * right[n];
            (var pivot, kept) = ImplicitMatrix.Pivot(capacity[n] + (c * bath[n]), lower, kept, upper);
            inversePivot[n] = pivot;
            var lowerOverPivot = lower * pivot;
            lowerMultiplier[n] = lowerOverPivot;
            upperMultiplier[n] = upper * pivot;
            var rightHandSide = (capacity[n] * start[n]) + (c * source[n]);
            previous = Math.FusedMultiplyAdd(lowerOverPivot, previous, rightHandSide * pivot);
            stage[n] = previous;
        }
    }

    /// <summary>Forward sweep of the BDF2 stage into <paramref name="next"/>, its right-hand side built on the way.</summary>
    private void BdfForward(TridiagonalFactors factors, ReadOnlySpan<double> start, Span<double> next, double c)
    {
        var count = start.Length;
        ReadOnlySpan<double> inversePivot = factors.InversePivot[..count];
        ReadOnlySpan<double> lowerMultiplier = factors.LowerMultiplier[..count];
        ReadOnlySpan<double> capacity = _system.Capacity.AsSpan(0, count);
        ReadOnlySpan<double> source = _source.AsSpan(0, count);
        ReadOnlySpan<double> stage = _stage.AsSpan(0, count);
        var end = next[..count];
        var previous = 0.0;
        for (var n = 0; n < count; n++)
        {
            var rightHandSide = (capacity[n] * ((BdfWeightOfStage * stage[n]) - (BdfWeightOfStart * start[n]))) + (c * source[n]);
            previous = Math.FusedMultiplyAdd(lowerMultiplier[n], previous, rightHandSide * inversePivot[n]);
            end[n] = previous;
        }
    }

    /// <summary>
    /// Backward sweep of the half step's z in place, each value replaced at once by the stage's u_g = 2 z - u_n, and the
    /// rate s - A u_g as in <see cref="BackwardWithResidual"/>.
    /// </summary>
    private void BackwardReflectedWithResidual(TridiagonalFactors factors, ReadOnlySpan<double> start, Span<double> values, Span<double> rates)
    {
        var count = values.Length;
        ReadOnlySpan<double> upperMultiplier = factors.UpperMultiplier[..count];
        ReadOnlySpan<double> conductance = _system.Conductance.AsSpan(0, count - 1);
        var before = start[..count];
        var x = values[..count];
        var rate = rates[..count];
        var right = _system.RightBath;
        var halfStep = x[count - 1];
        var after = (2 * halfStep) - before[count - 1];
        x[count - 1] = after;
        var outflow = -right.InflowRate(after);
        for (var n = count - 2; n >= 0; n--)
        {
            halfStep = Math.FusedMultiplyAdd(upperMultiplier[n], halfStep, x[n]);
            var value = (2 * halfStep) - before[n];
            x[n] = value;
            var flux = conductance[n] * (value - after);
            rate[n + 1] = flux - outflow;
            outflow = flux;
            after = value;
        }

        rate[0] = _system.LeftBath.InflowRate(after) - outflow;
    }

    /// <summary>
    /// Backward sweep in place, and the rate s - A u of the solution: the flux through face n is known as soon as
    /// u_n is, and it completes the rate of node n + 1.
    /// </summary>
    private void BackwardWithResidual(TridiagonalFactors factors, Span<double> values, Span<double> rates)
    {
        var count = values.Length;
        ReadOnlySpan<double> upperMultiplier = factors.UpperMultiplier[..count];
        ReadOnlySpan<double> conductance = _system.Conductance.AsSpan(0, count - 1);
        var x = values[..count];
        var rate = rates[..count];
        var right = _system.RightBath;
        var after = x[count - 1];
        var outflow = -right.InflowRate(after);
        for (var n = count - 2; n >= 0; n--)
        {
            var value = Math.FusedMultiplyAdd(upperMultiplier[n], after, x[n]);
            x[n] = value;
            var flux = conductance[n] * (value - after);
            rate[n + 1] = flux - outflow;
            outflow = flux;
            after = value;
        }

        rate[0] = _system.LeftBath.InflowRate(after) - outflow;
    }

    /// <summary>
    /// The Hosea-Shampine estimate (Cap + c A)^-1 2 k h (r_n / gamma - r_g / (gamma (1 - gamma)) + r_n+1 / (1 - gamma)),
    /// its combination formed in the forward sweep and its largest |error| / tolerance in the backward sweep.
    /// </summary>
    private double FilteredLinearError(TridiagonalFactors factors, ReadOnlySpan<double> start, ReadOnlySpan<double> next, double h, ErrorWeights weights)
    {
        var count = start.Length;
        var scale = 2 * ErrorConstant * h;
        var weightOfStart = scale * ErrorWeightOfStart;
        var weightOfStage = scale * ErrorWeightOfStage;
        var weightOfEnd = scale * ErrorWeightOfEnd;
        ReadOnlySpan<double> inversePivot = factors.InversePivot[..count];
        ReadOnlySpan<double> lowerMultiplier = factors.LowerMultiplier[..count];
        ReadOnlySpan<double> upperMultiplier = factors.UpperMultiplier[..count];
        ReadOnlySpan<double> rateAtStart = _rateAtStart.AsSpan(0, count);
        ReadOnlySpan<double> rateAtStage = _rateAtStage.AsSpan(0, count);
        ReadOnlySpan<double> rateAtEnd = _rateAtEnd.AsSpan(0, count);
        var work = _work.AsSpan(0, count);
        var previous = 0.0;
        for (var n = 0; n < count; n++)
        {
            var combined = (weightOfStart * rateAtStart[n]) + (weightOfStage * rateAtStage[n]) + (weightOfEnd * rateAtEnd[n]);
            previous = Math.FusedMultiplyAdd(lowerMultiplier[n], previous, combined * inversePivot[n]);
            work[n] = previous;
        }

        // The largest |error| / tolerance, found without a division per node: a division only where a new largest
        // ratio appears.
        var absolute = weights.Absolute;
        var relative = weights.Relative;
        var before = start[..count];
        var after = next[..count];
        var worst = 0.0;
        for (var n = count - 1; n >= 0; n--)
        {
            previous = n == count - 1 ? previous : Math.FusedMultiplyAdd(upperMultiplier[n], previous, work[n]);
            var size = Math.Abs(previous);
            var tolerance = absolute + (relative * Math.Max(Math.Abs(before[n]), Math.Abs(after[n])));
            if (!(size <= worst * tolerance))
            {
                worst = size / tolerance;
            }
        }

        return worst;
    }
}
