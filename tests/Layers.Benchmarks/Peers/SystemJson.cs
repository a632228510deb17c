using System.Text.Json;
using Layers.Core.Discretization;
using Layers.Core.Domain;

namespace Layers.Benchmarks.Peers;

/// <summary>
/// Writes a problem's finite-volume system for the general-purpose integrators of tests/benchmarks/stiff-peers:
/// Cap du/dt = s - A u with A symmetric tridiagonal, u(0), the output times, the amount received on the right as
/// weights on the state plus the time integral of weights on the state, the exact amounts, and our methods' sweeps.
/// </summary>
public static class SystemJson
{
    /// <summary>The absolute tolerance of our solver over (relative tolerance x largest |u|); the peers use the same.</summary>
    public const double AbsoluteToleranceScale = 1e-3;

    /// <summary>Writes the file.</summary>
    public static void Write(
        string path,
        PeerProblem problem,
        (IReadOnlyList<double> Reference, IReadOnlyList<SweepPoint> Points, SweepPoint? Chosen) trBdf2,
        (IReadOnlyList<SweepPoint> Points, SweepPoint? Chosen) laplace)
    {
        ArgumentNullException.ThrowIfNull(problem);
        var system = problem.Model.System;
        var count = system.NodeCount;
        var diagonal = new double[count];
        var source = new double[count];
        for (var n = 0; n < count; n++)
        {
            diagonal[n] = system.ConductanceToLeft(n) + system.ConductanceToRight(n);
        }

        source[0] += system.LeftBath.Conductance * system.LeftBath.BathValue;
        source[count - 1] += system.RightBath.Conductance * system.RightBath.BathValue;
        CheckAgainstResidual(system, diagonal, source, problem.Model.InitialState);

        using var stream = File.Create(path);
        using var json = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true });
        json.WriteStartObject();
        json.WriteString("case", problem.Name);
        json.WriteString("title", problem.Case.Title);
        json.WriteNumber("targetAccuracy", problem.TargetAccuracy);
        json.WriteNumber("cells", problem.Model.Grid.CellCount);
        json.WriteNumber("nodes", count);
        json.WriteString("equations", "capacity * du/dt = source - A u; A symmetric tridiagonal (matrixDiagonal, matrixOffDiagonal = A[n, n+1] = A[n+1, n]); SI, per unit area");
        Array("capacity", system.Capacity);
        Array("matrixDiagonal", diagonal);
        Array("matrixOffDiagonal", [.. system.Conductance.Select(conductance => -conductance)]);
        Array("source", source);
        Array("initialState", problem.Model.InitialState);
        json.WriteNumber("defaultAbsoluteToleranceScale", AbsoluteToleranceScale);
        json.WriteNumber("stateScale", StateScale(system, problem.Model.InitialState));
        json.WriteNumber("durationSeconds", problem.Case.DurationSeconds);
        Array("outputTimesSeconds", problem.Case.ReportTimesSeconds);
        WriteReceived(json, system, problem.Model.InitialState);
        Array("exactReceived", problem.ExactKgPerSquareMeter);
        json.WriteNumber("errorScale", problem.ScaleKgPerSquareMeter);

        json.WriteStartObject("trBdf2");
        json.WriteNumber("referenceTolerance", TrBdf2Runs.ReferenceTolerance);
        json.WriteNumber("referenceAbsoluteScale", TrBdf2Runs.ReferenceAbsoluteScale);
        Array("reference", trBdf2.Reference);
        json.WriteNumber("referenceAgainstExact", problem.Error(trBdf2.Reference, problem.ExactKgPerSquareMeter));
        Points("ladder", "relativeTolerance", trBdf2.Points, trBdf2.Chosen);
        json.WriteEndObject();

        json.WriteStartObject("laplace");
        json.WriteNumber("referenceContourPoints", PeerProblem.ExactContourPoints);
        Points("ladder", "contourPoints", laplace.Points, laplace.Chosen);
        json.WriteEndObject();
        json.WriteEndObject();

        void Array(string name, IEnumerable<double> values)
        {
            json.WriteStartArray(name);
            foreach (var value in values)
            {
                json.WriteNumberValue(value);
            }

            json.WriteEndArray();
        }

        void Points(string name, string setting, IReadOnlyList<SweepPoint> points, SweepPoint? chosen)
        {
            json.WriteStartArray(name);
            foreach (var point in points)
            {
                json.WriteStartObject();
                json.WriteNumber(setting, point.Setting);
                if (point.AbsoluteScale is { } scale)
                {
                    json.WriteNumber("absoluteScale", scale);
                }

                json.WriteNumber("error", point.Error);
                json.WriteNumber("work", point.Work);
                if (point.BestSeconds is { } seconds)
                {
                    json.WriteNumber("bestSeconds", seconds);
                }

                json.WriteBoolean("chosen", ReferenceEquals(point, chosen));
                json.WriteEndObject();
            }

            json.WriteEndArray();
        }
    }

    // The amount received on the right: a compartment's gain is a weight on its node; what a bath takes is the time
    // integral of its link's flux, G (u_last - u_bath), which an integrator carries as one more unknown.
    private static void WriteReceived(Utf8JsonWriter json, DiffusionSystem system, double[] initial)
    {
        var node = system.CompartmentNode(Side.Right);
        var last = system.NodeCount - 1;
        json.WriteStartObject("received");
        json.WriteString("meaning", "amount(t) = sum(stateWeights * u[stateNodes]) + stateOffset + integral from 0 to t of (sum(rateWeights * u[rateNodes]) + rateOffset) dt, kg/m2");
        if (node >= 0)
        {
            if (system.RightBath.Exists)
            {
                throw new InvalidOperationException("A compartment with first-order removal is not written: its amount received would also count what was removed.");
            }

            Nodes("state", [node], [system.Capacity[node]], -system.Capacity[node] * initial[node]);
            Nodes("rate", [], [], 0);
        }
        else
        {
            var bath = system.RightBath;
            Nodes("state", [], [], 0);
            Nodes("rate", [last], [bath.Conductance], -bath.Conductance * bath.BathValue);
        }

        json.WriteEndObject();

        void Nodes(string prefix, int[] nodes, double[] weights, double offset)
        {
            json.WriteStartArray(prefix + "Nodes");
            foreach (var n in nodes)
            {
                json.WriteNumberValue(n);
            }

            json.WriteEndArray();
            json.WriteStartArray(prefix + "Weights");
            foreach (var weight in weights)
            {
                json.WriteNumberValue(weight);
            }

            json.WriteEndArray();
            json.WriteNumber(prefix + "Offset", offset);
        }
    }

    // The scale of u our solver sets its absolute tolerance by: the largest |u| at the start or in a bath.
    private static double StateScale(DiffusionSystem system, double[] initial)
    {
        var scale = Math.Max(Math.Abs(system.LeftBath.BathValue), Math.Abs(system.RightBath.BathValue));
        scale = initial.Aggregate(scale, (largest, value) => Math.Max(largest, Math.Abs(value)));
        return scale > 0 ? scale : 1;
    }

    // The written s - A u must be the system's own rate at u(0) and at a state with every node different.
    private static void CheckAgainstResidual(DiffusionSystem system, double[] diagonal, double[] source, double[] initial)
    {
        var count = system.NodeCount;
        var varied = Enumerable.Range(0, count).Select(n => initial[n] + (1 + (0.37 * n % 1.0))).ToArray();
        foreach (var state in new[] { initial, varied })
        {
            var rate = new double[count];
            system.Residual(state, rate);
            for (var n = 0; n < count; n++)
            {
                var written = source[n] - (diagonal[n] * state[n])
                    + (n > 0 ? system.Conductance[n - 1] * state[n - 1] : 0)
                    + (n < count - 1 ? system.Conductance[n] * state[n + 1] : 0);
                var size = Math.Abs(diagonal[n] * state[n]) + Math.Abs(source[n]);
                if (Math.Abs(written - rate[n]) > 1e-12 * size)
                {
                    throw new InvalidOperationException($"The written system differs from the solver's at node {n}: {written} against {rate[n]}.");
                }
            }
        }
    }
}
