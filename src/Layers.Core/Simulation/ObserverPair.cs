using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>Passes the loop's notifications to two observers; the first decides whether to run past the end.</summary>
internal sealed class ObserverPair(ITimeLoopObserver first, ITimeLoopObserver second) : ITimeLoopObserver
{
    public bool WantsMoreTime => first.WantsMoreTime;

    public void OnOutput(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow)
    {
        first.OnOutput(timeSeconds, state, bathInflow);
        second.OnOutput(timeSeconds, state, bathInflow);
    }

    public void OnStep(double timeSeconds, ReadOnlySpan<double> state, BathTotals bathInflow, IDenseOutput dense)
    {
        first.OnStep(timeSeconds, state, bathInflow, dense);
        second.OnStep(timeSeconds, state, bathInflow, dense);
    }
}
