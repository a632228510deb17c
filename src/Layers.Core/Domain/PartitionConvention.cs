namespace Layers.Core.Domain;

/// <summary>
/// Worst-case partition coefficients between polymer and food, K_P,F = c_polymer / c_food at equilibrium, used
/// when no measured K exists. These are conventions of migration modelling for compliance screening, not
/// properties of a material: K = 1 where the migrant dissolves well in the food or simulant (fatty simulants), 1000
/// where it dissolves poorly (aqueous simulants). Source: EU modelling guidance, JRC EUR 27529 EN (2015) (the
/// values are recalled from memory; not checked against the text).
/// </summary>
public static class PartitionConvention
{
    /// <summary>Name of the convention for a migrant readily soluble in the food.</summary>
    public const string ReadilySoluble = "readilySoluble";

    /// <summary>Name of the convention for a migrant poorly soluble in the food.</summary>
    public const string PoorlySoluble = "poorlySoluble";

    /// <summary>All names with their K_P,F.</summary>
    public static readonly IReadOnlyDictionary<string, double> Values = new Dictionary<string, double>
    {
        [ReadilySoluble] = 1,
        [PoorlySoluble] = 1000,
    };

    /// <summary>Where the values come from, for reports.</summary>
    public const string Source = "convention of EU migration-modelling guidance (JRC EUR 27529 EN, 2015; values from memory, not checked)";
}
