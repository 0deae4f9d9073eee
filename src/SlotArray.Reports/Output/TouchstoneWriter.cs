using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>input.s1p</c>: Touchstone version 1.1 one-port file of S11 over the sweep (EIA/IBIS "Touchstone File Format
/// Specification", rev. 1.1, 2002: option line <c># &lt;freq unit&gt; S RI R &lt;n&gt;</c>, comment lines start
/// with <c>!</c>). The reference resistance is the guide's TE10 wave impedance at the design frequency.
/// Frequencies in Hz with 3 decimals, S11 real and imaginary parts with 9 decimals, "\n" line ends.
/// </summary>
public static class TouchstoneWriter
{
    /// <summary>Writes the Touchstone file of the report's sweep.</summary>
    public static void Write(DesignReport report, TextWriter writer)
    {
        string z = Invariant.Fixed(report.Guide.WaveImpedanceOhm, 3);
        writer.Write($"! SlotArray input reflection of array '{report.Name}'\n");
        writer.Write($"! S11 is normalised to the TE10 wave impedance of the guide ({report.Guide.Designation}) at the design frequency {Invariant.Ghz(report.FrequencyHz, 6)} GHz: {z} ohm\n");
        writer.Write("! The reference plane is the feed port of the array (the plane where the feed guide meets the slotted section)\n");
        writer.Write("! Data: frequency in Hz, then Re(S11) and Im(S11)\n");
        writer.Write($"# Hz S RI R {z}\n");
        foreach (var p in report.Sweep)
            writer.Write($"{Invariant.Fixed(p.FrequencyHz, 3)} {Invariant.Fixed(p.S11.Real, 9)} {Invariant.Fixed(p.S11.Imaginary, 9)}\n");
    }
}
