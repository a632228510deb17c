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

    /// <summary>The unit for depths in a stack: micrometres below 2 mm of total thickness (films), millimetres otherwise.</summary>
    public static UnitDefinition Depth(double totalThicknessMeters) => UnitTable.Get(totalThicknessMeters < 2e-3 ? "um" : "mm");
}
