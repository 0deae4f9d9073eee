namespace SlotArray.FullWave.Model;

/// <summary>A point in the engine's drawing frame, millimetres (x across the broad wall, y across the narrow wall, z along the guide).</summary>
/// <param name="X">x, mm.</param>
/// <param name="Y">y, mm.</param>
/// <param name="Z">z, mm.</param>
internal readonly record struct Point3(double X, double Y, double Z);

/// <summary>What fills a solid.</summary>
internal enum FillKind
{
    /// <summary>Perfect electric conductor.</summary>
    Metal,

    /// <summary>Vacuum (air), used to carve holes out of metal at a higher priority.</summary>
    Air,

    /// <summary>A lossy dielectric with relative permittivity and conductivity.</summary>
    Dielectric,
}

/// <summary>One geometric primitive of a solid; a higher priority wins where primitives overlap.</summary>
/// <param name="Priority">Overlap priority (higher wins).</param>
internal abstract record Primitive(int Priority);

/// <summary>An axis-aligned box between two corners, mm.</summary>
/// <param name="P1">One corner.</param>
/// <param name="P2">The opposite corner.</param>
/// <param name="Priority">Overlap priority.</param>
internal sealed record BoxPrimitive(Point3 P1, Point3 P2, int Priority) : Primitive(Priority);

/// <summary>A circular cylinder of radius <paramref name="RadiusMm"/> on the axis from <paramref name="P1"/> to <paramref name="P2"/>, mm.</summary>
/// <param name="P1">Axis start.</param>
/// <param name="P2">Axis end.</param>
/// <param name="RadiusMm">Radius, mm, &gt; 0.</param>
/// <param name="Priority">Overlap priority.</param>
internal sealed record CylinderPrimitive(Point3 P1, Point3 P2, double RadiusMm, int Priority) : Primitive(Priority);

/// <summary>
/// A polygon in the plane normal to axis <paramref name="NormalAxis"/> (0 = x, 1 = y, 2 = z), extruded from
/// <paramref name="ElevationMm"/> by <paramref name="LengthMm"/> along that axis. Vertices are the two remaining
/// coordinates in cyclic order (normal x: (y, z); normal y: (z, x); normal z: (x, y)), mm.
/// </summary>
/// <param name="NormalAxis">0, 1 or 2.</param>
/// <param name="ElevationMm">Start of the extrusion along the normal, mm.</param>
/// <param name="LengthMm">Extrusion length along the normal, mm.</param>
/// <param name="Vertices">Polygon vertices (first, second in-plane coordinate), mm.</param>
/// <param name="Priority">Overlap priority.</param>
internal sealed record ExtrudedPolygon(int NormalAxis, double ElevationMm, double LengthMm, IReadOnlyList<(double First, double Second)> Vertices,
    int Priority) : Primitive(Priority);

/// <summary>A named solid: a fill and the primitives it occupies.</summary>
/// <param name="Name">Unique name in the model.</param>
/// <param name="Kind">What fills it.</param>
/// <param name="Permittivity">Relative permittivity (dielectric only; 1 otherwise).</param>
/// <param name="Conductivity">Conductivity, S/m (dielectric loss; 0 otherwise).</param>
/// <param name="Primitives">Where it is.</param>
internal sealed record Solid(string Name, FillKind Kind, double Permittivity, double Conductivity, IReadOnlyList<Primitive> Primitives);

/// <summary>
/// A rectangular-waveguide port for the TE10 mode along z: the guide's inside spans x in [XMin, XMax] (broad, width a)
/// and y in [YMin, YMax]; the mode is excited (when <paramref name="Excited"/>) in the plane z = <paramref name="ExciteZMm"/>
/// and its voltage and current are probed in the plane z = <paramref name="MeasureZMm"/>, which lies on the structure's
/// side of the excitation plane. The port's own direction points from the excitation plane to the measurement plane.
/// </summary>
/// <param name="Number">Port number (1-based).</param>
/// <param name="XMinMm">Inside broad-wall span start, mm.</param>
/// <param name="XMaxMm">Inside broad-wall span end, mm.</param>
/// <param name="YMinMm">Inside narrow-wall span start, mm.</param>
/// <param name="YMaxMm">Inside narrow-wall span end, mm.</param>
/// <param name="ExciteZMm">Excitation plane, mm.</param>
/// <param name="MeasureZMm">Measurement plane, mm.</param>
/// <param name="Excited">Whether this port launches the TE10 wave.</param>
internal sealed record WaveguidePortDefinition(int Number, double XMinMm, double XMaxMm, double YMinMm, double YMaxMm, double ExciteZMm,
    double MeasureZMm, bool Excited)
{
    /// <summary>+1 when the port points toward +z (its measurement plane beyond its excitation plane), else −1.</summary>
    public int Direction => MeasureZMm > ExciteZMm ? 1 : -1;

    /// <summary>Probe file name of the modal voltage.</summary>
    public string VoltageProbeName => $"port_ut{Number}";

    /// <summary>Probe file name of the modal current.</summary>
    public string CurrentProbeName => $"port_it{Number}";
}

/// <summary>A voltage probe: the line integral of E from <paramref name="From"/> to <paramref name="To"/> (an axis-aligned line), written to a file named <paramref name="Name"/>.</summary>
/// <param name="Name">Probe (file) name.</param>
/// <param name="From">Start point, mm.</param>
/// <param name="To">End point, mm.</param>
internal sealed record VoltageProbe(string Name, Point3 From, Point3 To);

/// <summary>Rectilinear mesh lines of the three axes, mm, each ascending.</summary>
/// <param name="X">x lines.</param>
/// <param name="Y">y lines.</param>
/// <param name="Z">z lines.</param>
internal sealed record MeshLines(IReadOnlyList<double> X, IReadOnlyList<double> Y, IReadOnlyList<double> Z)
{
    /// <summary>Number of FDTD cells.</summary>
    public long Cells => (long)(X.Count - 1) * (Y.Count - 1) * (Z.Count - 1);

    /// <summary>The smallest cell edge of the three axes, mm (it sets the time step).</summary>
    public double SmallestCellMm => new[] { X, Y, Z }.Min(l => l.Zip(l.Skip(1), (a, b) => b - a).Min());
}

/// <summary>
/// A complete FDTD run: mesh, solids, TE10 ports, probes, Gaussian excitation and the stop rule. The outer
/// boundary is a perfectly matched layer of <paramref name="PmlCells"/> cells on every face; structures that cross
/// it (the guide's ends) are absorbed there as matched terminations.
/// </summary>
/// <param name="Title">What the run is (a comment in the XML).</param>
/// <param name="Mesh">Mesh lines.</param>
/// <param name="Solids">Solids in the order written.</param>
/// <param name="Ports">Waveguide ports (one excited).</param>
/// <param name="Probes">Extra voltage probes.</param>
/// <param name="CentreFrequencyHz">Centre of the Gaussian pulse, Hz.</param>
/// <param name="HalfBandwidthHz">Half of the pulse's 20 dB bandwidth, Hz.</param>
/// <param name="MaxTimesteps">Upper bound on time steps.</param>
/// <param name="EndCriterion">Stop when the field energy falls to this fraction of its peak (1e-4 = −40 dB).</param>
/// <param name="PmlCells">PML thickness in cells on every face.</param>
internal sealed record FdtdModel(string Title, MeshLines Mesh, IReadOnlyList<Solid> Solids, IReadOnlyList<WaveguidePortDefinition> Ports,
    IReadOnlyList<VoltageProbe> Probes, double CentreFrequencyHz, double HalfBandwidthHz, int MaxTimesteps, double EndCriterion, int PmlCells);
