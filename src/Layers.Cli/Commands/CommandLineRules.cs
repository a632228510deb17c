using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;

namespace Layers.Cli.Commands;

/// <summary>
/// The checks every command applies to its options and arguments, so that each mistake on the command line becomes
/// one usage error (exit 64) naming the option, never an exception from converting a value later.
/// </summary>
internal static class CommandLineRules
{
    /// <summary>
    /// Makes <paramref name="option"/> read a whole number from <paramref name="minimum"/> to <paramref name="maximum"/>.
    /// The value is converted here rather than by the parser's own conversion, whose failure (a value beyond the
    /// range of an int, or not a number) would otherwise surface as an exception from a range check.
    /// </summary>
    /// <param name="option">The option.</param>
    /// <param name="minimum">Smallest value allowed.</param>
    /// <param name="maximum">Largest value allowed.</param>
    /// <param name="unit">Said after the range in the message, e.g. " pixels"; empty for none.</param>
    public static void WholeNumber(Option<int> option, int minimum, int maximum, string unit = "") =>
        option.CustomParser = result => Parse(result, option.Name, minimum, maximum, unit);

    /// <summary>As <see cref="WholeNumber(Option{int}, int, int, string)"/>, for an option without a default.</summary>
    public static void WholeNumber(Option<int?> option, int minimum, int maximum, string unit = "") =>
        option.CustomParser = result => Parse(result, option.Name, minimum, maximum, unit);

    /// <summary>Refuses an empty path (which no file system accepts) given to <paramref name="option"/>.</summary>
    public static void NonEmptyPath(Option option) =>
        option.Validators.Add(result =>
        {
            if (result.Tokens.Count > 0 && Problem(result.Tokens[^1].Value) is { } problem)
            {
                result.AddError($"{option.Name} {problem}");
            }
        });

    /// <summary>
    /// Refuses, among the paths given to <paramref name="argument"/>, a word that looks like an option: an option the
    /// command does not know would otherwise be taken as a file name and the command would run. A file whose name
    /// starts with '-' is given as ./-name.
    /// </summary>
    public static void PathsNotOptions(Argument argument) =>
        argument.Validators.Add(result =>
        {
            foreach (var token in result.Tokens.Select(token => token.Value))
            {
                if (token.Length > 1 && token[0] == '-')
                {
                    result.AddError($"unknown option '{token}'; a file whose name starts with '-' is given as ./{token}");
                    return;
                }

                if (Problem(token) is { } problem)
                {
                    result.AddError($"{argument.Name} {problem}");
                    return;
                }
            }
        });

    private static string? Problem(string path) =>
        string.IsNullOrWhiteSpace(path) ? "needs a path; got an empty value"
        : path.Contains('\0', StringComparison.Ordinal) ? "holds a NUL character, which no path may contain"
        : null;

    private static int Parse(ArgumentResult result, string name, int minimum, int maximum, string unit)
    {
        var token = result.Tokens.Count > 0 ? result.Tokens[^1].Value : string.Empty;
        if (!int.TryParse(token, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var value) || value < minimum || value > maximum)
        {
            result.AddError($"{name} must be from {minimum} to {maximum}{unit}; got '{token}'");
            return minimum;
        }

        return value;
    }
}
