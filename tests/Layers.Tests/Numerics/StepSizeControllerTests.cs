using Layers.Core.TimeStepping;

namespace Layers.Tests.Numerics;

/// <summary>
/// Each documented behaviour of the step-size rule. The rule is the standard one for an embedded error estimate of
/// order p (here the local error is O(h^3)): Hairer, Norsett and Wanner, Solving Ordinary Differential Equations I,
/// 2nd ed., ch. II.4, eq. 4.13.
/// </summary>
public sealed class StepSizeControllerTests
{
    private readonly StepSizeController _controller = new();

    [Fact]
    public void Error_at_tolerance_is_accepted_and_the_step_shrinks_by_the_safety_factor()
    {
        var (accept, next) = _controller.Decide(10, 1);
        Assert.True(accept);
        Assert.Equal(9, next, 12);
    }

    [Fact]
    public void Small_error_grows_the_step_by_at_most_the_maximum_factor()
    {
        Assert.Equal(40, _controller.Decide(10, 1e-9).NextStepSeconds, 12);
        Assert.Equal(40, _controller.Decide(10, 0).NextStepSeconds, 12);
    }

    [Fact]
    public void Moderate_error_scales_the_step_by_the_inverse_cube_root()
    {
        Assert.Equal(10 * 0.9 * 2, _controller.Decide(10, 1.0 / 8).NextStepSeconds, 12);
    }

    [Fact]
    public void Large_error_is_rejected_and_the_step_is_cut_by_at_most_the_minimum_factor()
    {
        var (accept, next) = _controller.Decide(10, 1e6);
        Assert.False(accept);
        Assert.Equal(2, next, 12);
    }

    [Fact]
    public void Slightly_large_error_is_rejected_and_the_step_never_grows()
    {
        var (accept, next) = _controller.Decide(10, 1.0001);
        Assert.False(accept);
        Assert.True(next < 10);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void Non_finite_error_is_rejected_with_the_strongest_cut(double error)
    {
        var (accept, next) = _controller.Decide(10, error);
        Assert.False(accept);
        Assert.Equal(2, next, 12);
    }
}
