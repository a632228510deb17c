namespace Layers.Core.TimeStepping;

/// <summary>
/// The time within an accepted step at which a measure of the state reaches a level, found on the step's own
/// interpolant (<see cref="IDenseOutput"/>) rather than by a straight line between the step's ends: the interpolant is
/// O(h^3) accurate, a line only O(h^2), and the line's error is what dominated the times read off a run.
/// </summary>
/// <remarks>
/// Bisection on the time: the measure is below the level at the start and at or above it at the end, and each halving
/// costs one evaluation of the interpolant, O(nodes), with no allocation. It stops when the bracket is below
/// <see cref="RelativeWidth"/> of the step, far below the interpolant's own error. A measure that is not monotone within
/// the step has a crossing found, not necessarily its first.
/// </remarks>
public static class DenseCrossing
{
    /// <summary>Width of the final bracket relative to the step.</summary>
    public const double RelativeWidth = 1e-13;

    /// <summary>
    /// The time in the step at which <paramref name="measure"/> reaches <paramref name="level"/>, given that it
    /// is below the level at the start and at or above it at the end.
    /// </summary>
    public static double Time(IDenseOutput step, StateMeasure measure, double level)
    {
        ArgumentNullException.ThrowIfNull(step);
        ArgumentNullException.ThrowIfNull(measure);
        var below = step.StartSeconds;
        var above = step.EndSeconds;
        var width = RelativeWidth * (above - below);
        while (above - below > width)
        {
            var middle = below + (0.5 * (above - below));
            if (middle <= below || middle >= above)
            {
                break;
            }

            if (measure(step.StateAt(middle)) >= level)
            {
                above = middle;
            }
            else
            {
                below = middle;
            }
        }

        return below + (0.5 * (above - below));
    }
}
