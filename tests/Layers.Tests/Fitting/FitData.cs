using System.Globalization;
using System.Text;
using Layers.Core.Analytics;
using Layers.Core.Domain;
using Layers.Core.Fitting;
using Layers.Tests.TestSupport;
using MathNet.Numerics.Distributions;

namespace Layers.Tests.Fitting;

/// <summary>
/// Synthetic measurements from published analytic solutions with seeded normal noise, and the cases to fit them
/// with, written into a temporary folder.
/// </summary>
internal static class FitData
{
    /// <summary>The membrane's true inputs: 100 um, D = 1e-8 cm2/s, K = 0.5, donor 1 mg/mL into a sink.</summary>
    public const double ThicknessMeters = 100e-6;
    public const double Diffusivity = 1e-12;
    public const double DiffusivityCm2PerS = 1e-8;
    public const double PartitionCoefficient = 0.5;
    public const double DonorKgPerCubicMeter = 1;

    public const string DiffusivityPath = "$.layers[0].diffusionCoefficient";
    public const string PartitionPath = "$.layers[0].partitionCoefficient";

    /// <summary>A membrane between a donor bath and a sink, with D and K at the given starting values.</summary>
    public static string MembraneCase(string duration, string diffusivity, double partition) => $$"""
        {
          "title": "Membrane to fit",
          "layers": [ { "name": "membrane", "thickness": "100 um", "diffusionCoefficient": "{{diffusivity}}", "partitionCoefficient": {{partition.ToString(CultureInfo.InvariantCulture)}} } ],
          "left": { "kind": "bath", "name": "donor", "concentration": "1 mg/mL" },
          "right": { "kind": "bath", "name": "receiver", "concentration": "0 mg/mL" },
          "duration": "{{duration}}"
        }
        """;

    /// <summary>
    /// Cumulative amounts received by the sink (Crank, The Mathematics of Diffusion, 2nd ed., ch. 4, eq. 4.24a,
    /// from memory, through <see cref="MembraneTimeLag"/>) at the given hours, with seeded normal noise of
    /// standard deviation absolute + relative * value; written as ug/cm2 with or without the sd column.
    /// </summary>
    public static string MembraneCsv(IEnumerable<double> hours, double absoluteUgPerCm2, double relative, int seed, bool withDeviation)
    {
        var random = new Random(seed);
        var text = new StringBuilder(withDeviation ? "time [h],cumulative amount [ug/cm2],sd [ug/cm2]\n" : "time [h],cumulative amount [ug/cm2]\n");
        foreach (var hour in hours)
        {
            // kg/m2 to ug/cm2: 1 kg/m2 = 1e9 ug / 1e4 cm2 = 1e5 ug/cm2.
            var exact = 1e5 * MembraneTimeLag.CumulativeMassPerArea(Diffusivity, ThicknessMeters, PartitionCoefficient, DonorKgPerCubicMeter, hour * 3600);
            var deviation = absoluteUgPerCm2 + (relative * exact);
            var measured = exact + Normal.Sample(random, 0, deviation);
            text.Append(CultureInfo.InvariantCulture, $"{hour:R},{measured:R}");
            text.Append(withDeviation ? string.Create(CultureInfo.InvariantCulture, $",{deviation:R}\n") : "\n");
        }

        return text.ToString();
    }

    /// <summary>The film's true inputs: 200 um, D = 5e-9 cm2/s, K = 2, 1 g/L at the start, into 10 mL over 100 cm2.</summary>
    public const double FilmThicknessMeters = 200e-6;
    public const double FilmDiffusivity = 5e-13;
    public const double FilmPartition = 2;
    public const double FilmInitialKgPerCubicMeter = 1;
    public const double VolumePerAreaMeters = 1e-3;

    /// <summary>A film with a closed back releasing into a compartment, with D and K at the given starting values.</summary>
    public static string FilmCase(string diffusivity, double partition) => $$"""
        {
          "title": "Film releasing into a limited volume",
          "layers": [ { "name": "film", "thickness": "200 um", "diffusionCoefficient": "{{diffusivity}}", "partitionCoefficient": {{partition.ToString(CultureInfo.InvariantCulture)}}, "initialConcentration": "1 g/L" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "simulant", "volume": "10 mL", "area": "100 cm2" },
          "duration": "3 d"
        }
        """;

    /// <summary>
    /// Concentrations in the solution of limited volume (Crank, The Mathematics of Diffusion, 2nd ed., ch. 4,
    /// eq. 4.37, from memory, through <see cref="PlaneSheetIntoLimitedVolume"/>) at the given hours, in mg/L, with
    /// seeded normal noise of standard deviation absolute + relative * value, written with the sd column.
    /// </summary>
    public static string FilmCsv(IEnumerable<double> hours, double absoluteMgPerL, double relative, int seed)
    {
        var random = new Random(seed);
        var text = new StringBuilder("time [h],concentration [mg/L],sd [mg/L]\n");
        foreach (var hour in hours)
        {
            // kg/m3 to mg/L: 1 kg/m3 = 1e3 mg/L.
            var exact = 1e3 / VolumePerAreaMeters * PlaneSheetIntoLimitedVolume.TransferredMassPerArea(
                FilmDiffusivity, FilmThicknessMeters, FilmInitialKgPerCubicMeter, VolumePerAreaMeters, FilmPartition, hour * 3600);
            var deviation = absoluteMgPerL + (relative * exact);
            text.Append(CultureInfo.InvariantCulture, $"{hour:R},{exact + Normal.Sample(random, 0, deviation):R},{deviation:R}\n");
        }

        return text.ToString();
    }

    /// <summary>Writes the case and the data and fits the given paths.</summary>
    public static FitResult Fit(TempFolder folder, string caseJson, string csv, params string[] paths)
    {
        var casePath = folder.WriteFile("fit-case.json", caseJson);
        var dataPath = folder.WriteFile("measured.csv", csv);
        var data = MeasuredSeries.Read(dataPath, out var problem) ?? throw new InvalidOperationException(problem);
        var errors = new List<string>();
        var prepared = CaseFitter.Prepare(new FitRequest(casePath, data, Side.Right, paths), errors)
            ?? throw new InvalidOperationException(string.Join("\n", errors));
        return CaseFitter.Fit(prepared) ?? throw new InvalidOperationException("the model could not be solved at the start");
    }

    public static IEnumerable<double> Range(double from, double to, double step)
    {
        for (var value = from; value <= to * (1 + 1e-12); value += step)
        {
            yield return value;
        }
    }
}
