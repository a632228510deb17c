using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Laplace;
using Layers.Core.Results;
using Layers.Core.Simulation;

namespace Layers.Core.Verification;

/// <summary>
/// The analytic benchmarks the tool runs on itself (<c>layers verify</c>), each at the fixed numerics
/// <see cref="BenchmarkNumerics"/> against a published solution. The same solutions check the solver in the test suite.
/// </summary>
public static class VerificationSuite
{
    /// <summary>Relative tolerance of every benchmark: the accuracy the tool promises at its defaults.</summary>
    public const double DefaultTolerance = 1e-3;

    private const string Crank = "Crank, The Mathematics of Diffusion, 2nd ed. (1975)";

    /// <summary>Runs every benchmark, in a fixed order.</summary>
    public static IReadOnlyList<BenchmarkResult> Run(CancellationToken cancellation = default)
    {
        var results = new List<BenchmarkResult>();
        foreach (var pass in new[] { FiniteVolumes, Exact })
        {
            results.AddRange(PlaneSheet(pass, cancellation));
            foreach (var (alpha, k) in new[] { (0.1, 1000.0), (1.0, 1.0), (10.0, 1.0) })
            {
                results.Add(LimitedVolume(pass, alpha, k, cancellation));
            }

            results.AddRange(Membrane(pass, cancellation));
            results.Add(SemiInfiniteMedia(pass, cancellation));
            results.Add(SteadyThreeLayers(pass, cancellation));
            results.Add(ClosedEquilibrium(pass, cancellation));
            results.Add(Laminate(pass, cancellation));
            if (pass == FiniteVolumes)
            {
                results.AddRange(MultiLayerStacks(cancellation));
                results.Add(RenewedVolume(cancellation));
                results.Add(NewPortion(cancellation));
                results.Add(DonorSteps(cancellation));
            }
        }

        return results;
    }

    private static IEnumerable<BenchmarkResult> PlaneSheet(Pass pass, CancellationToken cancellation)
    {
        const double thickness = 100e-6, diffusivity = 1e-13, c0 = 900;
        var scale = thickness * thickness / diffusivity;
        var result = Simulator.Run(Case(pass, new ClosedFace(), new BathFace("sink", 0, 1, null), 0.5 * scale, [Layer("sheet", thickness, diffusivity, 1, c0)]), cancellation);
        double Released(StateSample sample) => sample.Right!.TransferredIntoMediumPerArea / (c0 * thickness);
        var curve = Curve(result, "D t / L^2 [-]", "M_t / M_0 [-]", scale, Released, t => PlaneSheetIntoSink.FractionReleased(diffusivity, thickness, t));
        yield return new BenchmarkResult(
            "plane sheet into a perfect sink" + pass.Suffix, $"{Crank}, eq. 4.18", "fraction released at D t/L^2 = 0.5",
            PlaneSheetIntoSink.FractionReleased(diffusivity, thickness, 0.5 * scale), Released(result.Reports[^1].Sample), pass.Tolerance, curve);
        var half = Bisect(t => PlaneSheetIntoSink.FractionReleased(diffusivity, thickness, t) - 0.5, 0, scale);
        yield return new BenchmarkResult(
            "plane sheet into a perfect sink" + pass.Suffix, $"{Crank}, eq. 4.18 solved for 50 %", "time to release half, s",
            half, result.FinalState.System.Half!.Value, pass.Tolerance);
    }

