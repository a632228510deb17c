using Layers.Core.Domain;

namespace Layers.Core.Discretization;

/// <summary>
/// The semi-discrete equations Cap du/dt = -A u + s over a chain of nodes: an optional well-mixed compartment node,
/// the cells of the stack, an optional compartment node at the other end. Per unit contact area throughout.
/// </summary>
/// <remarks>
/// Node n exchanges with node n+1 through the conductance G[n] = 1 / R[n] (see <see cref="SeriesResistance"/>), so
/// A is symmetric tridiagonal with zero row sums apart from bath couplings, which conserves mass exactly.
/// A bath adds G_bath to the diagonal of its end node and G_bath u_bath to s. Storage of a cell is h K, of a
/// compartment (V/A) K.
/// <para>
/// The state is the content of each node divided by its storage, w = (total mass per volume) / K, so Cap w is the
/// mass whatever the node holds. Where the layer has no solubility, or holds less than it, w is the dissolved
/// u = c / K. A layer with a solubility C_s caps the dissolved part, u = min(w, C_s / K), and the rest is undissolved
/// (<see cref="Saturation"/>); fluxes are driven by u, storage by w.
/// </para>
/// </remarks>
public sealed class DiffusionSystem
{
    internal DiffusionSystem(
        Grid grid,
        double[] capacity,
        double[] conductance,
        double[] halfCellResistance,
        double[] partitionCoefficient,
        FaceModel leftFace,
        FaceModel rightFace,
        BathCoupling left,
        BathCoupling right,
        int firstCellNode,
        double[]? saturation = null)
    {
        Saturation = saturation;
        Grid = grid;
        Capacity = capacity;
        Conductance = conductance;
        HalfCellResistance = halfCellResistance;
        PartitionCoefficient = partitionCoefficient;
        Left = leftFace;
        Right = rightFace;
        LeftBath = left;
        RightBath = right;
        FirstCellNode = firstCellNode;
    }

    /// <summary>The mesh of the stack.</summary>
    public Grid Grid { get; }

    /// <summary>Storage per node, m (per unit area): h K for cells, (V/A) K for compartments.</summary>
    public double[] Capacity { get; }

    /// <summary>Conductance between node n and node n+1, m/s. Length = node count - 1.</summary>
    public double[] Conductance { get; }

    /// <summary>
    /// Resistance from the centre of each cell to either of its faces, s/m, by <see cref="SeriesResistance.HalfCell"/>;
    /// indexed by cell (not node). The conductances are built from these, and a face value is reconstructed with them.
    /// </summary>
    public double[] HalfCellResistance { get; }

    /// <summary>
    /// Partition coefficient K of the medium of each node (a cell's layer, or a compartment's liquid), by node; the one
    /// place where the state u = c/K is turned back into a concentration (<see cref="ConcentrationOf"/>).
    /// </summary>
    public double[] PartitionCoefficient { get; }

    /// <summary>The model of the left face: whether it adds a node, its links, its face-value reconstruction.</summary>
    public FaceModel Left { get; }

    /// <summary>The model of the right face: whether it adds a node, its links, its face-value reconstruction.</summary>
    public FaceModel Right { get; }

    /// <summary>The model of the face on a side.</summary>
    public FaceModel Face(Side side) => side == Side.Left ? Left : Right;

    /// <summary>Coupling of the first node to a bath on the left (zero conductance when there is none).</summary>
    public BathCoupling LeftBath { get; }

    /// <summary>Coupling of the last node to a bath on the right (zero conductance when there is none).</summary>
    public BathCoupling RightBath { get; }

    /// <summary>Index of the node of the first cell (1 when a compartment sits on the left, else 0).</summary>
    public int FirstCellNode { get; }

    /// <summary>
    /// u = C_s / K at which each node saturates (+infinity where there is no solubility), or null when no layer has a
    /// solubility: then state and dissolved u are the same everywhere and the linear stepper applies.
    /// </summary>
    public double[]? Saturation { get; }

    /// <summary>
    /// The same system with the links between some neighbouring nodes cut (zero conductance): layers taken off the
    /// stack keep their cells, which then exchange with nothing.
    /// </summary>
    /// <param name="links">Indices n of the links to cut, each between node n and node n + 1.</param>
    internal DiffusionSystem WithLinksCut(IEnumerable<int> links)
    {
        var conductance = (double[])Conductance.Clone();
        foreach (var link in links)
        {
            conductance[link] = 0;
        }

        return new DiffusionSystem(Grid, Capacity, conductance, HalfCellResistance, PartitionCoefficient, Left, Right, LeftBath, RightBath, FirstCellNode, Saturation);
    }

