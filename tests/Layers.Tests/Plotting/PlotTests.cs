using System.Reflection;
using Layers.Core.Results;
using Layers.Plotting;

namespace Layers.Tests.Plotting;

/// <summary>
/// Every plot of the demo case and of a permeation case is produced, is a PNG of the requested size, and is not
/// blank. These are checks of the output's form (common practice, no source): what a plot shows is judged by
/// looking at it.
/// </summary>
public sealed class PlotTests(PlotCases cases) : IClassFixture<PlotCases>
{
    // A white picture has variance 0; these plots, mostly white with text, lines and light bands, measure several
    // hundred (common practice, no source: a loose floor that only a blank or nearly blank picture fails).
    private const double BlankVarianceFloor = 100;

    // The third plot is named by what it shows: the approach to equilibrium, or the steady permeation.
    private static string[] FileNames(string which) =>
        [PlotSet.ProfileFileName, PlotSet.TransferFileName, which == "demo" ? PlotSet.EquilibriumFileName : PlotSet.PermeationFileName];

    public static TheoryData<string, int, int> Sizes => new()
    {
        { "demo", 1200, 800 },
        { "demo", 800, 500 },
        { "permeation", 1200, 800 },
        { "permeation", 800, 500 },
    };

    [Theory]
    [MemberData(nameof(Sizes))]
    public void Every_plot_is_a_png_of_the_requested_size_and_not_blank(string which, int width, int height)
    {
        var options = new PlotOptions(width, height);

        var files = PlotSet.Render(Result(which), options);

        Assert.Equal(FileNames(which).Order(StringComparer.Ordinal), files.Keys.Order(StringComparer.Ordinal));
        foreach (var (name, png) in files)
        {
            AssertPicture(name, png, width, height);
        }
    }

    [Theory]
    [InlineData("demo")]
    [InlineData("permeation")]
    public void Log_concentration_linear_time_and_a_limit_line_still_give_valid_plots(string which)
    {
        var options = new PlotOptions(LogConcentrationAxis: true, LogTimeAxis: false) { LimitMassPerArea = 3e-6, LimitLabel = "limit" };

        var files = PlotSet.Render(Result(which), options);

        foreach (var (name, png) in files)
        {
            AssertPicture(name, png, options.WidthPixels, options.HeightPixels);
        }
    }

    [Fact]
    public void The_default_options_are_1200_by_800_with_linear_concentration_and_log_time()
    {
        var options = new PlotOptions();

        Assert.Equal((1200, 800, false, true, null), (options.WidthPixels, options.HeightPixels, options.LogConcentrationAxis, options.LogTimeAxis, options.LimitMassPerArea));
    }

    [Theory]
    [InlineData(0, 800)]
    [InlineData(1200, 10)]
    [InlineData(20000, 800)]
    public void Unusable_sizes_are_refused(int width, int height)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PlotSet.Render(cases.Demo, new PlotOptions(width, height)));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1e-6)]
    [InlineData(double.NaN)]
    public void A_limit_that_is_not_a_positive_mass_per_area_is_refused(double limit)
    {
        Assert.Throws<ArgumentException>(() => PlotSet.Render(cases.Demo, new PlotOptions { LimitMassPerArea = limit }));
    }

    [Fact]
    public void The_permeation_case_is_drawn_as_steady_permeation_and_the_demo_as_an_equilibrium()
    {
        Assert.Equal(FinalStateKind.SteadyPermeation, cases.Permeation.FinalState.Kind);
        Assert.NotNull(cases.Permeation.Permeation?.LagTimeSeconds);
        Assert.Equal(FinalStateKind.ClosedEquilibrium, cases.Demo.FinalState.Kind);
    }

    [Fact]
    public void The_core_library_does_not_depend_on_the_plotting_packages()
    {
        var core = typeof(SimulationResult).Assembly;

        var references = core.GetReferencedAssemblies().Select(name => name.Name ?? string.Empty).ToList();

        Assert.DoesNotContain(references, name => name.StartsWith("OxyPlot", StringComparison.Ordinal) || name.StartsWith("SkiaSharp", StringComparison.Ordinal));
        Assert.Contains(typeof(PlotSet).Assembly.GetReferencedAssemblies(), name => name.Name == core.GetName().Name);
    }

    private SimulationResult Result(string which) => which == "demo" ? cases.Demo : cases.Permeation;

    [Fact]
    public void Work_precision_diagram_is_a_png_of_the_requested_size_even_with_points_it_cannot_draw()
    {
        var options = new PlotOptions(900, 600);
        WorkPrecisionSeries[] series =
        [
            new("tool", [new(1e-3, 1e-4), new(2e-3, 1e-5), new(0, 1e-6)]),
            new("plain reference", [new(1e-4, 1e-2), new(1e-2, 1e-4), new(1e-1, 0)], IsReference: true),
        ];

        var png = WorkPrecisionPlot.Render("work and precision", ["invented points"], series, options);

        AssertPicture("work-precision.png", png, options.WidthPixels, options.HeightPixels);
    }

    private static void AssertPicture(string name, byte[] png, int width, int height)
    {
        Assert.True(PngImage.HasSignature(png), $"{name}: no PNG signature");
        Assert.Equal((width, height), PngImage.HeaderSize(png));
        Assert.Equal((width, height), PngImage.DecodedSize(png));
        var variance = PngImage.LuminanceVariance(png);
        Assert.True(variance > BlankVarianceFloor, FormattableString.Invariant($"{name}: luminance variance {variance:G4} looks blank"));
    }
}
