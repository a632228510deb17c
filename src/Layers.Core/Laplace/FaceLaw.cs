using System.Numerics;
using Layers.Core.Domain;

namespace Layers.Core.Laplace;

/// <summary>
/// What one face medium imposes on the transformed u at the face, in one of two forms: a fixed value
/// (a bath without film: u = u_bath / s) or a linear law F_in = Y (g - u) for the flux F_in from the medium into the
/// stack, written as F_in = Source - Y u with Source = Y g (closed face: Y = 0; bath behind a film; compartment).
/// </summary>
/// <remarks>
/// A compartment of capacity C = (V/A) K_c, initial u_c0, film resistance R = 1/(k K_c) and removal rate lambda obeys
/// C du_c/dt = -F_in - lambda C u_c and u_c = u + R F_in; transformed, u_c = (C u_c0 - F_in) / (C (s + lambda)), so
/// F_in = Y (u_c0/(s + lambda) - u) with Y = C (s + lambda) / (1 + R C (s + lambda)).
/// </remarks>
internal sealed class FaceLaw
{
    private FaceLaw(FaceCondition condition)
    {
        Condition = condition;
    }

    /// <summary>The face condition of the case.</summary>
    public FaceCondition Condition { get; }

    /// <summary>True for a bath without film: the face value is fixed.</summary>
    public bool IsFixedValue => Condition is BathFace { FilmCoefficientMetersPerSecond: null };

    /// <summary>Film resistance 1/(k K) of a bath or compartment, s/m; zero without film.</summary>
    public double FilmResistance { get; private init; }

    /// <summary>Capacity (V/A) K of a compartment, m; zero otherwise.</summary>
    public double Capacity { get; private init; }

    /// <summary>Initial u of a compartment; the bath's u for a bath.</summary>
    public double MediumValue { get; private init; }

    /// <summary>First-order removal rate of a compartment, 1/s.</summary>
    public double RemovalRate { get; private init; }

    public static FaceLaw For(FaceCondition condition) => condition switch
    {
        ClosedFace => new FaceLaw(condition),
        BathFace bath => new FaceLaw(condition)
        {
            FilmResistance = Film(bath.FilmCoefficientMetersPerSecond, bath.PartitionCoefficient),
            MediumValue = bath.ContinuousVariable,
        },
        CompartmentFace compartment => new FaceLaw(condition)
        {
            FilmResistance = Film(compartment.FilmCoefficientMetersPerSecond, compartment.PartitionCoefficient),
            Capacity = compartment.VolumePerAreaMeters * compartment.PartitionCoefficient,
            MediumValue = compartment.InitialConcentrationKgPerCubicMeter / compartment.PartitionCoefficient,
            RemovalRate = compartment.RemovalRatePerSecond,
        },
        _ => throw new ArgumentException($"Unknown face kind {condition.KindName}.", nameof(condition)),
    };

    /// <summary>
    /// The admittance Y(s), m/s, and the source Y(s) g(s), the flux the medium would give a face held at u = 0,
    /// transformed; given 1/s, with one complex division for a compartment.
    /// </summary>
    public (Complex Admittance, Complex Source) AdmittanceAndSource(Complex s, Complex inverseS)
    {
        switch (Condition)
        {
            case BathFace:
                var conductance = 1 / FilmResistance;
                return (conductance, conductance * MediumValue * inverseS);
            case CompartmentFace:
                var shifted = s + RemovalRate;
                var share = Capacity / (1 + (FilmResistance * Capacity * shifted));
                return (share * shifted, share * MediumValue);
            default:
                return (Complex.Zero, Complex.Zero);
        }
    }

    // The film law of the finite volumes, J = k K (u_bulk - u_surface): a resistance 1/(k K) in series.
    private static double Film(double? filmCoefficient, double partitionCoefficient)
        => filmCoefficient is { } k ? 1 / (k * partitionCoefficient) : 0;
}
