using Layers.Core.Domain;
using Layers.Core.Simulation;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Simulation;

/// <summary>
/// numerics.method (docs/numerics.md, "Choosing the method"): the exact method where the case allows it, the finite
/// volumes otherwise, never silently.
/// </summary>
public sealed class MethodChoiceTests
{
    [Fact]
    public void Auto_takes_the_exact_method_for_a_linear_case_with_constant_coefficients()
    {
        var simulation = ReadValid(CaseJson.Minimal);

        var choice = MethodChoice.For(simulation);

        Assert.Equal(SolutionMethod.Auto, simulation.Numerics.Method);
        Assert.Equal(SolutionMethod.Laplace, choice.Method);
        var result = Simulator.Run(simulation, checkExactByFiniteVolumes: false);
        Assert.Equal(SolutionMethod.Laplace, result.Method);
        Assert.Equal(choice.Reason, result.MethodReason);
    }

    [Fact]
    public void Auto_falls_back_to_the_finite_volumes_with_the_reason_for_a_cell_count()
    {
        var simulation = ReadValid(CaseJson.MinimalWith(("$.numerics", """{ "cells": 200 }""")));

        var result = Simulator.Run(simulation, checkExactByFiniteVolumes: false);

        Assert.Equal(SolutionMethod.FiniteVolume, result.Method);
        Assert.Contains("numerics.cells", result.MethodReason, StringComparison.Ordinal);
    }

    [Fact]
    public void Auto_falls_back_to_the_finite_volumes_with_the_reason_for_a_layer_with_a_solubility()
    {
        var simulation = Cases.Make(
            Cases.Closed, Cases.Bath(0), 3600, numerics: NumericsSettings.Default,
            layers: Cases.Layer("matrix", 1e-4, 1e-12, 1, 50) with { SolubilityKgPerCubicMeter = 10 });

        var choice = MethodChoice.For(simulation);

        Assert.Equal(SolutionMethod.FiniteVolume, choice.Method);
        Assert.Contains("solubility", choice.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Asking_for_the_exact_method_where_it_cannot_serve_is_an_error_at_the_method_key()
    {
        var read = CaseDocument.ReadText(
            CaseJson.MinimalWith(("$.numerics", """{ "method": "laplace", "cells": 100 }""")).Replace("\"closed\"", "\"closed\"", StringComparison.Ordinal),
            "case.json");
        Assert.True(read.IsValid, "a cell count alone does not stop the exact method: " + read.FormatErrors());

        var food = CaseDocument.ReadFile(Path.Combine(RepoRoot.Path, "cases", "invalid", "method-laplace-with-food-contact.json"));
        Assert.False(food.IsValid);
        Assert.Contains("$.numerics.method", food.FormatErrors(), StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_method_is_refused_with_the_three_names()
    {
        var read = CaseDocument.ReadText(CaseJson.MinimalWith(("$.numerics", """{ "method": "spectral" }""")), "case.json");

        Assert.False(read.IsValid);
        Assert.Contains("must be \"auto\", \"finiteVolume\" or \"laplace\"", read.FormatErrors(), StringComparison.Ordinal);
    }

    private static SimulationCase ReadValid(string json)
    {
        var read = CaseDocument.ReadText(json, "case.json");
        Assert.True(read.IsValid, read.FormatErrors());
        return read.Case!;
    }
}