    private static BenchmarkResult LimitedVolume(Pass pass, double alpha, double kSheet, CancellationToken cancellation)
    {
        const double thickness = 50e-6, diffusivity = 4e-14, c0 = 920;
        var volumePerArea = alpha * kSheet * thickness;
        var scale = thickness * thickness / diffusivity;
        var simulation = Case(pass, new ClosedFace(), new CompartmentFace("solution", volumePerArea, 1, 1, 0, null), 0.3 * scale, [Layer("sheet", thickness, diffusivity, kSheet, c0)]);
        var result = Simulator.Run(simulation, cancellation);
        double Analytic(double t) => PlaneSheetIntoLimitedVolume.TransferredMassPerArea(diffusivity, thickness, c0, volumePerArea, kSheet, t);
        var curve = Curve(result, "D t / L^2 [-]", "mass in solution [kg/m2]", scale, sample => sample.Right!.TransferredIntoMediumPerArea, Analytic);
        return new BenchmarkResult(
            FormattableString.Invariant($"plane sheet in a limited volume, alpha {alpha}, K {kSheet}") + pass.Suffix,
            $"{Crank}, eq. 4.37 (from memory), roots of tan q = -alpha q",
            "mass in the solution at D t/L^2 = 0.3, kg/m2",
            Analytic(0.3 * scale), result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea, pass.Tolerance, curve);
    }

    /// <summary>
    /// A sheet into a limited volume replaced by fresh solution after every contact (a schedule's renewals; finite
    /// volumes only, as the exact method does not take renewals): the third contact against the eigenfunction expansion
    /// restarted from the profile each contact leaves.
    /// </summary>
    private static BenchmarkResult RenewedVolume(CancellationToken cancellation)
    {
        const double thickness = 50e-6, diffusivity = 4e-14, c0 = 920, alpha = 0.5, contacts = 3;
        var volumePerArea = alpha * thickness;
        var contact = 0.2 * thickness * thickness / diffusivity;
        var periods = Enumerable.Range(0, (int)contacts)
            .Select(index => new SchedulePeriod("contact", (0, 0), index + 1, (int)contacts, index * contact, contact, [Side.Right]))
            .ToArray();
        var simulation = Case(new ClosedFace(), new CompartmentFace("solution", volumePerArea, 1, 1, 0, null), contacts * contact, [Layer("sheet", thickness, diffusivity, 1, c0)])
            with
            {
                Schedule = new ContactSchedule(periods),
            };
        var result = Simulator.Run(simulation, cancellation);
        var expected = SheetIntoRenewedVolume.AmountPerContact(diffusivity, thickness, c0, volumePerArea, 1, contact, (int)contacts);
        return new BenchmarkResult(
            "plane sheet in a limited volume renewed after each contact, alpha 0.5",
            $"{Crank}, eq. 4.37 (from memory), its eigenfunction expansion restarted at each renewal",
            "mass into the third fresh solution, D T/L^2 = 0.2 per contact, kg/m2",
            expected[^1], result.Schedule!.Periods[^1].Media.Single().ReceivedKgPerSquareMeter, DefaultTolerance);
    }

    /// <summary>
    /// A sheet left in a first limited volume until it is at equilibrium with it (D T/L^2 = 20), then renewed with a
    /// portion of another volume and K (a schedule's renewal with new properties; finite volumes only): the second
    /// contact starts from a uniform sheet, so it is Crank's limited volume again, with the second portion's alpha.
    /// </summary>
    private static BenchmarkResult NewPortion(CancellationToken cancellation)
    {
        const double thickness = 50e-6, diffusivity = 4e-14, c0 = 920, firstVolume = 0.5 * thickness, secondVolume = 3 * thickness, secondK = 2;
        var scale = thickness * thickness / diffusivity;
        var (first, second) = (20 * scale, 0.1 * scale);
        var portion = new CompartmentFace("solution", secondVolume, 1, secondK, 0, null);
        var periods = new[]
        {
            new SchedulePeriod("first portion", (0, 0), 1, 1, 0, first, []),
            new SchedulePeriod("second portion", (1, 0), 1, 1, first, second, [Side.Right]) { NewMedia = new Dictionary<Side, FaceCondition> { [Side.Right] = portion } },
        };
        var simulation = Case(new ClosedFace(), new CompartmentFace("solution", firstVolume, 1, 1, 0, null), first + second, [Layer("sheet", thickness, diffusivity, 1, c0)])
            with
            {
                Schedule = new ContactSchedule(periods),
            };
        var result = Simulator.Run(simulation, cancellation);

        // At equilibrium with the first portion (K 1): c_sheet = c0 L / (L + V/A); Crank's K is c_sheet / c_solution = 1 / K_medium.
        var sheet = c0 * thickness / (thickness + firstVolume);
        var expected = PlaneSheetIntoLimitedVolume.TransferredMassPerArea(diffusivity, thickness, sheet, secondVolume, 1 / secondK, second);
        return new BenchmarkResult(
            "plane sheet renewed with a portion of another volume and K, alpha 6",
            $"{Crank}, eq. 4.37 (from memory), from the sheet at equilibrium with the first portion",
            "mass into the second portion at D T/L^2 = 0.1, kg/m2",
            expected, result.Schedule!.Periods[^1].Media.Single().ReceivedKgPerSquareMeter, DefaultTolerance);
    }

