using Layers.Core.Domain;
using MathNet.Numerics.RootFinding;

namespace Layers.Tests.TestSupport;

/// <summary>
/// The cases and closed forms of the read-off checks (a time to a fraction, a lag time, a value on a closed face),
/// each series summed here from its published form, and the check of a value relative to its own size.
/// </summary>
internal static class ReadOffReferences
{
    public const double Thickness = 100e-6;
    public const double Diffusivity = 1e-13;
    public const double InitialConcentration = 900;
    public const double MembraneOverDonor = 4;
    public const double Donor = 5;

    /// <summary>L^2 / D, s.</summary>
    public static double TimeScale => Thickness * Thickness / Diffusivity;

    /// <summary>A loaded sheet, closed on the left, releasing into a perfect sink on the right.</summary>
    public static SimulationCase ReleasingSheet(NumericsSettings numerics, double duration) => Cases.Make(
        Cases.Closed,
        Cases.Bath(0),
        duration,
        numerics: numerics,
        layers: Cases.Layer("sheet", Thickness, Diffusivity, c0: InitialConcentration));

    /// <summary>An empty membrane between a constant source and a perfect sink, run for three times L^2 / D.</summary>
    public static SimulationCase Membrane(NumericsSettings numerics) => Cases.Make(
        Cases.Bath(Donor, MembraneOverDonor),
        Cases.Bath(0),
        3 * TimeScale,
        numerics: numerics,
        layers: Cases.Layer("membrane", Thickness, Diffusivity, MembraneOverDonor));

    /// <summary>
    /// Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 4.3, eq. 4.18 (from memory), sheet of thickness 2L with
    /// both faces at zero (its half with a closed face here): M_t / M_inf = 1 - sum 8 / ((2n+1)^2 pi^2)
    /// exp(-D (2n+1)^2 pi^2 t / (4 L^2)), solved for the time at which it equals <paramref name="fraction"/>, s.
    /// </summary>
    public static double TimeToReleasedFraction(double fraction)
        => TimeScale * Brent.FindRoot(tau => ReleasedFraction(tau) - fraction, 1e-3, 10, 1e-14, 200);

    /// <summary>
    /// Crank (1975), ch. 4.3, eq. 4.17 (from memory) at the centre of the sheet of thickness 2L (the closed face here):
    /// c / c0 = (4 / pi) sum (-1)^n / (2n+1) exp(-D (2n+1)^2 pi^2 t / (4 L^2)), kg/m3.
    /// </summary>
    public static double ClosedFaceConcentration(double timeSeconds)
    {
        var tau = timeSeconds / TimeScale;
        var sum = 0.0;
        for (var n = 0; n < 200; n++)
        {
            var m = (2 * n) + 1;
            sum += (n % 2 == 0 ? 1 : -1) / (double)m * Math.Exp(-m * m * Math.PI * Math.PI * tau / 4);
        }

        return InitialConcentration * 4 / Math.PI * sum;
    }

    /// <summary>Daynes (1920) and Barrer (1939) as given by Crank (1975), ch. 4.3, eq. 4.24c (from memory): L^2 / (6 D), s.</summary>
    public static double MembraneLagSeconds => Thickness * Thickness / (6 * Diffusivity);

    /// <summary>K of the first of two semi-infinite media in contact (the second has 1).</summary>
    public const double ContactPartition = 5;

    private const double ContactThickness = 400e-6;
    private const double FirstDiffusivity = 1e-13;
    private const double SecondDiffusivity = 4e-13;
    private const double ContactInitial = 300;

    /// <summary>
    /// Two media in contact, the first loaded, both closed outside, run until L / (2 sqrt(D t)) = 4 in the faster one:
    /// erfc(4) ~ 1.5e-8, so both are semi-infinite.
    /// </summary>
    public static SimulationCase SemiInfiniteContact(NumericsSettings numerics) => Cases.Make(
        Cases.Closed,
        Cases.Closed,
        Math.Pow(ContactThickness / 8, 2) / SecondDiffusivity,
        numerics: numerics,
        layers: [Cases.Layer("first", ContactThickness, FirstDiffusivity, ContactPartition, ContactInitial), Cases.Layer("second", ContactThickness, SecondDiffusivity, 1)]);

    /// <summary>
    /// Crank (1975), ch. 3, composite media (section from memory); Carslaw and Jaeger, Conduction of Heat in Solids,
    /// 2nd ed. (1959), ch. 2.15: c/K is continuous and constant at the contact for t &gt; 0, weighted by K sqrt(D):
    /// c/K = (c0 / K_1) K_1 sqrt(D_1) / (K_1 sqrt(D_1) + K_2 sqrt(D_2)), kg/m3 (c on the second side, K_2 = 1).
    /// </summary>
    public static double ContactValue
        => ContactInitial * Math.Sqrt(FirstDiffusivity) / ((ContactPartition * Math.Sqrt(FirstDiffusivity)) + Math.Sqrt(SecondDiffusivity));

    /// <summary>|value - exact| &lt;= accuracy x |exact|.</summary>
    public static void AssertRelative(double exact, double simulated, double accuracy, string what)
    {
        var error = Math.Abs(simulated - exact) / Math.Abs(exact);
        Assert.True(error <= accuracy, $"{what} at accuracy {accuracy:E0}: {simulated} vs {exact}, relative error {error:E2}");
    }

    private static double ReleasedFraction(double tau)
    {
        var remaining = 0.0;
        for (var n = 0; n < 200; n++)
        {
            var m = (2 * n) + 1;
            remaining += 8 / (m * m * Math.PI * Math.PI) * Math.Exp(-m * m * Math.PI * Math.PI * tau / 4);
        }

        return 1 - remaining;
    }
}
