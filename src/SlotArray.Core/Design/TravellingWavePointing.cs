using System.Globalization;
using SlotArray.Core.Network;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Design;

/// <summary>
/// Puts the beam of an isolated-slot (uncoupled) travelling-wave design where the phase condition asks for it: the
/// slot lengths are detuned off resonance so that every slot voltage follows the unloaded guide's progression
/// e^{jβz_n}, which points the array factor at sin θ_b = λ/λg − λ/(2d) (<see cref="TravellingWaveBeam"/>).
/// </summary>
/// <remarks>
/// <para>Why the resonant design misses. A resonant shunt slot is a real conductance g on the line, and each one
/// reflects g/(2 + g) of the wave reaching it. Between slots d ≠ λg/2 apart the reflections do not add in phase, but
/// near 0.45–0.48 λg they nearly do, and the loaded line no longer advances by βd per cell: for a periodic line of
/// shunt conductances the Bloch wave's constant obeys cosh(γd) = cos(βd) + j(g/2) sin(βd) (the ABCD matrix of one
/// cell, D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., Wiley 2012, §8.1, eq. (8.5) cosh γd = cos θ − (b/2) sin θ
/// for a shunt susceptance b, with jb replaced by the admittance y = g + jb; the equation number from memory), whose imaginary part is below βd when βd is a little under π. The slot voltages, and so
/// the far-field phases arg(y_n V_n), then advance less than βd per cell where the taper's conductances are largest,
/// and the beam moves toward the feed. Measured: WR-90 aluminium, 16 longitudinal slots, d = 21 mm (0.469 λg),
/// Taylor 30 dB n̄ = 4, 8 % load, 9.375 GHz: the resonant design's cell phases fall from βd = 168.97° to 160.6° in the
/// middle of the array and its beam lies at −3.19° instead of −2.675° (an independent lossless ABCD cascade of the
/// same conductances gives the array factor's peak at −3.21°; with the phases set to e^{jβz_n} the same array factor
/// peaks at −2.675°). The alternating-sign convention and the array factor's phase reference are not at fault.</para>
/// <para>Method. The fixed point of <see cref="CoupledTravellingWaveDesigner"/> with the isolated-slot line
/// (<see cref="ArrayNetwork"/>) in place of the coupled network: each iteration solves the line with the slot model's
/// own admittances at f0, sets the conductances from the measured slot powers, and moves each slot's length by the
/// departure of its voltage phase from e^{jβz_n} over the slope of arg y(l); the detuned slot's own admittance phase
/// arg y_n turns its far-field phase directly. It stops when the powers are within the designer's tolerance and every
/// phase within <see cref="ToleranceDegrees"/>. What remains between the achieved beam and the phase condition is the
/// element pattern's pull toward broadside (measured: 0.015° for the 16-slot case above, 0.027° for a beam at −4.5°);
/// above <see cref="ElementPullToleranceDegrees"/> one more pass aims the progression past it. When the detuned slots
/// would need more conductance than the slot gives, the spacing is moved instead (resonant slots).</para>
/// </remarks>
internal static class TravellingWavePointing
{
    /// <summary>Phase tolerance of the correction, degrees (every slot voltage within it of the progression, mean removed).</summary>
    public const double ToleranceDegrees = 0.01;

