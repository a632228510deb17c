using System.Numerics;

namespace Layers.Core.Laplace;

/// <summary>
/// The exact solution at one time t &gt; 0, with the transformed stack solved once on the time's contour: every
/// quantity asked of it is one more inversion of values at the same points, without solving the stack again (a run that
/// reads many places at one time, to find where a profile crosses a level and integrate it piecewise, costs one solve).
/// </summary>
public sealed class LaplaceInstant
{
    private readonly LaplaceSolution _solution;
    private readonly TalbotContour _contour;
    private readonly IReadOnlyList<double> _partition;
    private readonly TransformedState[] _states;
    private LaplaceSnapshot? _snapshot;

    internal LaplaceInstant(LaplaceSolution solution, TalbotContour contour, IReadOnlyList<double> partition, TransformedState[] states, double timeSeconds)
    {
        _solution = solution;
        _contour = contour;
        _partition = partition;
        _states = states;
        TimeSeconds = timeSeconds;
    }

    /// <summary>The time, s.</summary>
    public double TimeSeconds { get; }

    /// <summary>The integral quantities at this time (as <see cref="LaplaceSolution.At"/> gives them).</summary>
    public LaplaceSnapshot Snapshot => _snapshot ??= _solution.Snapshot(
        TimeSeconds, _contour.InvertByNode(_solution.QuantityCount, (k, transformed) => _solution.Transforms(_states[k], transformed), TimeSeconds));

    /// <summary>
    /// u = c / K at places given by layer and depth from that layer's left face (0 to its thickness), kg/m3: the variable
    /// that is continuous across interfaces.
    /// </summary>
    public double[] ContinuousValuesAt(IReadOnlyList<(int Layer, double DepthMeters)> places)
    {
        ArgumentNullException.ThrowIfNull(places);
        return _contour.InvertByNode(
            places.Count,
            (k, transformed) =>
            {
                for (var i = 0; i < places.Count; i++)
                {
                    transformed[i] = _states[k].ValueInLayer(places[i].Layer, places[i].DepthMeters);
                }
            },
            TimeSeconds);
    }

    /// <summary>
    /// Mass per area held in pieces of layers, kg/m2: each piece a layer and a depth range inside it, measured from the
    /// layer's left face.
    /// </summary>
    public double[] MassesPerAreaIn(IReadOnlyList<(int Layer, double FromMeters, double ToMeters)> pieces)
    {
        ArgumentNullException.ThrowIfNull(pieces);
        var values = _contour.InvertByNode(
            pieces.Count,
            (k, transformed) =>
            {
                for (var i = 0; i < pieces.Count; i++)
                {
                    var (layer, from, to) = pieces[i];
                    transformed[i] = _states[k].IntegralInLayer(layer, from, to);
                }
            },
            TimeSeconds);
        for (var i = 0; i < values.Length; i++)
        {
            values[i] *= _partition[pieces[i].Layer];
        }

        return values;
    }
}
