using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.TimeStepping;

namespace Layers.Tests.TestSupport;

/// <summary>Small helpers to build cases in SI for tests.</summary>
internal static class Cases
{
    public static Layer Layer(string name, double thickness, double diffusivity, double k = 1, double c0 = 0)
        => new(name, thickness, diffusivity, k, c0);

    public static SimulationCase Make(
        FaceCondition left,
        FaceCondition right,
        double duration,
        IReadOnlyList<double>? reports = null,
        GridOptions? grid = null,
        SolverOptions? solver = null,
        params Layer[] layers)
        => new()
        {
            Title = "test",
            Stack = new LayerStack(layers),
            Left = left,
            Right = right,
            DurationSeconds = duration,
            ReportTimesSeconds = reports ?? [duration],
            Grid = grid ?? new GridOptions(),
            Solver = solver ?? new SolverOptions(),
        };

    public static ClosedFace Closed => new();

    public static BathFace Bath(double concentration, double k = 1, double? film = null)
        => new("bath", concentration, k, film);

    public static CompartmentFace Compartment(double volumePerArea, double k = 1, double c0 = 0, double? film = null)
        => new("compartment", volumePerArea, 1.0, k, c0, film);
}
