using System.Diagnostics;
using System.Text.Json;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// The demo's files opened by independent readers, as an RF engineer's own tools would: input.s1p by scikit-rf
/// (Debian's python3-scikit-rf; Touchstone File Format Specification 1.1, EIA/IBIS Open Forum, 2002) and cutlist.csv
/// by Python's csv module in strict mode (Python Standard Library, csv, Dialect.strict: raise on bad CSV input, the
/// RFC 4180 quoting rules). The figures they read must match design.json.
/// </summary>
public class ExternalReaderTests
{
    private const string Reader = """
import csv, json, sys
import numpy as np
import skrf
folder = sys.argv[1]
n = skrf.Network(folder + '/input.s1p')
d = json.load(open(folder + '/design.json'))
f0 = d['frequency_hz']
i = int(np.argmin(abs(n.f - f0)))
with open(folder + '/cutlist.csv', newline='', encoding='utf-8') as fh:
    rows = list(csv.reader(fh, strict=True))
data = [r for r in rows if r and not r[0].startswith('#')]
print(json.dumps({'f_first': float(n.f[0]), 'f_last': float(n.f[-1]), 'points': len(n.f), 'f_near': float(n.f[i]),
                  's11_db': float(20 * np.log10(abs(n.s[i, 0, 0]))), 'header': data[0], 'rows': sum(1 for r in data[1:] if r[0] == 'slot'),
                  'widths': sorted({len(r) for r in rows})}))
""";

    [Fact]
    public async Task Scikit_rf_reads_input_s1p_and_strict_csv_reads_the_cut_list()
    {
        string work = DesignRuns.TempFolder("external"), dir = Path.Combine(work, "out");
        var (code, _, err) = DesignRuns.Run("design", RepoFiles.Demo, "-o", dir, "--cache-dir", Path.Combine(work, "cache"));
        Assert.True(code == ExitCodes.Ok, err);

        var info = new ProcessStartInfo("/usr/bin/python3") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add("-c");
        info.ArgumentList.Add(Reader);
        info.ArgumentList.Add(dir);
        using var p = Process.Start(info)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        string stderr = await p.StandardError.ReadToEndAsync();
        await p.WaitForExitAsync();
        Assert.True(p.ExitCode == 0, $"python3 with scikit-rf (apt-get install python3-scikit-rf; .ci/run installs it) failed: {stderr}");
        var read = JsonDocument.Parse(await stdout).RootElement;

        var design = JsonDocument.Parse(File.ReadAllText(Path.Combine(dir, "design.json"))).RootElement;
        double low = design.GetProperty("band").GetProperty("low_hz").GetDouble();
        double high = design.GetProperty("band").GetProperty("high_hz").GetDouble();
        double f0 = design.GetProperty("frequency_hz").GetDouble();
        // input.s1p spans the match sweep: the analysis band widened to show where the VSWR leaves 2 (issue 13).
        Assert.True(read.GetProperty("f_first").GetDouble() <= low, $"scikit-rf: the file starts at {read.GetProperty("f_first").GetDouble()} Hz, above design.json band.low_hz {low}");
        Assert.True(read.GetProperty("f_last").GetDouble() >= high, $"scikit-rf: the file ends at {read.GetProperty("f_last").GetDouble()} Hz, below design.json band.high_hz {high}");
        Assert.Equal(f0, read.GetProperty("f_near").GetDouble(), 1.0);   // the sweep has a point at f0
        Check.Absolute(design.GetProperty("match").GetProperty("s11_db_at_design").GetDouble(), read.GetProperty("s11_db").GetDouble(), 0.01,
            "|S11| at f0 read by scikit-rf against design.json match.s11_db_at_design (9-digit Touchstone values)");

        Assert.Equal(design.GetProperty("slots").GetArrayLength(), read.GetProperty("rows").GetInt32());
        Assert.Single(read.GetProperty("widths").EnumerateArray());   // every record has the same number of fields (RFC 4180 §2.4)
        var header = read.GetProperty("header").EnumerateArray().Select(h => h.GetString()!).ToList();
        Assert.Contains(header, h => h.EndsWith("_mm", StringComparison.Ordinal));   // units in the header
        Assert.All(header.Where(h => h.Contains("position", StringComparison.Ordinal) || h.Contains("length", StringComparison.Ordinal)),
            h => Assert.Matches("_(mm|deg)$", h));
    }
}
