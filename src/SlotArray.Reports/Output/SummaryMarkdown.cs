using System.Numerics;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>summary.md</c>: the human-readable report: inputs, key figures (units stated), the per-slot table, a
/// pass/fail line per requirement, warnings, optional tolerance lines and the cautions. "\n" line ends.
/// </summary>
internal static class SummaryMarkdown
{
    /// <summary>The caution printed when the report carries none of its own (issue 5, item 5).</summary>
    public const string StandardCaution =
        "RF exposure and high transmitter power can hurt; local regulations and licensed practice govern.";

    /// <summary>Writes the summary of <paramref name="report"/>.</summary>
    public static void Write(DesignReport report, TextWriter writer)
    {
        void L(string line = "") { writer.Write(line); writer.Write('\n'); }

        L($"# {Escape(report.Name)}: slotted-waveguide array design");
        L();
        L(VerdictLine(report));
        foreach (var q in report.Requirements.Where(q => !q.Passed))
            L($"- not met: {Escape(q.Description)}: required {Escape(q.Required)}, achieved {Escape(q.Achieved)}");
        foreach (string x in report.SafetyExceedances) L($"- **SAFETY LIMIT EXCEEDED**: {Escape(x)}");
        L();
        WriteInputs(report, L);
        WriteSlotData(report, L);
        WriteKeyFigures(report, L);
        L();
        if (report.Flare is { } flare) MarineSummary.WriteFlare(flare, report, s => L(s));
        if (report.Pointing is { } pointing) MarineSummary.WritePointing(pointing, s => L(s));
        MarineSummary.WriteParts(report.Parts, s => L(s));
        if (report.Filter is { } flt) MarineSummary.WriteFilter(flt, report.FrequencyHz, s => L(s));
        WriteScan(report, L);
        L();
        if (report.Coupling is { } coupling) CouplingSummary.Write(coupling, s => L(s));
        L("## Requirements");
        L();
        if (report.Requirements.Count == 0) L("No requirements were given.");
        foreach (var q in report.Requirements) L(RequirementLine(q));
        L();
        WriteSlotTable(report, L);
        WriteNotes(report, L);
    }

    /// <summary>The inputs table.</summary>
    private static void WriteInputs(DesignReport report, Action<string> L)
    {
        var g = report.Guide;
        var i = report.Inputs;
        L("## Inputs");
        L("");
        L("| item | value |");
        L("| --- | --- |");
        L($"| guide | {Escape(g.Designation)}: a = {Invariant.Mm(g.A)} mm, b = {Invariant.Mm(g.B)} mm |");
        L($"| wall, metal | {Invariant.Mm(g.Wall)} mm, {Escape(g.Metal)} |");
        L($"| design frequency | {Invariant.Ghz(report.FrequencyHz, 4)} GHz |");
        L($"| band | {Invariant.Ghz(report.BandLowHz, 4)} to {Invariant.Ghz(report.BandHighHz, 4)} GHz |");
        L($"| slots | {Invariant.Int(report.Slots.Count)} × {Escape(i.SlotType)} |");
        L($"| feed | {Escape(i.FeedType)} |");
        L($"| taper | {Escape(i.TaperDescription)} |");
        L($"| slot model | {Escape(i.SlotModelName)} |");
        L($"| datum A | {Escape(report.Fabrication?.Datum ?? i.DatumDescription)} |");
        L($"| cut tolerance | ± {Invariant.Mm(i.CutTolerance)} mm |");
        L("");
    }

    /// <summary>The user's slot table, when the slots were designed from one.</summary>
    private static void WriteSlotData(DesignReport report, Action<string> L)
    {
        if (report.SlotData is { } sd)
        {
            L("## Slot data");
            L("");
            L($"The slots were designed from the table `{Escape(sd.File)}` (SHA-256 `{sd.Sha256}`), {Invariant.Int(sd.Rows)} rows: {Escape(sd.Range)}.");
            L($"Fit residuals (leave-one-out): L_r rms {Invariant.Fixed(sd.Residuals[0] * 100, 4)} %, max {Invariant.Fixed(sd.Residuals[1] * 100, 4)} %; g_r rms {Invariant.Fixed(sd.Residuals[2] * 100, 4)} %, max {Invariant.Fixed(sd.Residuals[3] * 100, 4)} %; y/g_r rms {Invariant.Fixed(sd.Residuals[4], 4)}, max {Invariant.Fixed(sd.Residuals[5], 4)}.");
            int outside = report.Slots.Count(s => s.OutsideSlotTable);
            if (outside > 0) L($"{Invariant.Int(outside)} slot(s) lie outside the table and were extrapolated (slots.extrapolate: true); they are marked \"outside table\" below and in the cut list.");
            L("");
            L("Provenance (the table's comment lines):");
            L("");
            foreach (string line in sd.Provenance) L($"> {Escape(line)}");
            if (sd.Provenance.Count == 0) L("> (the table has no comment lines)");
            L("");
        }
    }