    /// <summary>
    /// The isolated-slot design of <see cref="TravellingWaveDesigner"/> with its slot lengths detuned so that the slot
    /// voltages follow e^{jβz_n} (see remarks); the returned figures are those of the corrected design.
    /// </summary>
    /// <param name="stick">The stick (travelling-wave feed; amplitudes a_n, slot 1 nearest the load first).</param>
    /// <exception cref="InfeasibleDesignException">A slot must absorb more than it can (named, with the numbers).</exception>
    /// <exception cref="ConvergenceException">The correction did not reach its tolerances.</exception>
    public static TravellingWaveDesign Design(StickRequest stick)
    {
        ArgumentNullException.ThrowIfNull(stick);
        var slot = stick.Slot;
        var start = TravellingWaveDesigner.Design(stick);
        var asked = start.Squint;
        if (asked is null) return start;
        var f0 = stick.DesignFrequency;
        var options = CoupledTravellingWaveOptions.Default with { ToleranceDegrees = ToleranceDegrees };
        try
        {
            const string context = " (isolated slots, lengths detuned for phase)";
            var corrected = CoupledTravellingWaveDesigner.Iterate(stick, options, start, d => ArrayNetwork.Solve(d, slot, f0), context,
                releaseSaturated: true);
            // The element pattern pulls the beam slightly toward broadside, and a slot left resonant (its phase free) pulls
            // it toward the feed: further passes on a progression steeper by dκ = k cos θ · residual (from
            // k sin θ = κ − π/d) remove it.
            double residual = AchievedBeam(corrected.Design, slot).Radians - asked.Value.Radians;
            double kappa = stick.Guide.PhaseConstant(f0);
            for (int pass = 0; Math.Abs(residual) * 180 / Math.PI > ElementPullToleranceDegrees; pass++)
            {
                if (pass == MaximumAimingPasses)
                    throw new ConvergenceException(string.Create(CultureInfo.InvariantCulture,
                        $"aiming the slot-phase progression left the beam {residual * 180 / Math.PI:0.###} deg off {asked.Value.Degrees:0.###} deg after {pass} passes"), pass, residual);
                kappa -= f0.FreeSpaceWavenumber * Math.Cos(asked.Value.Radians) * residual;
                corrected = CoupledTravellingWaveDesigner.Iterate(stick, options, start, d => ArrayNetwork.Solve(d, slot, f0), context, kappa,
                    releaseSaturated: true);
                residual = AchievedBeam(corrected.Design, slot).Radians - asked.Value.Radians;
            }
            return start with { Design = corrected.Design, AchievedErrorDb = corrected.ResidualDb / 2 }
                with { PhaseErrorDegrees = corrected.PhaseErrorDegrees, Correction = PointingCorrection.LengthDetuning, AskedBeam = asked,
                    PhaseIterations = corrected.Iterations };
        }
        catch (Exception e) when (e is InfeasibleDesignException or ConvergenceException)
        {
            return BySpacing(stick, start, asked.Value, e.Message);
        }
    }

    /// <summary>Residual above which the detuned design takes one more pass to remove the element pattern's pull, degrees.</summary>
    public const double ElementPullToleranceDegrees = 0.01;

    /// <summary>Passes aiming the progression's slope before the detuning is given up for the spacing correction.</summary>
    public const int MaximumAimingPasses = 8;

    /// <summary>Pointing residual the spacing correction aims for, degrees.</summary>
    public const double SpacingToleranceDegrees = 0.005;

    /// <summary>
    /// Largest pointing residual accepted when the slots' largest conductance stops the spacing short of the exact
    /// direction, degrees (the tool's pointing promise).
    /// </summary>
    public const double AcceptedResidualDegrees = 0.05;

