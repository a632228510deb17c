using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Core.Laplace;

namespace Layers.Core.Simulation;

/// <summary>
/// How far the exact solution is from the final state: the distance D(t) = sum over layers of the integral of
/// K |u - u_final| dx, plus each compartment's |content - final content|, and the fraction of the way,
/// 1 - D(t) / D(0). It is the limit of the finite volumes' measure (the same sum over nodes) as their cells shrink.
/// </summary>
/// <remarks>
/// u - u_final is smooth inside a layer, so the integral of its magnitude is the sum of the magnitudes of its exact
/// integrals between its zeros. The zeros are found on the inverted solution: its values at five evenly spaced places
/// in each layer (the edges from the interface values) give the sign changes; a bracket that holds a zero of the last
/// time asked is first narrowed around it; false position with the Illinois rule, halving every fourth round, then
/// places each zero to 1e-6 of its layer or where |u - u_final| is round-off, each round one inversion for all zeros at
/// once (an error delta in a zero changes D by about |u'| delta^2). The number of sign changes of u - u_final never
/// grows in time for a diffusion equation (Sturm's zero-number argument), and it starts at most at the interfaces; two
/// zeros closer than a quarter of a layer, which the sampling would miss, take a narrow dip that diffusion smooths out
/// first.
/// </remarks>
internal sealed class ExactDistance
{
    private const int IntervalsPerLayer = 4;
    private const int MostRounds = 60;

    /// <summary>How far either side of a zero of the last time asked the warm start looks, as a fraction of its layer.</summary>
    private const double WarmStartWidth = 1e-3;

    /// <summary>A trial where |u - u_final| is below this fraction of its largest sampled value is on the zero.</summary>
    private const double RoundOff = 1e-12;

    /// <summary>
    /// A zero is placed once its bracket is narrower than this fraction of its layer: D then changes by about
    /// |u'| (1e-6 L)^2, some 1e-12 of the layer's share of D.
    /// </summary>
    private const double ZeroTolerance = 1e-6;

    private readonly double[] _thickness;
    private readonly double[] _partition;
    private readonly (double Left, double Right)[] _final;
    private readonly List<(Side Side, double Capacity, double Final)> _compartments = [];
    private readonly (int Layer, double DepthMeters)[] _interior;
    private List<(int Layer, double DepthMeters)> _previous = [];
    private readonly double _initialDistance;

    public ExactDistance(DiscreteModel model, FinalStateTarget final)
    {
        var simulation = model.Case;
        var layers = simulation.Stack.Layers;
        _thickness = [.. layers.Select(layer => layer.ThicknessMeters)];
        _partition = [.. layers.Select(layer => layer.PartitionCoefficient)];
        _final = [.. layers.Select((layer, j) =>
        {
            var (left, right) = final.LayerEdges(simulation, j);
            return (left / layer.PartitionCoefficient, right / layer.PartitionCoefficient);
        })];
        var system = model.System;
        var initial = 0.0;
        var scale = 0.0;
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var node = system.CompartmentNode(side);
            if (node >= 0)
            {
                _compartments.Add((side, system.Capacity[node], final.NodeValues[node]));
                initial += system.Capacity[node] * Math.Abs(model.InitialState[node] - final.NodeValues[node]);
                scale += system.Capacity[node] * (Math.Abs(model.InitialState[node]) + Math.Abs(final.NodeValues[node]));
            }
        }

        for (var j = 0; j < layers.Count; j++)
        {
            var u0 = layers[j].InitialContinuousVariable;
            initial += _partition[j] * IntegralOfMagnitude(u0 - _final[j].Left, u0 - _final[j].Right, _thickness[j]);
            scale += _partition[j] * _thickness[j] * (Math.Abs(u0) + (0.5 * (Math.Abs(_final[j].Left) + Math.Abs(_final[j].Right))));
        }

