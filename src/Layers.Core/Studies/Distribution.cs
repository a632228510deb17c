using System.Globalization;
using MathNet.Numerics.Distributions;

namespace Layers.Core.Studies;

/// <summary>
/// The spread of an uncertain input, in the unit it is written in. Samples are drawn by the inverse of the
/// cumulative distribution (<see cref="Quantile"/>) from probabilities in (0, 1), which is what lets one sampler serve
/// plain random sampling and Latin hypercube sampling alike.
/// </summary>
public abstract record Distribution
{
    /// <summary>The value below which a fraction <paramref name="probability"/> of the distribution lies.</summary>
    /// <param name="probability">Strictly between 0 and 1.</param>
    public abstract double Quantile(double probability);

    /// <summary>The case-file name and parameters, e.g. "logNormal (median 1e-09 cm2/s, factor 2)".</summary>
    /// <param name="unit">The unit the parameters are written in; empty for plain numbers.</param>
    public abstract string Describe(string unit);

    /// <summary>Formats a parameter with its unit for <see cref="Describe"/>.</summary>
    protected static string Number(double value, string unit = "") =>
        value.ToString("G6", CultureInfo.InvariantCulture) + (unit.Length > 0 ? " " + unit : string.Empty);
}

/// <summary>
/// Log-normal by its median and its factor, the geometric standard deviation exp(sigma): about 68 % of values lie
/// between median/factor and median*factor, about 95 % between median/factor^1.96 and median*factor^1.96.
/// </summary>
/// <param name="Median">The median, > 0.</param>
/// <param name="Factor">The geometric standard deviation, > 1.</param>
public sealed record LogNormalDistribution(double Median, double Factor) : Distribution
{
    /// <inheritdoc/>
    public override double Quantile(double probability) => Median * Math.Pow(Factor, Normal.InvCDF(0, 1, probability));

    /// <inheritdoc/>
    public override string Describe(string unit) => $"logNormal (median {Number(Median, unit)}, factor {Number(Factor)})";
}

/// <summary>Uniform between two values.</summary>
/// <param name="Minimum">The lower end.</param>
/// <param name="Maximum">The upper end, above the lower.</param>
public sealed record UniformDistribution(double Minimum, double Maximum) : Distribution
{
    /// <inheritdoc/>
    public override double Quantile(double probability) => Minimum + (probability * (Maximum - Minimum));

    /// <inheritdoc/>
    public override string Describe(string unit) => $"uniform ({Number(Minimum, unit)} to {Number(Maximum, unit)})";
}

/// <summary>Uniform in the logarithm between two positive values: every decade equally likely.</summary>
/// <param name="Minimum">The lower end, > 0.</param>
/// <param name="Maximum">The upper end, above the lower.</param>
public sealed record LogUniformDistribution(double Minimum, double Maximum) : Distribution
{
    /// <inheritdoc/>
    public override double Quantile(double probability) => Minimum * Math.Pow(Maximum / Minimum, probability);

    /// <inheritdoc/>
    public override string Describe(string unit) => $"logUniform ({Number(Minimum, unit)} to {Number(Maximum, unit)})";
}

/// <summary>Normal by its mean and standard deviation. Values that break a rule of the case (a negative thickness) make the study invalid.</summary>
/// <param name="Mean">The mean.</param>
/// <param name="StandardDeviation">The standard deviation, > 0.</param>
public sealed record NormalDistribution(double Mean, double StandardDeviation) : Distribution
{
    /// <inheritdoc/>
    public override double Quantile(double probability) => Normal.InvCDF(Mean, StandardDeviation, probability);

    /// <inheritdoc/>
    public override string Describe(string unit) => $"normal (mean {Number(Mean, unit)}, standard deviation {Number(StandardDeviation, unit)})";
}