    /// <summary>
    /// A membrane between a sink and a donor bath whose level is raised at D t/L^2 = 0.3 (a schedule's renewal of a
    /// bath; finite volumes only): by the linearity of Fick's law the amount passed is the time-lag solution of the first
    /// level plus that of the step, started when the level changes.
    /// </summary>
    private static BenchmarkResult DonorSteps(CancellationToken cancellation)
    {
        const double thickness = 20e-6, diffusivity = 3e-13, k = 4, low = 5, high = 12;
        var scale = thickness * thickness / diffusivity;
        var (change, end) = (0.3 * scale, 1.5 * scale);
        var periods = new[]
        {
            new SchedulePeriod("low", (0, 0), 1, 1, 0, change, []),
            new SchedulePeriod("high", (1, 0), 1, 1, change, end - change, [Side.Left]) { NewMedia = new Dictionary<Side, FaceCondition> { [Side.Left] = new BathFace("source", high, 1, null) } },
        };
        var simulation = Case(new BathFace("source", low, 1, null), new BathFace("sink", 0, 1, null), end, [Layer("membrane", thickness, diffusivity, k, 0)])
            with
            {
                Schedule = new ContactSchedule(periods),
            };
        var result = Simulator.Run(simulation, cancellation);
        double Analytic(double t) => MembraneTimeLag.CumulativeMassPerArea(diffusivity, thickness, k, low, t)
            + (t > change ? MembraneTimeLag.CumulativeMassPerArea(diffusivity, thickness, k, high - low, t - change) : 0);
        var curve = Curve(result, "D t / L^2 [-]", "Q [kg/m2]", scale, sample => sample.Right!.TransferredIntoMediumPerArea, Analytic);
        return new BenchmarkResult(
            "membrane with a donor raised in steps",
            $"Daynes-Barrer; {Crank}, eq. 4.24a (from memory), the first level plus the step",
            "cumulative amount Q at D t/L^2 = 1.5, kg/m2",
            Analytic(end), result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea, DefaultTolerance, curve);
    }

    private static IEnumerable<BenchmarkResult> Membrane(Pass pass, CancellationToken cancellation)
    {
        const double thickness = 20e-6, diffusivity = 3e-13, k = 4, donor = 5;
        var scale = thickness * thickness / diffusivity;
        var result = Simulator.Run(Case(pass, new BathFace("source", donor, 1, null), new BathFace("sink", 0, 1, null), 2 * scale, [Layer("membrane", thickness, diffusivity, k, 0)]), cancellation);
        double Analytic(double t) => MembraneTimeLag.CumulativeMassPerArea(diffusivity, thickness, k, donor, t);
        var curve = Curve(result, "D t / L^2 [-]", "Q [kg/m2]", scale, sample => sample.Right!.TransferredIntoMediumPerArea, Analytic);
        yield return new BenchmarkResult(
            "membrane between a source and a sink" + pass.Suffix, $"Daynes-Barrer; {Crank}, eq. 4.24a (from memory)", "cumulative amount Q at D t/L^2 = 2, kg/m2",
            Analytic(2 * scale), result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea, pass.Tolerance, curve);
        yield return new BenchmarkResult(
            "membrane between a source and a sink" + pass.Suffix, $"Daynes-Barrer; {Crank}, eq. 4.24c (from memory)", "lag time L^2/(6D), s",
            MembraneTimeLag.LagTimeSeconds(diffusivity, thickness), result.Permeation!.LagTimeSeconds ?? double.NaN, pass.Tolerance);
    }