        _initialDistance = initial;
        StartsAtFinalState = initial <= Observables.StartsAtFinalStateBelow * scale;
        _interior = [.. Enumerable.Range(0, layers.Count)
            .SelectMany(j => Enumerable.Range(1, IntervalsPerLayer - 1).Select(i => (j, _thickness[j] * i / IntervalsPerLayer)))];
    }

    /// <summary>True when the case starts at its final state (to round-off), so the fraction of the way is undefined.</summary>
    public bool StartsAtFinalState { get; }

    /// <summary>1 - D(t) / D(0) at the instant's time; NaN when the case starts at its final state.</summary>
    public double FractionOfFinalState(LaplaceInstant instant)
        => StartsAtFinalState ? double.NaN : 1 - (Distance(instant) / _initialDistance);

    private double Distance(LaplaceInstant instant)
    {
        var zeros = Zeros(instant);
        var pieces = new List<(int Layer, double FromMeters, double ToMeters)>();
        for (var j = 0; j < _thickness.Length; j++)
        {
            var edges = zeros.Where(zero => zero.Layer == j).Select(zero => zero.DepthMeters).Order().Prepend(0).Append(_thickness[j]).ToArray();
            for (var p = 0; p + 1 < edges.Length; p++)
            {
                pieces.Add((j, edges[p], edges[p + 1]));
            }
        }

        var masses = instant.MassesPerAreaIn(pieces);
        var distance = 0.0;
        for (var p = 0; p < pieces.Count; p++)
        {
            var (j, from, to) = pieces[p];
            var finalMass = _partition[j] * (to - from) * 0.5 * (Final(j, from) + Final(j, to));
            distance += Math.Abs(masses[p] - finalMass);
        }

        foreach (var (side, capacity, final) in _compartments)
        {
            distance += Math.Abs(instant.Snapshot.Face(side)!.MediumMassPerArea!.Value - (capacity * final));
        }

        return distance;
    }

    /// <summary>The zeros of u - u_final inside the layers, from the sampled values, placed by the Illinois rule.</summary>
    private List<(int Layer, double DepthMeters)> Zeros(LaplaceInstant instant)
    {
        // u at each layer's edges is the interface value of the snapshot; inside, three more places per layer.
        var inside = instant.ContinuousValuesAt(_interior);
        var interfaces = instant.Snapshot.ContinuousValueAtInterfaces;
        var brackets = new List<Bracket>();
        var largest = 0.0;
        for (var j = 0; j < _thickness.Length; j++)
        {
            for (var i = 0; i < IntervalsPerLayer; i++)
            {
                var a = _thickness[j] * i / IntervalsPerLayer;
                var b = _thickness[j] * (i + 1) / IntervalsPerLayer;
                var ua = i == 0 ? interfaces[j] : inside[(j * (IntervalsPerLayer - 1)) + i - 1];
                var ub = i == IntervalsPerLayer - 1 ? interfaces[j + 1] : inside[(j * (IntervalsPerLayer - 1)) + i];
                var ga = ua - Final(j, a);
                var gb = ub - Final(j, b);
                largest = Math.Max(largest, Math.Max(Math.Abs(ga), Math.Abs(gb)));
                if (ga * gb < 0)
                {
                    brackets.Add(new Bracket(j, a, b, ga, gb));
                }
            }
        }

        WarmStart(instant, brackets);
        for (var round = 0; round < MostRounds; round++)
        {
            var open = brackets.Where(bracket => !bracket.Placed(ZeroTolerance * _thickness[bracket.Layer], RoundOff * largest)).ToList();
            if (open.Count == 0)
            {
                break;
            }

            // Every fourth round halves the bracket, so that a steep front (an erfc across a sliver of a thick layer)
            // cannot stall false position on one side.
            var halve = round % 4 == 3;
            var trials = open.Select(bracket => (bracket.Layer, halve ? bracket.Middle : bracket.Trial)).ToArray();
            var trialValues = instant.ContinuousValuesAt(trials);
            for (var k = 0; k < open.Count; k++)
            {
                open[k].Take(trials[k].Item2, trialValues[k] - Final(trials[k].Layer, trials[k].Item2));
            }
        }

        _previous = [.. brackets.Select(bracket => (bracket.Layer, bracket.Zero))];
        return _previous;
    }

    /// <summary>
    /// Zeros move little from one time asked to the next: a bracket that holds a zero of the last time asked is first
    /// narrowed by the values a thousandth of its layer on either side of it (one inversion for all).
    /// </summary>
    private void WarmStart(LaplaceInstant instant, List<Bracket> brackets)
    {
        var trials = new List<(Bracket Bracket, int Layer, double DepthMeters)>();
        foreach (var bracket in brackets)
        {
            foreach (var (layer, zero) in _previous.Where(zero => zero.Layer == bracket.Layer && bracket.Holds(zero.DepthMeters)))
            {
                var width = WarmStartWidth * _thickness[layer];
                trials.Add((bracket, layer, Math.Max(bracket.Lower, zero - width)));
                trials.Add((bracket, layer, Math.Min(bracket.Upper, zero + width)));
            }
        }

        if (trials.Count == 0)
        {
            return;
        }

        var values = instant.ContinuousValuesAt([.. trials.Select(trial => (trial.Layer, trial.DepthMeters))]);
        for (var k = 0; k < trials.Count; k++)
        {
            var (bracket, layer, depth) = trials[k];
            if (bracket.Holds(depth))
            {
                bracket.Take(depth, values[k] - Final(layer, depth));
            }
        }
    }

    private double Final(int layer, double depthMeters)
        => _final[layer].Left + ((_final[layer].Right - _final[layer].Left) * depthMeters / _thickness[layer]);

    /// <summary>The integral of |h| over a layer where h goes linearly from <paramref name="left"/> to <paramref name="right"/>.</summary>
    private static double IntegralOfMagnitude(double left, double right, double thickness)
        => left * right >= 0
            ? 0.5 * thickness * (Math.Abs(left) + Math.Abs(right))
            : 0.5 * thickness * ((left * left) + (right * right)) / (Math.Abs(left) + Math.Abs(right));

    /// <summary>A sign change of u - u_final between two depths of a layer, narrowed by false position with the Illinois rule.</summary>
    private sealed class Bracket(int layer, double lower, double upper, double lowerValue, double upperValue)
    {
        private double _lower = lower;
        private double _upper = upper;
        private double _lowerValue = lowerValue;
        private double _upperValue = upperValue;
        private int _side;
        private double _last;
        private double _lastValue;
        private bool _tried;
        private bool _atRoundOff;

        public int Layer { get; } = layer;

        /// <summary>The false-position point of the bracket.</summary>
        public double Trial => _upper == _lower ? _lower : Math.Clamp(_lower - (_lowerValue * (_upper - _lower) / (_upperValue - _lowerValue)), _lower, _upper);

        /// <summary>The lower end of the bracket.</summary>
        public double Lower => _lower;

        /// <summary>The upper end of the bracket.</summary>
        public double Upper => _upper;

        /// <summary>True when a depth lies strictly inside the bracket.</summary>
        public bool Holds(double depthMeters) => depthMeters > _lower && depthMeters < _upper;

        /// <summary>The middle of the bracket.</summary>
        public double Middle => 0.5 * (_lower + _upper);

        /// <summary>The zero: the last trial where u - u_final was round-off, else the middle of the bracket.</summary>
        public double Zero => _atRoundOff ? _last : Middle;

        /// <summary>True once the bracket is narrower than the width given or a trial met u - u_final below the floor.</summary>
        public bool Placed(double width, double floor)
        {
            _atRoundOff = _tried && Math.Abs(_lastValue) <= floor;
            return _atRoundOff || _upper - _lower <= width;
        }

        /// <summary>Narrows the bracket with the value of u - u_final at a trial depth inside it.</summary>
        public void Take(double trial, double value)
        {
            (_last, _lastValue, _tried) = (trial, value, true);
            if (value == 0)
            {
                (_lower, _upper) = (trial, trial);
                return;
            }

            if (value * _lowerValue < 0)
            {
                (_upper, _upperValue) = (trial, value);
                _lowerValue = _side == -1 ? _lowerValue / 2 : _lowerValue;
                _side = -1;
            }
            else
            {
                (_lower, _lowerValue) = (trial, value);
                _upperValue = _side == 1 ? _upperValue / 2 : _upperValue;
                _side = 1;
            }
        }
    }
}
