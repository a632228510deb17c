using System.Text;

namespace Layers.Core.Units;

/// <summary>How a unit symbol is spelled for people: the ASCII micro prefix u as µ.</summary>
public static class UnitSpelling
{
    /// <summary>
    /// The symbol with a u that starts a unit (at the start, after '/', '(' or a space) and is followed by a letter
    /// written as µ: "ug/cm2/h" → "µg/cm2/h", "um" → "µm"; every other character unchanged.
    /// </summary>
    public static string ForPeople(string symbol)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        var builder = new StringBuilder(symbol.Length);
        for (var i = 0; i < symbol.Length; i++)
        {
            var startsUnit = i == 0 || symbol[i - 1] is '/' or '(' or ' ';
            builder.Append(symbol[i] == 'u' && startsUnit && i + 1 < symbol.Length && char.IsAsciiLetter(symbol[i + 1]) ? '\u00B5' : symbol[i]);
        }

        return builder.ToString();
    }
}
