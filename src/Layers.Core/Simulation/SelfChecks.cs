using System.Globalization;
using Layers.Core.TimeStepping;

namespace Layers.Core.Simulation;

/// <summary>
/// The checks a run makes on its own results before it calls itself a success: the mass balance closes and no layer or
/// compartment holds a negative amount. A conservative scheme solved to round-off passes both by orders of magnitude
/// (about 1e-14 on the cases measured); a run that fails them has met a round-off or stability limit, and its numbers
/// are not shown as results.
/// </summary>
public static class SelfChecks
{
    /// <summary>Largest |mass balance error| (relative to the reference mass) of a run called a success.</summary>
    public const double MassBalanceLimit = 1e-9;

    /// <summary>Most negative amount in a layer or compartment, relative to the reference mass, of a run called a success.</summary>
    public const double NegativeAmountLimit = 1e-9;

    /// <summary>
    /// The stop reason and the reason in words for a run that reached its end: <see cref="StopReason.Completed"/> and
    /// an empty text when both checks pass.
    /// </summary>
    /// <param name="worstMassBalanceError">Largest |mass balance error| over the outputs, relative.</param>
    /// <param name="lowestAmountRelative">Lowest amount of a layer or compartment over the outputs, relative.</param>
    public static (StopReason Reason, string Message) Judge(double worstMassBalanceError, double lowestAmountRelative)
    {
        if (!(worstMassBalanceError <= MassBalanceLimit))
        {
            return (StopReason.MassBalanceNotClosed, string.Create(
                CultureInfo.InvariantCulture,
                $"the run failed its own check: the mass balance is off by {worstMassBalanceError:G3} of the mass (at most {MassBalanceLimit:G1} is accepted); the step sizes met a round-off limit"));
        }

        if (!(lowestAmountRelative >= -NegativeAmountLimit))
        {
            return (StopReason.NegativeAmount, string.Create(
                CultureInfo.InvariantCulture,
                $"the run failed its own check: a layer or compartment holds a negative amount, {lowestAmountRelative:G3} of the mass (at least {-NegativeAmountLimit:G1} is accepted)"));
        }

        return (StopReason.Completed, string.Empty);
    }
}
