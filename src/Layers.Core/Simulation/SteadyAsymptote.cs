using Layers.Core.Discretization;

namespace Layers.Core.Simulation;

/// <summary>
/// The lag time of steady permeation read from the steady asymptote of the discrete system itself, with no time
/// stepping: Q(t) tends to J_ss (t - t_lag), and for Cap du/dt = s - A u the whole transient integrates in closed form.
/// </summary>
/// <remarks>
/// u - u_ss obeys Cap d(u - u_ss)/dt = -A (u - u_ss) and decays to zero, so its integral over all time is
/// y = A^-1 Cap (u0 - u_ss). The receiving bath takes G (u_r - u_b) from its end node r, so
/// Q(t) = J_ss t + G (integral of u_r - u_ss,r up to t), which tends to J_ss t + G y_r; hence
/// t_lag = -G y_r / J_ss = -y_r / (u_ss,r - u_b), with J_ss = G (u_ss,r - u_b) the exact steady flux of the discrete
/// system. Two tridiagonal solves, O(nodes). The result is exact for the discrete system: its only error is that of
/// the mesh, O(h^2), which falls with the accuracy setting; none comes from the steps or from reading Q at a finite
/// time (where the remaining transient, decaying like exp(-t / tau), and the error of Q, magnified by t / t_lag in the
/// difference t - Q / J, would both enter). The system must be linear: layers above their solubility make A depend
/// on u, and the caller then reads the lag from the run instead.
/// </remarks>
internal static class SteadyAsymptote
{
    /// <summary>The lag time for the bath on the right (<paramref name="rightReceives"/>) or left, s; null when no flux reaches it.</summary>
    public static double? LagTimeSeconds(DiffusionSystem system, ReadOnlySpan<double> initialState, bool rightReceives)
    {
        ArgumentNullException.ThrowIfNull(system);
        var count = system.NodeCount;
        var source = new double[count];
        system.Residual(new double[count], source);
        var steady = Solve(system, source);
        var excess = new double[count];
        for (var n = 0; n < count; n++)
        {
            excess[n] = system.Capacity[n] * (initialState[n] - steady[n]);
        }

        var integral = Solve(system, excess);
        var (node, bath) = rightReceives ? (count - 1, system.RightBath) : (0, system.LeftBath);
        var drive = steady[node] - bath.BathValue;
        return bath.Exists && drive != 0 ? -integral[node] / drive : null;
    }

    /// <summary>Solves A x = b, A the symmetric tridiagonal matrix of the links (bath links on its diagonal), by Thomas' algorithm.</summary>
    private static double[] Solve(DiffusionSystem system, double[] rightHandSide)
    {
        var count = system.NodeCount;
        var upper = new double[count];
        var x = new double[count];
        var previousUpper = 0.0;
        var previousValue = 0.0;
        for (var n = 0; n < count; n++)
        {
            // Row n: -G_left x_n-1 + (G_left + G_right) x_n - G_right x_n+1 = b_n.
            var lower = n > 0 ? -system.Conductance[n - 1] : 0;
            var pivot = system.ConductanceToLeft(n) + system.ConductanceToRight(n) - (lower * previousUpper);
            upper[n] = n < count - 1 ? -system.Conductance[n] / pivot : 0;
            x[n] = (rightHandSide[n] - (lower * previousValue)) / pivot;
            previousUpper = upper[n];
            previousValue = x[n];
        }

        for (var n = count - 2; n >= 0; n--)
        {
            x[n] -= upper[n] * x[n + 1];
        }

        return x;
    }
}
