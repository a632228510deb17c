namespace Layers.Core.TimeStepping;

/// <summary>Mutable bookkeeping of the time loop: current and candidate state, time, bath totals, counters.</summary>
internal sealed class LoopState
{
    private double[] _current;
    private double[] _candidate;
    private double _smallestStep = double.PositiveInfinity;
    private double _largestStep;

    public LoopState(int nodeCount, ReadOnlySpan<double> initial, double scale)
    {
        _current = initial.ToArray();
        _candidate = new double[nodeCount];
        Scale = scale;
    }

    public double[] Current => _current;

    /// <summary>The candidate of the next step; after <see cref="Accept"/>, the state at the start of the step just taken.</summary>
    public double[] Candidate => _candidate;

    /// <summary>Time at the start of the step just accepted.</summary>
    public double PreviousTime { get; private set; }

    /// <summary>Bath totals at the start of the step just accepted.</summary>
    public BathTotals PreviousBaths { get; private set; }

    public double Scale { get; }

    public double Time { get; private set; }

    public BathTotals Baths { get; private set; }

    public int Accepted { get; private set; }

    public int Rejected { get; set; }

    /// <summary>Makes the candidate the current state; swapping buffers avoids copying and allocation.</summary>
    public void Accept(double newTime, double step, StepTrial trial)
    {
        (_current, _candidate) = (_candidate, _current);
        PreviousTime = Time;
        PreviousBaths = Baths;
        Time = newTime;
        Baths = new BathTotals(
            Baths.LeftPerArea + trial.LeftBathInflowPerArea,
            Baths.RightPerArea + trial.RightBathInflowPerArea);
        Accepted++;
        _smallestStep = Math.Min(_smallestStep, step);
        _largestStep = Math.Max(_largestStep, step);
    }

    public SolverStatistics Statistics(StopReason reason, double wallSeconds) => new()
    {
        AcceptedSteps = Accepted,
        RejectedSteps = Rejected,
        SmallestStepSeconds = Accepted > 0 ? _smallestStep : 0,
        LargestStepSeconds = _largestStep,
        Unknowns = _current.Length,
        WallSeconds = wallSeconds,
        StopReason = reason,
    };
}
