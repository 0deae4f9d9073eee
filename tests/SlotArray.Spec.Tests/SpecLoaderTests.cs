using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Spec;
using SlotArray.Tests.Shared;

namespace SlotArray.Spec.Tests;

/// <summary>The example specs load cleanly into the values they state; defaults are applied as documented.</summary>
public class SpecLoaderTests
{
    [Fact]
    public void Every_example_loads_without_errors_or_warnings()
    {
        Assert.Equal(4, RepoFiles.Examples.Count);   // harbour demo, custom tube, marine travelling-wave edge-slot demo, circular planar array
        foreach (string path in RepoFiles.Examples)
        {
            var r = SpecLoader.LoadFile(path);
            Assert.True(r.IsValid, string.Join("\n", r.Errors));
            Assert.Empty(r.Warnings);
        }
    }

    [Fact]
    public void The_demo_spec_reads_into_SI()
    {
        var r = SpecLoader.LoadFile(RepoFiles.Demo).Request!;
        Assert.Equal("harbour-surveillance-16", r.Name);
        Check.Relative(9.41e9, r.DesignFrequency.Hertz, 1e-12, "as written in the spec");
        Check.Relative(9.35e9, r.BandLow.Hertz, 1e-12, "as written in the spec");
        Check.Relative(9.47e9, r.BandHigh.Hertz, 1e-12, "as written in the spec");
        Assert.Equal("WR-90", r.Guide.Designation);
        Check.Relative(0.900 * 0.0254, r.Guide.BroadWall.Meters, 1e-12, "WR-90 inside a = 0.900 in (EIA RS-261-B)");
        Check.Relative(0.400 * 0.0254, r.Guide.NarrowWall.Meters, 1e-12, "WR-90 inside b = 0.400 in (EIA RS-261-B)");
        Check.Relative(1.27e-3, r.Guide.WallThickness.Meters, 1e-12, "as written");
        Assert.Equal("aluminium", r.Guide.MetalName);
        Assert.Equal(new SlotRequest(SlotType.Longitudinal, 16, Core.Quantities.Length.FromMillimeters(1.6), Core.Quantities.Length.FromMillimeters(1.6), SlotModelKind.MomentMethod), r.Slots);
        Assert.Equal(FeedType.StandingWave, r.Feed.Type);
        Assert.Equal(0.5, r.Feed.Spacing.GuideWavelengths);
        Assert.Equal(0.25, r.Feed.ShortDistance.GuideWavelengths);
        Assert.Equal((TaperType.Taylor, -26.0, 4), (r.Taper.Type, r.Taper.SidelobeLevelDb, r.Taper.Nbar));
        var t = r.Tolerance!;
        Assert.Equal((2000, 7), (t.Trials, t.Seed));
        Assert.Equal(ErrorDistribution.Uniform, t.Offset.Distribution);
        Assert.Equal(ErrorDistribution.Normal, t.Wall.Distribution);
        Check.Relative(0.05e-3, t.Wall.Value.Meters, 1e-12, "as written ({sigma: 0.05 mm})");
        Assert.Equal(new Requirements(-24, -25, 1.5), r.Requirements);
        Assert.Equal(new TransmitterRequest(25e3, 20), r.Transmitter);
    }

    [Fact]
    public void The_tube_example_is_a_custom_guide_single_mode_at_5_8_GHz()
    {
        var r = SpecLoader.LoadFile(RepoFiles.Tube).Request!;
        Assert.Equal("custom", r.Guide.Designation);
        // 40 mm wide tube: TE10 cutoff c/(2a) = 3.7474 GHz, TE20 = c/a = 7.4948 GHz (Pozar Sec. 3.3, computed here)
        Check.Relative(299_792_458 / 0.080, r.Guide.CutoffTe10.Hertz, 1e-12, "c/(2a), Pozar Sec. 3.3");
        Assert.Equal(FeedPosition.Centre, r.Feed.Position);
        Assert.Equal(TaperType.Chebyshev, r.Taper.Type);
    }

