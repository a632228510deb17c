using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace Layers.Core.Fitting;

/// <summary>
/// Decides which estimates the data determine, in log10 space, by three rules, each giving a finding:
/// a direction of parameter space along which J is singular (an input with no effect on the data, or inputs that
/// act only together); a pair whose estimates correlate with |r| above <see cref="CorrelationLimit"/> (only a
/// combination X Y^e is determined, as D and K of a membrane measured at steady state, where the flux is
/// D K c / L: Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, from memory), which makes them not
/// identifiable when the interval of either spans more than a factor of <see cref="WidestFactor"/> and is only a
/// note otherwise; and a single input whose interval spans more than that factor. An input that is not
/// identifiable gets no interval.
/// </summary>
internal static class Identifiability
{
    /// <summary>Estimates correlated beyond this are not separately identifiable (common practice, no source).</summary>
    public const double CorrelationLimit = 0.99;

    /// <summary>
    /// An interval wider than this factor (upper / lower) says the data hardly determine the input (a choice of this
    /// tool, no source: beyond a decade an estimate of D or K no longer tells a practitioner anything usable).
    /// </summary>
    public const double WidestFactor = 10;

    private const double Involved = 0.1;

    public static (IReadOnlyList<FitEstimate> Estimates, IReadOnlyList<FitFinding> Findings) Judge(
        IReadOnlyList<FitParameter> parameters,
        IReadOnlyList<double> logValues,
        LeastSquaresStatistics statistics)
    {
        var p = parameters.Count;
        var flagged = new bool[p];
        var findings = new List<FitFinding>();
        foreach (var direction in statistics.UndeterminedDirections)
        {
            var members = Enumerable.Range(0, p).Where(i => Math.Abs(direction[i]) > Involved).ToArray();
            findings.Add(members.Length == 1
                ? new FitFinding([parameters[members[0]].Path], $"{parameters[members[0]].Label} has no effect on the measured values: it cannot be estimated from these data", null, NotIdentifiable: true)
                : Together(parameters, logValues, statistics, members, direction, correlation: null, wide: true));
            Flag(flagged, members);
        }

        var factors = statistics.StandardErrors.Select(error => Math.Pow(10, 2 * statistics.TQuantile * error)).ToArray();
        var wide = factors.Select(factor => !(factor <= WidestFactor)).ToArray();
        for (var i = 0; i < p; i++)
        {
            for (var j = i + 1; j < p; j++)
            {
                var r = statistics.Correlation[i, j];
                if (!flagged[i] && !flagged[j] && Math.Abs(r) > CorrelationLimit)
                {
                    findings.Add(Together(parameters, logValues, statistics, [i, j], WeakestDirection(statistics.Covariance, i, j), r, wide[i] || wide[j]));
                    if (wide[i] || wide[j])
                    {
                        Flag(flagged, [i, j]);
                    }
                }
            }
        }

        var estimates = new List<FitEstimate>();
        for (var i = 0; i < p; i++)
        {
            if (!flagged[i] && wide[i])
            {
                findings.Add(new FitFinding(
                    [parameters[i].Path],
                    string.Create(CultureInfo.InvariantCulture, $"{parameters[i].Label} is hardly determined by these data: its interval would span a factor of {factors[i]:G3}; it is not identifiable from them"),
                    null,
                    NotIdentifiable: true));
                flagged[i] = true;
            }

            var half = statistics.TQuantile * statistics.StandardErrors[i];
            estimates.Add(new FitEstimate(
                parameters[i],
                Math.Pow(10, logValues[i]),
                statistics.StandardErrors[i],
                flagged[i] ? null : Math.Pow(10, logValues[i] - half),
                flagged[i] ? null : Math.Pow(10, logValues[i] + half),
                !flagged[i]));
        }

        return (estimates, findings);
    }

    /// <summary>The direction of the pair (i, j) the data determine least: the eigenvector of its larger variance.</summary>
    private static double[] WeakestDirection(Matrix<double> covariance, int i, int j)
    {
        var block = Matrix<double>.Build.DenseOfArray(new[,]
        {
            { covariance[i, i], covariance[i, j] },
            { covariance[j, i], covariance[j, j] },
        });
        var evd = block.Evd(Symmetricity.Symmetric);
        var weakest = evd.EigenVectors.Column(evd.EigenValues[0].Real > evd.EigenValues[1].Real ? 0 : 1);
        var direction = new double[covariance.RowCount];
        direction[i] = weakest[0];
        direction[j] = weakest[1];
        return direction;
    }

    private static void Flag(bool[] flagged, IEnumerable<int> members)
    {
        foreach (var member in members)
        {
            flagged[member] = true;
        }
    }

    /// <summary>
    /// Inputs that move together along <paramref name="direction"/> without changing the fit. For two inputs the
    /// data determine log X + e log Y with e = -v_X / v_Y (orthogonal to the direction), i.e. X Y^e; e is rounded to a
    /// whole number when within 0.05 of one, which names the product or ratio the physics suggests.
    /// </summary>
    private static FitFinding Together(
        IReadOnlyList<FitParameter> parameters,
        IReadOnlyList<double> logValues,
        LeastSquaresStatistics statistics,
        int[] members,
        IReadOnlyList<double> direction,
        double? correlation,
        bool wide)
    {
        var names = string.Join(" and ", members.Select(i => parameters[i].Label));
        var paths = members.Select(i => parameters[i].Path).ToArray();
        var why = correlation is { } r
            ? string.Create(CultureInfo.InvariantCulture, $"their estimates are correlated (r = {r:F4})")
            : "they act on the measured values only together";
        if (members.Length != 2)
        {
            return new FitFinding(paths, $"{names} are not identifiable from these data: {why}", null, NotIdentifiable: true);
        }

        var (x, y) = (members[0], members[1]);
        var exponent = -direction[x] / direction[y];
        if (Math.Abs(exponent - Math.Round(exponent)) < 0.05)
        {
            exponent = Math.Round(exponent);
        }

        var weights = Vector<double>.Build.Dense(parameters.Count);
        weights[x] = 1;
        weights[y] = exponent;
        var log = logValues[x] + (exponent * logValues[y]);
        var half = statistics.TQuantile * Math.Sqrt(Math.Max(weights * statistics.Covariance * weights, 0));
        var (text, unit) = Describe(parameters[x], parameters[y], exponent);
        var combination = new FitCombination(text, unit, Math.Pow(10, log), Math.Pow(10, log - half), Math.Pow(10, log + half));
        return wide
            ? new FitFinding(paths, $"{names} are not separately identifiable from these data: {why}; only {text} is determined", combination, NotIdentifiable: true)
            : new FitFinding(paths, $"{names} are strongly correlated: {why}; their intervals hold only jointly, and {text} is determined best", combination, NotIdentifiable: false);
    }

    private static (string Text, string Unit) Describe(FitParameter x, FitParameter y, double exponent)
    {
        var power = exponent.ToString("0.##", CultureInfo.InvariantCulture);
        var text = exponent switch
        {
            1 => $"{x.Label} × {y.Label}",
            -1 => $"{x.Label} / {y.Label}",
            _ => $"{x.Label} × {y.Label}^{power}",
        };
        var unit = (x.Unit, y.Unit) switch
        {
            (_, "") => x.Unit,
            ("", _) => $"({y.Unit})^{power}",
            _ => $"{x.Unit}·({y.Unit})^{power}",
        };
        return (text, unit);
    }
}
