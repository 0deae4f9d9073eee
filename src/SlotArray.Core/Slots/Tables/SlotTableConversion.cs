using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots.Tables;

/// <summary>
/// Turns a table row's response into the slot's own normalised element value: the shunt admittance y = Y/G0 of a shunt
/// slot (longitudinal, edge), or the series impedance z = Z/Z0 of a series slot (inclined-series).
/// </summary>
/// <remarks>
/// <para>Two-port of a lumped element between two equal lines, normalised (D. M. Pozar, <i>Microwave Engineering</i>,
/// 4th ed., Wiley 2012, Table 4.1 for the ABCD matrices of a shunt admittance and a series impedance, Table 4.2 for
/// ABCD → S; from memory): shunt y: S11 = −y/(2 + y), S21 = 2/(2 + y), hence y = −2 S11/(1 + S11); series z:
/// S11 = z/(z + 2), S21 = 2/(z + 2), hence z = 2 S11/(1 − S11). A pure shunt element has S21 = 1 + S11 and a pure
/// series one S21 = 1 − S11; the difference measures how far the slot is from that (<see cref="ElementAsymmetry"/>).</para>
/// <para>Reference planes d beyond the slot centre on either side: a TE10 wave ∝ e^(−jβz) (e^(jωt)) travels d to the
/// slot and d back, so S11 at the planes is S11 at the centre times e^(−2jβd); the centre value is S11·e^(2jβd), and
/// the same factor for S21 (2d of line in total). β is the lossless TE10 phase constant of the spec's guide.</para>
/// <para>Edge slot: a row with a cut depth D gets the developed length L = b/cos θ + 2(D − t), the inner-aperture
/// convention of <see cref="EdgeSlot.DevelopedLength"/> that the cut list inverts.</para>
/// </remarks>
internal static class SlotTableConversion
{
    /// <summary>y from S11 of a shunt element: y = −2 S11/(1 + S11) (Pozar 2012, Tables 4.1–4.2).</summary>
    public static Complex ShuntAdmittanceFromS11(Complex s11) => -2 * s11 / (1 + s11);

    /// <summary>z from S11 of a series element: z = 2 S11/(1 − S11) (Pozar 2012, Tables 4.1–4.2).</summary>
    public static Complex SeriesImpedanceFromS11(Complex s11) => 2 * s11 / (1 - s11);

    /// <summary>S11 and S21 of a normalised shunt admittance y: −y/(2 + y), 2/(2 + y).</summary>
    public static (Complex S11, Complex S21) ShuntScattering(Complex y) => (-y / (2 + y), 2 / (2 + y));

    /// <summary>S-parameters moved from reference planes d beyond the slot centre to the centre: both × e^(2jβd).</summary>
    /// <param name="s">S11 or S21 at the planes.</param>
    /// <param name="guide">The guide (its TE10 β at f).</param>
    /// <param name="f">Frequency.</param>
    /// <param name="distance">d, metres (0: no shift).</param>
    public static Complex ToSlotCentre(Complex s, RectangularWaveguide guide, Frequency f, double distance)
    {
        ArgumentNullException.ThrowIfNull(guide);
        return distance == 0 ? s : s * Complex.FromPolarCoordinates(1, 2 * guide.PhaseConstant(f) * distance);
    }

    /// <summary>
    /// |1 + S11 − S21| (shunt) or |1 − S11 − S21| (series) at the slot centre: 0 for a pure element; null without S21.
    /// </summary>
    public static double? ElementAsymmetry(SlotTable table, SlotTableRow row, RectangularWaveguide guide)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(row);
        if (table.Response != SlotTableResponse.Scattering || row.S21 is not { } s21m) return null;
        var f = Frequency.FromHertz(row.Frequency);
        var s11 = ToSlotCentre(row.Value, guide, f, row.ReferencePlane);
        var s21 = ToSlotCentre(s21m, guide, f, row.ReferencePlane);
        return (table.Geometry == SlotTableGeometry.InclinedSeries ? 1 - s11 - s21 : 1 + s11 - s21).Magnitude;
    }

    /// <summary>The row's element value: y for a shunt slot, z for a series slot (see remarks).</summary>
    public static Complex ElementValue(SlotTable table, SlotTableRow row, RectangularWaveguide guide)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(row);
        ArgumentNullException.ThrowIfNull(guide);
        bool series = table.Geometry == SlotTableGeometry.InclinedSeries;
        return table.Response switch
        {
            SlotTableResponse.Admittance => series ? 1 / row.Value : row.Value,
            SlotTableResponse.Impedance => series ? row.Value : 1 / row.Value,
            _ => series
                ? SeriesImpedanceFromS11(ToSlotCentre(row.Value, guide, Frequency.FromHertz(row.Frequency), row.ReferencePlane))
                : ShuntAdmittanceFromS11(ToSlotCentre(row.Value, guide, Frequency.FromHertz(row.Frequency), row.ReferencePlane)),
        };
    }

    /// <summary>The row's slot length (m): as given, or for an edge slot with a cut depth only, b/cos θ + 2(D − t).</summary>
    public static double RowLength(SlotTable table, SlotTableRow row, RectangularWaveguide guide)
    {
        ArgumentNullException.ThrowIfNull(table);
        ArgumentNullException.ThrowIfNull(row);
        ArgumentNullException.ThrowIfNull(guide);
        if (table.Geometry != SlotTableGeometry.Edge || double.IsNaN(row.CutDepth)) return row.Length;
        return EdgeDevelopedLength(guide, row.Coupling, row.CutDepth);
    }

    /// <summary>Developed length b/cos θ + 2(D − t) of an edge slot of tilt θ and cut depth D (inner-aperture convention).</summary>
    public static double EdgeDevelopedLength(RectangularWaveguide guide, double tilt, double cutDepth)
    {
        ArgumentNullException.ThrowIfNull(guide);
        return guide.NarrowWall.Meters / Math.Cos(tilt) + 2 * (cutDepth - guide.WallThickness.Meters);
    }
}
