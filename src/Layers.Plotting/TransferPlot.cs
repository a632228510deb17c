using Layers.Core.Domain;
using Layers.Core.Results;
using Layers.Core.Simulation;
using Layers.Core.Units;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace Layers.Plotting;

/// <summary>
/// Mass transferred per contact area into each face medium against time. With one receiving compartment that keeps
/// all it receives, a second scale on the right reads the same curve as the compartment's concentration; otherwise
/// (two compartments, a compartment that only gives mass, or one that loses mass to sampling or first-order removal,
/// whose content is no longer what it received) the compartments' concentrations get a panel of their own under the
/// amounts.
/// An optional limit is drawn as a dashed line with its label and the time each receiving medium reaches it; without
/// one, a food-contact result's specific migration limit is drawn, with the time the solver found the food reaches it.
/// </summary>
public static class TransferPlot
{
    private const string MassAxisKey = "mass";
    private const string ConcentrationAxisKey = "concentration";

    // Room above the highest value, as a fraction of the range.
    private const double TopMargin = 0.08;

    /// <summary>Builds the transfer plot.</summary>
    /// <param name="result">A simulation result.</param>
    /// <param name="options">Picture size, time axis choice and the optional limit.</param>
    /// <returns>The plot model, ready for <see cref="PngRenderer.Render"/> at the same options.</returns>
    public static PlotModel Create(SimulationResult result, PlotOptions options)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        var migration = options.LimitMassPerArea is null ? MigrationLimit.Of(result) : null;
        if (migration is { PerContact: null })
        {
            options = options with { LimitMassPerArea = migration.MassPerArea, LimitLabel = MigrationLimit.Label };
        }

        var simulation = result.Case;
        var massUnit = DisplayText.MassPerAreaUnit(simulation.Display);
        var concentrationUnit = DisplayText.ConcentrationUnit(simulation.Display);
        // Periods of a schedule repeat on a linear clock (a dose a day); a log axis would crowd all but the first.
        var time = TimeAxis.Create(result, options.LogTimeAxis && result.Case.Schedule is null);
        var samples = time.Samples(result).ToList();
        var media = Media(result, time.FirstSeconds, time.Unit, massUnit);
        if (media.Count == 0)
        {
            return LayerHoldings(result, options, time, massUnit);
        }

        var subtitle = Subtitle(result, media, new Units(time.Unit, massUnit, concentrationUnit), options, migration);
        var model = PlotFrame.Create(simulation.Title, PeriodMarks.Text(result, time) is { } marks ? subtitle.Append(marks) : subtitle, options);
        model.Axes.Add(time.Axis);
        var compartments = media.Where(medium => medium.Face.HasFiniteVolume).ToList();
        var secondScale = SecondScale(compartments, result.Case);
        var panel = compartments.Count > 0 && !secondScale;
        var massAxis = PlotFrame.Linear(AxisPosition.Left, $"Transferred per contact area ({DisplayText.Unit(massUnit)})");
        massAxis.Key = MassAxisKey;
        model.Axes.Add(massAxis);
        var (low, high) = Range(media.SelectMany(medium => medium.Points).Select(point => point.Y), options, massUnit);
        massAxis.Minimum = low;
        massAxis.Maximum = high;

        for (var i = 0; i < media.Count; i++)
        {
            model.Series.Add(Line(media[i].Title, media[i].Points, i, MassAxisKey));
        }

        if (secondScale)
        {
            model.Axes.Add(ConcentrationScale(compartments[0], low, high, massUnit, simulation.Display));
        }
        else if (panel)
        {
            massAxis.StartPosition = 0.42;
            var scale = PanelScale(compartments, simulation.Display, concentrationUnit);
            AddConcentrationPanel(model, media, samples, time.Unit, scale, simulation);
            if (migration is { PerContact: not null })
            {
                // Each fresh portion of food is held to the limit by its own concentration: the line sits in the panel.
                var level = scale.Unit.FromSi(migration.FoodConcentrationKgPerCubicMeter / scale.Divisor);
                AddLimit(model, options, level, MigrationLimit.Label, scale.Unit, ConcentrationAxisKey);
                if (migration.ReachedSeconds is { } first && time.Covers(first, simulation.DurationSeconds))
                {
                    AddCrossing(model, time.Unit.FromSi(first), level, ConcentrationAxisKey);
                }
            }
        }

