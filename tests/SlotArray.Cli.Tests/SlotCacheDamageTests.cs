using SlotArray.Cli;
using SlotArray.Core.Slots;
using SlotArray.Spec;

namespace SlotArray.Cli.Tests;

/// <summary>
/// Issue 11: a slot-cache file such as <c>{"Version":1}</c> made every later run exit 3. Any unreadable cache entry
/// (characterisation table or stored admittances) is ignored, the run succeeds, and the file is rewritten valid.
/// </summary>
public class SlotCacheDamageTests
{
    /// <summary>Shapes a damaged or foreign file can have (each was, or could have been, an internal error).</summary>
    public static TheoryData<string> Damaged => new()
    {
        "{\"Version\":1}",
        "{\"Version\":1,\"Sha256\":null,\"Table\":[]}",
        "{\"Version\":1,\"Sha256\":\"00\",\"Table\":5}",
        "{\"Version\":1,\"Sha256\":\"00\",\"Body\":{\"Solvers\":null,\"Rows\":[[1]]}}",
        "{\"Version\":\"one\"}",
        "[]",
        "null",
        "",
        "{ not json",
    };

    [Theory]
    [MemberData(nameof(Damaged))]
    public void A_damaged_file_reads_as_absent(string text)
    {
        string file = Path.Combine(DesignRuns.TempFolder("damaged"), "characterisation-0.json");
        File.WriteAllText(file, text);
        Assert.Null(SlotCache.Read(file));
        Assert.Null(SlotAdmittanceStore.Read(file));
    }

    [Fact]
    public void Design_and_tolerance_succeed_over_damaged_cache_files_and_rewrite_them()
    {
        string spec = DesignRuns.SmallSpec("damagedcache", "tolerance: {offset: 0.02 mm, length: 0.02 mm, trials: 50, seed: 3}\n");
        var request = SpecLoader.LoadFile(spec).Request!;
        string cache = DesignRuns.TempFolder("damagedcache-cache");
        var solver = new LongitudinalSlotMomentMethod(request.Guide, request.Slots.Width);
        string table = new SlotCache(cache).FileFor(ResonantCharacterisation.KeyOf(solver, request.DesignFrequency, 30));
        string admittances = SlotAdmittanceStore.FileFor(cache, request);
        foreach (string command in new[] { "design", "tolerance" })
        {
            File.WriteAllText(table, "{\"Version\":1}");
            File.WriteAllText(admittances, "{\"Version\":1}");
            var (code, _, err) = DesignRuns.Run(command, spec, "-o", DesignRuns.TempFolder("damagedcache-" + command), "--cache-dir", cache);
            Assert.True(code == 0, $"{command}: exit {code}\n{err}");
            Assert.Contains("slot cache: ignored", err);
            Assert.NotNull(SlotCache.Read(table));              // rewritten, valid
            Assert.NotNull(SlotAdmittanceStore.Read(admittances));
        }
    }

    [Fact]
    public void Stored_admittances_round_trip_bit_exactly()
    {
        var entries = new[]
        {
            new SlotAdmittanceEntry("a=0.02286;w=0.0016", 0.0012345678901234567, 0.015432109876543211, 9.41e9, 0.12345678901234568, -1e-300),
            new SlotAdmittanceEntry("a=0.02286;w=0.0017", -0.003, 0.0161, 9.3e9, double.Epsilon, 0.1 + 0.2),
        };
        string file = Path.Combine(DesignRuns.TempFolder("admittances"), "admittances-0.json");
        File.WriteAllText(file, SlotAdmittanceStore.Serialise(entries));
        var back = SlotAdmittanceStore.Read(file)!;
        Assert.Equal(entries, back);   // records compare every double exactly
        File.WriteAllText(file, File.ReadAllText(file).Replace("0.0161", "0.0162"));
        Assert.Null(SlotAdmittanceStore.Read(file));   // checksum no longer matches
    }
}
