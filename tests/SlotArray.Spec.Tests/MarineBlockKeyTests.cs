namespace SlotArray.Spec.Tests;

/// <summary>
/// The marine antenna's <c>filter</c> and <c>flare</c> blocks: their lengths are each a positive length (or <c>auto</c>)
/// up to a limit no such part exceeds (filter 1 m, flare 10 m; common practice, no source), and a bad one is refused at
/// its own line and column with the value read back in mm, not ignored or clamped.
/// </summary>
public class MarineBlockKeyTests
{
    private static string Spec(params string[] blockLines) => string.Join("\n",
    [
        "spec: 1", "name: t", "frequency: 9.41 GHz", "band: [9.38 GHz, 9.44 GHz]",
        "guide:", "  size: WR-90", "  wall: 1.27 mm", "  metal: aluminium",
        "slots:", "  type: edge", "  count: 16", "  width: 1.6 mm",
        "feed:", "  type: travelling-wave", "  spacing: 21 mm", "  load: 8 %",
        "taper:", "  type: taylor", "  sidelobes: -25 dB",
        .. blockLines,
    ]) + "\n";

    private const int FirstBlockLine = 20;

    [Fact]
    public void Filter_and_flare_lengths_and_auto_are_read_in_SI()
    {
        var r = SpecLoader.Parse(Spec("filter:", "  spacing: 12 mm", "  depth: auto", "flare:", "  length: 150 mm", "  aperture: auto"), "t.yaml");
        Assert.True(r.IsValid, string.Join("\n", r.Errors));
        Assert.Equal(12e-3, r.Request!.Filter!.Spacing!.Value.Meters, 15);
        Assert.Null(r.Request.Filter.Depth);
        Assert.Equal(0.150, r.Request.Flare!.Length!.Value.Meters, 15);
        Assert.Null(r.Request.Flare.Aperture);
    }

    [Theory]
    [InlineData("filter:", "spacing: 2 m", "'spacing' must be a length above 0 and up to 1 m, got 2000 mm")]
    [InlineData("filter:", "depth: 0 mm", "'depth' must be a length above 0 and up to 1 m, got 0 mm")]
    [InlineData("flare:", "length: 12 m", "'length' must be a length above 0 and up to 10 m, got 12000 mm")]
    [InlineData("flare:", "aperture: -5 mm", "'aperture' must be a length above 0 and up to 10 m, got -5 mm")]
    public void A_length_out_of_range_is_refused_at_its_line_and_column(string block, string line, string message)
    {
        var r = SpecLoader.Parse(Spec(block, "  " + line), "t.yaml");
        var e = Assert.Single(r.Errors);
        Assert.Equal(FirstBlockLine + 1, e.Line);
        Assert.Equal(3 + line.IndexOf(':', StringComparison.Ordinal) + 2, e.Column);
        Assert.Contains(message, e.Message, StringComparison.Ordinal);
    }
}
