using System.Numerics;
using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// The exact solution of a case with constant coefficients, linear faces and uniform initial concentrations:
/// the transform of the whole stack (<see cref="StackTransform"/>) inverted numerically. <see cref="At"/> inverts on a
/// Talbot contour scaled to the one time asked for: one tridiagonal solve of N + 1 unknowns per contour point (16 by
/// default), whatever the time. <see cref="AtTimes"/> inverts many times at once on hyperbolic contours that each serve
/// a window of times (<see cref="HyperbolicContour"/>, <see cref="ContourWindows"/>): 13 solves for a lone time, 32
/// for a decade, so six report times from 1 h to 10 d cost 58 solves instead of 96. Either way every quantity of a
/// snapshot comes from the same solves. A solution may be used from several
/// threads at once: each call works in buffers of its own.
/// </summary>
public sealed class LaplaceSolution
{
    private const int QuantitiesPerFace = 4;

    private readonly StackTransform _stack;
    private readonly TalbotContour _contour;
    private readonly Lazy<LongTimeExpansion?> _longTime;

    // The error the window contours of AtTimes are sized for, relative to the size of each quantity.
    private readonly double _windowTolerance;

    private LaplaceSolution(SimulationCase simulation, TalbotContour contour)
    {
        Case = simulation;
        _stack = new StackTransform(simulation);
        _contour = contour;
        _windowTolerance = WindowToleranceFor(contour.Points);
        _longTime = new Lazy<LongTimeExpansion?>(() => LongTimeExpansion.Of(simulation, _stack));
    }

    /// <summary>The case solved.</summary>
    public SimulationCase Case { get; }

    /// <summary>The solution of a case the method can serve (see <see cref="LaplaceApplicability"/>).</summary>
    /// <param name="simulation">The case.</param>
    /// <param name="contourPoints">
    /// Points on the Talbot contour of <see cref="At"/> (even, at least 8); the default reaches about 1e-11. The window
    /// contours of <see cref="AtTimes"/> follow it: they are sized for the error bound 10^(-3 points / 8), 1e-12 for
    /// the default 32 and 1e-15 (round-off) from 40 on, so two sizes give two independent inversions to compare.
    /// </param>
    /// <exception cref="ArgumentException">When the method cannot serve the case; the message says why.</exception>
    public static LaplaceSolution For(SimulationCase simulation, int contourPoints = TalbotContour.DefaultPoints)
    {
        var applicability = LaplaceApplicability.Of(simulation);
        if (!applicability.IsApplicable)
        {
            throw new ArgumentException("The exact method cannot serve this case: " + string.Join("; ", applicability.Reasons) + ".", nameof(simulation));
        }

        return new LaplaceSolution(simulation, new TalbotContour(contourPoints));
    }

    /// <summary>The integral quantities at the case's report times (see <see cref="AtTimes"/>).</summary>
    public IReadOnlyList<LaplaceSnapshot> AtReportTimes() => AtTimes(Case.ReportTimesSeconds);

    /// <summary>The integral quantities at time t &gt;= 0, s.</summary>
    public LaplaceSnapshot At(double timeSeconds)
    {
        if (timeSeconds == 0)
        {
            return Initial();
        }

        RequirePositive(timeSeconds);
        var state = new TransformedState(_stack);
        var transformed = new Complex[QuantityCount];
        var sums = new double[QuantityCount];
        for (var k = 0; k < _contour.EvaluationsPerTime; k++)
        {
            _stack.Solve(_contour.Node(k, timeSeconds), state);
            Transforms(state, transformed);
            Accumulate(_contour.Factor(k, timeSeconds), transformed, sums);
        }

        return Snapshot(timeSeconds, sums);
    }

