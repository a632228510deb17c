namespace Layers.Core.Discretization;

/// <summary>Link from an end node to an unlimited bath.</summary>
/// <param name="Conductance">1 / (half-cell resistance + film resistance), m/s; zero when there is no bath.</param>
/// <param name="BathValue">The bath's value of u = c / K, kg/m3.</param>
public readonly record struct BathCoupling(double Conductance, double BathValue)
{
    /// <summary>No bath: no exchange.</summary>
    public static BathCoupling None => new(0, 0);

    /// <summary>True when a bath is attached.</summary>
    public bool Exists => Conductance > 0;

    /// <summary>Flux from the bath into the end node, kg/m2/s, for the node value u.</summary>
    public double InflowRate(double nodeValue) => Conductance * (BathValue - nodeValue);
}
