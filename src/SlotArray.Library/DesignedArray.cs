using SlotArray.Core.Design;
using SlotArray.Reports.Model;

namespace SlotArray;

/// <summary>
/// The outcome of <see cref="SlotArrayDesigner.Design(ArraySpec, System.Threading.CancellationToken, IProgress{SlotArray.Core.WorkProgress}?)"/>:
/// the slot geometry and the predicted performance, as <c>design.json</c> carries them (SI units: metres, hertz; levels in dB).
/// </summary>
public sealed class DesignedArray
{
    internal DesignedArray(ArraySpec spec, ArrayResult analysis, DesignReport report)
    {
        Spec = spec;
        Analysis = analysis;
        Report = report;
    }

    /// <summary>The spec that was designed.</summary>
    public ArraySpec Spec { get; }

    /// <summary>
    /// Everything the output folder reports: the slots (position, offset or tilt, length, overall length, conductance,
    /// target and achieved amplitude), the pattern (beam, beamwidth, peak sidelobe, directivity, gain), the match across
    /// the band, the requirement verdicts, safety screens and warnings.
    /// </summary>
    public DesignReport Report { get; }

    /// <summary>The slots in order from the feed end's datum (the short circuit for a standing-wave array).</summary>
    public IReadOnlyList<SlotReport> Slots => Report.Slots;

    /// <summary>Peak sidelobe of the analysed pattern at the design frequency, dB relative to the main beam (negative).</summary>
    public double PeakSidelobeDb => Report.Pattern.PeakSidelobeDb;

    /// <summary>Whether every requirement the spec states is met (see <see cref="DesignReport.Requirements"/>).</summary>
    public bool MeetsRequirements => Report.Requirements.All(r => r.Passed);

    /// <summary>The pipeline's full result (design, network sweep, figures), kept for the tolerance analysis.</summary>
    internal ArrayResult Analysis { get; }
}