    /// <summary>
    /// Spacing correction: resonant slots, the spacing d moved until the achieved beam (network at f0, pattern with the
    /// element) lies within <see cref="SpacingToleranceDegrees"/> of <paramref name="asked"/>. Newton steps on the
    /// phase condition's slope d(sin θ)/dd = λ/(2d²) (from sin θ_b = λ/λg − λ/(2d)); the loading's shift changes little
    /// with d, so each step removes most of the error. When a step needs more conductance than the slot can give (the
    /// spacing moves toward λg/2, where the reflections add), the feasible spacing nearest the target is found by
    /// bisection and accepted if its residual is within <see cref="AcceptedResidualDegrees"/>. Used when the detuned
    /// slots would need more conductance than the slot can give.
    /// </summary>
    private static TravellingWaveDesign BySpacing(StickRequest stick, TravellingWaveDesign start, Quantities.Angle asked, string why)
    {
        var slot = stick.Slot;
        var f0 = stick.DesignFrequency;
        double lambda = f0.FreeSpaceWavelength.Meters;
        TravellingWaveDesign At(double spacing) => TravellingWaveDesigner.Design(
            stick with { Feed = stick.Feed with { Spacing = GuideDistance.OfLength(Quantities.Length.FromMeters(spacing)) } });
        double d = start.Design.Spacing.Meters;
        var design = start;
        double residual = AchievedBeam(design.Design, slot).Degrees - asked.Degrees;
        int iterations = 0;
        while (Math.Abs(residual) >= SpacingToleranceDegrees)
        {
            if (++iterations > 20)
                throw new ConvergenceException(string.Create(CultureInfo.InvariantCulture,
                    $"moving the slot spacing did not bring the beam within {SpacingToleranceDegrees} deg of {asked.Degrees:0.000} deg ({why}): use a spacing farther from 0.5 guide-wavelength"),
                    iterations, residual);
            double next = d - Math.Cos(asked.Radians) * residual * Math.PI / 180 * 2 * d * d / lambda;
            TravellingWaveDesign moved;
            try { moved = At(next); }
            catch (InfeasibleDesignException limit)
            {
                // Bisect between the feasible d and the infeasible step for the feasible spacing nearest the target.
                double ok = d, bad = next;
                for (int k = 0; k < 30 && Math.Abs(bad - ok) > 1e-9; k++)
                {
                    double mid = 0.5 * (ok + bad);
                    try { design = At(mid); ok = mid; }
                    catch (InfeasibleDesignException) { bad = mid; }
                }
                design = At(ok);
                d = ok;
                residual = AchievedBeam(design.Design, slot).Degrees - asked.Degrees;
                if (Math.Abs(residual) > AcceptedResidualDegrees)
                    throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                        $"the beam cannot be put at {asked.Degrees:0.000} deg: detuning the slots for phase fails ({why}), and moving the spacing toward it stops at {d * 1e3:0.000} mm with the beam {Math.Round(residual, 3) + 0.0:+0.000;-0.000} deg off, because {limit.Message}"));
                break;
            }
            d = next;
            design = moved;
            residual = AchievedBeam(design.Design, slot).Degrees - asked.Degrees;
        }
        var warning = new DesignWarning("travelling-wave-spacing-corrected", string.Create(CultureInfo.InvariantCulture,
            $"the resonant slots' reflections slow the wave per cell, which moves the beam toward the feed; detuning the slot lengths to correct the phases is not possible here ({why}), so the spacing was moved from {start.Design.Spacing.Meters * 1e3:0.000} mm to {d * 1e3:0.000} mm to point the beam at {asked.Degrees:0.000} deg (residual {Math.Round(residual, 3) + 0.0:+0.000;-0.000} deg); the slot phases still ripple by up to {design.PhaseErrorDegrees:0.#} deg"));
        return design with { Design = design.Design with { Warnings = [.. design.Design.Warnings, warning] } }
            with { Correction = PointingCorrection.Spacing, AskedBeam = asked, PhaseIterations = iterations };
    }

    /// <summary>Main-beam direction of a design at its design frequency (isolated-slot network, pattern with the element).</summary>
    /// <param name="design">The design.</param>
    /// <param name="slot">The slot model.</param>
    public static Quantities.Angle AchievedBeam(ArrayDesign design, IShuntSlotModel slot)
    {
        ArgumentNullException.ThrowIfNull(design);
        return ArrayFigures.At(design, ArrayNetwork.Solve(design, slot, design.DesignFrequency)).Metrics.BeamDirection;
    }

    /// <summary>
    /// The pointing residual: achieved beam minus the asked direction, degrees, or null when either is missing.
    /// </summary>
    /// <param name="asked">The direction the phase condition (or <c>feed.beam</c>) asks for.</param>
    /// <param name="achieved">The achieved main-beam direction of the analysed pattern.</param>
    public static double? ResidualDegrees(Quantities.Angle? asked, Quantities.Angle? achieved)
        => asked is { } a && achieved is { } b ? b.Degrees - a.Degrees : null;
}
