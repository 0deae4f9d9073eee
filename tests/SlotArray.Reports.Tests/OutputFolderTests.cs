namespace SlotArray.Reports.Tests;

public sealed class OutputFolderTests : IDisposable
{
    private readonly string _root = Path.Combine(Path.GetTempPath(), "slotarray-reports-tests-" + Guid.NewGuid().ToString("N"));

    public OutputFolderTests() => Directory.CreateDirectory(_root);

    public void Dispose() => Directory.Delete(_root, recursive: true);

    private static readonly string[] Expected =
        ["cutlist.csv", "design.json", "input.s1p", "layout.svg", "pattern.png", "pattern.svg", "scan.png", "slots.png", "summary.md", "sweep.png", "taper.png"];

    private string[] Entries(string dir) => [.. Directory.EnumerateFileSystemEntries(dir).Select(Path.GetFileName).Order(StringComparer.Ordinal)!];

    [Fact]
    public void WriteAll_writes_every_file_of_the_architecture_table_and_nothing_else_beside_it()
    {
        string dir = Path.Combine(_root, "out");
        OutputFolder.WriteAll(ReportFixture.Eight(), dir);
        Assert.Equal(Expected, Entries(dir));
        Assert.Equal(["out"], Entries(_root));                // no temporary folder left behind
    }

    [Fact]
    public void Two_writes_give_byte_identical_files()
    {
        string a = Path.Combine(_root, "a"), b = Path.Combine(_root, "b");
        OutputFolder.WriteAll(ReportFixture.Eight(), a);
        OutputFolder.WriteAll(ReportFixture.Eight(), b);
        foreach (string f in Expected)
            Assert.True(File.ReadAllBytes(Path.Combine(a, f)).AsSpan().SequenceEqual(File.ReadAllBytes(Path.Combine(b, f))), $"{f} differs between two runs");
    }

    private static IReadOnlyList<OutputFile> FailingAfterTwo() =>
    [
        OutputFolder.Files[0],
        OutputFolder.Files[1],
        new("layout.svg", (_, s) => { s.Write("<svg"u8); throw new InvalidOperationException("writer failed midway"); }),
        OutputFolder.Files[3],
    ];

    [Fact]
    public void A_writer_failing_midway_leaves_no_output()
    {
        string dir = Path.Combine(_root, "out");
        var e = Assert.Throws<InvalidOperationException>(() => OutputFolder.WriteAll(ReportFixture.Eight(), dir, FailingAfterTwo()));
        Assert.Equal("writer failed midway", e.Message);
        Assert.False(Directory.Exists(dir));
        Assert.Empty(Entries(_root));
    }

    [Fact]
    public void A_failed_run_keeps_the_older_output_intact_and_a_good_run_replaces_it_whole()
    {
        string dir = Path.Combine(_root, "out");
        var older = ReportFixture.Eight() with { Name = "older" };
        OutputFolder.WriteAll(older, dir, [OutputFolder.Files[0], new("summary.md", (_, s) => s.Write("old"u8))]);
        byte[] oldJson = File.ReadAllBytes(Path.Combine(dir, "design.json"));

        Assert.Throws<InvalidOperationException>(() => OutputFolder.WriteAll(ReportFixture.Eight(), dir, FailingAfterTwo()));
        Assert.Equal(["design.json", "summary.md"], Entries(dir));
        Assert.Equal(oldJson, File.ReadAllBytes(Path.Combine(dir, "design.json")));
        Assert.Equal(["out"], Entries(_root));

        OutputFolder.WriteAll(ReportFixture.Eight(), dir, [OutputFolder.Files[1]]);
        Assert.Equal(["cutlist.csv"], Entries(dir));            // replaced whole: no file of the older run survives
    }

    [Fact]
    public void A_folder_holding_other_files_is_refused_before_anything_is_written()
    {
        string dir = Path.Combine(_root, "mine");
        Directory.CreateDirectory(dir);
        File.WriteAllText(Path.Combine(dir, "notes.txt"), "keep me");
        var e = Assert.Throws<OutputFolderException>(() => OutputFolder.WriteAll(ReportFixture.Eight(), dir));
        Assert.Contains("notes.txt", e.Message);
        Assert.Equal(["notes.txt"], Entries(dir));
        Assert.Equal(["mine"], Entries(_root));
    }
}
