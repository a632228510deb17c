using System.Globalization;
using System.Text.RegularExpressions;
using Layers.Core.Cases;
using Layers.Core.Domain;
using Layers.Core.FoodContact;
using Layers.Core.Studies;
using Layers.Tests.TestSupport;

namespace Layers.Tests.CaseReading;

/// <summary>
/// docs/case-format.md, "Units": the temperature and molar-energy rows name the keys that read them and the units they
/// accept, and the reader reads every such key in every such unit to the same SI value.
/// </summary>
public sealed partial class CaseFormatTemperatureUnitsTests
{
    // Invented: a film on food with an Arrhenius D and a test condition, so that every temperature and molar-energy key is present.
    private const string Case = """
        {
          "layers": [ { "name": "film", "thickness": "50 um", "diffusionCoefficient": "1e-10 cm2/s", "initialConcentration": "1 mg/L" } ],
          "left": { "kind": "closed" },
          "right": { "kind": "compartment", "name": "food", "volume": "1 L", "area": "6 dm2" },
          "foodContact": {
            "stages": [ { "name": "storage", "duration": "10 d", "temperature": "TEMPERATURE" } ],
            "layerDiffusion": { "film": { "referenceTemperature": "TEMPERATURE", "activationEnergy": "ENERGY" } },
            "testCondition": { "duration": "10 d", "temperature": "TEMPERATURE" },
            "equivalenceActivationEnergy": "ENERGY"
          }
        }
        """;

    // 40 degC is 313.15 K (the kelvin's definition: 0 degC = 273.15 K, SI brochure, 9th ed., 2.3.1); 80 kJ/mol in each
    // unit, with the thermochemical calorie of 4.184 J (NIST SP 811, appendix B.8).
    private static readonly Dictionary<string, string> Temperatures = new(StringComparer.Ordinal)
    {
        ["degC"] = "40 degC", ["C"] = "40 C", ["°C"] = "40 °C", ["℃"] = "40 ℃", ["K"] = "313.15 K",
    };

    private static readonly Dictionary<string, string> Energies = new(StringComparer.Ordinal)
    {
        ["kJ/mol"] = "80 kJ/mol", ["J/mol"] = "80000 J/mol", ["kcal/mol"] = (80 / 4.184).ToString("R", CultureInfo.InvariantCulture) + " kcal/mol",
    };

    [Fact]
    public void The_units_table_lists_temperature_and_molar_energy_with_every_key_that_reads_them()
    {
        var temperature = Row("Temperature");
        var energy = Row("Molar energy");

        Assert.Equal(["referenceTemperature", "temperature"], temperature.Keys.Order(StringComparer.Ordinal));
        Assert.Equal(["activationEnergy", "equivalenceActivationEnergy"], energy.Keys.Order(StringComparer.Ordinal));
        Assert.Equal(Temperatures.Keys.Order(StringComparer.Ordinal), temperature.Units.Order(StringComparer.Ordinal));
        Assert.Equal(Energies.Keys.Order(StringComparer.Ordinal), energy.Units.Order(StringComparer.Ordinal));
        Assert.DoesNotContain("do not use", FormatReference.Section("Units"), StringComparison.Ordinal);
    }

    [Fact]
    public void Every_documented_temperature_and_molar_energy_unit_is_read_to_the_same_SI_value()
    {
        foreach (var unit in Row("Temperature").Units)
        {
            foreach (var energyUnit in Row("Molar energy").Units)
            {
                var json = Case.Replace("TEMPERATURE", Temperatures[unit], StringComparison.Ordinal).Replace("ENERGY", Energies[energyUnit], StringComparison.Ordinal);
                var read = CaseDocument.ReadText(json, "food.json");
                Assert.True(read.IsValid, $"{unit}, {energyUnit}: {read.FormatErrors()}");

                var food = read.Case!.FoodContact!;
                Assert.Equal(313.15, food.Stages[0].TemperatureKelvin, 9);
                Assert.Equal(313.15, food.TestCondition!.TemperatureKelvin, 9);
                Assert.Equal(80e3, food.EquivalenceActivationEnergy, 6);
                var arrhenius = Assert.IsType<ArrheniusDiffusivity>(read.Case.Stack.Layers[0].Diffusivity);
                Assert.Equal(313.15, arrhenius.ReferenceKelvin, 9);
                Assert.Equal(80e3, arrhenius.ActivationEnergyJoulesPerMole, 6);
            }
        }
    }

    /// <summary>The keys (second column) and units (third column) of a row of the units table, from their backticks.</summary>
    private static (List<string> Keys, List<string> Units) Row(string dimension)
    {
        var line = FormatReference.Section("Units").Split('\n').SingleOrDefault(row => row.StartsWith($"| {dimension} |", StringComparison.Ordinal));
        Assert.True(line is not null, $"docs/case-format.md, Units: no row for {dimension}");
        var cells = line.Split('|', StringSplitOptions.TrimEntries);
        static List<string> Ticked(string cell) => Backticked().Matches(cell).Select(match => match.Groups[1].Value).ToList();
        return (Ticked(cells[2]).Where(key => key != "foodContact" && key != "testCondition").Distinct().ToList(), Ticked(cells[3]));
    }

    [GeneratedRegex("`([^`]+)`")]
    private static partial Regex Backticked();
}
