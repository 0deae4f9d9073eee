using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Planar;

/// <summary>A designed and analysed planar array.</summary>
/// <param name="Request">The spec's request.</param>
/// <param name="Design">The design (branch sticks, coupling slots, feed guide).</param>
/// <param name="SlotModel">The branch guide's slot model the design used.</param>
/// <param name="PitchAuto">True when the pitch was solved (<c>pitch: auto</c>).</param>
/// <param name="FeedWidthSolved">True when the feed guide's broad wall was solved for the pitch.</param>
/// <param name="AtDesign">The network at the design frequency.</param>
/// <param name="Sweep">The network across the band (the design frequency not included).</param>
/// <param name="Figures">Pattern figures at the design frequency.</param>
/// <param name="Positions">Aperture x, y (m) of every slot centre, layout order.</param>
internal sealed record PlanarResult(ArrayRequest Request, PlanarDesign Design, IShuntSlotModel SlotModel, bool PitchAuto, bool FeedWidthSolved,
    PlanarSolution AtDesign, IReadOnlyList<PlanarSolution> Sweep, PlanarFigures Figures, IReadOnlyList<(double X, double Y)> Positions);

/// <summary>
/// The planar job as one pure function: the geometry (pitch, feed guide, layout), the planar design
/// (<see cref="PlanarDesigner"/>: the stick designer per branch, then Elliott's coupled iteration over the aperture and the
/// feed), the network across the band (<see cref="PlanarNetwork"/> through the frequency-interpolated slot model, as the
/// linear pipeline does) and the pattern figures (<see cref="PlanarFigures"/>).
/// </summary>
internal static class PlanarPipeline
{
    /// <summary>Sweep points across the band (each a full coupled network solve).</summary>
    public const int SweepPoints = 21;

    /// <summary>The pitch and feed guide a planar request resolves to (see <see cref="PlanarArrayRequest"/>).</summary>
    /// <exception cref="InfeasibleDesignException">The pitch is smaller than the branch guides allow, or no feed guide fits it.</exception>
    public static (Length Pitch, RectangularWaveguide Feed, bool FeedSolved) Geometry(ArrayRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var p = request.Planar ?? throw new ArgumentException("not a planar request", nameof(request));
        var f0 = request.DesignFrequency;
        var min = FeedGuideSizing.MinimumPitch(request.Guide, p.CommonWall);
        Length pitch = p.Pitch ?? (p.FeedGuide is { } given ? FeedGuideSizing.RequiredPitch(given, f0) : min);
        if (pitch.Meters < min.Meters * (1 - 1e-12))
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"the branch pitch {pitch.Millimeters:0.###} mm is less than the branch guide's a + common wall = {min.Millimeters:0.###} mm: the branches would overlap; {(p.FeedGuide is null ? "give a larger pitch" : "widen the feed guide's a (its λg/2 sets the pitch) or thin the common wall")}"));
        if (p.FeedGuide is { } fg)
        {
            var need = FeedGuideSizing.RequiredPitch(fg, f0);
            if (Math.Abs(need.Meters - pitch.Meters) > 1e-4 * pitch.Meters)
                throw new InfeasibleDesignException(FormattableString.Invariant(
                    $"the feed guide's λg/2 is {need.Millimeters:0.###} mm but the branch pitch is {pitch.Millimeters:0.###} mm: the coupling slots must sit λg/2 apart; set array.pitch: auto, or change feed.guide.a to {FeedGuideSizing.FeedWidthForPitch(pitch, f0).Millimeters:0.###} mm"));
            return (pitch, fg, false);
        }
        var a = FeedGuideSizing.FeedWidthForPitch(pitch, f0, request.Guide.RelativePermittivity);
        return (pitch, request.Guide with { BroadWall = a, Designation = "feed (a solved for the pitch)" }, true);
    }

