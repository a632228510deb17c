namespace Layers.Core.Analytics;

/// <summary>
/// A plane sheet releasing into a well-stirred solution of limited volume that is replaced by fresh solution at the
/// end of every contact of equal length: what each contact takes. The first contact is Crank's sheet into a limited
/// volume (<see cref="PlaneSheetIntoLimitedVolume"/>); each later one is the same problem restarted from the profile
/// the previous contact left in the sheet, with the solution free of solute again.
/// </summary>
/// <remarks>
/// <para>
/// With u = c_sheet / K = c_solution at the face, the sheet and the solution form one Sturm-Liouville problem whose
/// eigenvalue also appears in the boundary condition: phi_n(x) = cos(q_n x / L), the solution's value phi_n(L), with
/// q_0 = 0 and q_n the roots of tan q = -alpha q, alpha = (V/A) / (K L) (Crank 1975, The Mathematics of Diffusion, 2nd
/// ed., ch. 4, eq. 4.37 and its derivation, from memory). The modes are orthogonal in the product that weighs each part
/// by its storage, (f, g) = integral of K f g dx + (V/A) f(L) g(L), so any start, a profile in the sheet and a
/// solution's concentration, expands as u = sum a_n phi_n exp(-q_n^2 D t / L^2) with a_n = (start, phi_n) / N_n,
/// N_n = (phi_n, phi_n) (the standard expansion of such a problem; Carslaw and Jaeger, Conduction of Heat in Solids,
/// 2nd ed. 1959, section 3.11, from memory).
/// </para>
/// <para>
/// A renewal keeps the sheet's profile and empties the solution, so the new coefficients are
/// a'_n = sum_m a_m e_m S_mn / N_n with e_m = exp(-q_m^2 D T / L^2) and S_mn the sheet's part of the product of two
/// modes: by orthogonality S_mn = -(V/A) cos q_m cos q_n for m != n, and S_nn = N_n - (V/A) cos^2 q_n, in closed form.
/// The solution then holds (V/A) u(L) = (V/A) sum a_n e_n cos q_n at the contact's end.
/// </para>
/// <para>
/// The series is cut after <see cref="Modes"/> roots. Mode n decays by exp(-q_n^2 D T / L^2) over a contact, so for
/// D T / L^2 &gt;= 0.01 the modes left out hold less than exp(-(Modes pi)^2 / 100), far below 1e-16, at every contact's
/// end; shorter contacts are refused.
/// </para>
/// </remarks>
public static class SheetIntoRenewedVolume
{
    /// <summary>Roots kept (besides q_0 = 0).</summary>
    public const int Modes = 200;

    /// <summary>Mass per unit face area each contact puts into its fresh solution, kg/m2, in order.</summary>
    /// <param name="diffusivity">Diffusion coefficient D in the sheet, m2/s.</param>
    /// <param name="thicknessMeters">Sheet thickness L, m (the face x = 0 is impermeable).</param>
    /// <param name="initialConcentration">Uniform initial concentration C0 in the sheet, kg/m3.</param>
    /// <param name="solutionVolumePerArea">Solution volume per unit face area V/A, m.</param>
    /// <param name="partitionCoefficient">K = c_sheet / c_solution at equilibrium.</param>
    /// <param name="contactSeconds">Length T of every contact, s, with D T / L^2 &gt;= 0.01.</param>
    /// <param name="contacts">How many contacts, one or more.</param>
    public static double[] AmountPerContact(
        double diffusivity,
        double thicknessMeters,
        double initialConcentration,
        double solutionVolumePerArea,
        double partitionCoefficient,
        double contactSeconds,
        int contacts)
    {
        AnalyticArguments.RequirePositive(diffusivity);
        AnalyticArguments.RequirePositive(thicknessMeters);
        AnalyticArguments.RequireNonNegative(initialConcentration);
        AnalyticArguments.RequirePositive(solutionVolumePerArea);
        AnalyticArguments.RequirePositive(partitionCoefficient);
        ArgumentOutOfRangeException.ThrowIfLessThan(contacts, 1);
        var tau = diffusivity * contactSeconds / (thicknessMeters * thicknessMeters);
        ArgumentOutOfRangeException.ThrowIfLessThan(tau, 0.01, nameof(contactSeconds));

        var solution = solutionVolumePerArea;
        var sheetStorage = partitionCoefficient * thicknessMeters;
        var q = new double[Modes + 1];
        PlaneSheetIntoLimitedVolume.Roots(solution / sheetStorage, Modes).CopyTo(q, 1);
        var cos = q.Select(Math.Cos).ToArray();
        var norm = new double[q.Length];
        var decay = new double[q.Length];
        var a = new double[q.Length];
        norm[0] = sheetStorage + solution;
        a[0] = initialConcentration * thicknessMeters / norm[0];
        decay[0] = 1;
        for (var n = 1; n < q.Length; n++)
        {
            norm[n] = (sheetStorage / 2 * (1 + (Math.Sin(2 * q[n]) / (2 * q[n])))) + (solution * cos[n] * cos[n]);

            // (start, phi_n) with u = C0 / K in the sheet and nothing in the solution: K (C0 / K) (L / q_n) sin q_n.
            a[n] = initialConcentration * thicknessMeters / q[n] * Math.Sin(q[n]) / norm[n];
            decay[n] = Math.Exp(-q[n] * q[n] * tau);
        }

        var amounts = new double[contacts];
        for (var contact = 0; contact < contacts; contact++)
        {
            var atEnd = a.Select((value, n) => value * decay[n]).ToArray();
            amounts[contact] = solution * atEnd.Select((value, n) => value * cos[n]).Sum();

            // Renewal: the sheet's part of each mode carries over, the solution's is emptied.
            var weighted = atEnd.Select((value, m) => value * cos[m]).Sum();
            for (var n = 0; n < q.Length; n++)
            {
                var crossTerms = -solution * cos[n] * (weighted - (atEnd[n] * cos[n]));
                a[n] = (crossTerms + (atEnd[n] * (norm[n] - (solution * cos[n] * cos[n])))) / norm[n];
            }
        }

        return amounts;
    }
}
