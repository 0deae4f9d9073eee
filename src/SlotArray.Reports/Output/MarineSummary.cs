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
}