    /// <summary>The key figures table: guide, termination, tube, pattern, match, EIRP, load, travelling wave.</summary>
    private static void WriteKeyFigures(DesignReport report, Action<string> L)
    {
        var g = report.Guide;
        L("## Key figures");
        L("");
        var p = report.Pattern;
        var m = report.Match;
        L("| quantity | value | unit |");
        L("| --- | ---: | --- |");
        L($"| guide wavelength at the design frequency | {Invariant.Mm(g.GuideWavelength)} | mm |");
        L($"| TE10 wave impedance | {Invariant.Fixed(g.WaveImpedanceOhm, 2)} | Ω |");
        L($"| termination: {Escape(report.Termination.Type)}, its plane (z = 0) to the centre of slot 1 | {Invariant.Mm(report.Termination.Distance)} | mm |");
        if (report.Termination.FeedPosition is { } feed) L($"| feed reference plane from z = 0 | {Invariant.Mm(feed)} | mm |");
        if (report.Termination.FarShortPosition is { } far) L($"| second end short (inner face) from z = 0 | {Invariant.Mm(far)} | mm |");
        if (report.Fabrication is { } plan)
        {
            L($"| tube length, datum A (the tube's machined end face) to its far end | {Invariant.Mm(plan.TubeLength.Meters)} | mm |");
            L($"| datum A to z = 0 (cutlist.csv, layout and DXF positions are z + this) | {Invariant.Mm(plan.DesignOrigin.Meters)} | mm |");
        }
        L($"| beam direction from broadside | {Invariant.Fixed(p.BeamDeg, 2)} | deg |");
        L($"| half-power beamwidth | {Invariant.Fixed(p.HpbwDeg, 2)} | deg |");
        if (!double.IsNaN(p.TransverseFaceWidth))
            L(double.IsNaN(p.TransverseHpbwLowerBoundDeg)
                ? $"| transverse-plane (E-plane) half-power beamwidth, slotted face {Invariant.Mm(p.TransverseFaceWidth)} mm wide | no beam: wider than the front half-space | (see note) |"
                : $"| transverse-plane (E-plane) half-power beamwidth, slotted face {Invariant.Mm(p.TransverseFaceWidth)} mm wide | ≥ {Invariant.Fixed(p.TransverseHpbwLowerBoundDeg, 1)} | deg (lower bound, see note) |");
        L($"| peak sidelobe (design level {Invariant.Fixed(p.DesignSidelobeDb, 1)} dB) | {Invariant.Fixed(p.PeakSidelobeDb, 2)} | dB |");
        L($"| first sidelobe | {Invariant.Fixed(p.FirstSidelobeDb, 2)} | dB |");
        L($"| directivity | {Invariant.Fixed(p.DirectivityDbi, 2)} | dBi |");
        L($"| gain | {Invariant.Fixed(p.GainDbi, 2)} | dBi |");
        L($"| S11 at the design frequency | {Invariant.Fixed(m.S11DbAtDesign, 2)} | dB |");
        L($"| VSWR at the design frequency | {Invariant.Fixed(m.VswrAtDesign, 3)} | |");
        L($"| bandwidth with VSWR ≤ 1.5 | {Invariant.Fixed(m.BandwidthVswr15Hz * 1e-6, 1)} | MHz |");
        L($"| bandwidth with VSWR ≤ 2 | {Invariant.Fixed(m.BandwidthVswr2Hz * 1e-6, 1)} | MHz |");
        if (report.Sweep.Count > 0)
        {
            double worst = report.Sweep.Max(s => Complex.Abs(s.S11));
            L($"| worst VSWR over the sweep ({Invariant.Ghz(report.Sweep[0].FrequencyHz)} to {Invariant.Ghz(report.Sweep[^1].FrequencyHz)} GHz) | {Invariant.Fixed((1 + worst) / (1 - worst), 3)} | |");
        }
        if (report.Eirp is { } eirp)
        {
            if (eirp.PeakW is { } pk) L($"| EIRP on the beam axis at the peak transmitter power (P G) | {Invariant.Fixed(Dbw(pk), 2)} | dBW ({Watts(pk)}) |");
            if (eirp.AverageW is { } av) L($"| EIRP on the beam axis at the average transmitter power (P G) | {Invariant.Fixed(Dbw(av), 2)} | dBW ({Watts(av)}) |");
        }
        if (p.CrossPolarDb is { } xpol)
            L($"| peak cross-polar level (edge-slot tilts, {(report.Filter is null ? "no polarisation filter" : "behind the polarisation filter")}) at {Invariant.Fixed(p.CrossPolarDirectionDeg ?? double.NaN, 1)} deg | {Invariant.Fixed(xpol, 2)} | dB |");
        if (report.Load is { } load)
        {
            L($"| power into the matched load (asked {Invariant.Fixed(load.Fraction * 100, 2)} %) | {Invariant.Fixed(load.PowerWPerWIn * 100, 3)} | % of input |");
        }
        if (report.TravellingWave is { } tw)
        {
            L($"| radiation efficiency (radiated / accepted) | {Invariant.Fixed(tw.Efficiency * 100, 2)} | % |");
            L($"| wall loss | {Invariant.Fixed(tw.WallLossWPerWIn * 100, 3)} | % of input |");
            L($"| beam squint, phase condition sin θ = λ/λg − λ/(2d) (+ toward the load end) | {Invariant.Fixed(tw.SquintDeg, 3)} | deg |");
            L($"| scan rate, phase condition / network sweep | {Invariant.Fixed(tw.ScanDegPer100MHz, 3)} / {Invariant.Fixed(tw.ScanFromSweepDegPer100MHz, 3)} | deg per 100 MHz |");
            L($"| designer: network refinement iterations, final residual | {Invariant.Int(tw.RefinementIterations)}, {Invariant.Fixed(tw.RefinementResidualDb, 6)} | –, dB |");
            L($"| largest slot phase departure from the travelling-wave progression | {Invariant.Fixed(tw.PhaseErrorDeg, 2)} | deg |");
            L($"| beam asked / achieved residual (pointing correction: {tw.PointingCorrection}) | {Invariant.Fixed(tw.BeamAskedDeg, 3)} / {Invariant.Fixed(tw.BeamResidualDeg, 3)} | deg |");
            L($"| slot spacing of the design{(tw.LoadAuto ? "; load chosen by load: auto" : "")} | {Invariant.Fixed(tw.SpacingM * 1e3, 3)} | mm |");
        }
        if (!double.IsNaN(p.TransverseFaceWidth))
        {
            L("");
            L("Transverse plane (perpendicular to the guide axis, the slots' E-plane): on an infinite ground plane a slot radiates "
              + "uniformly over the half-space in this plane, so the beam here is set by the width w of the slotted face alone. "
              + "Model: a lower bound, the uniform aperture of width w, HPBW ≥ 2 asin(0.443 λ/w) (about 50.8 λ/w deg for w ≫ λ; "
              + "Balanis, Antenna Theory, 3rd ed., 2005, Table 12.1). Limit: the face is not uniformly lit; its edges diffract the "
              + "slot's grazing field (GTD), which broadens and ripples the beam and radiates behind the tube, so the true beamwidth is "
              + "wider; a face narrower than 0.443 λ forms no beam at all (the pattern wraps round the tube, as in an omnidirectional "
              + "slotted tube). For sector and omnidirectional builds measure it or model the tube full-wave.");
        }
    }

