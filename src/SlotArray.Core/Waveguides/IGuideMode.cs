using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Waveguides;

/// <summary>
/// One propagating guide mode seen as a transmission line: the complex propagation constant and
/// the wave impedance at a frequency. Array and slot code depend only on this interface.
/// </summary>
/// <remarks>
/// Sign convention, stated once for the whole project: time dependence e^{jωt}; a wave travelling
/// towards +z varies as e^{−γz} with γ = α + jβ, α ≥ 0 the attenuation (Np/m) and β &gt; 0 the
/// phase constant (rad/m) above cutoff.
/// </remarks>
public interface IGuideMode
{
    /// <summary>Complex propagation constant γ = α + jβ at frequency f (1/m).</summary>
    Complex PropagationConstant(Frequency f);

    /// <summary>Wave impedance of the mode at frequency f (Ω); G0 = 1/Z is the normalising admittance.</summary>
    double WaveImpedance(Frequency f);

    /// <summary>Guide wavelength λg = 2π/β at frequency f.</summary>
    Length GuideWavelength(Frequency f);
}
