namespace Layers.Core.Units;

/// <summary>
/// The physical dimension of a quantity. Each dimension has exactly one SI unit, and every
/// <see cref="UnitDefinition"/> converts to that unit, so numerics never see anything but SI.
/// </summary>
public enum Dimension
{
    /// <summary>A plain number without unit (partition coefficients, ratios); never written with a symbol.</summary>
    Dimensionless,

    /// <summary>Length; SI unit m.</summary>
    Length,

    /// <summary>Area; SI unit m2.</summary>
    Area,

    /// <summary>Volume; SI unit m3.</summary>
    Volume,

    /// <summary>Time; SI unit s.</summary>
    Time,

    /// <summary>Mass; SI unit kg.</summary>
    Mass,

    /// <summary>Diffusion coefficient (area per time); SI unit m2/s.</summary>
    Diffusivity,

    /// <summary>Mass per volume, also used for densities; SI unit kg/m3.</summary>
    MassConcentration,

    /// <summary>Mass per mass (mg/kg, ppm, % w/w); SI unit kg/kg.</summary>
    MassFraction,

    /// <summary>Length per time, used for film mass-transfer and permeability coefficients; SI unit m/s.</summary>
    Velocity,

    /// <summary>Mass per area, e.g. specific migration per contact area; SI unit kg/m2.</summary>
    MassPerArea,

    /// <summary>Mass per area per time; SI unit kg/(m2 s).</summary>
    MassFlux,

    /// <summary>Thermodynamic temperature; SI unit K.</summary>
    Temperature,

    /// <summary>Energy per amount of substance, e.g. activation energies; SI unit J/mol.</summary>
    MolarEnergy,
}
