namespace Layers.Core.Units;

/// <summary>
/// One accepted unit and its affine conversion to the SI unit of its dimension:
/// <c>si = value * FactorToSi + OffsetToSi</c>.
/// </summary>
/// <param name="Symbol">The canonical symbol shown in messages and output, e.g. "um2/s".</param>
/// <param name="Dimension">The dimension the unit measures.</param>
/// <param name="FactorToSi">The SI value of one unit, before the offset; must be finite and positive.</param>
/// <param name="OffsetToSi">
/// Added after scaling; non-zero only for scales whose zero is shifted from the SI zero (degree Celsius).
/// </param>
public sealed record UnitDefinition(string Symbol, Dimension Dimension, double FactorToSi, double OffsetToSi = 0)
{
    /// <summary>The SI value of one unit, before the offset; always finite and positive.</summary>
    // A zero or negative factor would make FromSi meaningless, so it is refused at construction.
    public double FactorToSi { get; init; } = double.IsFinite(FactorToSi) && FactorToSi > 0
        ? FactorToSi
        : throw new ArgumentOutOfRangeException(
            nameof(FactorToSi), FactorToSi, "The factor must be finite and positive.");

    /// <summary>
    /// The symbol as texts for people write it (console, report.html, summary.md): the micro prefix as µ (U+00B5),
    /// "µg/cm2", "µm", so that one spelling is used beside the plots' µg. Files read by programs (CSV and JSON headers)
    /// keep the ASCII <see cref="Symbol"/>, which inputs accept too.
    /// </summary>
    public string ForPeople => UnitSpelling.ForPeople(Symbol);

    /// <summary>Converts a value given in this unit to the SI unit of <see cref="Dimension"/>.</summary>
    /// <param name="value">The value in this unit.</param>
    /// <returns><c>value * FactorToSi + OffsetToSi</c>.</returns>
    public double ToSi(double value) => value * FactorToSi + OffsetToSi;

    /// <summary>Converts a value in the SI unit of <see cref="Dimension"/> to this unit.</summary>
    /// <param name="siValue">The value in SI.</param>
    /// <returns><c>(siValue - OffsetToSi) / FactorToSi</c>.</returns>
    public double FromSi(double siValue) => (siValue - OffsetToSi) / FactorToSi;
}