    /// <summary>The aperture layout at the given pitch and the aperture taper a planar request asks for.</summary>
    public static (PlanarLayout Layout, ApertureTaper Taper) LayoutAndTaper(ArrayRequest request, Length pitch)
    {
        ArgumentNullException.ThrowIfNull(request);
        var p = request.Planar ?? throw new ArgumentException("not a planar request", nameof(request));
        var layout = PlanarLayout.Create(p.Branches, request.Slots.Count, 0.5 * request.Guide.GuideWavelength(request.DesignFrequency), pitch, p.Outline);
        var taper = p.CircularSidelobesDb is { } sll
            ? ApertureTaper.CircularTaylor(sll, p.CircularNbar)
            : new ApertureTaper(request.Taper, p.Across ?? request.Taper);
        return (layout, taper);
    }

    /// <summary>
    /// The grating-lobe skirt figures <c>check</c> can give before any design: the taper's weights on the layout, beam at
    /// broadside (a standing-wave planar array's fixed beam).
    /// </summary>
    public static (GratingLobeSkirt Along, GratingLobeSkirt Across) TaperSkirts(ArrayRequest request, Length pitch)
    {
        var (layout, taper) = LayoutAndTaper(request, pitch);
        var w = taper.Weights(layout).Weights;
        return PlanarPatternWarnings.Skirts(layout, [.. w.Select(x => new System.Numerics.Complex(x, 0))], request.DesignFrequency);
    }

    /// <summary>Designs and analyses a planar request with the slot source chosen at the composition root.</summary>
    public static PlanarResult Run(ArrayRequest request, SlotSource? source = null)
    {
        ArgumentNullException.ThrowIfNull(request);
        return ParallelFailures.Unwrapped(() => RunStages(request, source));
    }

    private static PlanarResult RunStages(ArrayRequest request, SlotSource? source)
    {
        var p = request.Planar ?? throw new ArgumentException("not a planar request", nameof(request));
        var f0 = request.DesignFrequency;
        var (pitch, feed, solved) = Geometry(request);
        var slot = ArrayPipeline.SlotModelFor(request, source);
        var (layout, taper) = LayoutAndTaper(request, pitch);
        var planar = new PlanarRequest(request.Name, request.Guide, feed, f0, layout, taper, slot, request.Feed.Position,
            request.Coupling == CouplingMode.Mutual) { Cutter = request.Slots.Cutter };
        var design = PlanarDesigner.Design(planar);
        bool coupled = design.Coupled;
        var model = new FrequencyInterpolatedSlotModel(slot, f0);
        model.Prepare([.. design.Branches.SelectMany(b => b.Stick.Slots).Select(s => (s.Coupling, s.Length))], request.BandLow, request.BandHigh);
        var atDesign = PlanarNetwork.Solve(design, slot, f0, coupled);
        var sweep = new PlanarSolution[SweepPoints];
        Parallel.For(0, SweepPoints, new ParallelOptions { MaxDegreeOfParallelism = 2 }, i =>
            sweep[i] = PlanarNetwork.Solve(design, model, Frequency.FromHertz(request.BandLow.Hertz + (request.BandHigh.Hertz - request.BandLow.Hertz) * i / (SweepPoints - 1)), coupled));
        var placements = PlanarDesigner.Placements(design);
        var positions = placements.Select(q => (q.Position.Meters, q.Offset.Meters)).ToArray();
        var field = new PlanarArrayFactor(positions.Select(q => q.Item1).ToArray(), positions.Select(q => q.Item2).ToArray(), atDesign.Excitations, f0.FreeSpaceWavenumber);
        var figures = PlanarFigures.Of(field, layout.Area, atDesign.Excitations, f0, atDesign.SlotPowers.Sum(), atDesign.InputPower);
        var (along, across) = PlanarPatternWarnings.Skirts(layout, atDesign.Excitations, f0, figures.Beam.U, figures.Beam.V);
        design = design with { Warnings = [.. design.Warnings, .. PlanarPatternWarnings.Grating(along, across, f0), .. PlanarPatternWarnings.Sidelobes(request, figures)] };
        return new PlanarResult(request, design, slot, p.Pitch is null, solved, atDesign, Array.AsReadOnly(sweep), figures,
            Array.AsReadOnly(positions.Select(q => (q.Item1, q.Item2)).ToArray()));
    }
}
