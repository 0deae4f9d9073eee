using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>summary.md's marine-antenna sections: the polarisation filter.</summary>
internal static class MarineSummary
{
    /// <summary>The filter's plates, its attenuation and the cross-polar level before and after it.</summary>
    /// <param name="f">The filter report.</param>
    /// <param name="f0Hz">Design frequency, Hz.</param>
    /// <param name="line">Writes one line.</param>
    public static void WriteFilter(FilterReport f, double f0Hz, Action<string> line)
    {
        string chosen = f.Chosen.Count == 0 ? "as given" : $"{string.Join(", ", f.Chosen)} chosen by the tool";
        line("## Polarisation filter");
        line("");
        line($"Thin metal plates across the aperture, normal to the guide axis ({chosen}): the wanted field (E along the guide axis) is normal to the plates and passes as the parallel-plate TEM mode; the cross-polarised field (E parallel to the plates) meets the TE1 mode below its cutoff and decays through the depth (D. M. Pozar, Microwave Engineering, 4th ed., 2012, §3.1: α = √((π/g)² − k²), g the clear gap).");
        line("");
        line("| quantity | value | unit |");
        line("| --- | ---: | --- |");
        line($"| plate pitch (centre to centre) / depth / thickness | {Invariant.Fixed(f.SpacingM * 1e3, 2)} / {Invariant.Fixed(f.DepthM * 1e3, 2)} / {Invariant.Fixed(f.ThicknessM * 1e3, 2)} | mm |");
        line($"| TE1 cutoff of the clear gap | {Invariant.Fixed(f.CutoffTe1Hz * 1e-9, 3)} | GHz |");
        line($"| cross-polar attenuation at {Invariant.Ghz(f0Hz)} GHz ({Invariant.Fixed(f.AttenuationDbPerMmAtDesign, 3)} dB per mm) / smallest over the band | {Invariant.Fixed(f.AttenuationAtDesignDb, 2)} / {Invariant.Fixed(f.SmallestAttenuationDb, 2)} | dB |");
        line($"| worst cross-polar peak, bare slots (at {Invariant.Ghz(f.BareWorstFrequencyHz)} GHz) | {Invariant.Fixed(f.BareWorstDb, 2)} | dB |");
        line($"| worst cross-polar peak behind the filter (at {Invariant.Ghz(f.FilteredWorstFrequencyHz)} GHz){(f.MarginDb > 0 ? $"; depth chosen for a {Invariant.Fixed(f.MarginDb, 1)} dB margin" : "")} | {Invariant.Fixed(f.FilteredWorstDb, 2)} | dB |");
        line($"| loss of the wanted polarisation (open-fraction step at both faces), largest over the band; in the gain | {Invariant.Fixed(f.WantedLossDb, 4)} | dB |");
        line("");
        line("Limits: infinitely wide, perfectly conducting plates; the attenuation is the TE1 mode's decay applied to the whole cross-polarised cut (higher modes decay faster); edge diffraction and the plates' loading of the slots are not modelled. With the pitch below half a wavelength no grating order of the plates reaches real space.");
        line("");
    }

    /// <summary>The flare's plates, the vertical beam, the throat and the antenna's beamwidths and total gain.</summary>
    /// <param name="f">The flare report.</param>
    /// <param name="report">The whole report (horizontal beam).</param>
    /// <param name="line">Writes one line.</param>
    public static void WriteFlare(FlareReport f, DesignReport report, Action<string> line)
    {
        string chosen = f.Chosen.Count == 0 ? "as given" : $"{string.Join(", ", f.Chosen)} chosen by the tool";
        line("## Flare and the whole antenna");
        line("");
        line($"Two plates diverging from the slotted narrow-wall face ({chosen}). The slots' field (E along the guide) is parallel to the plates, so the flare is an H-plane sectoral horn: cos(πy/A) across the aperture with the quadratic phase of the plates' apex (C. A. Balanis, Antenna Theory, 4th ed., 2016, §13.2); the vertical cut is its aperture integral with the obliquity factor.");
        line("");
        line("| quantity | value | unit |");
        line("| --- | ---: | --- |");
        line($"| throat (slotted face) / aperture / depth from the face | {Invariant.Fixed(f.ThroatM * 1e3, 2)} / {Invariant.Fixed(f.ApertureM * 1e3, 2)} / {Invariant.Fixed(f.LengthM * 1e3, 2)} | mm |");
        line($"| horizontal / vertical half-power beamwidth | {Invariant.Fixed(report.Pattern.HpbwDeg, 2)} / {Invariant.Fixed(f.VerticalHpbwDeg, 2)}{(f.RequiredVerticalHpbwDeg is { } q ? $" (required {Invariant.Fixed(q, 2)})" : "")} | deg |");
        line($"| beam squint (horizontal, + toward the load end) | {Invariant.Fixed(report.Pattern.BeamDeg, 3)} | deg |");
        line($"| first vertical sidelobe | {Invariant.Fixed(f.FirstSidelobeDb, 2)} | dB |");
        line($"| largest phase error at the aperture edge / gain lost to it | {Invariant.Fixed(f.PhaseErrorDeg, 1)} deg / {Invariant.Fixed(f.PhaseErrorLossDb, 3)} dB | |");
        line($"| evanescent throat: plates reach λ/2 apart at / field decay before that (reactive: lowers the slots' conductance, not in the gain) | {Invariant.Fixed(f.CutoffPlaneM * 1e3, 2)} mm / {Invariant.Fixed(f.ThroatLossDb, 3)} dB | |");
        line($"| antenna directivity / gain (array × flare, D = d_H d_V / π) | {Invariant.Fixed(f.TotalDirectivityDbi, 2)} / {Invariant.Fixed(f.TotalGainDbi, 2)} | dBi |");
        line("");
        line("Limits: infinite, perfectly conducting plates without edge diffraction (far vertical sidelobes and the back lobe are not modelled); the slots' detuning by the narrow throat is not modelled (check one slot in the throat full-wave); the total gain assumes a separable aperture and narrow beams in both planes.");
        line("");
    }