    /// <summary>
    /// The integral quantities at many times t &gt;= 0 at once, in the order given (a time may repeat): the positive
    /// times are grouped into windows of at most three decades, and each window is inverted on one hyperbolic contour
    /// whose solves serve all of its times. The contours are sized for an error bound of 1e-12 of each quantity's size
    /// (see <see cref="HyperbolicContour"/>); measured on three-layer stacks, every figure is within a few 1e-9 of itself
    /// or, once it has fallen below a tenth of its largest value, of that value (docs/numerics.md).
    /// </summary>
    public IReadOnlyList<LaplaceSnapshot> AtTimes(IReadOnlyList<double> timesSeconds)
    {
        ArgumentNullException.ThrowIfNull(timesSeconds);
        foreach (var time in timesSeconds)
        {
            if (time != 0)
            {
                RequirePositive(time);
            }
        }

        var positive = timesSeconds.Where(time => time > 0).Distinct().Order().ToArray();
        var sums = new double[positive.Length][];
        var state = new TransformedState(_stack);
        var transformed = new Complex[QuantityCount];
        foreach (var (first, last) in ContourWindows.Plan(positive, _windowTolerance))
        {
            var contour = HyperbolicContour.ForWindow(positive[first], positive[last] / positive[first], _windowTolerance);
            for (var i = first; i <= last; i++)
            {
                sums[i] = new double[QuantityCount];
            }

            for (var k = 0; k < contour.Evaluations; k++)
            {
                _stack.Solve(contour.Node(k), state);
                Transforms(state, transformed);
                for (var i = first; i <= last; i++)
                {
                    if (contour.Contributes(k, positive[i]))
                    {
                        Accumulate(contour.Factor(k, positive[i]), transformed, sums[i]);
                    }
                }
            }
        }

        var snapshots = new LaplaceSnapshot[positive.Length];
        for (var i = 0; i < positive.Length; i++)
        {
            snapshots[i] = Snapshot(positive[i], sums[i]);
        }

        return [.. timesSeconds.Select(time => time == 0 ? Initial() : snapshots[Array.BinarySearch(positive, time)])];
    }

    /// <summary>How many quantities a snapshot inverts.</summary>
    internal int QuantityCount => (3 * (_stack.LayerCount + 1)) + (2 * QuantitiesPerFace) - 1;

    // The error asked of the window contours for a Talbot contour of the given points (see For).
    private static double WindowToleranceFor(int contourPoints) => Math.Max(1e-15, Math.Pow(10, -3.0 * contourPoints / 8));

    // sum += Im[factor F] for every quantity.
    private static void Accumulate(Complex factor, ReadOnlySpan<Complex> transformed, Span<double> sums)
    {
        var real = factor.Real;
        var imaginary = factor.Imaginary;
        for (var q = 0; q < sums.Length; q++)
        {
            var value = transformed[q];
            sums[q] += (real * value.Imaginary) + (imaginary * value.Real);
        }
    }

    private static void RequirePositive(double timeSeconds)
    {
        if (!(timeSeconds > 0) || double.IsInfinity(timeSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(timeSeconds), timeSeconds, "The inversion needs a finite time above zero.");
        }
    }

    /// <summary>The snapshot from the inverted values of <see cref="Transforms(TransformedState, Complex[])"/>.</summary>
    internal LaplaceSnapshot Snapshot(double timeSeconds, double[] values)
    {
        var n = _stack.LayerCount;
        return new LaplaceSnapshot(
            timeSeconds,
            values[..n],
            values[n..((2 * n) + 1)],
            values[((2 * n) + 1)..((3 * n) + 2)],
            FaceValues(Side.Left, values.AsSpan((3 * n) + 2, QuantitiesPerFace)),
            FaceValues(Side.Right, values.AsSpan((3 * n) + 2 + QuantitiesPerFace, QuantitiesPerFace)));
    }

    /// <summary>
    /// Concentration c = K u at depths measured from the left face of the stack, at time t &gt; 0, kg/m3. A depth on an
    /// interface reads the layer to its right (the last layer at the right face).
    /// </summary>
    public IReadOnlyList<double> ConcentrationsAt(IReadOnlyList<double> depthsMeters, double timeSeconds)
    {
        ArgumentNullException.ThrowIfNull(depthsMeters);
        var places = depthsMeters.Select(Locate).ToArray();
        var state = new TransformedState(_stack);
        var values = _contour.Invert(
            places.Length,
            (s, transformed) =>
            {
                _stack.Solve(s, state);
                for (var i = 0; i < places.Length; i++)
                {
                    transformed[i] = state.ValueInLayer(places[i].Layer, places[i].DepthInLayer);
                }
            },
            timeSeconds);
        return [.. values.Select((value, i) => _stack.Partition[places[i].Layer] * value)];
    }

    /// <summary>Concentration c = K u at one depth from the left face at time t &gt; 0, kg/m3 (see <see cref="ConcentrationsAt"/>).</summary>
    public double ConcentrationAt(double depthMeters, double timeSeconds) => ConcentrationsAt([depthMeters], timeSeconds)[0];

    /// <summary>Concentration just inside a layer at one of its faces, at time t &gt; 0, kg/m3.</summary>
    public double ConcentrationAtFace(int layer, Side side, double timeSeconds)
    {
        var node = side == Side.Left ? layer : layer + 1;
        return _stack.Partition[layer] * At(timeSeconds).ContinuousValueAtInterfaces[node];
    }

