using System.Diagnostics;
using SlotArray.Cli;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// The two things that make <c>design</c> fast must not change its results: the frequency-interpolated slot model
/// (checked against direct moment-method solves) and the disk cache of resonant characterisations (bit-exact round
/// trip; warm and cold processes write identical files; a corrupt file is ignored).
/// </summary>
public class DesignPerformanceModelTests
{
    private static readonly RectangularWaveguide Wr90 =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);

    [Fact]
    public void Interpolated_admittance_agrees_with_direct_solves_to_1e_minus_4_of_y()
    {
        // Reference: the moment-method solve itself at each frequency. The interpolant's error bound is O((h/F)^6)
        // (Isaacson and Keller 1966, Ch. 6); 1e-4 |y| is the target of issue 5's performance note.
        var direct = new MomentMethodSlotModel(Wr90, Length.FromMillimeters(1.6));
        var f0 = Frequency.FromGigahertz(9.41);
        var interpolated = new FrequencyInterpolatedSlotModel(direct, f0);
        foreach (double g in new[] { 0.015, 0.12 })
        {
            var r = direct.ForConductance(g, f0);
            foreach (double rel in new[] { -0.0287, -0.0111, -0.0013, 0.0, 0.00071, 0.0093, 0.0241 })
            {
                var f = Frequency.FromHertz(f0.Hertz * (1 + rel));
                var y0 = direct.Admittance(r.Coupling, r.ResonantLength, f);
                var y1 = interpolated.Admittance(-r.Coupling, r.ResonantLength, f);   // either side: y is even in x
                double err = (y1 - y0).Magnitude / y0.Magnitude;
                Assert.True(err < 1e-4, $"g = {g}, f = {f}: |Δy|/|y| = {err:E2}");
            }
        }
        Assert.Equal(direct.Admittance(0.002, Length.FromMillimeters(15), f0), interpolated.Admittance(0.002, Length.FromMillimeters(15), f0));   // exact at a node
    }

    [Fact]
    public void Stored_characterisation_round_trips_bit_exactly_and_a_tampered_file_is_rejected()
    {
        var solver = new LongitudinalSlotMomentMethod(Wr90, Length.FromMillimeters(1.6));
        var table = new ResonantCharacterisationCache().For(solver, Frequency.FromGigahertz(9.41), 8).Table;
        string dir = DesignRuns.TempFolder("cachefile");
        var cache = new SlotCache(dir);
        string file = cache.FileFor(table.Key);
        File.WriteAllText(file, SlotCache.Serialise(table));
        var back = SlotCache.Read(file)!;
        Assert.Equal(table.Key, back.Key);
        Assert.Equal(table.FormatVersion, back.FormatVersion);
        Assert.Equal(table.FrequencyHertz, back.FrequencyHertz);
        foreach (var (x, y) in new[] { (table.OffsetsMeters, back.OffsetsMeters), (table.ResonantLengthsMeters, back.ResonantLengthsMeters), (table.Conductances, back.Conductances), (table.ShuntAsymmetries, back.ShuntAsymmetries) })
            Assert.Equal(x.Select(BitConverter.DoubleToInt64Bits), y.Select(BitConverter.DoubleToInt64Bits));

        File.WriteAllText(file, File.ReadAllText(file).Replace(table.Conductances[3].ToString("R", System.Globalization.CultureInfo.InvariantCulture), "0.5"));
        Assert.Null(SlotCache.Read(file));       // checksum no longer matches
        File.WriteAllText(file, "{ not json");
        Assert.Null(SlotCache.Read(file));
    }

    [Fact]
    public void Cold_and_warm_processes_write_identical_files_and_a_corrupt_cache_file_is_ignored()
    {
        // Separate processes, so that the second one really reads the characterisation from disk.
        string dll = Path.Combine(AppContext.BaseDirectory, "slotarray.dll");
        string cache = DesignRuns.TempFolder("xcache");
        File.WriteAllText(Path.Combine(cache, "characterisation-000000000000000000000000.json"), "garbage");
        string spec = DesignRuns.Spec("coldwarm", """
            spec: 1
            name: coldwarm
            frequency: 9.375 GHz
            band: [9.35 GHz, 9.40 GHz]
            guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
            feed: {type: standing-wave}
            slots: {type: longitudinal, count: 8, width: 1.6 mm, cutter: 1.6 mm}
            taper: {type: chebyshev, sidelobes: -20 dB}
            """);
        string root = Path.GetDirectoryName(spec)!;
        var cold = Process(dll, "design", spec, "-o", Path.Combine(root, "cold"), "--cache-dir", cache);
        var warm = Process(dll, "design", spec, "-o", Path.Combine(root, "warm"), "--cache-dir", cache);
        Assert.True(cold.Code == 0, cold.Err);
        Assert.True(warm.Code == 0, warm.Err);
        Assert.Contains("(0 slot table(s) from the cache)", cold.Err);
        Assert.Contains("(1 slot table(s) from the cache)", warm.Err);
        Assert.Contains("slot cache: ignored", cold.Err);
        foreach (string f in Directory.GetFiles(Path.Combine(root, "cold")))
            Assert.True(File.ReadAllBytes(f).AsSpan().SequenceEqual(File.ReadAllBytes(Path.Combine(root, "warm", Path.GetFileName(f)))), $"{Path.GetFileName(f)} differs warm vs cold");
    }

    private static (int Code, string Err) Process(string dll, params string[] args)
    {
        var psi = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
        psi.ArgumentList.Add(dll);
        foreach (string a in args) psi.ArgumentList.Add(a);
        using var p = System.Diagnostics.Process.Start(psi)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        string err = p.StandardError.ReadToEnd();
        p.WaitForExit();
        _ = stdout.Result;
        return (p.ExitCode, err);
    }
}