    /// <summary>
    /// The same system with the medium on some faces out of contact: a compartment's link to the stack cut, a bath's
    /// coupling removed. The compartment keeps its node and what it holds.
    /// </summary>
    internal DiffusionSystem WithFacesDetached(IReadOnlyCollection<Side> sides)
    {
        var conductance = (double[])Conductance.Clone();
        var leftBath = LeftBath;
        var rightBath = RightBath;
        foreach (var side in sides)
        {
            if (Face(side).AddsNode)
            {
                conductance[side == Side.Left ? 0 : conductance.Length - 1] = 0;
            }
            else if (side == Side.Left)
            {
                leftBath = BathCoupling.None;
            }
            else
            {
                rightBath = BathCoupling.None;
            }
        }

        return new DiffusionSystem(Grid, Capacity, conductance, HalfCellResistance, PartitionCoefficient, Left, Right, leftBath, rightBath, FirstCellNode, Saturation);
    }

    /// <summary>Number of unknowns.</summary>
    public int NodeCount => Capacity.Length;

    /// <summary>Node index of the node a face adds on a side (a compartment), or -1 when that side adds none.</summary>
    public int CompartmentNode(Side side)
    {
        if (!Face(side).AddsNode)
        {
            return -1;
        }

        return side == Side.Left ? 0 : NodeCount - 1;
    }

    /// <summary>
    /// Rate of change of stored mass at every node, r = s - A u (kg/m2/s), written into <paramref name="rate"/>.
    /// </summary>
    public void Residual(ReadOnlySpan<double> u, Span<double> rate)
    {
        ReadOnlySpan<double> conductance = Conductance;
        var count = conductance.Length + 1;
        var values = u[..count];
        var rates = rate[..count];
        var inflow = LeftBath.InflowRate(values[0]);
        for (var n = 0; n < count - 1; n++)
        {
            var flux = conductance[n] * (values[n] - values[n + 1]);
            rates[n] = inflow - flux;
            inflow = flux;
        }

        rates[count - 1] = inflow + RightBath.InflowRate(values[count - 1]);
    }

    /// <summary>
    /// Flux from the stack across a face into its medium, kg/(m2 s), positive into the medium, for a state u: the rate
    /// of the face's link in <see cref="Residual"/> (to a compartment's node, or to a bath), so that its time integral
    /// is what the mass balance counts as transferred. A compartment's first-order removal is a link beyond its node,
    /// not part of this flux. Zero for a closed face.
    /// </summary>
    /// <param name="side">The face.</param>
    /// <param name="state">u at every node (w where a layer has a solubility: the dissolved part drives the flux).</param>
    public double FluxIntoMedium(Side side, ReadOnlySpan<double> state)
    {
        var last = NodeCount - 1;
        if (Face(side).AddsNode)
        {
            return side == Side.Left
                ? Conductance[0] * (Dissolved(1, state[1]) - Dissolved(0, state[0]))
                : Conductance[last - 1] * (Dissolved(last - 1, state[last - 1]) - Dissolved(last, state[last]));
        }

        // 0 - x rather than -x, so that no exchange reads 0, not -0, in the files.
        return side == Side.Left
            ? 0 - LeftBath.InflowRate(Dissolved(0, state[0]))
            : 0 - RightBath.InflowRate(Dissolved(last, state[last]));
    }

    /// <summary>Concentration c = K u in the medium of a node for a value u of the continuous variable, kg/m3.</summary>
    public double ConcentrationOf(int node, double u) => PartitionCoefficient[node] * u;

    /// <summary>
    /// Conductance from node n towards its left: to node n-1, or to the left bath (zero when there is none) for the
    /// first node, m/s.
    /// </summary>
    public double ConductanceToLeft(int n) => n > 0 ? Conductance[n - 1] : LeftBath.Conductance;

    /// <summary>
    /// Conductance from node n towards its right: to node n+1, or to the right bath (zero when there is none) for the
    /// last node, m/s.
    /// </summary>
    public double ConductanceToRight(int n) => n < NodeCount - 1 ? Conductance[n] : RightBath.Conductance;

    /// <summary>The dissolved u = min(w, saturation) of a node whose state is w.</summary>
    public double Dissolved(int node, double state) => Saturation is { } cap ? Math.Min(state, cap[node]) : state;

    /// <summary>Mass per unit area held by all nodes for a state u, kg/m2.</summary>
    public double TotalMass(ReadOnlySpan<double> u) => Mass(u, 0, NodeCount);

    /// <summary>Mass per unit area held by <paramref name="count"/> nodes from <paramref name="firstNode"/> on, kg/m2.</summary>
    public double Mass(ReadOnlySpan<double> u, int firstNode, int count)
    {
        // Asked at every output: two partial sums, so that the additions do not wait on one another.
        ReadOnlySpan<double> capacity = Capacity.AsSpan(firstNode, count);
        var values = u.Slice(firstNode, count);
        double even = 0, odd = 0;
        var n = 0;
        for (; n + 1 < count; n += 2)
        {
            even += capacity[n] * values[n];
            odd += capacity[n + 1] * values[n + 1];
        }

        return n < count ? even + odd + (capacity[n] * values[n]) : even + odd;
    }
}
