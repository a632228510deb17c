using System.Numerics;
using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// The first two terms of the transformed node values at small s, U(s) = U1 / s + U0 + O(s), for a case with a bath
/// or a removing compartment (then the long-time state is fixed by the media, not by the mass held). U1 is the final
/// (steady) state; U0 gives the offset of every accumulated amount from its long-time line: a cumulative amount with
/// transform Q(s) = J / s^2 + Q0 / s + O(1) follows Q(t) = J t + Q0 + o(1), a steady flux J and a lag time -Q0 / J.
/// </summary>
/// <remarks>
/// At small s each layer's admittances expand as G = P/L + s K L / 3, H = P/L - s K L / 6 and T = s K L / 2 + O(s^2)
/// (coth x = 1/x + x/3, csch x = 1/x - x/6, tanh(x/2) = x/2, with x^2 = s L^2 / D and P / D = K); a face medium's
/// admittance Y(s) = Y0 + s Y1 and source Y g = Y u_bath / s (bath) or S0 + O(s) (compartment). Collecting powers of
/// s in the node equations gives M0 U1 = r1 and M0 U0 = r0 - M1 U1, two solves of the same real ladder network (docs/numerics.md).
/// </remarks>
internal sealed class LongTimeExpansion
{
    private readonly double[] _conductance;
    private readonly double[] _capacity;
    private readonly double[] _initialMass;

    private LongTimeExpansion(double[] conductance, double[] capacity, double[] initialMass, double[] final, double[] offset)
    {
        _conductance = conductance;
        _capacity = capacity;
        _initialMass = initialMass;
        Final = final;
        Offset = offset;
    }

    /// <summary>U1: the node values of u in the long-time state.</summary>
    public double[] Final { get; }

    /// <summary>U0: the constant terms of the transformed node values.</summary>
    public double[] Offset { get; }

    /// <summary>The expansion, or null for a closed system (no bath and no removal), whose M0 is singular.</summary>
    public static LongTimeExpansion? Of(SimulationCase simulation, StackTransform stack)
    {
        var left = FaceLaw.For(simulation.Left);
        var right = FaceLaw.For(simulation.Right);
        if (!Anchors(left) && !Anchors(right))
        {
            return null;
        }

        var n = stack.LayerCount;
        var layers = simulation.Stack.Layers;
        var conductance = layers.Select(layer => layer.DiffusivitySquareMetersPerSecond * layer.PartitionCoefficient / layer.ThicknessMeters).ToArray();
        var capacity = layers.Select(layer => layer.PartitionCoefficient * layer.ThicknessMeters).ToArray();
        var initialMass = layers.Select(layer => layer.InitialMassPerArea).ToArray();

        // M0 is the network of the conductances P/L with the faces' Y(0) to ground; M1 holds the layers' storage
        // terms K L / 3 (diagonal) and K L / 6 (off the diagonal) and the compartments' Y1.
        var series = conductance.Select(value => (Complex)value).ToArray();
        var shunt = new Complex[n + 1];
        var diagonal1 = new double[n + 1];
        var r1 = new Complex[n + 1];
        var r0 = new double[n + 1];
        for (var j = 0; j < n; j++)
        {
            diagonal1[j] += capacity[j] / 3;
            diagonal1[j + 1] += capacity[j] / 3;
            r0[j] += initialMass[j] / 2;
            r0[j + 1] += initialMass[j] / 2;
        }

        AddFace(left, 0, shunt, diagonal1, r1, r0);
        AddFace(right, n, shunt, diagonal1, r1, r0);
        Complex? heldLeft = left.IsFixedValue ? left.MediumValue : null;
        Complex? heldRight = right.IsFixedValue ? right.MediumValue : null;
        var final = LadderNetwork.Solve(series, shunt, r1, heldLeft, heldRight);

        var rhs = new Complex[n + 1];
        for (var node = 0; node <= n; node++)
        {
            var m1u1 = diagonal1[node] * final[node];
            if (node > 0)
            {
                m1u1 += capacity[node - 1] / 6 * final[node - 1];
            }

            if (node < n)
            {
                m1u1 += capacity[node] / 6 * final[node + 1];
            }

            rhs[node] = r0[node] - m1u1;
        }

        // A held face has u = u_bath / s exactly: no constant term there.
        var offset = LadderNetwork.Solve(series, shunt, rhs, heldLeft is null ? null : Complex.Zero, heldRight is null ? null : Complex.Zero);
        return new LongTimeExpansion(
            conductance, capacity, initialMass, [.. final.Select(value => value.Real)], [.. offset.Select(value => value.Real)]);
    }

    /// <summary>
    /// The two leading terms (J, Q0) of the flux into the right medium: its transform is J / s + Q0 + O(s), so the
    /// amount received is J t + Q0 at long times. From F(L) = H u_{N-1} - G u_N + T u_init / s of the last layer.
    /// </summary>
    public (double SteadyFlux, double Intercept) RightFluxTerms()
    {
        var j = _conductance.Length - 1;
        var steady = _conductance[j] * (Final[j] - Final[j + 1]);
        var intercept = (_conductance[j] * (Offset[j] - Offset[j + 1]))
            - (_capacity[j] / 6 * Final[j])
            - (_capacity[j] / 3 * Final[j + 1])
            + (_initialMass[j] / 2);
        return (steady, intercept);
    }

    /// <summary>The same for the flux into the left medium, -F(0) of the first layer.</summary>
    public (double SteadyFlux, double Intercept) LeftFluxTerms()
    {
        var steady = _conductance[0] * (Final[1] - Final[0]);
        var intercept = (_conductance[0] * (Offset[1] - Offset[0]))
            - (_capacity[0] / 6 * Final[1])
            - (_capacity[0] / 3 * Final[0])
            + (_initialMass[0] / 2);
        return (steady, intercept);
    }

    // A bath or a removing compartment fixes the long-time level of u.
    private static bool Anchors(FaceLaw face) => face.Condition is BathFace || face.RemovalRate > 0;

    private static void AddFace(FaceLaw face, int node, Complex[] shunt, double[] diagonal1, Complex[] r1, double[] r0)
    {
        switch (face.Condition)
        {
            case BathFace when face.IsFixedValue:
                break;
            case BathFace:
                shunt[node] += 1 / face.FilmResistance;
                r1[node] += face.MediumValue / face.FilmResistance;
                break;
            case CompartmentFace:
                // Y(s) = C (s + k) / (1 + R C (s + k)) = Y0 + s Y1; source C u_c0 / (1 + R C (s + k)) = S0 + O(s).
                var denominator = 1 + (face.FilmResistance * face.Capacity * face.RemovalRate);
                shunt[node] += face.Capacity * face.RemovalRate / denominator;
                diagonal1[node] += face.Capacity / (denominator * denominator);
                r0[node] += face.Capacity * face.MediumValue / denominator;
                break;
        }
    }
}
