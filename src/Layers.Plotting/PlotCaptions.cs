using Layers.Core.Domain;
using Layers.Core.Results;

namespace Layers.Plotting;

/// <summary>
/// The caption of each plot in report.html: what the figure shows and how to read it, in words a reader who has not
/// seen the program can follow; the plot's own title and subtitle carry the case's numbers.
/// </summary>
internal static class PlotCaptions
{
    public static string Profile(SimulationResult result)
    {
        var simulation = result.Case;
        var strips = new[] { ("left", FaceText.MediumName(simulation.Left)), ("right", FaceText.MediumName(simulation.Right)) }
            .Where(face => face.Item2 is not null)
            .Select(face => $"beyond the {face.Item1} face stands for {face.Item2}")
            .ToList();
        var media = strips.Count switch
        {
            0 => string.Empty,
            1 => $" The blue strip {strips[0]}, at its concentration at the same times.",
            _ => $" The blue strip {strips[0]} and the one {strips[1]}, each at its concentration at the same times.",
        };
        var jumps = simulation.Stack.Count > 1
            ? " The jumps at the interfaces are the partition coefficients: at every interface, at all times, the concentrations on its two sides are in the ratio of the two layers' partition coefficients."
            : string.Empty;
        return "Concentration across the stack against depth from the left face, one colour per report time, the dashed grey line the initial state; "
            + "the shaded bands are the layers, named at the top." + media + jumps;
    }

    public static string Transfer(SimulationResult result)
    {
        var simulation = result.Case;
        if (FaceText.MediumName(simulation.Left) is null && FaceText.MediumName(simulation.Right) is null)
        {
            return "Both faces are closed, so nothing leaves the stack: the mass per area held by each layer against time, "
                + "which shows the drug moving from layer to layer; the total stays constant.";
        }

        var text = "Mass per contact area that has moved into each face medium against time (for a medium that feeds the stack, "
            + "the mass that has moved out of it, drawn positive). ";
        text += TransferPlot.ConcentrationsShown(result) switch
        {
            CompartmentConcentrations.RightScale => "The right-hand scale reads the same curve as the receiving compartment's concentration. ",
            CompartmentConcentrations.Panel => "The panel under the amounts shows the compartments' concentrations. ",
            _ => string.Empty,
        };

        if (MigrationLimit.Of(result) is { PerContact: not null })
        {
            text += "The food is renewed, so the amount it received no longer reads as its concentration: the dashed red line in the panel is the specific migration limit, which each fresh portion's concentration is held to. ";
        }
        else if (MigrationLimit.Of(result) is not null)
        {
            text += "The dashed red line is the specific migration limit as a mass per contact area; where the food's curve meets it, the food reaches the limit. ";
        }

        return text + (result.FinalState.Kind == FinalStateKind.SteadyPermeation
            ? "Once the permeation is steady the curves run straight, with the steady flux as their slope."
            : "A curve that levels off shows the medium approaching equilibrium.");
    }

    public static string FinalState(SimulationResult result)
    {
        var simulation = result.Case;
        if (result.FinalState.Kind == FinalStateKind.SteadyPermeation)
        {
            var receiver = FaceText.MediumName(simulation.Right) ?? "the right face medium";
            return $"Cumulative amount per contact area received by {receiver} against time, with the steady-state asymptote "
                + "J (t - lag time) dashed: its slope is the steady flux J and it meets the time axis at the lag time (marked).";
        }

        var target = result.FinalState.Kind switch
        {
            FinalStateKind.AllRemoved => "the state in which first-order removal has taken everything",
            FinalStateKind.BathEquilibrium => "equilibrium with the bath",
            _ => "equilibrium",
        };
        return $"Progress toward {target} against time: 0 % at the start, 100 % at the final state; the whole system is drawn solid, "
            + "each compartment dashed, with the times to 50, 90 and 99 % marked on the dashed grey lines (those beyond the duration are in the subtitle).";
    }

    public static string Cumulative(SimulationResult result)
    {
        var receiver = FaceText.MediumName(result.Case.Right) ?? "the right face medium";
        return $"Cumulative amount per contact area received by {receiver} against time: the model (line), the amounts of the "
            + "receptor samples corrected for earlier samples (open markers) and the measured amounts (filled markers), with the "
            + "steady line fitted to each (dashed) where one is reached; a steady line's slope is the steady flux and it meets the "
            + "time axis at the lag time.";
    }
}
