using System.Text.Json;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>Reads <c>duration</c>, <c>reportTimes</c> and <c>extraOutputTimes</c>.</summary>
internal static class TimesReader
{
    /// <summary>Default report times as fractions of the duration.</summary>
    public static readonly double[] DefaultReportFractions = [0.01, 0.1, 0.25, 0.5, 1];

    public static double? Duration(JsonFields root, ReadContext context)
        => ReadContext.Positive(root, "duration", Dimension.Time, required: true);

    /// <summary>
    /// Reads a list of times within (0, duration]; report times (<paramref name="ascending"/>) must also be strictly
    /// ascending and must not be an empty list. A list longer than <paramref name="most"/> is refused unread.
    /// </summary>
    public static List<double>? List(
        JsonFields root, string key, double? duration, string? durationText, bool ascending, ReadContext context, int most = CaseLimits.MaxOutputTimes)
    {
        if (root.Member(key) is not { } array)
        {
            return null;
        }

        if (array.ValueKind != JsonValueKind.Array)
        {
            root.Error(key, $"expected an array of times such as [\"1 d\", \"10 d\"]; found {JsonFields.Describe(array)}");
            return null;
        }

        if (ascending && array.GetArrayLength() == 0)
        {
            root.Error(key, "must hold at least one time (leave the key out for the default times); got []");
            return null;
        }

        if (array.GetArrayLength() > most)
        {
            root.Error(key, $"at most {most} times are allowed; got {array.GetArrayLength()}");
            return null;
        }

        var times = new List<double>();
        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{root.PathOf(key)}[{index++}]";
            if (JsonFields.ParseQuantity(element, path, [Dimension.Time], context.Errors) is not { } time)
            {
                continue;
            }

            var written = element.GetString()!.Trim();

            if (!(time.SiValue > 0))
            {
                context.Errors.Add(new CaseError(path, $"must be > 0; got '{written}'"));
            }
            else if (duration is { } end && time.SiValue > end * (1 + 1e-12))
            {
                context.Errors.Add(new CaseError(path, $"must be <= duration ({durationText}); got '{written}'"));
            }
            else if (ascending && times.Count > 0 && time.SiValue <= times[^1])
            {
                context.Errors.Add(new CaseError(path, $"must be later than the previous time; got '{written}'"));
            }

            times.Add(time.SiValue);
        }

        return times;
    }
}
