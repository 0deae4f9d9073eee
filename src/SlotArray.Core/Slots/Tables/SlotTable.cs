using System.Numerics;

namespace SlotArray.Core.Slots.Tables;

/// <summary>Which slot a table describes, as its geometry columns say.</summary>
public enum SlotTableGeometry
{
    /// <summary>Longitudinal broad-wall shunt slot: offset and length.</summary>
    Longitudinal,
    /// <summary>Inclined narrow-wall (edge) shunt slot: tilt and cut depth (or developed length).</summary>
    Edge,
    /// <summary>Centred inclined series slot in the broad wall: tilt and length.</summary>
    InclinedSeries,
}

/// <summary>What a table row's response columns hold.</summary>
public enum SlotTableResponse
{
    /// <summary>Normalised admittance y = g + jb.</summary>
    Admittance,
    /// <summary>Normalised impedance z = r + jx.</summary>
    Impedance,
    /// <summary>Single-slot two-port S11 (and optionally S21), TE10 at both ports.</summary>
    Scattering,
}

/// <summary>One row of a slot table, in SI units, as read (no conversion yet).</summary>
/// <param name="Line">1-based line of the row in the file (for messages).</param>
/// <param name="Coupling">Offset (m) or tilt (rad).</param>
/// <param name="Length">Slot length (m), or NaN when the row gives a cut depth only.</param>
/// <param name="CutDepth">Edge slot: cut depth into each broad wall from the outer narrow-wall face (m), or NaN.</param>
/// <param name="Frequency">Frequency, Hz.</param>
/// <param name="Value">y, z or S11 as <see cref="SlotTable.Response"/> says.</param>
/// <param name="S21">S21 when the table gives it (scattering only), else null.</param>
/// <param name="ReferencePlane">Scattering: distance of both reference planes beyond the slot centre (m), 0 at the centre.</param>
public sealed record SlotTableRow(int Line, double Coupling, double Length, double CutDepth, double Frequency, Complex Value,
    Complex? S21 = null, double ReferencePlane = 0);

/// <summary>
/// A user's slot table as read from its file (README, "Your own slot table"): where it came from, its provenance lines,
/// its geometry and response kinds, and its rows. Pure data; the file is read at the edge (SlotArray.Spec).
/// </summary>
/// <param name="Source">The file name as the spec gives it (for messages and reports).</param>
/// <param name="Sha256">SHA-256 of the file's bytes, lower-case hex.</param>
/// <param name="Provenance">The <c>#</c> comment lines, without the <c>#</c> and surrounding blanks, in order.</param>
/// <param name="Geometry">Which slot the geometry columns describe.</param>
/// <param name="Response">What the response columns hold.</param>
/// <param name="Rows">The rows, in file order.</param>
public sealed record SlotTable(string Source, string Sha256, IReadOnlyList<string> Provenance, SlotTableGeometry Geometry,
    SlotTableResponse Response, IReadOnlyList<SlotTableRow> Rows);
