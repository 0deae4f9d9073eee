using System.Diagnostics;
using System.Globalization;
using System.Xml.Linq;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Slots;

namespace SlotArray.FullWave.Tests;

/// <summary>
/// The edge-slot geometry this project writes, read back by an independent reader: CSXCAD's own Python module
/// (Debian python3-openems, the engine's geometry library) says which solid owns each point
/// (scripts/fullwave/csx_owner.py). The expected owners follow from the cut's definition: a kerf of width w tilted θ
/// from the perpendicular to the guide axis, through the narrow wall and wrapping into both broad walls to depth D from
/// the outer narrow-wall face (WR-90: a = 22.86 mm, b = 10.16 mm; EIA inside 0.900 × 0.400 in, common practice, from memory).
/// </summary>
public sealed class EdgeSlotGeometryTests
{
    private static readonly GuideSection Wr90 = new(22.86, 10.16, 1.27);
    private const double Xo = 22.86 / 2 + 1.27, Yo = 10.16 / 2 + 1.27;

    private static FdtdModel Model(EdgeCut cut, SlotSurround surround) =>
        TubeModel.Build(new TubeLayout(Wr90, [new PlacedSlot(cut, 0)], true, null, -32, 32, 9.375e9, 1.4e9, MeshDensity.Coarse, false) { Surround = surround }, "test");

    private static string[] Owners(FdtdModel model, params (double X, double Y, double Z)[] points)
    {
        string file = Path.Combine(Path.GetTempPath(), $"edge-{Guid.NewGuid():N}.xml");
        File.WriteAllText(file, OpenEmsXml.ToText(model));
        try
        {
            var psi = new ProcessStartInfo("/usr/bin/python3") { RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true };
            psi.ArgumentList.Add(Path.Combine(RepoRoot(), "scripts", "fullwave", "csx_owner.py"));
            psi.ArgumentList.Add(file);
            using var p = Process.Start(psi)!;
            foreach (var (x, y, z) in points) p.StandardInput.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{x} {y} {z}"));
            p.StandardInput.Close();
            string stdout = p.StandardOutput.ReadToEnd(), stderr = p.StandardError.ReadToEnd();
            p.WaitForExit();
            Assert.True(p.ExitCode == 0, "CSXCAD could not read the model (install python3-openems: .ci/run does): " + stderr);
            return stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Skip(1).ToArray();
        }
        finally
        {
            File.Delete(file);
        }
    }

    private static string RepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SlotArray.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("SlotArray.sln not found above the test's folder");
    }

    private static List<double> Lines(FdtdModel m, string axis) =>
        XDocument.Parse(OpenEmsXml.ToText(m)).Root!.Element("ContinuousStructure")!.Element("RectilinearGrid")!.Element(axis)!.Value
            .Split(',').Select(v => double.Parse(v, CultureInfo.InvariantCulture)).ToList();

    [Fact]
    public void A_flat_saw_cut_opens_the_tilted_kerf_through_the_narrow_wall_and_the_wraps_down_to_the_depth()
    {
        double th = 20 * Math.PI / 180, d = 3.3, w = 1.6, tan = Math.Tan(th), half = w / 2 / Math.Cos(th);
        var m = Model(new EdgeCut(20, d, w), SlotSurround.Tube);
        double xWall = Xo - 0.6, yBroad = 10.16 / 2 + 0.6;
        var owners = Owners(m,
            (xWall, 3, 3 * tan),                          // on the kerf's axis in the narrow wall
            (xWall, 3, 3 * tan + half + 0.3),             // beside the kerf
            (xWall, -3, -3 * tan),                        // the other half, tilted the same way
            (Xo - d + 0.1, yBroad, yBroad * tan),         // in the +y wrap, just above the bottom
            (Xo - d - 0.1, yBroad, yBroad * tan),         // just below the bottom: metal
            (Xo - d + 0.1, -yBroad, -yBroad * tan),       // the -y wrap
            (0, 0, 0));                                   // inside the guide
        Assert.Equal(["slots", "tube", "slots", "slots", "tube", "slots", "-"], owners);
        // Mesh: a line on the cut's bottom, and cells no larger than w/3 (coarse: 2 across + 1) over the face the kerf crosses.
        Assert.Contains(Lines(m, "XLines"), x => Math.Abs(x - (Xo - d)) < 1e-9);
        var y = Lines(m, "YLines").Where(v => v >= -Yo - 1e-9 && v <= Yo + 1e-9).ToList();
        Assert.All(y.Zip(y.Skip(1), (a, b) => b - a), c => Assert.InRange(c, 0.2, w / 3 + 1e-9));
        double zExt = Yo * tan + half;
        var z = Lines(m, "ZLines").Where(v => Math.Abs(v) <= zExt + 1e-9).ToList();
        Assert.All(z.Zip(z.Skip(1), (a, b) => b - a), c => Assert.InRange(c, 0.2, w / 3 + 1e-9));
    }

    [Fact]
    public void An_end_mill_rounds_the_wraps_bottom_to_a_half_circle_whose_deepest_point_is_at_the_depth()
    {
        double th = 10 * Math.PI / 180, d = 3.3, w = 1.6;
        var m = Model(new EdgeCut(10, d, w, EdgeCutterForm.EndMill), SlotSurround.Tube);
        double yMid = 10.16 / 2 + 1.27 / 2, zc = yMid * Math.Tan(th);
        var owners = Owners(m,
            (Xo - d + 0.05, yMid, zc),              // on the half-round's axis just above its deepest point: air
            (Xo - d + 0.15, yMid, zc + 0.7),        // same height, near the kerf's edge: the round leaves metal there
            (Xo - d + 0.85, yMid, zc + 0.7));       // above the round's centre the kerf is full width
        Assert.Equal(["slots", "tube", "slots"], owners);
    }

    [Fact]
    public void The_surroundings_are_a_sheet_in_the_face_plane_or_two_plates_diverging_from_the_face_edges()
    {
        var cut = new EdgeCut(15, 3.3, 1.6);
        var plane = Model(cut, SlotSurround.GroundPlane);
        Assert.Equal(["ground-plane", "ground-plane", "-"], Owners(plane, (Xo, Yo + 5, 10), (Xo, -Yo - 5, -10), (Xo + 2, Yo + 5, 0)));
        // A flare 100 mm long to a 100 mm aperture (drawn 40 mm, then into the absorber): plate inner face at y = Yo + x' tan α.
        var flare = Model(cut, SlotSurround.Flare(100, 100));
        double tan = (100 - 2 * Yo) / 2 / 100, x1 = 20;
        Assert.Equal(["flare", "flare", "-", "-"], Owners(flare,
            (Xo + x1, Yo + x1 * tan + 0.5, 0), (Xo + x1, -(Yo + x1 * tan + 0.5), 30),
            (Xo + x1, Yo + x1 * tan - 0.5, 0), (Xo + x1, 0, 0)));
    }
}
