namespace Layers.Tests.Architecture;

/// <summary>
/// The declared order of the namespaces of Layers.Core, lowest first: a namespace may use those before it, never
/// one after it. docs/architecture.md lists the same order and says what each layer holds.
/// </summary>
internal static class CoreLayers
{
    public static IReadOnlyList<string> Order { get; } =
    [
        "Units",
        "Files",
        "FoodContact",
        "Domain",
        "Discretization",
        "Analytics",
        "Laplace",
        "TimeStepping",
        "Results",
        "Permeation",
        "Simulation",
        "Cases",
        "Studies",
        "Fitting",
        "Reports",
        "Verification",
        "Batch",
    ];

    /// <summary>The position of a layer in <see cref="Order"/>, or -1 when it is not declared.</summary>
    public static int Rank(string layer)
    {
        for (var index = 0; index < Order.Count; index++)
        {
            if (Order[index] == layer)
            {
                return index;
            }
        }

        return -1;
    }
}
