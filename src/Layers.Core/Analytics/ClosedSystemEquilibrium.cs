using Layers.Core.Domain;

namespace Layers.Core.Analytics;

/// <summary>
/// Equilibrium of a closed system (faces closed or finite compartments): u = c / K is uniform, and one mass balance
/// fixes it, u_eq = (sum of initial masses) / (sum of capacities), with capacity h K for a layer and (V/A) K for a
/// compartment; then c_eq = K u_eq in every medium. This is the N-medium form of the partition equilibrium
/// c_A = K c_B with conservation of mass (Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.37 (from memory), the limit
/// t -> infinity of the limited-volume problem, generalised to many media).
/// A layer with a solubility caps u at C_s / K: when the mass exceeds what the system holds dissolved at the lowest
/// cap, u settles at that cap and the excess stays undissolved in the layer (or layers) with the lowest cap, whose
/// solid fixes the chemical potential everywhere.
/// </summary>
public sealed record ClosedSystemEquilibrium(double ContinuousVariable)
{
    /// <summary>Computes the equilibrium of a closed case.</summary>
    /// <exception cref="ArgumentException">When a face is a bath (the system is open).</exception>
    public static ClosedSystemEquilibrium Of(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var mass = simulation.Stack.InitialMassPerArea
            + new[] { simulation.Left, simulation.Right }.Sum(face => face.InitialMassPerArea);
        return Of(simulation, mass);
    }

    /// <summary>
    /// The equilibrium of a closed case that holds <paramref name="massPerArea"/> rather than its initial mass: the
    /// state it settles to once nothing more is taken out (after the last sample of a sampled compartment).
    /// </summary>
    /// <param name="simulation">A closed case.</param>
    /// <param name="massPerArea">Mass per contact area in the whole system, kg/m2.</param>
    /// <exception cref="ArgumentException">When a face is a bath (the system is open).</exception>
    public static ClosedSystemEquilibrium Of(SimulationCase simulation, double massPerArea)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        if (!simulation.IsClosed)
        {
            throw new ArgumentException("A case with a bath is open; use SteadyStateStack.", nameof(simulation));
        }

        var mass = massPerArea;
        var capacity = simulation.Stack.Layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient)
            + new[] { simulation.Left, simulation.Right }.OfType<CompartmentFace>().Sum(compartment => compartment.VolumePerAreaMeters * compartment.PartitionCoefficient);

        var lowestCap = simulation.Stack.Layers.Min(layer => layer.SaturationContinuousVariable);
        return new ClosedSystemEquilibrium(Math.Min(mass / capacity, lowestCap))
        {
            UndissolvedPerArea = Math.Max(0, mass - (capacity * lowestCap)),
        };
    }

    /// <summary>Mass per area left undissolved at equilibrium, kg/m2 (zero unless the lowest solubility cap is reached).</summary>
    public double UndissolvedPerArea { get; init; }

    /// <summary>Equilibrium concentration in a medium with partition coefficient K, kg/m3.</summary>
    public double ConcentrationIn(double partitionCoefficient) => partitionCoefficient * ContinuousVariable;
}