        if (options.LimitMassPerArea is { } limit)
        {
            AddLimit(model, options, massUnit.FromSi(limit), options.LimitLabel, massUnit, MassAxisKey);
        }

        if (migration is { PerContact: null, ReachedSeconds: { } reached } && time.Covers(reached, simulation.DurationSeconds))
        {
            AddCrossing(model, time.Unit.FromSi(reached), massUnit.FromSi(migration.MassPerArea), MassAxisKey);
        }

        PeriodMarks.Draw(model, result, time);
        return model;
    }

    /// <summary>
    /// True when the compartment's concentration is c0 + m / (V/A) for the amount m it received: not so once samples,
    /// first-order removal or a schedule's renewals take some of it out, since m counts what they took and the
    /// compartment no longer holds it.
    /// </summary>
    private static bool KeepsWhatItReceives(CompartmentFace compartment, Side side, SimulationCase simulation)
        => compartment.Sampling is null && compartment.RemovalRatePerSecond <= 0 && simulation.Schedule?.Renews(side) != true;

    // One receiving compartment that keeps all it receives: its concentration is a second scale on the amounts.
    private static bool SecondScale(List<Medium> compartments, SimulationCase simulation) =>
        compartments.Count == 1 && !compartments[0].Flipped && KeepsWhatItReceives((CompartmentFace)compartments[0].Face, compartments[0].Side, simulation);

    // The panel's unit: the one compartment's own (a mass fraction of food where the display asks for one), else the
    // case's concentration unit for all of them.
    private static (UnitDefinition Unit, double Divisor) PanelScale(List<Medium> compartments, DisplayUnits display, UnitDefinition concentrationUnit)
        => compartments.Count == 1 ? MediumScale((CompartmentFace)compartments[0].Face, display) : (concentrationUnit, 1);

    /// <summary>Where the plot shows the compartments' concentrations: nowhere, on a right-hand scale, or in a panel.</summary>
    internal static CompartmentConcentrations ConcentrationsShown(SimulationResult result)
    {
        var compartments = Media(result, 0, UnitTable.Get("s"), UnitTable.Get("kg/m2"))
            .Where(medium => medium.Face.HasFiniteVolume)
            .ToList();
        return compartments.Count == 0 ? CompartmentConcentrations.None
            : SecondScale(compartments, result.Case) ? CompartmentConcentrations.RightScale
            : CompartmentConcentrations.Panel;
    }

    // The solver's crossing time on the limit line; between output times the plotted curve is a straight chord, so
    // near a steep start it may cross the line elsewhere: the marker and the subtitle give the solver's time.
    private static void AddCrossing(PlotModel model, double time, double level, string axisKey)
    {
        model.Annotations.Add(new PointAnnotation
        {
            X = time,
            Y = level,
            YAxisKey = axisKey,
            Shape = MarkerType.Diamond,
            Size = PlotStyle.MarkerSize + 1,
            Fill = PlotStyle.Limit,
            Stroke = OxyColors.White,
            StrokeThickness = 1.2,
            Layer = AnnotationLayer.AboveSeries,
        });
    }

    private static List<Medium> Media(
        SimulationResult result, double firstSeconds, UnitDefinition timeUnit, UnitDefinition massUnit)
    {
        var media = new List<Medium>();
        var samples = result.TimeSeries;
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var face = result.Case.Face(side);
            if (FaceText.MediumName(face) is not { } name)
            {
                continue;
            }

            var values = samples.Select(sample => (sample.TimeSeconds, Face: side == Side.Left ? sample.Left : sample.Right))
                .Where(pair => pair.Face is not null)
                .Select(pair => (Seconds: pair.TimeSeconds, Transferred: pair.Face!.TransferredIntoMediumPerArea))
                .ToList();
            // A medium that only gives mass (a donor) is drawn as the amount it gave, so that every curve rises.
            var flipped = values.Count > 0
                && values.All(value => value.Transferred <= 0)
                && values.Any(value => value.Transferred < 0);
            var sign = flipped ? -1 : 1;
            var points = values
                .Where(value => value.Seconds >= firstSeconds)
                .Select(value => new DataPoint(timeUnit.FromSi(value.Seconds), massUnit.FromSi(sign * value.Transferred)))
                .ToList();
            var title = flipped ? $"out of {name} ({face.KindName})" : $"into {name} ({face.KindName})";
            media.Add(new Medium(side, face, name, title, flipped, points, values));
        }

        return media;
    }

    private static (double Low, double High) Range(IEnumerable<double> values, PlotOptions options, UnitDefinition massUnit)
    {
        var list = values.ToList();
        if (options.LimitMassPerArea is { } limit)
        {
            list.Add(massUnit.FromSi(limit));
        }

        var low = Math.Min(0, list.DefaultIfEmpty(0).Min());
        var high = Math.Max(0, list.DefaultIfEmpty(0).Max());
        if (high <= low)
        {
            high = low + 1;
        }

        return (low, high + (high - low) * TopMargin);
    }

    private static LineSeries Line(string title, IEnumerable<DataPoint> points, int index, string yAxisKey)
    {
        var series = new LineSeries
        {
            Title = title,
            Color = PlotStyle.SeriesColor(index),
            LineStyle = PlotStyle.SeriesLineStyle(index),
            StrokeThickness = PlotStyle.SeriesThickness,
            YAxisKey = yAxisKey,
        };
        series.Points.AddRange(points);
        return series;
    }

    // A right-hand scale on which the amount curve of the one compartment reads as its concentration:
    // c = c0 + m / (V / A) is linear in m, so the scale is the mass axis mapped through it.
    /// <summary>
    /// The compartment's concentration as a second scale: a mass fraction (mg/kg of food) where the display asks for
    /// one and the medium's density is known, as the console tables do, else mass per volume.
    /// </summary>
    private static LinearAxis ConcentrationScale(
        Medium medium, double low, double high, UnitDefinition massUnit, DisplayUnits display)
    {
        var compartment = (CompartmentFace)medium.Face;
        var (unit, perVolume) = MediumScale(compartment, display);
        double Map(double mass) => unit.FromSi(
            (compartment.InitialConcentrationKgPerCubicMeter + (massUnit.ToSi(mass) / compartment.VolumePerAreaMeters)) / perVolume);
        var axis = PlotFrame.Linear(
            AxisPosition.Right, $"Concentration in {medium.Name} ({DisplayText.Unit(unit)})");
        axis.Key = ConcentrationAxisKey;
        axis.Minimum = Map(low);
        axis.Maximum = Map(high);
        axis.MajorGridlineStyle = LineStyle.None;
        return axis;
    }

    /// <summary>
    /// The unit a compartment's concentration is shown in, and what divides kg/m3 to get there: its density for a mass
    /// fraction (mg/kg of food) where the display asks for one and the density is known, as the console does; else 1.
    /// </summary>
    private static (UnitDefinition Unit, double Divisor) MediumScale(CompartmentFace compartment, DisplayUnits display)
        => display.MediumMassFraction is { } fraction && compartment.DensityKgPerCubicMeter is { } density
            ? (fraction, density)
            : (DisplayText.ConcentrationUnit(display), 1);

    private static void AddConcentrationPanel(
        PlotModel model, List<Medium> media, List<StateSample> samples, UnitDefinition timeUnit, (UnitDefinition Unit, double Divisor) scale, SimulationCase simulation)
    {
        var axis = PlotFrame.Linear(AxisPosition.Left, $"Concentration ({DisplayText.Unit(scale.Unit)})");
        axis.Key = ConcentrationAxisKey;
        axis.StartPosition = 0;
        axis.EndPosition = 0.34;
        axis.MinimumPadding = 0.05;
        axis.MaximumPadding = 0.1;
        model.Axes.Add(axis);
        for (var i = 0; i < media.Count; i++)
        {
            if (!media[i].Face.HasFiniteVolume)
            {
                continue;
            }

            var side = media[i].Side;
            var fresh = FreshPortions(simulation, side);
            DataPoint Point(double seconds, double kgPerCubicMeter) => new(timeUnit.FromSi(seconds), scale.Unit.FromSi(kgPerCubicMeter / scale.Divisor));

            // The sample at a renewal is taken before it: the fresh portion's level follows at the same time, so the
            // curve drops straight down rather than along a chord to the next output.
            var points = samples
                .Select(sample => (sample.TimeSeconds, Face: side == Side.Left ? sample.Left : sample.Right))
                .Where(pair => pair.Face is not null)
                .SelectMany(pair => fresh.FirstOrDefault(renewal => Math.Abs(renewal.Seconds - pair.TimeSeconds) <= 1e-9 * renewal.Seconds) is { Seconds: > 0 } renewal
                    ? new[] { Point(pair.TimeSeconds, pair.Face!.ConcentrationKgPerCubicMeter), Point(pair.TimeSeconds, renewal.Level) }
                    : [Point(pair.TimeSeconds, pair.Face!.ConcentrationKgPerCubicMeter)]);
            var series = Line(media[i].Name, points, i, ConcentrationAxisKey);
            series.RenderInLegend = false;
            model.Series.Add(series);
        }
    }

    /// <summary>The times a schedule renews the medium on a side, with the fresh portion's concentration, kg/m3.</summary>
    private static (double Seconds, double Level)[] FreshPortions(SimulationCase simulation, Side side)
    {
        if (simulation.Schedule is not { } schedule || !schedule.Renews(side))
        {
            return [];
        }

        return schedule.Renewals(side, simulation.Face(side))
            .Where(renewal => renewal.Fresh is CompartmentFace)
            .Select(renewal => (renewal.TimeSeconds, ((CompartmentFace)renewal.Fresh).InitialConcentrationKgPerCubicMeter))
            .ToArray();
    }

    // A dashed horizontal line with its label just above or below it, where no curve runs.
    private static void AddLimit(PlotModel model, PlotOptions options, double value, string label, UnitDefinition unit, string axisKey)
    {
        model.Annotations.Add(new LineAnnotation
        {
            Type = LineAnnotationType.Horizontal,
            Y = value,
            YAxisKey = axisKey,
            Color = PlotStyle.Limit,
            StrokeThickness = PlotStyle.ReferenceThickness * 1.25,
            LineStyle = LineStyle.Dash,
            Layer = AnnotationLayer.AboveSeries,
        });
        using var pass = LayoutPass.Run(model, options);
        var xAxis = model.Axes.First(axis => axis.IsHorizontal());
        var yAxis = model.Axes.First(axis => axis.Key == axisKey);
        var placer = new LabelPlacer(pass.PlotArea);
        foreach (var series in model.Series.OfType<LineSeries>())
        {
            var seriesAxis = model.Axes.First(axis => axis.Key == series.YAxisKey);
            placer.ReserveLine([.. series.Points.Select(point => new ScreenPoint(xAxis.Transform(point.X), seriesAxis.Transform(point.Y)))], 2);
        }

        var text = $"{label} {DisplayText.Quantity(value, unit)}";
        var size = Labels.BoxSize(pass, text);
        var area = pass.PlotArea;
        var y = yAxis.Transform(value);
        var gap = PlotStyle.LabelGap / 2;
        var candidates = Enumerable.Range(0, 9)
            .Select(step => area.Right - gap - size.Width - step * (area.Width - size.Width) / 8)
            .SelectMany(left => new[] { Labels.Box(left, y - gap - size.Height, size), Labels.Box(left, y + gap, size) })
            .ToList();
        var box = placer.Place(candidates);
        model.Annotations.Add(Labels.At(box, text, PlotStyle.Limit, xAxis, yAxis, PlotStyle.LabelBackground));
    }

    // With both faces closed nothing leaves the stack; what moves is the mass between layers, so that is drawn.
    private static PlotModel LayerHoldings(SimulationResult result, PlotOptions options, TimeAxis time, UnitDefinition massUnit)
    {
        var layers = result.Case.Stack.Layers;
        var samples = time.Samples(result).ToList();
        var drawn = HoldingMost(layers.Count, samples);
        var model = PlotFrame.Create(
            result.Case.Title,
            [drawn.Count == layers.Count
                ? "Both faces closed, nothing leaves the stack: mass per area held by each layer"
                : $"Both faces closed, nothing leaves the stack: mass per area held by the {drawn.Count} of the {layers.Count} layers that hold most"],
            options);
        model.Axes.Add(time.Axis);
        var axis = PlotFrame.Linear(AxisPosition.Left, $"Held per area of stack ({DisplayText.Unit(massUnit)})");
        axis.Key = MassAxisKey;
        model.Axes.Add(axis);
        var (low, high) = Range(
            samples.SelectMany(sample => sample.LayerMassPerArea).Select(massUnit.FromSi), options with { LimitMassPerArea = null }, massUnit);
        axis.Minimum = low;
        axis.Maximum = high;
        foreach (var i in drawn)
        {
            var index = i;
            model.Series.Add(Line(
                $"in {layers[i].Name}",
                samples.Select(sample => new DataPoint(time.Unit.FromSi(sample.TimeSeconds), massUnit.FromSi(sample.LayerMassPerArea[index]))),
                i,
                MassAxisKey));
        }

        return model;
    }

    // Most layers drawn one line each: more would not be told apart, and each costs a line and a legend entry.
    private const int MostLayersDrawn = 12;

    /// <summary>The layers drawn, in stack order: all, or the ones with the largest holding at any time.</summary>
    private static List<int> HoldingMost(int layerCount, List<StateSample> samples) =>
        layerCount <= MostLayersDrawn
            ? [.. Enumerable.Range(0, layerCount)]
            : [.. Enumerable.Range(0, layerCount)
                .OrderByDescending(i => samples.Select(sample => sample.LayerMassPerArea[i]).DefaultIfEmpty(0).Max())
                .Take(MostLayersDrawn)
                .Order()];

    private static string Shown(double kgPerCubicMeter, (UnitDefinition Unit, double Divisor) scale, bool floor = false)
    {
        var value = scale.Unit.FromSi(kgPerCubicMeter / scale.Divisor);
        return DisplayText.Quantity(floor ? Floor(value) : value, scale.Unit);
    }

    /// <summary>A floor to one significant digit, as the console shows it.</summary>
    private static double Floor(double value) => NegligibleFloor.RoundedUp(value);

    private static IEnumerable<string> Subtitle(SimulationResult result, List<Medium> media, Units units, PlotOptions options, MigrationLimit? migration)
    {
        var massUnit = units.MassPerArea;
        yield return "Mass transferred per contact area into each face medium";
        var end = result.TimeSeries[^1];
        // Below the run's reporting floor a figure has no known accuracy: "< floor" stands in for its digits.
        var amountFloor = NegligibleFloor.AmountPerArea(result);
        var finals = media.Where(medium => medium.Values.Count > 0).Select(medium =>
        {
            var face = medium.Side == Side.Left ? end.Left : end.Right;
            var transferred = medium.Plotted(medium.Values[^1].Transferred);
            var amount = NegligibleFloor.Hides(transferred, amountFloor)
                ? "< " + DisplayText.Quantity(Floor(massUnit.FromSi(amountFloor)), massUnit)
                : DisplayText.Quantity(massUnit.FromSi(transferred), massUnit);
            var concentrationFloor = NegligibleFloor.ConcentrationIn(result, medium.Side);
            var concentration = medium.Face is CompartmentFace compartment && face is not null
                ? NegligibleFloor.Hides(face.ConcentrationKgPerCubicMeter, concentrationFloor)
                    ? $" (< {Shown(concentrationFloor!.Value, MediumScale(compartment, result.Case.Display), floor: true)})"
                    : $" ({Shown(face.ConcentrationKgPerCubicMeter, MediumScale(compartment, result.Case.Display))})"
                : string.Empty;
            return $"{(medium.Flipped ? "out of" : "into")} {medium.Name} {amount}{concentration}";
        }).ToList();
        if (finals.Count > 0)
        {
            yield return $"after {DisplayText.Time(end.TimeSeconds, result.Case.Display.Time)}: " + string.Join(";  ", finals);
        }

        if (options.LimitMassPerArea is { } limit)
        {
            yield return LimitText(media, limit, options.LimitLabel, units, migration, result.Case.Display.Time);
        }
        else if (migration is { PerContact: { } verdict } && result.Case.Face(migration.FoodSide) is CompartmentFace food)
        {
            yield return RepeatedUseText(verdict, Shown(migration.FoodConcentrationKgPerCubicMeter, MediumScale(food, result.Case.Display)));
        }
    }

    /// <summary>The limit held against each fresh portion of food, and the repeated-use verdict at the judged contact.</summary>
    private static string RepeatedUseText(RepeatedUseVerdict verdict, string limit)
    {
        var judged = verdict.LimitExceeded ? "above the limit" : "within the limit";
        var rising = verdict.RisingFrom.Count > 0
            ? $"; migration rises after contact {string.Join(", ", verdict.RisingFrom)}"
            : string.Empty;
        return $"{MigrationLimit.Label} {limit} in each fresh portion of food; contact {verdict.JudgedContact} is judged: {judged}{rising}";
    }

    private static string LimitText(List<Medium> media, double limit, string label, Units units, MigrationLimit? migration, UnitDefinition timeUnit)
    {
        // A limit applies to what a medium receives: a donor's loss is not compared with it. The specific migration
        // limit applies to the food only, at the time the solver located.
        var crossings = media.Where(medium => migration is null ? !medium.Flipped : medium.Side == migration.FoodSide)
            .Select(medium => (medium.Name, Time: migration is null ? Crossing(medium, limit) : migration.ReachedSeconds))
            .Where(crossing => crossing.Time is not null)
            .Select(crossing => $"{crossing.Name} reaches it at {DisplayText.Time(crossing.Time!.Value, timeUnit)}")
            .ToList();
        var head = $"{label} {DisplayText.Quantity(units.MassPerArea.FromSi(limit), units.MassPerArea)}: ";
        return head + (crossings.Count > 0 ? string.Join("; ", crossings) : "not reached within the duration");
    }

    // The first time, s, by linear interpolation between output times, at which the plotted amount reaches a level.
    private static double? Crossing(Medium medium, double level)
    {
        var points = medium.Values.Select(value => (value.Seconds, Amount: medium.Plotted(value.Transferred))).ToList();
        for (var i = 1; i < points.Count; i++)
        {
            if (points[i - 1].Amount < level && points[i].Amount >= level)
            {
                var fraction = (level - points[i - 1].Amount) / (points[i].Amount - points[i - 1].Amount);
                return points[i - 1].Seconds + fraction * (points[i].Seconds - points[i - 1].Seconds);
            }
        }

        return points.Count > 0 && points[0].Amount >= level ? points[0].Seconds : null;
    }

    private sealed record Units(UnitDefinition Time, UnitDefinition MassPerArea, UnitDefinition Concentration);

    private sealed record Medium(
        Side Side,
        FaceCondition Face,
        string Name,
        string Title,
        bool Flipped,
        List<DataPoint> Points,
        List<(double Seconds, double Transferred)> Values)
    {
        /// <summary>The amount plotted, kg/m2: what the medium received, or what it gave for a donor.</summary>
        public double Plotted(double transferred) => Flipped ? -transferred : transferred;
    }
}

/// <summary>Where the transfer plot shows the compartments' concentrations.</summary>
internal enum CompartmentConcentrations
{
    /// <summary>No compartment: nothing to show.</summary>
    None,

    /// <summary>A second scale on the right reads the amount curve as the concentration.</summary>
    RightScale,

    /// <summary>A panel of its own under the amounts.</summary>
    Panel,
}