    /// <summary>The pointing table over temperature and transmitter frequency, and the worst bearing error.</summary>
    /// <param name="p">The pointing report.</param>
    /// <param name="line">Writes one line.</param>
    public static void WritePointing(PointingReport p, Action<string> line)
    {
        line("## Pointing over temperature and frequency");
        line("");
        string alpha = double.IsNaN(p.ExpansionPerKelvin) ? "unknown for this metal: temperature not included"
            : $"{Invariant.Fixed(p.ExpansionPerKelvin * 1e6, 1)}e-6 per K ({p.ExpansionSource})";
        line($"Every dimension grows by 1 + αΔT from 20 °C (α {alpha}); by electromagnetic similitude (G. Sinclair, Proc. IRE 36, 1948) the antenna at temperature T and frequency f points where the antenna as built points at f (1 + αΔT), read off the analysed sweep.");
        line("");
        line("| temperature (°C) | transmitter (GHz) | equivalent (GHz) | beam (deg) | error (deg) |");
        line("| ---: | ---: | ---: | ---: | ---: |");
        foreach (var r in p.Rows)
            line($"| {Invariant.Fixed(r.TemperatureC, 1)} | {Invariant.Fixed(r.FrequencyHz * 1e-9, 4)} | {Invariant.Fixed(r.EquivalentFrequencyHz * 1e-9, 5)} | {Invariant.Fixed(r.BeamDeg, 3)} | {Invariant.Fixed(r.ErrorDeg, 3)}{(r.FromSweep ? "" : " (phase condition)")} |");
        line("");
        line($"Worst-case bearing error over {Invariant.Fixed(p.LowC, 0)} to {Invariant.Fixed(p.HighC, 0)} °C and ±{Invariant.Fixed(p.FrequencyToleranceHz * 1e-6, 1)} MHz: **{Invariant.Fixed(p.WorstErrorDeg, 3)} deg** (drift {Invariant.Fixed(p.DegPerKelvin * 1e3, 3)} mdeg per K, {Invariant.Fixed(p.DegPerMhz * 1e3, 2)} mdeg per MHz).");
        line("");
    }

    /// <summary>The flare's and the filter's plates (the same rows as <c>parts.csv</c>).</summary>
    /// <param name="parts">The parts.</param>
    /// <param name="line">Writes one line.</param>
    public static void WriteParts(IReadOnlyList<PartRow> parts, Action<string> line)
    {
        if (parts.Count == 0) return;
        line("## Flare and filter parts");
        line("");
        line("Positions along the guide from datum A, as in the cut list (`parts.csv` has the same rows).");
        line("");
        line("| part | qty | along guide (mm) | width / depth (mm) | height (mm) | first from A (mm) | pitch (mm) | angle (deg) |");
        line("| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: |");
        foreach (var p in parts)
            line($"| {p.Name} | {Invariant.Int(p.Quantity)} | {Invariant.Fixed(p.AlongGuideMm, 2)} | {Invariant.Fixed(p.WidthMm, 2)} | {Invariant.Fixed(p.HeightMm, 2)} | {Invariant.Fixed(p.FirstFromAMm, 2)} | {Invariant.Fixed(p.PitchMm, 2)} | {Invariant.Fixed(p.AngleDeg, 2)} |");
        line("");
    }
}
