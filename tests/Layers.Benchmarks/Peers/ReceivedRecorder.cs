using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Benchmarks.Peers;

/// <summary>
/// Keeps the amount received by the right medium at each output time: a compartment's gain (its storage times the
/// change of its u), or what a bath has taken (the loop's running total of the bath exchange).
/// </summary>
internal sealed class ReceivedRecorder(DiffusionSystem system, double[] initialState, int outputs) : ITimeLoopObserver
{
    private int _next;

    /// <summary>Amount received at the output times, kg/m2, in order.</summary>
    public double[] Received { get; } = new double[outputs];

    /// <inheritdoc />
    public bool WantsMoreTime => false;

    /// <inheritdoc />
    public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
    {
        if (timeSeconds == 0)
        {
            return;
        }

        var node = system.CompartmentNode(Side.Right);
        Received[_next++] = node >= 0
            ? system.Capacity[node] * (state[node] - initialState[node])
            : -bathInflow.RightPerArea;
    }

    /// <inheritdoc />
    public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
    {
    }
}
