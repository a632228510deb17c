using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Verification;

/// <summary>
/// The finite volumes checking a run of the exact method (docs/numerics.md, "The independent check"): on a plane sheet
/// releasing into a limited volume (Crank, The Mathematics of Diffusion, 2nd ed. (1975), eq. 4.37, from memory) the two
/// methods agree; a figure moved by a hundred times the accuracy is caught as a disagreement.
/// </summary>
public sealed class FiniteVolumeCheckTests
{
    [Fact]
    public void The_two_methods_agree_on_a_sheet_into_a_limited_volume_and_a_moved_figure_is_caught()
    {
        const double thickness = 5e-5, diffusivity = 4e-14;
        var scale = thickness * thickness / diffusivity;
        var simulation = Cases.Make(
            Cases.Closed, Cases.Compartment(0.5 * thickness), 0.5 * scale, [0.02 * scale, 0.1 * scale, 0.5 * scale],
            NumericsSettings.Default with { Method = SolutionMethod.Laplace }, Cases.Layer("sheet", thickness, diffusivity, 1, 900));
        var exact = Simulator.Run(simulation, checkExactByFiniteVolumes: false);
        SimulationResult Solve(SimulationCase solved) => Simulator.Run(solved with { Numerics = solved.Numerics with { ErrorControl = ErrorControl.None } }, checkExactByFiniteVolumes: false);

        var check = FiniteVolumeCheck.Of(exact, Solve);

        Assert.Null(check.NotApplicable);
        Assert.True(check.Figures.Count > 10, $"{check.Figures.Count} figures compared");
        Assert.Empty(check.Disagreements);
        Assert.True(check.LargestRelativeDifference < simulation.Numerics.Accuracy, $"largest difference {check.LargestRelativeDifference:G3}");

        var path = "$.faces.right.transferredMassPerAreaKgPerSquareMeter[1]";
        var error = exact.NumericalError!;
        var moved = exact with
        {
            NumericalError = error with
            {
                Figures = [.. error.Figures.Select(figure => figure.Figure.Path == path
                    ? figure with { Figure = figure.Figure with { Value = figure.Figure.Value * (1 + (100 * simulation.Numerics.Accuracy)) } }
                    : figure)],
            },
        };
        var caught = FiniteVolumeCheck.Of(moved, Solve);
        Assert.Equal([path], caught.Disagreements.Select(figure => figure.Figure.Figure.Path));
    }
}
