namespace Layers.Core.Results;

/// <summary>What a key figure measures, which sets the floor below which it counts as negligible.</summary>
public enum FigureKind
{
    /// <summary>A mass per area, kg/m2: in a layer, received by a medium.</summary>
    Amount,

    /// <summary>A concentration, kg/m3 (or a mass fraction in a food, kg/kg).</summary>
    Concentration,

    /// <summary>A flux, kg/(m2 s).</summary>
    Flux,

    /// <summary>A time, s: never negligible.</summary>
    Time,
}
