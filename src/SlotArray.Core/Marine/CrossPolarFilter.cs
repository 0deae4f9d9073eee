using System.Globalization;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Marine;

/// <summary>
/// A polarisation filter in front of edge slots: thin metal plates across the aperture, normal to the guide axis,
/// <see cref="Spacing"/> apart (centre to centre), <see cref="Thickness"/> thick, reaching <see cref="Depth"/> out from
/// the slotted face. The wanted field of an edge slot (E along the guide axis) is normal to the plates and passes
/// between them as the parallel-plate guide's TEM mode; the cross-polarised field (E across the narrow wall, parallel to
/// the plates) needs the TE1 mode, which is cut off when the clear gap is under half a wavelength and decays through
/// the depth.
/// </summary>
/// <remarks>
/// <para>Cut-off attenuation. Between plates a clear gap g = s − t apart, the TE_n and TM_n modes have the cutoff
/// wavenumber k_c = nπ/g and the propagation constant β = √(k² − k_c²) (D. M. Pozar, <i>Microwave Engineering</i>,
/// 4th ed., Wiley 2012, §3.1, parallel-plate waveguide, TE and TM modes); below cutoff β is imaginary and the field
/// decays as e^{−αx} with α = √(k_c² − k²) Np/m. A field parallel to the plates must vanish on them, so the cross-
/// polarised field's lowest mode is TE1 (f_c = c/(2g)); every higher mode decays faster, so the TE1 attenuation
/// 20 log10(e) α D dB over the depth D is the filter's (conservative) cross-polar attenuation.</para>
/// <para>Wanted polarisation. E normal to the plates is the TEM mode, with no cutoff; what it meets is the step in the
/// open fraction at the front and back faces: the plate region is a line section of relative impedance r = g/s and
/// electrical length kD, whose power transmission for a normally incident wave is
/// |T|² = 1 / (1 + ¼(r − 1/r)² sin²(kD)) (a lossless line section between matched lines, from its ABCD matrix,
/// Pozar 2012, §4.4, Table 4.1). Grating: the plates repeat every s along the guide axis, so the aperture field gains
/// the space harmonics sin θ_m = sin θ + mλ/s; with s &lt; λ/2 every m ≠ 0 has |sin θ_m| &gt; 1 and stays evanescent (no
/// grating lobe).</para>
/// <para>Limits (stated with the results): infinitely wide, perfectly conducting plates; the attenuation applied to the
/// whole cross-polarised cut (its coupling into TE1 at the entrance taken as lossless, so the figure is the mode's
/// decay, not a full-wave solution); the plates' edge diffraction and their loading of the slots (evanescent fields
/// reaching back to the slotted face) are not modelled.</para>
/// </remarks>
/// <param name="Spacing">Plate pitch s along the guide axis, centre to centre; &gt; <paramref name="Thickness"/>.</param>
/// <param name="Depth">Plate depth D out from the slotted face; &gt; 0.</param>
/// <param name="Thickness">Plate thickness t; ≥ 0.</param>
internal sealed record CrossPolarFilter(Length Spacing, Length Depth, Length Thickness)
{
    /// <summary>20 log10(e): dB per neper of field.</summary>
    public const double DbPerNeper = 8.685889638065036;

    /// <summary>Clear gap between neighbouring plates, g = s − t.</summary>
    public Length Gap => Spacing - Thickness;

    /// <summary>Cutoff frequency of the TE1 parallel-plate mode in the gap, c/(2g) (Pozar 2012, §3.1).</summary>
    public Frequency CutoffTe1 => Frequency.FromHertz(PhysicalConstants.SpeedOfLight / (2 * Gap.Meters));

    /// <summary>
    /// Attenuation constant α of the TE1 mode, Np/m: √((π/g)² − k²) below cutoff; 0 at or above it (the mode propagates).
    /// </summary>
    /// <param name="f">Frequency.</param>
    public double AttenuationNeperPerMeter(Frequency f)
    {
        double kc = Math.PI / Gap.Meters, k = f.FreeSpaceWavenumber;
        return kc > k ? Math.Sqrt(kc * kc - k * k) : 0;
    }

    /// <summary>Attenuation per millimetre of depth, dB (TE1 decay).</summary>
    /// <param name="f">Frequency.</param>
    public double AttenuationDbPerMillimeter(Frequency f) => DbPerNeper * AttenuationNeperPerMeter(f) * 1e-3;

    /// <summary>Cross-polar attenuation of the whole depth, dB (positive), 20 log10(e) α D.</summary>
    /// <param name="f">Frequency.</param>
    public double CrossPolarAttenuationDb(Frequency f) => DbPerNeper * AttenuationNeperPerMeter(f) * Depth.Meters;

    /// <summary>
    /// Loss of the wanted (TEM) polarisation through the plate region, dB (positive): −10 log10 |T|², the line section
    /// of relative impedance g/s and length D (remarks).
    /// </summary>
    /// <param name="f">Frequency.</param>
    public double WantedLossDb(Frequency f)
    {
        double r = Gap.Meters / Spacing.Meters, kd = f.FreeSpaceWavenumber * Depth.Meters;
        double m = 0.5 * (r - 1 / r), s = Math.Sin(kd);
        return 10 * Math.Log10(1 + m * m * s * s);
    }

    /// <summary>Whether some grating order of the plate pitch enters real space at beam direction θ: s (1 + |sin θ|) ≥ λ.</summary>
    /// <param name="f">Frequency.</param>
    /// <param name="beam">Beam direction.</param>
    public bool HasGratingLobe(Frequency f, Angle beam) => Spacing.Meters * (1 + Math.Abs(Math.Sin(beam.Radians))) >= f.FreeSpaceWavelength.Meters;

    /// <summary>Validates the geometry: thickness ≥ 0, spacing above it, depth &gt; 0; the reason names the numbers.</summary>
    /// <exception cref="ArgumentException">A dimension is out of range.</exception>
    public CrossPolarFilter Validated()
    {
        if (!(Thickness.Meters >= 0) || !(Spacing.Meters > Thickness.Meters) || !(Depth.Meters > 0))
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"filter plates {Thickness.Millimeters:0.###} mm thick at {Spacing.Millimeters:0.###} mm pitch, {Depth.Millimeters:0.###} mm deep: the pitch must exceed the thickness and the depth be positive"));
        return this;
    }
}
