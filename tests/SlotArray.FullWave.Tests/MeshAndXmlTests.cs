using System.Xml.Linq;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Slots;

namespace SlotArray.FullWave.Tests;

/// <summary>The mesh puts a line on every geometry edge and grades smoothly; the XML holds what the model says.</summary>
public sealed class MeshAndXmlTests
{
    private static readonly GuideSection Wr90 = new(22.86, 10.16, 1.27);

    [Fact]
    public void Mesh_lines_fall_on_every_edge_and_no_cell_exceeds_the_largest()
    {
        var anchors = new[] { (0.0, 2.0), (10.0, 0.2), (10.8, 0.2), (40.0, 2.0) };
        var lines = MeshBuilder.Lines(anchors, 2.0);
        foreach (var (at, _) in anchors) Assert.Contains(lines, l => Math.Abs(l - at) < 1e-9);
        var cells = lines.Zip(lines.Skip(1), (a, b) => b - a).ToList();
        Assert.All(cells, c => Assert.InRange(c, 0.05, 2.0 * 1.0000001));
        Assert.All(cells.Where((c, i) => i > 0 && lines[i] > 10.9), c => Assert.True(c <= 2.0 + 1e-9));
    }

    [Fact]
    public void The_xml_has_the_grid_ports_and_the_slot_the_layout_asks_for()
    {
        var cut = new LongitudinalCut(3.0, 15.3, 1.5875, 1.5875);
        var layout = new TubeLayout(Wr90, [new PlacedSlot(cut, 0)], true, null, -33, 33, 9.375e9, 1.4e9, MeshDensity.Coarse, false);
        var model = TubeModel.Build(layout, "test");
        var doc = XDocument.Parse(OpenEmsXml.ToText(model));
        var x = doc.Root!.Element("ContinuousStructure")!.Element("RectilinearGrid")!.Element("XLines")!.Value.Split(',').Select(double.Parse).ToList();
        Assert.Contains(x, v => Math.Abs(v - (3.0 - 1.5875 / 2)) < 1e-9);
        Assert.Contains(x, v => Math.Abs(v - 11.43) < 1e-9);
        Assert.Equal(2, doc.Descendants("ProbeBox").Count(p => (string?)p.Attribute("Type") == "10"));
        Assert.Single(doc.Descendants("Excitation"), e => e.Attribute("Name") is not null);
        Assert.Equal(2, doc.Descendants("Cylinder").Count()); // round ends with cutter = width: one full-round cylinder per end
        Assert.Equal("PML_8", (string?)doc.Root.Element("FDTD")!.Element("BoundaryCond")!.Attribute("zmin"));
    }
}
