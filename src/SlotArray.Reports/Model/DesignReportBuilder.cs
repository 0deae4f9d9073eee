using System.Globalization;
using System.Numerics;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Network;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Core.Slots;
using SlotArray.Core.Verdicts;

namespace SlotArray.Reports.Model;

/// <summary>
/// The adapter from the Core pipeline's <see cref="ArrayResult"/> to the writers' <see cref="DesignReport"/>: every
/// field of the report is taken from the result (and the request it carries), converted to the report's units.
/// </summary>
/// <remarks>
/// <list type="bullet">
/// <item>Positions: slot centres from the longitudinal datum, the inner face of the end short at z = 0 (the designer's
/// z axis, architecture.md "Axes"); offsets signed, positive toward the +x side wall.</item>
/// <item>Lengths: the equivalent rectangular length the slot model resonated, and the overall tip-to-tip length by
/// <see cref="FabricationPlan.Build"/> (round ends from the spec's cutter by the equal-area rule of <see cref="RoundEndedSlot"/>,
/// common practice; square ends without a cutter).</item>
/// <item>Amplitudes: the target is the taper weight, the achieved one the magnitude of the network's slot excitation
/// <see cref="NetworkSolution.Excitations"/> at the design frequency; both are normalised so that their largest
/// magnitude is 1. The achieved phase is that of the excitation relative to the slot of largest achieved amplitude.</item>
/// <item>Requirements: the verdicts of <see cref="RequirementChecks"/> (Core), worded by <see cref="RequirementWords"/>.</item>
/// <item>Travelling wave: datum the inner face of the load-end flange; the load power and efficiency from the network at
/// the design frequency; the squint and scan rate from the phase condition, and the scan rate also from the sweep.</item>
/// <item>Cautions: those of <see cref="ArraySafety.Assess"/> (Core): the standard caution always; with a transmitter, the
/// exposure screen and the power-handling margin with the network's own standing-wave peak field.</item>
/// </list>
/// </remarks>
internal static class DesignReportBuilder
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Floor of the pattern cut written to the report, dB below the beam peak.</summary>
    public const double PatternFloorDb = -100;

    /// <summary>The note every report carries: the model has no mutual coupling (unless the spec asked for it).</summary>
    public const string NoMutualCouplingNote =
        "mutual coupling between the slots is not in this model: the slots are designed and analysed as isolated slots (external coupling shifts their admittances and raises sidelobes)";

    /// <summary>Builds the report of one pipeline run.</summary>
    /// <param name="result">The pipeline's result.</param>
    /// <param name="document">Drawing number, revision, date and spec checksum for the fabrication documents; null: <see cref="DocumentInfo.Unnamed"/>.</param>
    /// <param name="plan">The fabrication plan, e.g. a next plate's with its changes flagged (<see cref="Core.Prototype.NextPlate.Plan"/>); null: the design's own, a first issue.</param>
    /// <exception cref="Core.InfeasibleDesignException">A slot cannot be cut as designed (it reaches the side wall, or the cutter is wider than the slot).</exception>
    public static DesignReport Build(ArrayResult result, DocumentInfo? document = null, FabricationPlan? plan = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        var request = result.Request;
        var design = result.Design;
        var guide = design.Guide;
        var f0 = design.DesignFrequency;
        double tolerance = FeatureTolerances.CutListTolerance(request.Tolerance).Meters;
        plan ??= FabricationPlan.Build(design, request.Feed.Type, request.Slots.Cutter, request.Tolerance);
        var atDesign = result.AtDesign;
        var slots = Slots(result, plan);
        var outside = SlotTableRangeCheck.Outside(design, result.SlotModel).Select(o => o.Index).ToHashSet();
        slots = [.. slots.Select(s => outside.Contains(s.Index) ? s with { OutsideSlotTable = true } : s)];

        var warnings = result.Warnings.Select(w => w.Message).ToList();
        warnings.AddRange(plan.Notes.Select(n => n.Message));
        if (request.Coupling == CouplingMode.None) warnings.Add(NoMutualCouplingNote);
        foreach (var b in new[] { result.BandVswr15, result.BandVswr2 })
            if (b is { } band && (band.LowLimited || band.HighLimited))
                warnings.Add(string.Create(Inv, $"the VSWR ≤ {band.VswrLimit:0.0#} band reaches the edge of the search range ({band.Low} to {band.High}): it is at least as wide as reported"));
        var addOns = result.AddOns;
        var travelling = result.Procedure switch
        {
            TravellingWaveProcedure p => p.TravellingWave,
            CoupledTravellingWaveProcedure p => p.TravellingWave,
            _ => null,
        };
        var safety = ArraySafety.Assess(result);
        var verdicts = RequirementChecks.Evaluate(result, safety);
        warnings.AddRange(verdicts.Notes.Select(n => n.Message));
        // Over-stress is a FAIL verdict and also a warning, so the console shows it as it happens.
        warnings.AddRange(safety.OverStress.Select(c => c.Message));

        return new DesignReport
        {
            Name = design.Name,
            FrequencyHz = f0.Hertz,
            BandLowHz = request.BandLow.Hertz,
            BandHighHz = request.BandHigh.Hertz,
            Guide = GuideOf(design),
            Slots = slots,
            SlotData = SlotDataOf(result.SlotModel),
            Termination = new TerminationReport
            {
                Type = TerminationName(design.NearTermination.Kind),
                Distance = design.NearTermination.Distance.Meters,
                FeedPosition = design.FeedPlane.Meters,
                FarShortPosition = design.FarTermination is { } far ? (design.Slots[^1].Position + far.Distance).Meters : null,
            },
            Pattern = PatternOf(result),
            Match = new MatchReport
            {
                S11DbAtDesign = 20 * Math.Log10(atDesign.Network.S11.Magnitude),
                VswrAtDesign = atDesign.Network.Vswr,
                BandwidthVswr15Hz = result.BandVswr15?.Width.Hertz ?? 0,
                BandwidthVswr2Hz = result.BandVswr2?.Width.Hertz ?? 0,
            },
            Sweep = SweepOf(result),
            MatchSweep = [.. result.MatchSweep.Points.Select(n => new MatchPoint { FrequencyHz = n.Frequency.Hertz, S11 = n.S11 })],
            Inputs = new InputsSummary
            {
                SlotType = SlotTypeName(request.Slots.Type),
                FeedType = FeedName(request.Feed),
                TaperDescription = TaperName(request.Taper, result.Taper.Method),
                SlotModelName = SlotModelName(design.SlotModelName),
                DatumDescription = DatumName(request.Feed.Type),
                CutTolerance = tolerance,
            },
            Warnings = warnings,
            Fabrication = plan,
            Document = document ?? DocumentInfo.Unnamed,
            Cautions = [.. safety.Cautions.Select(c => c.Message)],
            SafetyExceedances = [.. safety.Exceedances.Select(c => c.Message)],
            Eirp = request.Transmitter is not null ? new EirpReport { PeakW = safety.PeakEirpWatts, AverageW = safety.AverageEirpWatts } : null,
            Requirements = Requirements(verdicts, result),
            Load = travelling is { } tw ? new LoadReport { Fraction = tw.LoadFraction, PowerWPerWIn = atDesign.Network.LoadPower } : null,
            TravellingWave = travelling is { } t ? TravellingWaveOf(result, t) : null,
            Pointing = addOns.Pointing is { } pb ? PointingReport.Of(pb) : null,
            Parts = plan is not null && (addOns.Flare is not null || addOns.Filter is not null)
                ? PartRow.Of(Core.Marine.MarineParts.Of(design, plan.DesignOrigin, addOns.Flare?.Flare, addOns.Filter?.Filter)) : [],
            Flare = addOns.Flare is { } fo ? FlareReport.Of(fo, request.Requirements.VerticalBeamwidth) : null,
            Filter = addOns.Filter is { } flt && atDesign.CrossPolar is { } xc
                ? FilterReport.Of(flt, request.DesignFrequency, CrossLevels(xc, atDesign.Pattern.PeakPower), request.Requirements.CrossPolarDb) : null,
            Coupling = CouplingReport.Of(result),
        };
    }

    private static GuideReport GuideOf(ArrayDesign design)
    {
        var guide = design.Guide;
        var f0 = design.DesignFrequency;
        return new GuideReport
        {
            Designation = guide.Designation == "custom"
                ? string.Create(Inv, $"custom tube {guide.BroadWall.Millimeters:0.###} × {guide.NarrowWall.Millimeters:0.###} mm inside")
                : guide.Designation,
            A = guide.BroadWall.Meters,
            B = guide.NarrowWall.Meters,
            Wall = guide.WallThickness.Meters,
            Metal = guide.MetalName,
            GuideWavelength = design.GuideWavelength.Meters,
            WaveImpedanceOhm = guide.WaveImpedance(f0),
        };
    }

    private static PatternReport PatternOf(ArrayResult result)
    {
        var request = result.Request;
        var atDesign = result.AtDesign;
        var design = result.Design;
        var face = FiniteFaceBeamwidth.SlottedFaceWidth(design.Guide, design.CouplingKind == SlotCouplingKind.Tilt);
        return new PatternReport
        {
            BeamDeg = atDesign.Metrics.BeamDirection.Degrees,
            HpbwDeg = atDesign.Metrics.HalfPowerBeamwidth.Degrees,
            PeakSidelobeDb = atDesign.Metrics.PeakSidelobeDb ?? double.NaN,
            FirstSidelobeDb = atDesign.Metrics.FirstSidelobeDb ?? double.NaN,
            DirectivityDbi = atDesign.DirectivityDbi,
            GainDbi = atDesign.GainDbi,
            DesignSidelobeDb = SidelobeTarget.OfTaper(request.Taper, result.Taper)?.LevelDb ?? double.NaN,
            CutAngleDeg = [.. atDesign.Pattern.Theta.Select(t => t * 180 / Math.PI)],
            CutLevelDb = atDesign.Pattern.RelativeDecibels(PatternFloorDb),
            CrossPolarDb = atDesign.CrossPolar?.PeakLevelDb,
            CrossPolarDirectionDeg = atDesign.CrossPolar?.PeakDirection.Degrees,
            CrossCutLevelDb = atDesign.CrossPolar is { } x ? CrossLevels(x, atDesign.Pattern.PeakPower) : [],
            TransverseFaceWidth = face.Meters,
            TransverseHpbwLowerBoundDeg = FiniteFaceBeamwidth.LowerBound(face, request.DesignFrequency)?.Degrees ?? double.NaN,
        };
    }

    private static IReadOnlyList<SweepPoint> SweepOf(ArrayResult result)
    {
        return [.. result.SweepFigures.Select(p => new SweepPoint
        {
            FrequencyHz = p.Frequency.Hertz,
            S11 = p.Network.S11,
            BeamDeg = p.Metrics.BeamDirection.Degrees,
            PeakSidelobeDb = p.Metrics.PeakSidelobeDb ?? double.NaN,
            GainDbi = p.GainDbi,
            HpbwDeg = p.Metrics.HalfPowerBeamwidth.Degrees,
            CrossPolarDb = p.CrossPolar?.PeakLevelDb,
        })];
    }

    /// <summary>Cross-polar cut in dB relative to the co-polar peak, floored at <see cref="PatternFloorDb"/>.</summary>
    private static double[] CrossLevels(Core.Patterns.CrossPolarFigures x, double coPeak) =>
        [.. x.Pattern.Power.Select(p => p > 0 && coPeak > 0 ? Math.Max(PatternFloorDb, 10 * Math.Log10(p / coPeak)) : PatternFloorDb)];

    private static TravellingWaveReport TravellingWaveOf(ArrayResult result, TravellingWaveDesign tw)
    {
        var n = result.AtDesign.Network;
        double slope = BeamScan.DegreesPer100MHz(result.SweepFigures);
        return new TravellingWaveReport
        {
            SquintDeg = tw.Squint?.Degrees ?? double.NaN,
            ScanDegPer100MHz = tw.ScanRateDegreesPer100MHz ?? double.NaN,
            ScanFromSweepDegPer100MHz = slope,
            Efficiency = n.RadiationEfficiency,
            WallLossWPerWIn = n.WallLoss,
            RefinementIterations = tw.Refinement.Iterations,
            RefinementResidualDb = tw.Refinement.ResidualDb,
            PhaseErrorDeg = tw.PhaseErrorDegrees,
            BeamAskedDeg = (tw.AskedBeam ?? tw.Squint)?.Degrees ?? double.NaN,
            BeamResidualDeg = TravellingWavePointing.ResidualDegrees(tw.AskedBeam ?? tw.Squint, result.AtDesign.Metrics.BeamDirection) ?? double.NaN,
            PointingCorrection = tw.Correction switch
            {
                PointingCorrection.LengthDetuning => "length-detuning",
                PointingCorrection.Spacing => "spacing",
                _ => "none",
            },
            SpacingM = result.Design.Spacing.Meters,
            LoadAuto = result.Request.Feed.AutoLoad,
        };
    }

    private static List<SlotReport> Slots(ArrayResult result, FabricationPlan plan)
    {
        var design = result.Design;
        var excitation = RelativeExcitation.Of(design, result.AtDesign.Network);
        var list = new List<SlotReport>(design.Count);
        for (int i = 0; i < design.Count; i++)
        {
            var s = design.Slots[i];
            var row = plan.Slots[i].Row;
            list.Add(new SlotReport
            {
                Index = s.Index,
                Position = s.Position.Meters,
                Offset = row.Offset?.Meters,
                TiltDeg = row.Tilt?.Degrees,
                CutDepth = row.Tilt is null ? null : row.DepthOfCut?.Meters ?? 0,
                Length = s.Length.Meters,
                OverallLength = row.OverallLength.Meters,
                Width = s.Width.Meters,
                EndForm = row.End.Form == Core.Fabrication.SlotEndForm.Round ? SlotEndForm.Round : SlotEndForm.Square,
                Conductance = s.Conductance,
                TargetAmplitude = excitation[i].TargetAmplitude,
                AchievedAmplitude = excitation[i].AchievedAmplitude,
                AchievedPhaseDeg = excitation[i].AchievedPhaseDegrees,
            });
        }
        return list;
    }

    private static List<RequirementResult> Requirements(RequirementVerdicts verdicts, ArrayResult result) =>
        [.. verdicts.Verdicts.Select(v => RequirementWords.Of(v, result.Request))];

    private static string DatumName(FeedType feed) => feed == FeedType.TravellingWave
        ? "inner face of the load-end flange (matched load)"
        : "inner face of the end short";

    private static string TerminationName(TerminationKind k) => k switch
    {
        TerminationKind.Short => "short",
        TerminationKind.MatchedLoad => "matched-load",
        _ => "load",
    };

    private static string SlotTypeName(SlotType t) => t switch
    {
        SlotType.Longitudinal => "longitudinal",
        SlotType.Edge => "edge",
        _ => "inclined-series",
    };

    private static string FeedName(FeedRequest f) => f.Type == FeedType.StandingWave
        ? "standing-wave, " + (f.Position == FeedPosition.Centre ? "centre-fed" : "end-fed")
        : "travelling-wave";

    /// <summary>The user's slot table behind the design's slot model, in report form; null for a built-in model.</summary>
    private static SlotDataReport? SlotDataOf(Core.Slots.IShuntSlotModel slot)
    {
        if (SlotTableRangeCheck.TableOf(slot) is not { } model) return null;
        var fit = model.Fit;
        var r = fit.Range;
        var res = fit.Residuals;
        bool offset = fit.CouplingKind == Core.Slots.SlotCouplingKind.Offset;
        string C(double c) => offset ? string.Create(Inv, $"{c * 1e3:0.####} mm") : string.Create(Inv, $"{c * 180 / Math.PI:0.###} deg");
        return new SlotDataReport
        {
            File = fit.Table.Source,
            Sha256 = fit.Table.Sha256,
            Provenance = fit.Table.Provenance,
            Rows = fit.Table.Rows.Count,
            Range = string.Create(Inv, $"{(offset ? "offset" : "tilt")} {C(r.CouplingLow)} to {C(r.CouplingHigh)}, L/L_r {r.LengthRatioLow:0.####} to {r.LengthRatioHigh:0.####}, {r.FrequencyLow / 1e9:0.######} to {r.FrequencyHigh / 1e9:0.######} GHz"),
            Extrapolate = model.Extrapolate,
            Residuals = [res.ResonantLengthRms, res.ResonantLengthMax, res.ResonantConductanceRms, res.ResonantConductanceMax, res.AdmittanceRms, res.AdmittanceMax],
        };
    }

    private static string SlotModelName(string name) => name switch
    {
        "moment-method" => "moment method (finite wall)",
        "stevenson" => "Stevenson conductance, moment-method resonant length",
        _ => name,
    };

    private static string TaperName(TaperRequest t, string method) => t.Type switch
    {
        TaperType.Uniform => "uniform",
        TaperType.Given => string.Create(Inv, $"given ({t.Weights?.Count ?? 0} weights)"),
        TaperType.CosinePedestal => string.Create(Inv, $"cosine on a pedestal, edge {t.EdgeLevelDb:0.0#} dB, exponent {t.Exponent:0.##}"),
        TaperType.Taylor or TaperType.Villeneuve or TaperType.Bayliss => string.Create(Inv, $"{method}, {t.SidelobeLevelDb:0.0#} dB, nbar {t.Nbar}"),
        _ => string.Create(Inv, $"{method}, {t.SidelobeLevelDb:0.0#} dB"),
    };
}
