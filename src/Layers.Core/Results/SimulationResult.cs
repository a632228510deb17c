using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Core.Results;

/// <summary>Everything one solve produced.</summary>
public sealed record SimulationResult
{
    /// <summary>The case that was solved.</summary>
    public required SimulationCase Case { get; init; }

    /// <summary>The mesh used.</summary>
    public required Grid Grid { get; init; }

    /// <summary>Integral quantities at t = 0 and at every output time (report, extra and a dense log-spaced grid).</summary>
    public required IReadOnlyList<StateSample> TimeSeries { get; init; }

    /// <summary>Full results at the report times, in order.</summary>
    public required IReadOnlyList<ReportPoint> Reports { get; init; }

    /// <summary>The final state and the times to approach it.</summary>
    public required FinalStateSummary FinalState { get; init; }

    /// <summary>Steady permeation figures, when the case has two baths at different levels.</summary>
    public PermeationSummary? Permeation { get; init; }

    /// <summary>Diffusion-cell and patch figures (sampling, sink check, removal, permeation metrics), or null.</summary>
    public DiffusionCellSummary? DiffusionCell { get; init; }

    /// <summary>The undissolved drug of every layer with a solubility, left to right; empty when none has one.</summary>
    public IReadOnlyList<DispersedLayerSummary> DispersedLayers { get; init; } = [];

    /// <summary>Largest |mass balance error| over all output times (relative).</summary>
    public required double WorstMassBalanceError { get; init; }

    /// <summary>Solver counters.</summary>
    public required SolverStatistics Statistics { get; init; }

    /// <summary>
    /// The estimated numerical error of every key figure and the solves behind it; null when the case asks for none
    /// (<see cref="NumericsSettings.ErrorControl"/>) or the run did not complete.
    /// </summary>
    public NumericalErrorSummary? NumericalError { get; init; }

    /// <summary>
    /// The run checked against the exact method where the case allows it (and why not where it does not); null when
    /// the error was not estimated or the run did not complete.
    /// </summary>
    public CrossCheckSummary? CrossCheck { get; init; }

    /// <summary>The method that solved the case: the finite volumes or the exact method in the Laplace domain.</summary>
    public SolutionMethod Method { get; init; } = SolutionMethod.FiniteVolume;

    /// <summary>Why that method solved the case, in words (what <c>numerics.method</c> asked for, or why the exact method could not).</summary>
    public string MethodReason { get; init; } = string.Empty;

    /// <summary>The food-contact assessment, for a case with food-contact settings that ran to its end.</summary>
    public FoodContactResult? FoodContact { get; init; }

    /// <summary>The results per period of the case's schedule; null without a schedule.</summary>
    public ScheduleSummary? Schedule { get; init; }

    /// <summary>
    /// Why the run is not a result, in words (the solver stopped early, or the run failed its own mass-balance or sign
    /// check); empty when it completed.
    /// </summary>
    public string FailureReason { get; init; } = string.Empty;

    /// <summary>True when the time loop reached the end of the duration and the run passed its own checks.</summary>
    public bool Completed => Statistics.StopReason == StopReason.Completed;
}
