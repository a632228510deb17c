using System.Globalization;
using Layers.Core.Domain;
using Layers.Core.Fitting;
using Layers.Tests.TestSupport;

namespace Layers.Tests.Fitting;

/// <summary>
/// Measured concentrations written as mass fractions (mg/kg of food or simulant, as migration tests report them):
/// the same measurements written in mg/L and in mg/kg through the medium's density (w = c / rho, the definition of
/// a mass fraction) must give the same fit.
/// </summary>
public sealed class MassFractionFitTests
{
    private const double DensityGramsPerMilliliter = 0.92;

    [Fact]
    public void Concentrations_in_mg_per_kg_fit_like_the_same_data_in_mg_per_L()
    {
        using var folder = new TempFolder();
        var perLiter = FitData.FilmCsv([1, 2, 4, 6, 8, 12, 18, 24, 36, 48, 60, 72], absoluteMgPerL: 0.5, relative: 0.02, seed: 21);
        var caseJson = WithDensity(FitData.FilmCase("1.25e-9 cm2/s", 4));

        var byVolume = FitData.Fit(folder, caseJson, perLiter, FitData.DiffusivityPath, FitData.PartitionPath);
        var byMass = FitData.Fit(folder, caseJson, ToMilligramsPerKilogram(perLiter), FitData.DiffusivityPath, FitData.PartitionPath);

        Assert.Equal(MeasuredQuantity.MassFraction, byMass.Request.Data.Quantity);
        Tolerance.Relative(byVolume.Estimates[0].Value, byMass.Estimates[0].Value, 1e-6, "D");
        Tolerance.Relative(byVolume.Estimates[1].Value, byMass.Estimates[1].Value, 1e-6, "K");
        // The points stay in the data's own dimension: kg/kg = (kg/m3) / (kg/m3).
        Tolerance.Relative(byVolume.Points[^1].Model / (DensityGramsPerMilliliter * 1e3), byMass.Points[^1].Model, 1e-6, "model at the last time");
    }

    [Fact]
    public void Concentrations_in_mg_per_kg_without_the_medium_density_are_refused_with_the_key_to_give()
    {
        using var folder = new TempFolder();
        var casePath = folder.WriteFile("fit-case.json", FitData.FilmCase("1.25e-9 cm2/s", 4));
        var dataPath = folder.WriteFile("measured.csv", "time [h],concentration [mg/kg]\n1,1\n2,2\n4,3\n8,4\n");
        var data = MeasuredSeries.Read(dataPath, out var problem)!;
        Assert.Null(problem);
        var errors = new List<string>();

        var prepared = CaseFitter.Prepare(new FitRequest(casePath, data, Side.Right, [FitData.DiffusivityPath]), errors);

        Assert.Null(prepared);
        Assert.Contains(errors, error => error.Contains("$.right.density", StringComparison.Ordinal) && error.Contains("mass fraction", StringComparison.Ordinal));
    }

    private static string WithDensity(string caseJson) =>
        caseJson.Replace("\"area\": \"100 cm2\" }", $"\"area\": \"100 cm2\", \"density\": \"{DensityGramsPerMilliliter.ToString(CultureInfo.InvariantCulture)} g/cm3\" }}", StringComparison.Ordinal);

    // mg/L to mg/kg: divide by the density in kg/L (0.92 g/cm3 = 0.92 kg/L).
    private static string ToMilligramsPerKilogram(string perLiterCsv)
    {
        var lines = perLiterCsv.TrimEnd('\n').Split('\n');
        var rows = lines.Skip(1).Select(line => line.Split(','))
            .Select(cells => string.Join(',', cells[0],
                (double.Parse(cells[1], CultureInfo.InvariantCulture) / DensityGramsPerMilliliter).ToString("R", CultureInfo.InvariantCulture),
                (double.Parse(cells[2], CultureInfo.InvariantCulture) / DensityGramsPerMilliliter).ToString("R", CultureInfo.InvariantCulture)));
        return "time [h],concentration [mg/kg],sd [mg/kg]\n" + string.Join('\n', rows) + "\n";
    }
}