    /// <summary>
    /// The long-time line of the amount received by the medium on a side (steady flux and lag time), or null where the
    /// flux into it tends to zero: a closed face, a medium that fills up (a compartment without removal), a stack with
    /// nothing on its other face to draw from or drain to, or two media at the same level.
    /// </summary>
    public LaplaceSteadyLine? SteadyLine(Side receiving)
    {
        var other = receiving == Side.Left ? Side.Right : Side.Left;
        if (_longTime.Value is not { } expansion || !Anchors(_stack.Face(receiving)) || !Anchors(_stack.Face(other)))
        {
            return null;
        }

        var (flux, intercept) = receiving == Side.Right ? expansion.RightFluxTerms() : expansion.LeftFluxTerms();

        // The flux the two media's levels would drive through every resistance in series: below 1e-9 of it, none.
        var drive = (Math.Abs(Level(_stack.Left)) + Math.Abs(Level(_stack.Right)))
            / (Case.Stack.ResistanceSecondsPerMeter + Resistance(_stack.Left) + Resistance(_stack.Right));
        if (Math.Abs(flux) <= 1e-9 * drive)
        {
            return null;
        }

        return new LaplaceSteadyLine(receiving, flux, -intercept / flux);

        // A bath, or a compartment that removes, holds the level of u at long times (the bath's, or zero).
        static bool Anchors(FaceLaw face) => face.Condition is BathFace || face.RemovalRate > 0;
        static double Level(FaceLaw face) => face.Condition is BathFace ? face.MediumValue : 0;
        static double Resistance(FaceLaw face) => face.Condition is CompartmentFace
            ? face.FilmResistance + (1 / (face.Capacity * face.RemovalRate))
            : face.FilmResistance;
    }

    /// <summary>
    /// Mass per contact area a compartment holds once the case has settled: at equilibrium (no bath, no removal), or in
    /// the steady state fixed by a bath or a removal.
    /// </summary>
    /// <exception cref="ArgumentException">When the face is not a compartment.</exception>
    public double FinalMediumMassPerArea(Side side)
    {
        var face = _stack.Face(side);
        if (face.Condition is not CompartmentFace)
        {
            throw new ArgumentException("Only a compartment holds a mass of its own.", nameof(side));
        }

        if (_longTime.Value is not { } expansion)
        {
            var mass = Case.Stack.InitialMassPerArea + (_stack.Left.Capacity * _stack.Left.MediumValue) + (_stack.Right.Capacity * _stack.Right.MediumValue);
            var capacity = Case.Stack.Layers.Sum(layer => layer.PartitionCoefficient * layer.ThicknessMeters) + _stack.Left.Capacity + _stack.Right.Capacity;
            return face.Capacity * mass / capacity;
        }

        // u_c = u_face + R F_in with F_in = -Y(0) u_face at long times: u_c = u_face / (1 + R C k).
        var node = side == Side.Left ? 0 : _stack.LayerCount;
        return face.Capacity * expansion.Final[node] / (1 + (face.FilmResistance * face.Capacity * face.RemovalRate));
    }

    /// <summary>
    /// The first time a compartment has gained (or lost) the given fraction of its change toward its final content,
    /// (M(t) - M(0)) / (M_final - M(0)) = fraction, searched up to the given time; null when not reached by then or
    /// when its content does not change.
    /// </summary>
    public double? TimeToFractionOfFinal(Side side, double fraction, double searchUpToSeconds)
    {
        var final = FinalMediumMassPerArea(side);
        var face = _stack.Face(side);
        var initial = face.Capacity * face.MediumValue;
        if (final == initial)
        {
            return null;
        }

        return FirstCrossings.First(
            time => (At(time).Face(side)!.MediumMassPerArea!.Value - initial) / (final - initial), fraction, searchUpToSeconds);
    }

    /// <summary>The first time the concentration in a face medium reaches a limit, searched up to the given time, or null.</summary>
    public double? TimeToMediumConcentration(Side side, double concentrationKgPerCubicMeter, double searchUpToSeconds)
        => FirstTimeReaching(snapshot => snapshot.Face(side)?.ConcentrationKgPerCubicMeter ?? double.NaN, concentrationKgPerCubicMeter, searchUpToSeconds);