    /// <summary>The per-slot table (offset or tilt columns).</summary>
    private static void WriteSlotTable(DesignReport report, Action<string> L)
    {
        var i = report.Inputs;
        bool tilt = CutListCsv.UsesTilt(report);
        L("## Slots");
        L("");
        L($"Positions z from the {Escape(i.DatumDescription)} (z = 0; the cut list gives them from datum A, the tube's end face); {Invariant.Normalisation}; amplitudes linear, each normalised to its largest value; phase in degrees.");
        L("");
        if (tilt)
        {
            L("| slot | position (mm) | tilt (deg) | cut depth (mm) | length (mm) | overall (mm) | width (mm) | end | g | target amp. | achieved amp. | phase (deg) |");
            L("| ---: | ---: | ---: | ---: | ---: | ---: | ---: | --- | ---: | ---: | ---: | ---: |");
        }
        else
        {
            L("| slot | position (mm) | offset (mm) | side | length (mm) | overall (mm) | width (mm) | end | g | target amp. | achieved amp. | phase (deg) |");
            L("| ---: | ---: | ---: | --- | ---: | ---: | ---: | --- | ---: | ---: | ---: | ---: |");
        }
        foreach (var s in report.Slots)
        {
            string mid = tilt
                ? $"{Invariant.Fixed(s.TiltDeg!.Value, 2)} | {Invariant.Mm(s.CutDepth ?? double.NaN)}"
                : $"{Invariant.Mm(s.Offset!.Value)} | {CutListCsv.Side(s.Offset.Value)}";
            L($"| {Invariant.Int(s.Index)}{(s.OutsideSlotTable ? " (outside table)" : "")} | {Invariant.Mm(s.Position)} | {mid} | {Invariant.Mm(s.Length)} | {Invariant.Mm(s.OverallLength)} | {Invariant.Mm(s.Width)} | {(s.EndForm == SlotEndForm.Round ? "round" : "square")} | {Invariant.Fixed(s.Conductance, 5)} | {Invariant.Fixed(s.TargetAmplitude, 4)} | {Invariant.Fixed(s.AchievedAmplitude, 4)} | {Invariant.Fixed(s.AchievedPhaseDeg, 2)} |");
        }
        L("");
    }

