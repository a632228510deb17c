using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// What the readers of the parts of a case share: the error list, the partition basis and the reference density,
/// and the conversions that depend on them. Every unit conversion of the case happens here or in
/// <see cref="Quantity.SiValue"/>, once.
/// </summary>
internal sealed class ReadContext
{
    public static readonly Dimension[] ConcentrationDimensions = [Dimension.MassConcentration, Dimension.MassFraction];

    public ReadContext(List<CaseError> errors, CaseFileAccess access)
    {
        Errors = errors;
        Access = access;
    }

    public List<CaseError> Errors { get; }

    /// <summary>Which files the case may name.</summary>
    public CaseFileAccess Access { get; }

    public PartitionBasis Basis { get; set; } = PartitionBasis.Volume;

    public double? ReferenceDensity { get; set; }

    /// <summary>True once any concentration was given as a mass fraction (a hint that the case is about foods).</summary>
    public bool SawMassFraction { get; private set; }

    /// <summary>How many concentrations were written as mass fractions so far (a reader tells its own from the count).</summary>
    public int MassFractionsRead { get; private set; }

    /// <summary>True when some layer's concentration was written as a mass fraction (mg/kg): layers are then shown back so.</summary>
    public bool SawLayerMassFraction { get; set; }

    /// <summary>
    /// The layers whose D is estimated in foodContact.layerDiffusion, so they give none themselves, by name: the
    /// estimate, or null when its entry has a mistake (recorded).
    /// </summary>
    public Dictionary<string, EstimatedDiffusivity?> EstimatedDiffusivities { get; } = new(StringComparer.Ordinal);

    /// <summary>
    /// The layers whose D follows an Arrhenius law in foodContact.layerDiffusion, by name: the law's reference
    /// temperature, K, and activation energy, J/mol; the layer's own D is the value at the reference temperature.
    /// </summary>
    public Dictionary<string, (double ReferenceKelvin, double ActivationEnergyJoulesPerMole)> ArrheniusLaws { get; } = new(StringComparer.Ordinal);

    /// <summary>The case's duration, s, once read (null before or when invalid); bounds the sampling times.</summary>
    public double? DurationSeconds { get; set; }

    /// <summary>The duration as written, for messages.</summary>
    public string? DurationText { get; set; }

    /// <summary>True once a compartment was given by its mass (as foods are).</summary>
    public bool SawCompartmentByMass { get; set; }

    /// <summary>Reads a strictly positive quantity.</summary>
    public static double? Positive(JsonFields fields, string key, Dimension dimension, bool required)
    {
        var quantity = fields.Quantity(key, [dimension], required);
        if (quantity is { } value && !(value.SiValue > 0))
        {
            fields.Error(key, $"must be > 0; got '{fields.Written(key)}'");
            return null;
        }

        return quantity?.SiValue;
    }

    /// <summary>Reads a partition coefficient (default 1) and converts it to the volume basis.</summary>
    public double? PartitionCoefficient(JsonFields fields, double? densityKgPerCubicMeter)
    {
        var k = fields.Number("partitionCoefficient") ?? 1;
        if (!(k > 0))
        {
            fields.Error("partitionCoefficient", $"must be > 0; got {k.ToString(System.Globalization.CultureInfo.InvariantCulture)}");
            return null;
        }

        if (Basis == PartitionBasis.Volume)
        {
            return k;
        }

        if (densityKgPerCubicMeter is not { } density)
        {
            fields.Error("density", "is required because partitionBasis is \"mass\" (K is converted with the densities)");
            return null;
        }

        return ReferenceDensity is { } reference ? k * density / reference : null;
    }

    /// <summary>
    /// Reads a concentration (default 0) as mass per volume; a mass fraction is multiplied by the density of its
    /// medium. Negative values are rejected, and zero too when <paramref name="strictlyPositive"/> is set.
    /// </summary>
    public double? Concentration(JsonFields fields, string key, double? densityKgPerCubicMeter, bool strictlyPositive = false)
    {
        if (fields.Quantity(key, ConcentrationDimensions) is not { } quantity)
        {
            return fields.Has(key) ? null : 0;
        }

        if (strictlyPositive ? !(quantity.SiValue > 0) : !(quantity.SiValue >= 0))
        {
            fields.Error(key, $"must be {(strictlyPositive ? ">" : ">=")} 0; got '{fields.Written(key)}'");
            return null;
        }

        if (quantity.Dimension == Dimension.MassConcentration)
        {
            return quantity.SiValue;
        }

        SawMassFraction = true;
        MassFractionsRead++;
        if (densityKgPerCubicMeter is not { } density)
        {
            fields.Error(key, $"a mass fraction needs {fields.PathOf("density")} (e.g. \"0.92 g/cm3\") to convert '{fields.Written(key)}' to mass per volume");
            return null;
        }

        return quantity.SiValue * density;
    }
}
