using System.Globalization;

namespace Layers.Tests.Units;

/// <summary>
/// Sets the current culture for the lifetime of the scope; the culture is per thread, so tests stay isolated.
/// </summary>
internal sealed class CultureScope : IDisposable
{
    private readonly CultureInfo _previous;

    public CultureScope(CultureInfo culture)
    {
        _previous = CultureInfo.CurrentCulture;
        CultureInfo.CurrentCulture = culture;
    }

    public void Dispose() => CultureInfo.CurrentCulture = _previous;

    /// <summary>
    /// German formatting (decimal comma, dot as group separator). Under invariant globalization de-DE is
    /// not available, so an equivalent culture is built from the invariant one with the same separators.
    /// </summary>
    public static CultureInfo German()
    {
        try
        {
            var german = CultureInfo.GetCultureInfo("de-DE");
            if (german.NumberFormat.NumberDecimalSeparator == ",")
            {
                return german;
            }
        }
        catch (CultureNotFoundException)
        {
            // Invariant globalization: fall through to the hand-built equivalent.
        }

        var custom = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        custom.NumberFormat.NumberDecimalSeparator = ",";
        custom.NumberFormat.NumberGroupSeparator = ".";
        return custom;
    }
}
