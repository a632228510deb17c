namespace Layers.Core.TimeStepping;

/// <summary>
/// The dense output of the loop's last accepted step: the TR-BDF2 interpolant (<see cref="StepInterpolant"/>) through the
/// start, the stage and the end. One instance per run, pointed at the loop's buffers after each step, so nothing is
/// allocated per step.
/// </summary>
internal sealed class AcceptedStepOutput(StepInterpolant interpolant) : IDenseOutput
{
    private double[] _start = [];
    private double[] _end = [];
    private TrBdf2Stepper? _stepper;

    /// <inheritdoc />
    public double StartSeconds { get; private set; }

    /// <inheritdoc />
    public double EndSeconds { get; private set; }

    /// <summary>Points at the step just accepted: the start in <paramref name="start"/>, the end in <paramref name="end"/>.</summary>
    public void Set(double startSeconds, double endSeconds, double[] start, TrBdf2Stepper stepper, double[] end)
    {
        StartSeconds = startSeconds;
        EndSeconds = endSeconds;
        _start = start;
        _stepper = stepper;
        _end = end;
    }

    /// <inheritdoc />
    public ReadOnlySpan<double> StateAt(double timeSeconds)
    {
        var length = EndSeconds - StartSeconds;
        var theta = length > 0 ? Math.Clamp((timeSeconds - StartSeconds) / length, 0, 1) : 1;
        if (theta == 1)
        {
            return _end;
        }

        if (theta == 0)
        {
            return _start;
        }

        interpolant.At(theta, _start, _stepper!.Stage, _end, default, default, default);
        return interpolant.State;
    }
}
