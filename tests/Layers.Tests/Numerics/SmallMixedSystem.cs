using Layers.Core.Discretization;
using Layers.Core.Domain;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Numerics;

/// <summary>
/// A small assembled system with everything that enters a row (a bath with a film, two layers with a partition jump,
/// a compartment), for checks against dense linear algebra. Invented values, chosen only to make every term differ.
/// </summary>
internal static class SmallMixedSystem
{
    public static DiffusionSystem Build()
    {
        var simulation = Cases.Make(
            Cases.Bath(3, k: 0.2, film: 1e-6),
            Cases.Compartment(1e-3, k: 7),
            100,
            numerics: new NumericsSettings(new CellCountMesh(12) { MinimumCellsPerLayer = 4 }, new SolverOptions { RelativeTolerance = 1e-6 }),
            layers: [Cases.Layer("a", 1e-5, 1e-12, k: 0.3), Cases.Layer("b", 3e-5, 1e-13, k: 30)]);
        return DiffusionSystemBuilder.Build(simulation, GridBuilder.Build(simulation)).System;
    }
}
