using System.Globalization;
using System.Text;
using System.Xml;
using System.Xml.Linq;

namespace SlotArray.FullWave.Model;

/// <summary>
/// Writes an <see cref="FdtdModel"/> as the XML the openEMS engine reads (<c>openEMS FILE.xml</c>): an
/// <c>FDTD</c> element (time steps, stop rule, Gaussian excitation, boundaries) and a CSXCAD
/// <c>ContinuousStructure</c> (rectilinear grid in mm, solids, excitation and probes). The layout follows what the
/// engine's own Python interface (python3-openems, CSXCAD 0.6) writes for the same objects. TE10 port voltage and
/// current are mode-matching probes (types 10 and 11) with the TE10 field shape as weight, as that interface's
/// rectangular waveguide port does: E_y ∝ −sin(π(x − x0)/a), H_x ∝ +sin(π(x − x0)/a) (D. M. Pozar, Microwave
/// Engineering, 4th ed., Wiley 2012, section 3.3, eq. 3.89, from memory).
/// </summary>
internal static class OpenEmsXml
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The drawing unit of every coordinate in the file, metres (mm).</summary>
    public const double DrawingUnitMeters = 1e-3;

    /// <summary>The model as XML text (UTF-8 declaration, two-space indent, LF line ends); deterministic.</summary>
    public static string ToText(FdtdModel model)
    {
        var doc = new XDocument(new XDeclaration("1.0", "UTF-8", "yes"), Build(model));
        var sb = new StringBuilder();
        using (var w = XmlWriter.Create(new StringWriterUtf8(sb), new XmlWriterSettings { Indent = true, IndentChars = "  ", NewLineChars = "\n" }))
            doc.Save(w);
        return sb.Append('\n').ToString();
    }

    private static XElement Build(FdtdModel m)
    {
        string pml = $"PML_{m.PmlCells}";
        var fdtd = new XElement("FDTD",
            new XAttribute("NumberOfTimesteps", m.MaxTimesteps),
            new XAttribute("endCriteria", F(m.EndCriterion)),
            new XAttribute("f_max", F(m.CentreFrequencyHz + m.HalfBandwidthHz)),
            new XElement("Excitation", new XAttribute("Type", 0), new XAttribute("f0", F(m.CentreFrequencyHz)), new XAttribute("fc", F(m.HalfBandwidthHz))),
            new XElement("BoundaryCond", new XAttribute("xmin", pml), new XAttribute("xmax", pml), new XAttribute("ymin", pml),
                new XAttribute("ymax", pml), new XAttribute("zmin", pml), new XAttribute("zmax", pml)));
        var props = new XElement("Properties");
        int id = 0;
        foreach (var s in m.Solids) props.Add(SolidElement(s, id++));
        foreach (var p in m.Ports) foreach (var e in PortElements(p, ref id)) props.Add(e);
        foreach (var p in m.Probes) props.Add(VoltageProbeElement(p, id++));
        var csx = new XElement("ContinuousStructure", new XAttribute("CoordSystem", 0),
            new XElement("RectilinearGrid", new XAttribute("DeltaUnit", F(DrawingUnitMeters)), new XAttribute("CoordSystem", 0),
                Lines("XLines", m.Mesh.X), Lines("YLines", m.Mesh.Y), Lines("ZLines", m.Mesh.Z)),
            new XElement("BackgroundMaterial", new XAttribute("Epsilon", 1), new XAttribute("Mue", 1), new XAttribute("Kappa", 0), new XAttribute("Sigma", 0)),
            props);
        return new XElement("openEMS", new XComment(" " + m.Title.Replace("--", "- -") + " "), fdtd, csx);
    }

    private static XElement Lines(string name, IReadOnlyList<double> lines) =>
        new(name, new XAttribute("Qty", lines.Count), string.Join(",", lines.Select(F)));

    private static XElement SolidElement(Solid s, int id)
    {
        var prims = new XElement("Primitives", s.Primitives.Select(PrimitiveElement));
        if (s.Kind == FillKind.Metal)
            return new XElement("Metal", new XAttribute("ID", id), new XAttribute("Name", s.Name), prims);
        double eps = s.Kind == FillKind.Air ? 1 : s.Permittivity;
        double kappa = s.Kind == FillKind.Air ? 0 : s.Conductivity;
        return new XElement("Material", new XAttribute("ID", id), new XAttribute("Name", s.Name), new XAttribute("Isotropy", 1), prims,
            new XElement("Property", new XAttribute("Epsilon", Triple(eps)), new XAttribute("Mue", Triple(1)), new XAttribute("Kappa", Triple(kappa)),
                new XAttribute("Sigma", Triple(0)), new XAttribute("Density", 0)));
    }

    private static string Triple(double v) => $"{F(v)},{F(v)},{F(v)}";

    private static XElement PrimitiveElement(Primitive p) => p switch
    {
        BoxPrimitive b => new XElement("Box", new XAttribute("Priority", b.Priority), PointElement("P1", b.P1), PointElement("P2", b.P2)),
        CylinderPrimitive c => new XElement("Cylinder", new XAttribute("Priority", c.Priority), new XAttribute("Radius", F(c.RadiusMm)),
            PointElement("P1", c.P1), PointElement("P2", c.P2)),
        ExtrudedPolygon e => new XElement("LinPoly", new XAttribute("Priority", e.Priority), new XAttribute("Elevation", F(e.ElevationMm)),
            new XAttribute("NormDir", e.NormalAxis), new XAttribute("QtyVertices", e.Vertices.Count), new XAttribute("Length", F(e.LengthMm)),
            e.Vertices.Select(v => new XElement("Vertex", new XAttribute("X1", F(v.First)), new XAttribute("X2", F(v.Second))))),
        _ => throw new ArgumentOutOfRangeException(nameof(p), p.GetType().Name, "unknown primitive"),
    };

    private static XElement PointElement(string name, Point3 p) =>
        new(name, new XAttribute("X", F(p.X)), new XAttribute("Y", F(p.Y)), new XAttribute("Z", F(p.Z)));

    /// <summary>The TE10 weight along the broad wall, sin(π(x − x0)/a) scaled by 1/a, as the engine's function parser reads it (x in mm).</summary>
    internal static string ModeShape(WaveguidePortDefinition p, double sign)
    {
        double a = p.XMaxMm - p.XMinMm;
        return $"{F(sign / a)}*sin({F(Math.PI / a)}*(x-({F(p.XMinMm)})))";
    }

    private static IEnumerable<XElement> PortElements(WaveguidePortDefinition p, ref int id)
    {
        var list = new List<XElement>();
        string eY = ModeShape(p, -1), hX = ModeShape(p, +1);
        if (p.Excited)
        {
            list.Add(new XElement("Excitation", new XAttribute("ID", id++), new XAttribute("Name", $"port_excite{p.Number}"), new XAttribute("Number", 0),
                new XAttribute("Type", 0), new XAttribute("Excite", "1,1,0"), new XAttribute("Delay", 0),
                new XElement("Primitives", PlaneBox(p, p.ExciteZMm)),
                new XElement("Weight", new XAttribute("X", "0"), new XAttribute("Y", eY), new XAttribute("Z", "0"))));
        }
        list.Add(new XElement("ProbeBox", new XAttribute("ID", id++), new XAttribute("Name", p.VoltageProbeName), new XAttribute("Number", 0),
            new XAttribute("Type", 10), new XAttribute("Weight", 1), new XAttribute("NormDir", -1), new XAttribute("StartTime", 0), new XAttribute("StopTime", 0),
            new XElement("Attributes", new XAttribute("ModeFunctionX", "0"), new XAttribute("ModeFunctionY", eY), new XAttribute("ModeFunctionZ", "0")),
            new XElement("Primitives", PlaneBox(p, p.MeasureZMm))));
        list.Add(new XElement("ProbeBox", new XAttribute("ID", id++), new XAttribute("Name", p.CurrentProbeName), new XAttribute("Number", 0),
            new XAttribute("Type", 11), new XAttribute("Weight", p.Direction), new XAttribute("NormDir", -1), new XAttribute("StartTime", 0), new XAttribute("StopTime", 0),
            new XElement("Attributes", new XAttribute("ModeFunctionX", hX), new XAttribute("ModeFunctionY", "0"), new XAttribute("ModeFunctionZ", "0")),
            new XElement("Primitives", PlaneBox(p, p.MeasureZMm))));
        return list;
    }

    private static XElement PlaneBox(WaveguidePortDefinition p, double z) =>
        new("Box", new XAttribute("Priority", 0), PointElement("P1", new Point3(p.XMinMm, p.YMinMm, z)), PointElement("P2", new Point3(p.XMaxMm, p.YMaxMm, z)));

    private static XElement VoltageProbeElement(VoltageProbe p, int id) =>
        new("ProbeBox", new XAttribute("ID", id), new XAttribute("Name", p.Name), new XAttribute("Number", 0), new XAttribute("Type", 0),
            new XAttribute("Weight", 1), new XAttribute("NormDir", -1), new XAttribute("StartTime", 0), new XAttribute("StopTime", 0),
            new XElement("Primitives", new XElement("Box", new XAttribute("Priority", 0), PointElement("P1", p.From), PointElement("P2", p.To))));

    /// <summary>A double as the shortest round-trip invariant text.</summary>
    internal static string F(double v) => v.ToString("R", Inv);

    private sealed class StringWriterUtf8(StringBuilder sb) : StringWriter(sb, CultureInfo.InvariantCulture)
    {
        public override Encoding Encoding => Encoding.UTF8;
    }
}
