using Layers.Core.Domain;
using Layers.Core.Laplace;

namespace Layers.Core.Simulation;

/// <summary>
/// Which method a case is solved by, and why, in words (docs/numerics.md, "Choosing the method"): the exact method
/// where <c>numerics.method</c> allows it and the case has constant coefficients, linear faces and uniform initial
/// concentrations; the finite volumes otherwise. A fallback is never silent: the reason goes with the result.
/// </summary>
/// <param name="Method">The method chosen (never <see cref="SolutionMethod.Auto"/>).</param>
/// <param name="Reason">Why.</param>
public sealed record MethodChoice(SolutionMethod Method, string Reason)
{
    /// <summary>The choice for a case.</summary>
    /// <exception cref="ArgumentException">When the case asks for the exact method and it cannot serve the case.</exception>
    public static MethodChoice For(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var applicability = LaplaceApplicability.Of(simulation);
        var cannot = "the exact method cannot serve this case: " + string.Join("; ", applicability.Reasons);
        return simulation.Numerics.Method switch
        {
            SolutionMethod.FiniteVolume => new MethodChoice(SolutionMethod.FiniteVolume, "numerics.method asks for the finite volumes"),
            SolutionMethod.Laplace when applicability.IsApplicable => new MethodChoice(SolutionMethod.Laplace, "numerics.method asks for the exact method"),
            SolutionMethod.Laplace => throw new ArgumentException(cannot + ".", nameof(simulation)),
            _ when simulation.Numerics.Grid is CellCountMesh => new MethodChoice(SolutionMethod.FiniteVolume, "numerics.cells fixes a finite-volume mesh"),
            _ when !applicability.IsApplicable => new MethodChoice(SolutionMethod.FiniteVolume, cannot),
            _ => new MethodChoice(SolutionMethod.Laplace, "constant coefficients, linear faces and uniform initial concentrations: the exact method applies"),
        };
    }
}