    private static BenchmarkResult SemiInfiniteMedia(Pass pass, CancellationToken cancellation)
    {
        const double d1 = 1e-13, d2 = 4e-13, k = 5, c0 = 300, thickness = 400e-6;
        var time = Math.Pow(thickness / 8, 2) / d2;
        var result = Simulator.Run(Case(pass, new ClosedFace(), new ClosedFace(), time, [Layer("first", thickness, d1, k, c0), Layer("second", thickness, d2, 1, 0)]), cancellation);
        return new BenchmarkResult(
            "two semi-infinite media with a partition coefficient" + pass.Suffix, $"{Crank}, ch. 3, composite media (section from memory); Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., ch. 2",
            "mass transferred into the second medium, kg/m2",
            TwoSemiInfiniteMedia.MassPerAreaTransferred(d1, d2, k, c0, time), result.Reports[^1].Sample.LayerMassPerArea[1], pass.Tolerance);
    }

    private static BenchmarkResult SteadyThreeLayers(Pass pass, CancellationToken cancellation)
    {
        var layers = new[] { Layer("outer", 30e-6, 2e-12, 0.05, 0), Layer("core", 200e-6, 5e-11, 20, 0), Layer("inner", 10e-6, 1e-13, 3, 0) };
        double kLeft = 1, kRight = 0.5, filmLeft = 2e-6, filmRight = 5e-7, cLeft = 8, cRight = 0.5;
        var total = (1 / (filmLeft * kLeft)) + (1 / (filmRight * kRight)) + layers.Sum(layer => layer.ResistanceSecondsPerMeter);
        var storage = layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient);
        var simulation = Case(pass, new BathFace("left", cLeft, kLeft, filmLeft), new BathFace("right", cRight, kRight, filmRight), 40 * total * storage, layers);
        var result = Simulator.Run(simulation, cancellation);
        return new BenchmarkResult(
            "three layers with films between two baths, steady state" + pass.Suffix,
            $"series-resistance (two-resistance) law; {Crank}, ch. 12 (section from memory); Cussler, Diffusion, 3rd ed., ch. 13",
            "steady flux, kg/(m2 s)",
            ((cLeft / kLeft) - (cRight / kRight)) / total, result.Permeation!.FluxAtEndKgPerSquareMeterSecond, pass.Tolerance);
    }

    private static BenchmarkResult ClosedEquilibrium(Pass pass, CancellationToken cancellation)
    {
        var layers = new[] { Layer("a", 20e-6, 1e-12, 0.01, 0), Layer("b", 60e-6, 3e-13, 1, 500), Layer("c", 5e-6, 1e-14, 100, 20) };
        var compartment = new CompartmentFace("medium", 2e-3, 1, 0.5, 1, null);
        var capacity = layers.Sum(layer => layer.ThicknessMeters * layer.PartitionCoefficient) + (2e-3 * 0.5);
        var mass = layers.Sum(layer => layer.InitialMassPerArea) + compartment.InitialMassPerArea;
        var slowest = layers.Max(layer => layer.ThicknessMeters * layer.ThicknessMeters / layer.DiffusivitySquareMetersPerSecond);
        var result = Simulator.Run(Case(pass, new ClosedFace(), compartment, 40 * slowest, layers), cancellation);
        return new BenchmarkResult(
            "closed system of three layers and a compartment" + pass.Suffix,
            $"partition equilibrium with conservation of mass; {Crank}, eq. 4.37 as t -> infinity (from memory)",
            "compartment concentration at equilibrium, kg/m3",
            0.5 * mass / capacity, result.Reports[^1].Sample.Right!.ConcentrationKgPerCubicMeter, pass.Tolerance);
    }

    private static BenchmarkResult Laminate(Pass pass, CancellationToken cancellation)
    {
        var layers = new[] { Layer("first", 30e-6, 1e-12, 1, 0), Layer("second", 60e-6, 1e-13, 10, 0) };
        var expected = LaminateTimeLag.Seconds(new LayerStack(layers));
        var result = Simulator.Run(Case(pass, new BathFace("source", 1, 1, null), new BathFace("sink", 0, 1, null), 3 * expected, layers), cancellation);
        return new BenchmarkResult(
            "two-layer laminate between a source and a sink" + pass.Suffix,
            "Frisch, J. Phys. Chem. 61 (1957) 93, time-lag integral (from memory); " + Crank + ", ch. 12, laminates",
            "lag time, s",
            expected, result.Permeation!.LagTimeSeconds ?? double.NaN, pass.Tolerance);
    }

    /// <summary>
    /// Multi-layer stacks with partition jumps over decades, each solved both ways: by the finite volumes and by the
    /// exact solution of the stack in the Laplace domain (src/Layers.Core/Laplace), two methods that share nothing but
    /// the case (invented stacks).
    /// </summary>
    private static IEnumerable<BenchmarkResult> MultiLayerStacks(CancellationToken cancellation)
    {
        const string exact = "exact solution in the Laplace domain: transfer matrices of a composite wall (Carslaw and Jaeger, "
            + "Conduction of Heat in Solids, 2nd ed. (1959), ch. 12, from memory) inverted on Talbot's contour (Talbot, "
            + "J. Inst. Maths Applics 23 (1979) 97, from memory)";

        var laminate = Case(
            new ClosedFace(),
            new CompartmentFace("food", 1e-3 / 0.06, 1, 0.2, 0, 1e-6),
            10 * 86400,
            [Layer("print", 12e-6, 5e-14, 2, 0), Layer("adhesive", 3e-6, 2e-12, 1.5, 0), Layer("core", 40e-6, 1e-13, 1, 800), Layer("barrier", 8e-6, 3e-14, 50, 0), Layer("sealant", 25e-6, 8e-14, 1, 0)]);
        var result = Simulator.Run(laminate, cancellation);
        yield return new BenchmarkResult(
            "five-layer laminate into a food compartment with a film, K 0.2 to 50", exact, "amount received by the food at 10 d, kg/m2",
            LaplaceSolution.For(laminate).At(laminate.DurationSeconds).Right!.TransferredIntoMediumPerArea,
            result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea,
            DefaultTolerance);

        var membrane = Case(
            new BathFace("donor", 5, 1, 2e-6),
            new BathFace("receiver", 0, 1, 5e-6),
            6 * 3600,
            [Layer("adhesive", 20e-6, 1e-11, 3, 0), Layer("membrane", 50e-6, 5e-12, 0.1, 0), Layer("backing", 10e-6, 2e-11, 8, 0), Layer("skin", 15e-6, 1e-12, 0.5, 0)]);
        result = Simulator.Run(membrane, cancellation);
        yield return new BenchmarkResult(
            "four layers between a donor and a receiver, films on both faces", exact, "amount received at 6 h, kg/m2",
            LaplaceSolution.For(membrane).At(membrane.DurationSeconds).Right!.TransferredIntoMediumPerArea,
            result.Reports[^1].Sample.Right!.TransferredIntoMediumPerArea,
            DefaultTolerance);

        var plies = Enumerable.Range(0, 10)
            .Select(i => Layer($"ply {i + 1}", 5e-6, i % 2 == 0 ? 1e-13 : 4e-12, i % 2 == 0 ? 1 : 20, i < 2 ? 100 : 0))
            .ToArray();
        var closed = Case(new ClosedFace(), new ClosedFace(), 2 * 86400, plies);
        result = Simulator.Run(closed, cancellation);
        yield return new BenchmarkResult(
            "ten closed plies, K alternating 1 and 20, the first two loaded", exact, "mass per area in the last ply at 2 d, kg/m2",
            LaplaceSolution.For(closed).At(closed.DurationSeconds).LayerMassPerArea[^1],
            result.Reports[^1].Sample.LayerMassPerArea[^1],
            DefaultTolerance);
    }

    private static BenchmarkCurve Curve(SimulationResult result, string xLabel, string yLabel, double timeScale, Func<StateSample, double> computed, Func<double, double> analytic)
    {
        var samples = result.TimeSeries.Where(sample => sample.TimeSeconds > 0).ToArray();
        return new BenchmarkCurve(
            xLabel,
            yLabel,
            samples.Select(sample => sample.TimeSeconds / timeScale).ToArray(),
            samples.Select(computed).ToArray(),
            samples.Select(sample => analytic(sample.TimeSeconds)).ToArray());
    }

    private static double Bisect(Func<double, double> function, double low, double high)
    {
        for (var i = 0; i < 200; i++)
        {
            var middle = 0.5 * (low + high);
            if (function(middle) < 0)
            {
                low = middle;
            }
            else
            {
                high = middle;
            }
        }

        return 0.5 * (low + high);
    }

    private static Layer Layer(string name, double thickness, double diffusivity, double k, double c0)
        => new(name, thickness, diffusivity, k, c0);

    private static SimulationCase Case(FaceCondition left, FaceCondition right, double duration, Layer[] layers) => Case(FiniteVolumes, left, right, duration, layers);

    private static SimulationCase Case(Pass pass, FaceCondition left, FaceCondition right, double duration, Layer[] layers) => new()
    {
        Title = "verification",
        Stack = new LayerStack(layers),
        Left = left,
        Right = right,
        DurationSeconds = duration,
        ReportTimesSeconds = [duration],
        Numerics = pass.Numerics,
    };

    /// <summary>The finite volumes at <see cref="BenchmarkNumerics"/>, held to <see cref="DefaultTolerance"/>.</summary>
    private static Pass FiniteVolumes => new(BenchmarkNumerics, string.Empty, DefaultTolerance);

    /// <summary>
    /// The exact method in the Laplace domain (<c>numerics.method</c> "laplace", what "auto" chooses for these cases),
    /// held to <see cref="ExactTolerance"/>.
    /// </summary>
    private static Pass Exact => new(
        NumericsSettings.Default with { Method = SolutionMethod.Laplace, ErrorControl = ErrorControl.None }, ExactSuffix, ExactTolerance);

    /// <summary>Relative tolerance of the exact method's benchmarks: what issue #19 asks of the method.</summary>
    public const double ExactTolerance = 1e-8;

    /// <summary>What the name of a benchmark solved by the exact method ends with.</summary>
    public const string ExactSuffix = " (exact method)";

    /// <summary>A run of the benchmarks: the numerics, what the names end with, the tolerance.</summary>
    private sealed record Pass(NumericsSettings Numerics, string Suffix, double Tolerance);

    /// <summary>
    /// The numerics every benchmark runs at: 240 shared cells and step tolerance 1e-6, the settings the published
    /// validation page was measured with (until numerics had one default, a case built in code got these silently).
    /// At the default of a case file (accuracy 1e-4) the time to release half into a perfect sink misses 1e-3 (1.4e-3).
    /// </summary>
    public static NumericsSettings BenchmarkNumerics { get; } = NumericsSettings.FixedCells(240, 1e-6);

    /// <summary>
    /// <see cref="BenchmarkNumerics"/> in words ("240 cells, relative step tolerance 1e-6"), taken from the settings
    /// themselves so that the titles of the console table, the report and its plots say what was run.
    /// </summary>
    public static string BenchmarkSettings { get; } = FormattableString.Invariant(
        $"{BenchmarkNumerics.Grid.Match(mesh => $"cells by diffusion length (width {mesh.WidthPerDiffusionLength:G3})", count => $"{count.TotalCells} cells")}, relative step tolerance {BenchmarkNumerics.Solver.RelativeTolerance:0.###e+0}");
}