    [Fact]
    public void Defaults_are_taken_with_warnings_where_they_matter()
    {
        string yaml = "spec: 1\nname: d\nfrequency: 10 GHz\nguide:\n  size: WR-90\n  wall: 1 mm\nslots:\n  type: edge\n  count: 8\n  width: 1.5 mm\nfeed:\n  type: standing-wave\n";
        var r = SpecLoader.Parse(yaml, "d.yaml");
        Assert.True(r.IsValid, string.Join("\n", r.Errors));
        var q = r.Request!;
        Check.Relative(9.8e9, q.BandLow.Hertz, 1e-12, "documented default: design frequency − 2 %");
        Check.Relative(10.2e9, q.BandHigh.Hertz, 1e-12, "documented default: design frequency + 2 %");
        Assert.Equal("aluminium", q.Guide.MetalName);
        Assert.Equal(SlotModelKind.MomentMethod, q.Slots.Model);
        Assert.Null(q.Slots.Cutter);
        Assert.Equal(0.5, q.Feed.Spacing.GuideWavelengths);
        Assert.Equal(FeedPosition.End, q.Feed.Position);
        Assert.Equal(0.25, q.Feed.ShortDistance.GuideWavelengths);
        Assert.Equal(TaperType.Uniform, q.Taper.Type);
        Assert.Equal(CouplingMode.None, q.Coupling);
        Assert.Null(q.Tolerance);
        Assert.Null(q.Transmitter);
        Assert.Equal(Requirements.None, q.Requirements);
        Assert.Equal(3, r.Warnings.Count); // band, metal, taper
        Assert.Contains(r.Warnings, w => w.Message.Contains("assuming aluminium") && w.Line == 4 && w.Column == 1);
    }

    [Fact]
    public void Travelling_wave_needs_a_spacing_and_takes_a_load()
    {
        string head = "spec: 1\nname: tw\nfrequency: 9.41 GHz\nband: [9.3 GHz, 9.5 GHz]\nguide: {size: WR-90, wall: 1.27 mm, metal: copper}\n"
            + "slots: {type: edge, count: 20, width: 1.6 mm}\ntaper: {type: villeneuve, sidelobes: -30 dB, nbar: 5}\n";
        var missing = SpecLoader.Parse(head + "feed:\n  type: travelling-wave\n", "tw.yaml");
        var e = Assert.Single(missing.Errors);
        Assert.Equal((8L, 1L), (e.Line, e.Column));
        Assert.Contains("'feed' needs 'spacing'", e.Message);

        var ok = SpecLoader.Parse(head + "feed:\n  type: travelling-wave\n  spacing: 18.6 mm\n  load: 4 %\n", "tw.yaml");
        Assert.True(ok.IsValid, string.Join("\n", ok.Errors));
        Check.Relative(0.04, ok.Request!.Feed.LoadFraction, 1e-12, "as written");
        Check.Relative(0.0186, ok.Request.Feed.Spacing.Fixed!.Value.Meters, 1e-12, "as written");
        Assert.Equal(5, ok.Request.Taper.Nbar);
    }

    [Fact]
    public void Given_weights_must_number_one_per_slot()
    {
        string yaml = SpecErrorTests.With((15, "taper: {type: given, weights: [1, 2, 3]}"), (16, null), (17, null));
        var e = Assert.Single(SpecLoader.Parse(yaml, "t.yaml").Errors);
        Assert.Equal((15L, 31L), (e.Line, e.Column));
        Assert.Contains("one weight per slot", e.Message);
    }

    [Fact]
    public void A_file_that_cannot_be_read_is_an_error_not_an_exception()
    {
        var r = SpecLoader.LoadFile(Path.Combine(RepoFiles.Root, "arrays", "no-such-spec.yaml"));
        var e = Assert.Single(r.Errors);
        Assert.Equal((1L, 1L), (e.Line, e.Column));
        Assert.Contains("cannot read", e.Message);
    }
}
