namespace SlotArray.Core.Slots.Tables;

/// <summary>
/// Leave-one-out residuals of a table's fits (<see cref="SlotTableFit"/>): each interior point of a curve predicted by the
/// curve through the other points. Large values mean the table is too coarse where they occur.
/// </summary>
/// <param name="ResonantLengthRms">RMS of ΔL_r/L_r over the interior geometries of every frequency (0 with fewer than three geometries).</param>
/// <param name="ResonantLengthMax">Largest |ΔL_r/L_r|.</param>
/// <param name="ResonantConductanceRms">RMS of Δg_r/g_r.</param>
/// <param name="ResonantConductanceMax">Largest |Δg_r/g_r|.</param>
/// <param name="AdmittanceRms">RMS of |Δy|/g_r over the interior lengths of every geometry and frequency.</param>
/// <param name="AdmittanceMax">Largest |Δy|/g_r.</param>
/// <param name="Points">Number of leave-one-out predictions behind the figures.</param>
internal sealed record SlotTableResiduals(double ResonantLengthRms, double ResonantLengthMax, double ResonantConductanceRms,
    double ResonantConductanceMax, double AdmittanceRms, double AdmittanceMax, int Points)
{
    internal static SlotTableResiduals Of(double[] c, SlotTableFit.Group[,] g, Func<double, double> shape)
    {
        var dl = new List<double>();
        var dg = new List<double>();
        var dy = new List<double>();
        for (int k = 0; k < g.GetLength(0); k++)
        {
            double[] lr = [.. Enumerable.Range(0, c.Length).Select(i => g[k, i].ResonantLength)];
            double[] gr = [.. Enumerable.Range(0, c.Length).Select(i => g[k, i].ResonantConductance)];
            dl.AddRange(MonotoneCurve.LeaveOneOut(c, lr).Select(p => p.Residual / lr[p.Index]));
            double[] ratio = [.. gr.Select((v, i) => v / shape(c[i]))];
            dg.AddRange(MonotoneCurve.LeaveOneOut(c, ratio).Select(p => p.Residual / ratio[p.Index]));   // Δg_r/g_r = Δratio/ratio
            for (int i = 0; i < c.Length; i++)
            {
                var grp = g[k, i];
                var re = MonotoneCurve.LeaveOneOut(grp.Nu, grp.HRe).ToList();
                var im = MonotoneCurve.LeaveOneOut(grp.Nu, grp.HImValues).ToList();
                dy.AddRange(re.Zip(im, (a, b) => Math.Sqrt(a.Residual * a.Residual + b.Residual * b.Residual)));
            }
        }
        static double Rms(List<double> v) => v.Count == 0 ? 0 : Math.Sqrt(v.Average(x => x * x));
        static double Max(List<double> v) => v.Count == 0 ? 0 : v.Max(Math.Abs);
        return new SlotTableResiduals(Rms(dl), Max(dl), Rms(dg), Max(dg), Rms(dy), Max(dy), dl.Count + dg.Count + dy.Count);
    }
}
