using Layers.Core.Domain;

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
        NumericsSettings? numerics = null,
        params Layer[] layers)
        => new()
        {
            Title = "test",
            Stack = new LayerStack(layers),
            Left = left,
            Right = right,
            DurationSeconds = duration,
            ReportTimesSeconds = reports ?? [duration],
            Numerics = numerics ?? FiniteVolumes,
        };

    /// <summary>
    /// The default numerics with the finite volumes: most tests built in code exercise them (the tests of the exact
    /// method's runs ask for it, or for the automatic choice, themselves).
    /// </summary>
    public static NumericsSettings FiniteVolumes { get; } = NumericsSettings.Default with { Method = SolutionMethod.FiniteVolume };

    /// <summary>
    /// A fixed mesh of 240 shared cells at step tolerance 1e-6, for checks tighter than the default accuracy target
    /// (1e-4 of the largest amount): times derived from the run, and amounts held to 1e-4 of themselves.
    /// </summary>
    public static NumericsSettings FixedFineMesh { get; } = NumericsSettings.FixedCells(240, 1e-6);

    public static ClosedFace Closed => new();

    public static BathFace Bath(double concentration, double k = 1, double? film = null)
        => new("bath", concentration, k, film);

    public static CompartmentFace Compartment(double volumePerArea, double k = 1, double c0 = 0, double? film = null)
        => new("compartment", volumePerArea, 1.0, k, c0, film);
}
