using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>input.s1p</c>: Touchstone version 1.1 one-port file of S11 over the match sweep (EIA/IBIS "Touchstone File
/// Format Specification", rev. 1.1, 2002: option line <c># &lt;freq unit&gt; S RI R &lt;n&gt;</c>, comment lines start
/// with <c>!</c>). S11 is the reflection normalised to the guide's TE10 wave impedance, which is what a network
/// analyser calibrated in the waveguide (its standards are the guide's own) reports; the file says so with
/// <c>R 1</c> (normalised impedance), so an overlay with a measured waveguide file shows no false mismatch.
/// Frequencies in Hz with 3 decimals, S11 real and imaginary parts with 9 decimals, "\n" line ends.
/// </summary>
internal static class TouchstoneWriter
{
    /// <summary>The option line: Hz, S-parameters, real/imaginary, reference resistance 1 (normalised).</summary>
    public const string OptionLine = "# Hz S RI R 1";

    /// <summary>Writes the Touchstone file of the report's match sweep (or of its analysis sweep when no match sweep was made).</summary>
    public static void Write(DesignReport report, TextWriter writer)
    {
        string z = Invariant.Fixed(report.Guide.WaveImpedanceOhm, 3);
        writer.Write($"! SlotArray input reflection of array '{report.Name}'\n");
        writer.Write($"! S11 is normalised to the TE10 wave impedance of the guide ({report.Guide.Designation}), as a waveguide-calibrated network analyser reports it;\n");
        writer.Write($"! hence R 1: impedances are normalised (1 = the TE10 wave impedance, {z} ohm at the design frequency {Invariant.Ghz(report.FrequencyHz, 6)} GHz).\n");
        writer.Write("! The reference plane is the feed port of the array (the plane where the feed guide meets the slotted section)\n");
        writer.Write("! Data: frequency in Hz, then Re(S11) and Im(S11)\n");
        writer.Write(OptionLine + "\n");
        foreach (var (f, s11) in Points(report))
            writer.Write($"{Invariant.Fixed(f, 3)} {Invariant.Fixed(s11.Real, 9)} {Invariant.Fixed(s11.Imaginary, 9)}\n");
    }

    /// <summary>The match sweep of the report, or its analysis sweep when the report has no match sweep.</summary>
    public static IEnumerable<(double FrequencyHz, System.Numerics.Complex S11)> Points(DesignReport report) =>
        report.MatchSweep.Count > 0
            ? report.MatchSweep.Select(p => (p.FrequencyHz, p.S11))
            : report.Sweep.Select(p => (p.FrequencyHz, p.S11));
}
