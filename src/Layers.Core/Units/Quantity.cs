using System.Globalization;

namespace Layers.Core.Units;

/// <summary>A value together with the unit it was written in, as read from a case file.</summary>
/// <param name="Value">The number as written, in <paramref name="Unit"/>.</param>
/// <param name="Unit">The unit the number is expressed in.</param>
public readonly record struct Quantity(double Value, UnitDefinition Unit)
{
    /// <summary>The value converted to the SI unit of its dimension.</summary>
    public double SiValue => Unit.ToSi(Value);

    /// <summary>The dimension of the unit.</summary>
    public Dimension Dimension => Unit.Dimension;

    /// <summary>Formats as "value symbol" in invariant culture, e.g. "50 um", so the text parses back.</summary>
    /// <returns>The value, a space and the canonical unit symbol.</returns>
    public override string ToString() =>
        Value.ToString(CultureInfo.InvariantCulture) + " " + Unit.Symbol;
}
