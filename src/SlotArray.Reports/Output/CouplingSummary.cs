using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>The summary.md section of a <c>coupling: mutual</c> design: coupled and isolated-slot designs side by side, and the iterations.</summary>
internal static class CouplingSummary
{
    /// <summary>Writes the section through <paramref name="line"/> (one call per line).</summary>
    public static void Write(CouplingReport c, Action<string> line)
    {
        ArgumentNullException.ThrowIfNull(c);
        ArgumentNullException.ThrowIfNull(line);
        var tw = c.TravellingWaveResidualsDb;
        line(tw is null ? "## Mutual coupling (Elliott's design procedure)" : "## Mutual coupling (travelling-wave design on the coupled network)");
        line("");
        line($"Both designs analysed with the mutual coupling included ({CouplingReport.NeglectedNote}).");
        line("");
        line("| quantity | coupled design | isolated-slot design | unit |");
        line("| --- | ---: | ---: | --- |");
        Row("S11 at the design frequency", x => Invariant.Fixed(x.S11DbAtDesign, 2), "dB");
        Row("frequency of best match", x => Invariant.Ghz(x.BestMatchHz, 4), "GHz");
        Row("S11 at best match", x => Invariant.Fixed(x.BestMatchS11Db, 2), "dB");
        Row("peak sidelobe at the design frequency", x => Invariant.Fixed(x.PeakSidelobeDb, 2), "dB");
        line("");
        if (tw is not null)
        {
            line("Iterations (stop when every slot voltage's share of the radiated power is within 0.0001 dB of the taper's):");
            line("");
            line("| iteration | largest slot-power error (dB) |");
            line("| ---: | ---: |");
            for (int i = 0; i < tw.Count; i++) line($"| {Invariant.Int(i + 1)} | {Invariant.Fixed(tw[i], 6)} |");
            line("");
            return;
        }
        line($"Iterations (stop when no offset or length changes by more than {Invariant.Fixed(c.Tolerance * 1e3, 4)} mm; surrogate error at the final slots {Invariant.Fixed(c.SurrogateError * 100, 2)} %):");
        line("");
        line("| iteration | largest offset change (mm) | largest length change (mm) | at slot | match error Σ y^a − 1 |");
        line("| ---: | ---: | ---: | ---: | ---: |");
        foreach (var it in c.Iterations)
            line($"| {Invariant.Int(it.Index)} | {Invariant.Fixed(it.MaximumOffsetChange * 1e3, 5)} | {Invariant.Fixed(it.MaximumLengthChange * 1e3, 5)} | {Invariant.Int(it.WorstSlot)} | {Invariant.Fixed(it.MatchError, 6)} |");
        line("");

        void Row(string name, Func<CoupledDesignFigures, string> value, string unit)
            => line($"| {name} | {value(c.Coupled)} | {value(c.Uncoupled)} | {unit} |");
    }
}
