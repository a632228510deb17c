namespace Layers.Core.Discretization;

/// <summary>
/// The interfacial two-resistance law in the variable u = c / K, which is continuous across every interface.
/// </summary>
/// <remarks>
/// Inside a layer Fick's law reads J = -D dc/dx = -D K du/dx. Between the centre of cell i and the shared face the
/// flux is J = (u_i - u_face) / (h_i / (2 D_i K_i)); the same J leaves the face toward cell j. Eliminating u_face
/// gives J = (u_i - u_j) / R with R = h_i/(2 D_i K_i) + h_j/(2 D_j K_j). Because u (not c) is continuous, the
/// equilibrium jump c_i / c_j = K_i / K_j holds exactly at the face, and the driving force is c_i/K_i - c_j/K_j,
/// i.e. c_A - K c_B in two-medium notation. A liquid film with coefficient k on the side of a medium with partition
/// coefficient K carries J = k (c_bulk - c_surface) = k K (u_bulk - u_surface): one more resistance 1/(k K) in
/// series. The sum of all resistances of a stack is the N-layer form of the two-resistance law.
/// </remarks>
public static class SeriesResistance
{
    /// <summary>Resistance from a cell centre to its face: h / (2 D K), s/m.</summary>
    public static double HalfCell(double widthMeters, double diffusivity, double partitionCoefficient)
        => widthMeters / (2 * diffusivity * partitionCoefficient);

    /// <summary>Resistance of a film: 1 / (k K), s/m; zero when there is no film (perfect mixing).</summary>
    public static double Film(double? filmCoefficientMetersPerSecond, double partitionCoefficient)
        => filmCoefficientMetersPerSecond is { } k ? 1 / (k * partitionCoefficient) : 0;
}
