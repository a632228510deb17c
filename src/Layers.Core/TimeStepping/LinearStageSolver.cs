using Layers.Core.Discretization;

namespace Layers.Core.TimeStepping;

/// <summary>
/// The stage equation when nothing is capped: (Cap + c A) u = b, one Thomas factorisation per step shared by both
/// stages and by the error filter; content and dissolved value are the same.
/// </summary>
internal sealed class LinearStageSolver(DiffusionSystem system) : IStageSolver
{
    private readonly ImplicitMatrix _matrix = new(system);

    public void Prepare(double coefficientSeconds) => _matrix.Factor(coefficientSeconds);

    public bool Solve(ReadOnlySpan<double> rightHandSide, Span<double> content, Span<double> dissolved)
    {
        _matrix.Solve(rightHandSide, content);
        content.CopyTo(dissolved);
        return true;
    }

    public void Filter(Span<double> values) => _matrix.Solve(values, values);

    public void Dissolve(ReadOnlySpan<double> content, Span<double> dissolved) => content.CopyTo(dissolved);
}
