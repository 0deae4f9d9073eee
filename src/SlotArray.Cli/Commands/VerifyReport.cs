using System.Globalization;
using System.Text;
using System.Text.Json;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Legends;
using OxyPlot.Series;
using ExteriorCouplingFit = SlotArray.Core.Network.ExteriorCouplingFit;
using SlotArray.FullWave.Arrays;
using SlotArray.FullWave.Runs;
using SlotArray.Reports;
using SlotArray.Reports.Plots;

namespace SlotArray.Cli.Commands;

/// <summary>The files <c>verify</c> writes: verify.json, verify.md, s11.png, pattern.png, fullwave.s1p.</summary>
internal static class VerifyReport
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static IReadOnlyList<string> WriteAll(string dir, DesignFolder d, ArrayVerification plan, FullWaveArrayResult r, ArrayFigures predicted, RunOutcome run,
        ExteriorCouplingFit? calibration = null)
    {
        Directory.CreateDirectory(dir);
        AtomicFile.WriteText(Path.Combine(dir, "verify.json"), Json(d, plan, r, predicted, run, calibration));
        AtomicFile.WriteText(Path.Combine(dir, "verify.md"), Markdown(d, plan, r, predicted, run, calibration));
        AtomicFile.WriteText(Path.Combine(dir, "fullwave.s1p"), Touchstone(d, r));
        AtomicFile.Write(Path.Combine(dir, "s11.png"), s => PlotExport.Write(S11Plot(d, r), s, "png"));
        AtomicFile.Write(Path.Combine(dir, "pattern.png"), s => PlotExport.Write(PatternPlot(d, r), s, "png"));
        return ["verify.json", "verify.md", "fullwave.s1p", "s11.png", "pattern.png"];
    }

    public static void PrintTable(TextWriter o, DesignFolder d, ArrayFigures fw, ArrayFigures pr)
    {
        foreach (string line in Table(d, fw, pr)) o.WriteLine(line);
    }

    private static IEnumerable<string> Table(DesignFolder d, ArrayFigures fw, ArrayFigures pr)
    {
        double f0 = d.DesignFrequencyHz;
        yield return "| figure | full-wave | predicted |";
        yield return "| --- | --- | --- |";
        yield return string.Format(Inv, "| best-match frequency | {0:0.0000} GHz ({1:+0.000;-0.000} % from f0) | {2:0.0000} GHz ({3:+0.000;-0.000} %) |",
            fw.BestMatchHz * 1e-9, (fw.BestMatchHz / f0 - 1) * 100, pr.BestMatchHz * 1e-9, (pr.BestMatchHz / f0 - 1) * 100);
        yield return string.Format(Inv, "| S11 at f0 = {0:0.####} GHz | {1:0.0} dB | {2:0.0} dB |", f0 * 1e-9, fw.S11AtDesignDb, pr.S11AtDesignDb);
        yield return string.Format(Inv, "| beam direction | {0:0.00} deg | {1:0.00} deg |", fw.BeamDeg + 0.0, pr.BeamDeg + 0.0);
        yield return string.Format(Inv, "| peak sidelobe | {0} | {1} |", Opt(fw.PeakSidelobeDb), Opt(pr.PeakSidelobeDb));
        yield return string.Format(Inv, "| HPBW | {0:0.00} deg | {1:0.00} deg |", fw.HpbwDeg, pr.HpbwDeg);
    }

    /// <summary>The calibration as a sentence with the two spec keys to paste.</summary>
    public static string CalibrationText(ExteriorCouplingFit c) => string.Format(Inv,
        "exterior coupling calibration fitted to this run (the design's own slot model for the self admittances; the infinite-plane mutual impedances × κ): "
        + "κ = {0:0.000} at {1:+0.0;-0.0} deg, |S11| misfit RMS {2:0.0000} with κ = 1, {3:0.0000} with κ ({4:0.0000} without coupling); "
        + "to design these slots again with it: 'coupling: mutual', 'coupling_scale: {0:0.000}', 'coupling_phase: {1:0.0} deg'",
        c.Scale.Magnitude, c.Scale.Phase * 180 / Math.PI, c.RmsBefore, c.RmsAfter, c.RmsUncoupled);

    private static string Opt(double? db) => db is double v ? v.ToString("0.00", Inv) + " dB" : "none";

    private static string Json(DesignFolder d, ArrayVerification plan, FullWaveArrayResult r, ArrayFigures fw, RunOutcome run, ExteriorCouplingFit? c) =>
        JsonSerializer.Serialize(new Dictionary<string, object?>
        {
            ["name"] = d.Name,
            ["frequency_hz"] = d.DesignFrequencyHz,
            ["engine"] = "openEMS (FDTD)",
            ["mesh"] = plan.Layout.Density.ToString().ToLowerInvariant(),
            ["cells"] = run.Stats.Cells,
            ["timesteps"] = run.Stats.Timesteps,
            ["run_seconds"] = run.Stats.Seconds,
            ["full_wave"] = Figures(r.Figures, d.DesignFrequencyHz),
            ["predicted"] = Figures(fw, d.DesignFrequencyHz),
            ["sweep"] = r.FrequenciesHz.Select((f, i) => new Dictionary<string, double> { ["frequency_hz"] = f, ["s11_re"] = r.S11[i].Real, ["s11_im"] = r.S11[i].Imaginary }).ToList(),
            ["slot_voltages"] = r.SlotVoltages.Select((v, i) => new Dictionary<string, double> { ["slot"] = i + 1, ["re"] = v.Real, ["im"] = v.Imaginary }).ToList(),
            ["pattern"] = new Dictionary<string, object> { ["angle_deg"] = r.PatternDeg, ["level_db"] = r.PatternDb },
            ["coupling_calibration"] = c is null ? null : new Dictionary<string, double>
            {
                ["coupling_scale"] = c.Scale.Magnitude,
                ["coupling_phase_deg"] = c.Scale.Phase * 180 / Math.PI,
                ["s11_misfit_rms_model"] = c.RmsBefore,
                ["s11_misfit_rms_calibrated"] = c.RmsAfter,
                ["s11_misfit_rms_uncoupled"] = c.RmsUncoupled,
            },
            ["notes"] = new[]
            {
                "S11 referred to the feed reference plane (last slot centre) with the lossless TE10 phase constant",
                "pattern: array factor of the full-wave slot voltages times the half-wave slot element pattern (principal plane through the guide axis)",
                "walls modelled as perfect conductors; bare tube in free space",
            },
        }, new JsonSerializerOptions { WriteIndented = true }) + "\n";

    private static Dictionary<string, object?> Figures(ArrayFigures f, double f0) => new()
    {
        ["best_match_hz"] = f.BestMatchHz,
        ["best_match_offset_percent"] = (f.BestMatchHz / f0 - 1) * 100,
        ["s11_at_design_db"] = f.S11AtDesignDb,
        ["beam_deg"] = f.BeamDeg,
        ["peak_sidelobe_db"] = f.PeakSidelobeDb,
        ["hpbw_deg"] = f.HpbwDeg,
    };

    private static string Markdown(DesignFolder d, ArrayVerification plan, FullWaveArrayResult r, ArrayFigures pr, RunOutcome run, ExteriorCouplingFit? c)
    {
        var sb = new StringBuilder();
        sb.Append(Inv, $"# Full-wave check: {d.Name}\n\n");
        sb.Append(Inv, $"{d.Slots.Count} slots built as the cut list gives them, {d.Termination} at datum A, fed from beyond the last slot. openEMS FDTD, {plan.Layout.Density.ToString().ToLowerInvariant()} mesh, {run.Stats.Cells / 1e6:0.00} Mcells, {run.Stats.Timesteps} time steps, {run.Stats.Seconds / 60:0.0} min.\n\n");
        foreach (string line in Table(d, r.Figures, pr)) sb.Append(line).Append('\n');
        sb.Append("\nS11 is referred to the feed reference plane; the pattern is the array factor of the full-wave slot voltages times the half-wave slot element pattern. Walls are perfect conductors; the tube is bare in free space.\n");
        if (c is not null) sb.Append('\n').Append(CalibrationText(c)).Append('\n');
        return sb.ToString();
    }

    private static string Touchstone(DesignFolder d, FullWaveArrayResult r)
    {
        var sb = new StringBuilder();
        sb.Append(Inv, $"! full-wave S11 of {d.Name} (openEMS FDTD), referred to the feed reference plane; normalised to the TE10 wave impedance\n");
        sb.Append("# HZ S RI R 1\n");
        for (int i = 0; i < r.FrequenciesHz.Count; i++) sb.Append(Inv, $"{r.FrequenciesHz[i]:R} {r.S11[i].Real:0.000000} {r.S11[i].Imaginary:0.000000}\n");
        return sb.ToString();
    }

    private static PlotModel S11Plot(DesignFolder d, FullWaveArrayResult r)
    {
        var m = PlotExport.NewModel($"{d.Name}: |S11|, full-wave vs predicted");
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "frequency (GHz)" });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "|S11| (dB)", Maximum = 0 });
        var fw = new LineSeries { Title = "full-wave (openEMS)" };
        fw.Points.AddRange(r.FrequenciesHz.Select((f, i) => new DataPoint(f * 1e-9, 20 * Math.Log10(Math.Max(r.S11[i].Magnitude, 1e-6)))));
        var pr = new LineSeries { Title = "predicted (design)", LineStyle = LineStyle.Dash };
        pr.Points.AddRange(d.Predicted.Select(p => new DataPoint(p.FrequencyHz * 1e-9, Math.Max(p.S11Db, -120))));
        m.Series.Add(fw);
        m.Series.Add(pr);
        m.Legends.Add(new Legend { LegendPosition = LegendPosition.BottomRight });
        return m;
    }

    private static PlotModel PatternPlot(DesignFolder d, FullWaveArrayResult r)
    {
        var m = PlotExport.NewModel($"{d.Name}: pattern at {d.DesignFrequencyHz * 1e-9:0.####} GHz, full-wave vs predicted");
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "angle from broadside (deg)", Minimum = -90, Maximum = 90 });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "level (dB)", Minimum = -60, Maximum = 0 });
        var fw = new LineSeries { Title = "full-wave slot voltages" };
        fw.Points.AddRange(r.PatternDeg.Select((a, i) => new DataPoint(a, Math.Max(r.PatternDb[i], -60))));
        var pr = new LineSeries { Title = "predicted (design)", LineStyle = LineStyle.Dash };
        pr.Points.AddRange(d.PredictedPatternDeg.Select((a, i) => new DataPoint(a, Math.Max(d.PredictedPatternDb[i], -60))));
        m.Series.Add(fw);
        m.Series.Add(pr);
        m.Legends.Add(new Legend { LegendPosition = LegendPosition.BottomRight });
        return m;
    }
}
