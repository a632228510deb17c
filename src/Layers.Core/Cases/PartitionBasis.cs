namespace Layers.Core.Cases;

/// <summary>The basis on which a case states its partition coefficients.</summary>
public enum PartitionBasis
{
    /// <summary>K = c_medium / c_reference with concentrations in mass per volume (the solver's own basis).</summary>
    Volume,

    /// <summary>K = w_medium / w_reference with mass fractions; converted with K_volume = K_mass rho_medium / rho_reference.</summary>
    Mass,
}
