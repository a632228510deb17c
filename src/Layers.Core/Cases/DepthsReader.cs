using System.Text.Json;
using Layers.Core.Domain;
using Layers.Core.Units;

namespace Layers.Core.Cases;

/// <summary>
/// Reads <c>depths</c>: depths from the left face of the stack at which the concentration is reported at every report
/// time, each a length within the stack (0 is the left face, the total thickness the right face).
/// </summary>
internal static class DepthsReader
{
    public const string Key = "depths";

    /// <summary>The depths in metres, in the order given; empty when the key is left out or not valid.</summary>
    /// <param name="root">The case document's top level.</param>
    /// <param name="layers">The layers as read (their total thickness bounds the depths; none when they had errors).</param>
    /// <param name="context">Where errors go.</param>
    public static IReadOnlyList<double> Read(JsonFields root, IReadOnlyList<Layer> layers, ReadContext context)
    {
        if (root.Member(Key) is not { } array)
        {
            return [];
        }

        if (array.ValueKind != JsonValueKind.Array)
        {
            root.Error(Key, $"expected an array of depths from the left face of the stack such as [\"10 um\", \"55 um\"]; found {JsonFields.Describe(array)}");
            return [];
        }

        if (array.GetArrayLength() == 0)
        {
            root.Error(Key, "must hold at least one depth (leave the key out for none); got []");
            return [];
        }

        if (array.GetArrayLength() > CaseLimits.MaxDepths)
        {
            root.Error(Key, $"at most {CaseLimits.MaxDepths} depths are allowed; got {array.GetArrayLength()}");
            return [];
        }

        var total = layers.Sum(layer => layer.ThicknessMeters);
        var depths = new List<double>();
        var index = 0;
        foreach (var element in array.EnumerateArray())
        {
            var path = $"{root.PathOf(Key)}[{index++}]";
            if (JsonFields.ParseQuantity(element, path, [Dimension.Length], context.Errors) is not { } depth)
            {
                continue;
            }

            var written = element.GetString()!.Trim();
            if (!(depth.SiValue >= 0))
            {
                context.Errors.Add(new CaseError(path, $"must be >= 0 (a depth from the left face of the stack); got '{written}'"));
            }
            else if (layers.Count > 0 && depth.SiValue > total * (1 + Results.DepthReadings.OnEdgeRelative))
            {
                var thickness = QuantityParser.FormatSi(total, depth.Unit, 6);
                context.Errors.Add(new CaseError(path, $"must be at most the thickness of the stack ({thickness}, its right face); got '{written}'"));
            }
            else
            {
                depths.Add(depth.SiValue);
            }
        }

        return depths;
    }
}