    /// <summary>Tolerance lines, warnings and cautions.</summary>
    private static void WriteNotes(DesignReport report, Action<string> L)
    {
        if (report.Tolerance.Count > 0)
        {
            L("## Tolerance");
            L("");
            foreach (string t in report.Tolerance) L($"- {Escape(t)}");
            L("");
        }
        L("## Warnings");
        L("");
        if (report.Warnings.Count == 0) L("None.");
        foreach (string w in report.Warnings) L($"- {Escape(w)}");
        L("");
        L("## Cautions");
        L("");
        var cautions = report.Cautions.Count > 0 ? report.Cautions : [StandardCaution];
        for (int k = 0; k < cautions.Count; k++)
        {
            if (k > 0) L("");
            L(Escape(cautions[k]));
        }
    }

    /// <summary>
    /// The verdict line that opens the summary: "**Requirements: PASS** (n of n met)", "**Requirements: FAIL** (k of n
    /// met)", or "Requirements: none given".
    /// </summary>
    public static string VerdictLine(DesignReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        int n = report.Requirements.Count, met = report.Requirements.Count(q => q.Passed);
        if (n == 0) return "**Requirements: none given** (no pass/fail verdict).";
        return $"**Requirements: {(met == n ? "PASS" : "FAIL")}** ({Invariant.Int(met)} of {Invariant.Int(n)} met).";
    }

    private static double Dbw(double watts) => watts > 0 ? 10 * Math.Log10(watts) : double.NegativeInfinity;

    private static string Watts(double w) => w >= 1e6 ? $"{Invariant.Fixed(w * 1e-6, 3)} MW" : w >= 1e3 ? $"{Invariant.Fixed(w * 1e-3, 3)} kW" : $"{Invariant.Fixed(w, 3)} W";

    /// <summary>Most rows of the frequency-scan table (evenly spaced over the sweep, both ends included).</summary>
    public const int ScanRows = 11;

    private static void WriteScan(DesignReport report, Action<string> line)
    {
        line("## Frequency scan");
        line("");
        if (report.Sweep.Count == 0)
        {
            line("No sweep was run.");
            return;
        }
        bool xpol = report.Sweep.Any(s => s.CrossPolarDb is not null);
        line($"Beam direction from broadside (positive toward the {(report.Load is null ? "datum (short)" : "load")} end), half-power beamwidth, peak sidelobe and gain from the network analysis; every sweep point is in design.json and scan.png.");
        line("");
        line("| frequency (GHz) | beam (deg) | HPBW (deg) | peak sidelobe (dB) | gain (dBi) |" + (xpol ? " cross-polar (dB) |" : ""));
        line("| ---: | ---: | ---: | ---: | ---: |" + (xpol ? " ---: |" : ""));
        int n = report.Sweep.Count, rows = Math.Min(ScanRows, n);
        var picked = Enumerable.Range(0, rows).Select(k => rows == 1 ? 0 : (int)Math.Round((double)k * (n - 1) / (rows - 1))).Distinct();
        foreach (int k in picked)
        {
            var s = report.Sweep[k];
            line($"| {Invariant.Ghz(s.FrequencyHz, 4)} | {Invariant.Fixed(s.BeamDeg, 3)} | {Invariant.Fixed(s.HpbwDeg, 3)} | {Invariant.Fixed(s.PeakSidelobeDb, 2)} | {Invariant.Fixed(s.GainDbi, 2)} |"
                + (xpol ? $" {Invariant.Fixed(s.CrossPolarDb ?? double.NaN, 2)} |" : ""));
        }
        if (n >= 2 && report.Sweep[^1].FrequencyHz > report.Sweep[0].FrequencyHz)
        {
            double rate = (report.Sweep[^1].BeamDeg - report.Sweep[0].BeamDeg) / ((report.Sweep[^1].FrequencyHz - report.Sweep[0].FrequencyHz) * 1e-8);
            line("");
            line($"Squint per 100 MHz across the sweep (end to end): {Invariant.Fixed(rate, 3)} deg.");
        }
    }

    /// <summary>The one-line pass/fail statement of a requirement, as printed in the summary.</summary>
    public static string RequirementLine(RequirementResult q) =>
        $"- **{(q.Passed ? "PASS" : "FAIL")}**: {Escape(q.Description)}: required {Escape(q.Required)}, achieved {Escape(q.Achieved)}";

    /// <summary>Escapes the characters that would break a Markdown table cell or start markup.</summary>
    private static string Escape(string text) => text.Replace("\\", "\\\\").Replace("|", "\\|").Replace("\r", " ").Replace("\n", " ");
}
