namespace Layers.Core.Units;

/// <summary>
/// The rules that choose a unit to show a time span or a depth in, shared by the console, the tables and the plots
/// so that a case shows its times in one unit everywhere (common practice, no source).
/// </summary>
public static class DisplayUnitRules
{
    private const double Minute = 60;
    private const double Hour = 3600;
    private const double Day = 86400;
    private const double JulianYear = 365.25 * Day;

    /// <summary>
    /// The unit for times within a duration: the largest unit that keeps the duration at two or more (s below 2 min,
    /// min below 2 h, h up to 3 d, d below 2 y, y beyond); hours up to 3 d because a few days are read in hours.
    /// </summary>
    public static UnitDefinition Time(double durationSeconds) => UnitTable.Get(durationSeconds switch
    {
        < 2 * Minute => "s",
        < 2 * Hour => "min",
        <= 3 * Day => "h",
        < 2 * JulianYear => "d",
        _ => "y",
    });

    // From the largest down: the units a run's times may be shown in.
    private static readonly string[] TimeUnitsLargestFirst = ["y", "d", "h", "min", "s"];

    /// <summary>
    /// The one time unit of a run, from its duration and its report times: the duration's unit
    /// (<see cref="Time(double)"/>), unless the shortest positive report time would read as 0.0x in it (below 0.1,
    /// "0.08333 d" for 2 h); then the next smaller unit in which that time reads at least 0.1, as long as the duration
    /// stays at most 10^4 in it (a 10 d case with a 2 h report time is shown in hours, 240 h; a 10 y case with a 1 min
    /// report time keeps years, as 5.3E+06 min would not read better).
    /// </summary>
    public static UnitDefinition Time(double durationSeconds, IEnumerable<double> reportTimesSeconds)
    {
        ArgumentNullException.ThrowIfNull(reportTimesSeconds);
        var unit = Time(durationSeconds);
        var shortest = reportTimesSeconds.Where(time => time > 0).DefaultIfEmpty(durationSeconds).Min();
        if (unit.FromSi(shortest) >= 0.1)
        {
            return unit;
        }

        foreach (var symbol in TimeUnitsLargestFirst.SkipWhile(symbol => symbol != unit.Symbol).Skip(1))
        {
            var smaller = UnitTable.Get(symbol);
            if (smaller.FromSi(durationSeconds) > 1e4)
            {
                break;
            }

            if (smaller.FromSi(shortest) >= 0.1)
            {
                return smaller;
            }
        }

        return unit;
    }

    /// <summary>
    /// The unit one figure is shown in: the run's unit, unless the figure lies far from it. A positive figure below
    /// 0.01 of the unit (a time to 50 % of 0.2 s in a run shown in days would read 2.3E-06 d) is shown in the largest
    /// unit in which it is at least 1 (seconds at the least); one of 10^4 units or more (a time to 50 % of 15 years
    /// in a run shown in hours) in the unit the duration rule gives it (<see cref="Time(double)"/>) when that is
    /// larger. The text names the unit beside the number, so the exception is said where it is made.
    /// </summary>
    public static UnitDefinition TimeFigure(double seconds, UnitDefinition runUnit)
    {
        ArgumentNullException.ThrowIfNull(runUnit);
        var magnitude = Math.Abs(seconds);
        var inRunUnit = runUnit.FromSi(magnitude);
        if (magnitude == 0 || !double.IsFinite(magnitude) || inRunUnit is >= 0.01 and < 1e4)
        {
            return runUnit;
        }

        if (inRunUnit >= 1e4)
        {
            var larger = Time(magnitude);
            return larger.FactorToSi > runUnit.FactorToSi ? larger : runUnit;
        }

        return TimeUnitsLargestFirst.Select(UnitTable.Get).FirstOrDefault(unit => unit.FromSi(magnitude) >= 1) ?? UnitTable.Get("s");
    }

    /// <summary>The unit for depths in a stack: micrometres below 2 mm of total thickness (films), millimetres otherwise.</summary>
    public static UnitDefinition Depth(double totalThicknessMeters) => UnitTable.Get(totalThicknessMeters < 2e-3 ? "um" : "mm");
}
