namespace Layers.Core.TimeStepping;

/// <summary>
/// The state between the ends of an accepted TR-BDF2 step: the quadratic through u_n (at t), the stage value u_g (at
/// t + gamma h) and u_n+1 (at t + h), the interpolant Hosea and Shampine give for this method (Appl. Numer. Math. 20
/// (1996) 21). Its error is O(h^3), the order of the step's own local error, so outputs between steps are as accurate
/// as the steps; it uses no derivative, so stiff components that the step has damped are not amplified again.
/// </summary>
/// <remarks>
/// The bath totals are interpolated with the same weights from their values at the three points. The stored mass
/// minus the bath totals is the same at all three (the trapezoidal stage and the BDF2 stage each add exactly the
/// bath mass of their quadrature), and the weights sum to one, so the mass balance closes to round-off at an
/// interpolated output as it does at the step ends. Work is O(nodes); nothing is allocated.
/// </remarks>
internal sealed class StepInterpolant
{
    private readonly double[] _state;

    public StepInterpolant(int nodeCount) => _state = new double[nodeCount];

    /// <summary>u at the time of the last call to <see cref="At"/>.</summary>
    public ReadOnlySpan<double> State => _state;

    /// <summary>Sets <see cref="State"/> to u at t + theta h, 0 &lt; theta &lt; 1, and returns the bath totals there.</summary>
    public BathTotals At(
        double theta,
        ReadOnlySpan<double> start,
        ReadOnlySpan<double> stage,
        ReadOnlySpan<double> end,
        BathTotals bathsAtStart,
        BathTotals bathsAtStage,
        BathTotals bathsAtEnd)
    {
        var gamma = TrBdf2Stepper.Gamma;
        var wStart = (theta - gamma) * (theta - 1) / gamma;
        var wStage = theta * (theta - 1) / (gamma * (gamma - 1));
        var wEnd = theta * (theta - gamma) / (1 - gamma);
        var state = _state.AsSpan();
        var atStart = start[..state.Length];
        var atStage = stage[..state.Length];
        var atEnd = end[..state.Length];
        for (var i = 0; i < state.Length; i++)
        {
            state[i] = (wStart * atStart[i]) + (wStage * atStage[i]) + (wEnd * atEnd[i]);
        }

        return new BathTotals(
            (wStart * bathsAtStart.LeftPerArea) + (wStage * bathsAtStage.LeftPerArea) + (wEnd * bathsAtEnd.LeftPerArea),
            (wStart * bathsAtStart.RightPerArea) + (wStage * bathsAtStage.RightPerArea) + (wEnd * bathsAtEnd.RightPerArea));
    }
}
