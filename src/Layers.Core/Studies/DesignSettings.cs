using Layers.Core.Units;

namespace Layers.Core.Studies;

/// <summary>
/// A design question, read from <c>$.design</c>: which value of one input, within an allowed range, makes a result
/// equal a target. Keys and rules: docs/case-format.md, section "Design".
/// </summary>
public sealed record DesignSettings
{
    /// <summary>Default accuracy of the answer: a fraction of its value (log scale) or of the range (linear scale).</summary>
    public const double DefaultTolerance = 1e-3;

    /// <summary>Default number of values tried across the range before the root finder starts.</summary>
    public const int DefaultPoints = 13;

    /// <summary>The input solved for.</summary>
    public required StudyInput Input { get; init; }

    /// <summary>Smallest allowed value, in the input's unit.</summary>
    public required double Lowest { get; init; }

    /// <summary>Largest allowed value, in the input's unit.</summary>
    public required double Highest { get; init; }

    /// <summary>True when the range is searched in equal ratios (log scale), as for a D or a thickness spanning decades.</summary>
    public required bool LogScale { get; init; }

    /// <summary>The result that must equal the target.</summary>
    public required ResultMeasure Result { get; init; }

    /// <summary>The target in SI units.</summary>
    public required double TargetSi { get; init; }

    /// <summary>The unit the target was written in, used to show results.</summary>
    public required UnitDefinition TargetUnit { get; init; }

    /// <summary>Accuracy of the answer (see <see cref="DefaultTolerance"/>).</summary>
    public double Tolerance { get; init; } = DefaultTolerance;

    /// <summary>Values tried across the range, ends included, to bracket the answer and draw design.png.</summary>
    public int Points { get; init; } = DefaultPoints;

    /// <summary>The search variable of a value: its logarithm on a log scale, the value itself otherwise.</summary>
    public double ToSearch(double value) => LogScale ? Math.Log(value) : value;

    /// <summary>The value of a search variable.</summary>
    public double FromSearch(double search) => LogScale ? Math.Exp(search) : search;

    /// <summary>The accuracy asked of the root finder, in the search variable.</summary>
    public double SearchAccuracy => LogScale ? Math.Log(1 + Tolerance) : Tolerance * (Highest - Lowest);

    /// <summary>The values tried first: <see cref="Points"/> of them, evenly spaced in the search variable.</summary>
    public IReadOnlyList<double> BracketValues()
    {
        var low = ToSearch(Lowest);
        var high = ToSearch(Highest);
        return Enumerable.Range(0, Points)
            .Select(i => i == Points - 1 ? Highest : i == 0 ? Lowest : FromSearch(low + ((high - low) * i / (Points - 1))))
            .ToArray();
    }
}
