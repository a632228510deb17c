using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// The discrete model of a case, built once: the case it stands for, its mesh, its system Cap du/dt = s - A u (with
/// the face models and the node map c = K u) and the initial state u(0). What observes a run reads these from here.
/// </summary>
public sealed class DiscreteModel
{
    private DiscreteModel(SimulationCase simulation, DiffusionSystem system, double[] initialState)
    {
        Case = simulation;
        System = system;
        InitialState = initialState;
    }

    /// <summary>The case the model was built from.</summary>
    public SimulationCase Case { get; }

    /// <summary>The mesh of the stack.</summary>
    public Grid Grid => System.Grid;

    /// <summary>The assembled system.</summary>
    public DiffusionSystem System { get; }

    /// <summary>The initial state u(0), by node; readers that keep it copy it.</summary>
    public double[] InitialState { get; }

    /// <summary>Builds the mesh of a case (<see cref="GridBuilder"/>) and its system (<see cref="DiffusionSystemBuilder"/>).</summary>
    public static DiscreteModel Build(SimulationCase simulation)
    {
        ArgumentNullException.ThrowIfNull(simulation);
        var (system, initial) = DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation));
        return new DiscreteModel(simulation, system, initial);
    }
}
