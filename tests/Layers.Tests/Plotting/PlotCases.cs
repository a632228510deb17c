using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Core.Units;

namespace Layers.Tests.Plotting;

/// <summary>
/// The results the plot tests draw, solved once per test class: the shipped demo case (a closed laminate against a
/// food simulant) and a single membrane between a donor bath at 5 kg/m3 and a perfect sink (steady permeation).
/// </summary>
public sealed class PlotCases
{
    private readonly Lazy<SimulationResult> _demo = new(() =>
    {
        var read = CaseDocument.ReadFile(Path.Combine(RepoRoot(), "cases", "laminate-fatty-food.json"));
        Assert.True(read.IsValid, read.FormatErrors());
        return Simulator.Run(read.Case!);
    });

    private readonly Lazy<SimulationResult> _permeation = new(() => Simulator.Run(Membrane()));

    /// <summary>The demo case solved.</summary>
    public SimulationResult Demo => _demo.Value;

    /// <summary>The membrane case solved.</summary>
    public SimulationResult Permeation => _permeation.Value;

    /// <summary>100 um membrane, D = 1e-13 m2/s, K = 0.8, donor 5 kg/m3, sink; 2 d, about ten lag times.</summary>
    public static SimulationCase Membrane() => new()
    {
        Title = "Membrane between a donor bath at 5 kg/m3 and a sink",
        Stack = new LayerStack([new Layer("membrane", 100e-6, 1e-13, 0.8, 0)]),
        Left = new BathFace("donor", 5, 1, null),
        Right = new BathFace("receptor", 0, 1, null),
        DurationSeconds = 2 * 86400,
        ReportTimesSeconds = [3600, 4 * 3600, 12 * 3600, 2 * 86400],
        Display = new DisplayUnits
        {
            Time = UnitTable.Get("h"),
            Depth = UnitTable.Get("um"),
            Concentration = UnitTable.Get("mg/mL"),
            MassPerArea = UnitTable.Get("ug/cm2"),
        },
    };

    private static string RepoRoot()
    {
        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null; directory = directory.Parent)
        {
            if (File.Exists(Path.Combine(directory.FullName, "Layers.sln")))
            {
                return directory.FullName;
            }
        }

        var fromEnvironment = Environment.GetEnvironmentVariable("LAYERS_REPO_ROOT");
        if (!string.IsNullOrWhiteSpace(fromEnvironment) && File.Exists(Path.Combine(fromEnvironment, "Layers.sln")))
        {
            return Path.GetFullPath(fromEnvironment);
        }

        throw new InvalidOperationException("Cannot find the repository root (Layers.sln); set LAYERS_REPO_ROOT.");
    }
}