    /// <summary>The first time a quantity of the snapshots reaches a target, searched up to the given time, or null.</summary>
    public double? FirstTimeReaching(Func<LaplaceSnapshot, double> measure, double target, double searchUpToSeconds)
    {
        ArgumentNullException.ThrowIfNull(measure);
        return FirstCrossings.First(time => measure(At(time)), target, searchUpToSeconds);
    }

    /// <summary>
    /// The transformed solution on the contour of time t &gt; 0, solved once, from which any number of quantities at that
    /// time are inverted (<see cref="LaplaceInstant"/>).
    /// </summary>
    public LaplaceInstant InstantAt(double timeSeconds)
    {
        RequirePositive(timeSeconds);
        var states = new TransformedState[_contour.EvaluationsPerTime];
        for (var k = 0; k < states.Length; k++)
        {
            states[k] = new TransformedState(_stack);
            _stack.Solve(_contour.Node(k, timeSeconds), states[k]);
        }

        return new LaplaceInstant(this, _contour, _stack.Partition, states, timeSeconds);
    }

    /// <summary>The transformed quantities of a snapshot, from the transformed solution at one s.</summary>
    internal void Transforms(TransformedState state, Complex[] transformed)
    {
        var n = _stack.LayerCount;
        for (var j = 0; j < n; j++)
        {
            transformed[j] = state.LayerMass(j);
        }

        for (var node = 0; node <= n; node++)
        {
            transformed[n + node] = state.FluxAtNode(node);
            transformed[(2 * n) + 1 + node] = state.NodeValue(node);
        }

        // The flux into each medium is the flux at its node, read above: +x at the right face, -x at the left.
        FaceTransforms(state, Side.Left, -transformed[n], transformed.AsSpan((3 * n) + 2, QuantitiesPerFace));
        FaceTransforms(state, Side.Right, transformed[n + n], transformed.AsSpan((3 * n) + 2 + QuantitiesPerFace, QuantitiesPerFace));
    }

    // Per face: transferred amount F/s, flux F, medium u, removed amount k C u_c / s.
    private void FaceTransforms(TransformedState state, Side side, Complex flux, Span<Complex> transformed)
    {
        var face = _stack.Face(side);
        if (face.Condition is ClosedFace)
        {
            transformed.Clear();
            return;
        }

        var medium = state.MediumValue(side, flux);
        transformed[0] = flux * state.InverseS;
        transformed[1] = flux;
        transformed[2] = medium;
        transformed[3] = face.RemovalRate * face.Capacity * medium * state.InverseS;
    }

    private LaplaceFaceValues? FaceValues(Side side, ReadOnlySpan<double> values)
    {
        var face = _stack.Face(side);
        return face.Condition switch
        {
            BathFace bath => new LaplaceFaceValues(values[0], values[1], bath.ConcentrationKgPerCubicMeter, null, 0),
            CompartmentFace compartment => new LaplaceFaceValues(
                values[0], values[1], compartment.PartitionCoefficient * values[2], face.Capacity * values[2], values[3]),
            _ => null,
        };
    }

    private LaplaceSnapshot Initial()
    {
        var n = _stack.LayerCount;
        var undefined = Enumerable.Repeat(double.NaN, n + 1).ToArray();
        LaplaceFaceValues? Start(FaceCondition condition) => condition switch
        {
            BathFace bath => new LaplaceFaceValues(0, double.NaN, bath.ConcentrationKgPerCubicMeter, null, 0),
            CompartmentFace compartment => new LaplaceFaceValues(
                0, double.NaN, compartment.InitialConcentrationKgPerCubicMeter, compartment.InitialMassPerArea, 0),
            _ => null,
        };

        return new LaplaceSnapshot(
            0, [.. Case.Stack.Layers.Select(layer => layer.InitialMassPerArea)], undefined, undefined, Start(Case.Left), Start(Case.Right));
    }

    private (int Layer, double DepthInLayer) Locate(double depthMeters)
    {
        var layers = Case.Stack.Layers;
        if (!(depthMeters >= 0) || depthMeters > Case.Stack.TotalThicknessMeters * (1 + 1e-12))
        {
            throw new ArgumentOutOfRangeException(nameof(depthMeters), depthMeters, "The depth lies outside the stack.");
        }

        var edge = 0.0;
        for (var j = 0; j < layers.Count - 1; j++)
        {
            if (depthMeters < edge + layers[j].ThicknessMeters)
            {
                return (j, depthMeters - edge);
            }

            edge += layers[j].ThicknessMeters;
        }

        return (layers.Count - 1, Math.Clamp(depthMeters - edge, 0, layers[^1].ThicknessMeters));
    }
}
