namespace Layers.Core.FoodContact;

/// <summary>One row of the polymer table of the upper-bound diffusion correlation.</summary>
/// <param name="Name">Short name used in case files (e.g. "LDPE").</param>
/// <param name="Aliases">Other names accepted in case files.</param>
/// <param name="APrime">A_P', dimensionless.</param>
/// <param name="TauKelvin">tau, K.</param>
/// <param name="Source">Where the constants come from.</param>
/// <param name="Verified">False when the constants were written from memory and not checked against the source.</param>
public sealed record PolymerConstants(
    string Name,
    IReadOnlyList<string> Aliases,
    double APrime,
    double TauKelvin,
    string Source,
    bool Verified);
