using System.Numerics;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>summary.md</c>: the human-readable report: inputs, key figures (units stated), the per-slot table, a
/// pass/fail line per requirement, warnings, optional tolerance lines and the cautions. "\n" line ends.
/// </summary>
public static class SummaryMarkdown
{
    /// <summary>The caution printed when the report carries none of its own (issue 5, item 5).</summary>
    public const string StandardCaution =
        "RF exposure and high transmitter power can hurt; local regulations and licensed practice govern.";

    /// <summary>Writes the summary of <paramref name="report"/>.</summary>
    public static void Write(DesignReport report, TextWriter writer)
    {
        var g = report.Guide;
        var i = report.Inputs;
        bool tilt = CutListCsv.UsesTilt(report);
        void L(string line = "") { writer.Write(line); writer.Write('\n'); }

        L($"# {Escape(report.Name)}: slotted-waveguide array design");
        L();
        L("## Inputs");
        L();
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
        L($"| datum | {Escape(i.DatumDescription)} |");
        L($"| cut tolerance | ± {Invariant.Mm(i.CutTolerance)} mm |");
        L();
        L("## Key figures");
        L();
        var p = report.Pattern;
        var m = report.Match;
        L("| quantity | value | unit |");
        L("| --- | ---: | --- |");
        L($"| guide wavelength at the design frequency | {Invariant.Mm(g.GuideWavelength)} | mm |");
        L($"| TE10 wave impedance | {Invariant.Fixed(g.WaveImpedanceOhm, 2)} | Ω |");
        L($"| termination: {Escape(report.Termination.Type)}, last slot centre to it | {Invariant.Mm(report.Termination.Distance)} | mm |");
        L($"| beam direction from broadside | {Invariant.Fixed(p.BeamDeg, 2)} | deg |");
        L($"| half-power beamwidth | {Invariant.Fixed(p.HpbwDeg, 2)} | deg |");
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
        L();
        if (report.Coupling is { } coupling) CouplingSummary.Write(coupling, s => L(s));
        L("## Requirements");
        L();
        if (report.Requirements.Count == 0) L("No requirements were given.");
        foreach (var q in report.Requirements) L(RequirementLine(q));
        L();
        L("## Slots");
        L();
        L($"Positions from datum A ({Escape(i.DatumDescription)}); {Invariant.Normalisation}; amplitudes linear, phase in degrees.");
        L();
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
            L($"| {Invariant.Int(s.Index)} | {Invariant.Mm(s.Position)} | {mid} | {Invariant.Mm(s.Length)} | {Invariant.Mm(s.OverallLength)} | {Invariant.Mm(s.Width)} | {(s.EndForm == SlotEndForm.Round ? "round" : "square")} | {Invariant.Fixed(s.Conductance, 5)} | {Invariant.Fixed(s.TargetAmplitude, 4)} | {Invariant.Fixed(s.AchievedAmplitude, 4)} | {Invariant.Fixed(s.AchievedPhaseDeg, 2)} |");
        }
        L();
        if (report.Tolerance.Count > 0)
        {
            L("## Tolerance");
            L();
            foreach (string t in report.Tolerance) L($"- {Escape(t)}");
            L();
        }
        L("## Warnings");
        L();
        if (report.Warnings.Count == 0) L("None.");
        foreach (string w in report.Warnings) L($"- {Escape(w)}");
        L();
        L("## Cautions");
        L();
        var cautions = report.Cautions.Count > 0 ? report.Cautions : [StandardCaution];
        for (int k = 0; k < cautions.Count; k++)
        {
            if (k > 0) L();
            L(Escape(cautions[k]));
        }
    }

    /// <summary>The one-line pass/fail statement of a requirement, as printed in the summary.</summary>
    public static string RequirementLine(RequirementResult q) =>
        $"- **{(q.Passed ? "PASS" : "FAIL")}**: {Escape(q.Description)}: required {Escape(q.Required)}, achieved {Escape(q.Achieved)}";

    /// <summary>Escapes the characters that would break a Markdown table cell or start markup.</summary>
    private static string Escape(string text) => text.Replace("\\", "\\\\").Replace("|", "\\|").Replace("\r", " ").Replace("\n", " ");
}
