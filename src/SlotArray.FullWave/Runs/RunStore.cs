using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using SlotArray.FullWave.Engine;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Results;

namespace SlotArray.FullWave.Runs;

/// <summary>One engine run to make: its model and what to read back from it.</summary>
/// <param name="Label">Short readable name (part of the run folder's name).</param>
/// <param name="Model">The model.</param>
/// <param name="BroadWallMeters">Inside broad dimension a of the ports' guide, m.</param>
/// <param name="FrequenciesHz">Frequencies of the response, Hz.</param>
internal sealed record RunRequest(string Label, FdtdModel Model, double BroadWallMeters, IReadOnlyList<double> FrequenciesHz)
{
    /// <summary>The XML the engine reads.</summary>
    public string Xml { get; } = OpenEmsXml.ToText(Model);

    /// <summary>Content key: the first 16 hex digits of the SHA-256 of the XML and the frequencies (same input, same folder).</summary>
    public string Key
    {
        get
        {
            string f = string.Join(",", FrequenciesHz.Select(x => x.ToString("R", CultureInfo.InvariantCulture)));
            return Convert.ToHexString(SHA256.HashData(Encoding.UTF8.GetBytes(Xml + "\n" + f + "\n" + BroadWallMeters.ToString("R", CultureInfo.InvariantCulture))))[..16].ToLowerInvariant();
        }
    }
}

/// <summary>A finished run: its response and the engine's own figures.</summary>
/// <param name="Request">What was run.</param>
/// <param name="Response">The response.</param>
/// <param name="Stats">Cells, time steps, seconds (of the run that made it, also when read back from the cache).</param>
/// <param name="FromCache">True when an earlier invocation made it.</param>
internal sealed record RunOutcome(RunRequest Request, TwoPortResponse Response, EngineRunStats Stats, bool FromCache);

/// <summary>
/// A folder of runs, one sub-folder per content key: <c>model.xml</c>, the engine's probe files and log, then
/// <c>response.csv</c> and <c>stats.txt</c> written atomically when the run has finished and been read. A folder
/// without <c>response.csv</c> is an unfinished run (killed): it is cleared and run again.
/// </summary>
internal sealed class RunStore(string root)
{
    /// <summary>The store's folder.</summary>
    public string Root { get; } = root;

    /// <summary>The folder of a request.</summary>
    public string FolderOf(RunRequest r) => Path.Combine(Root, $"{r.Label}-{r.Key}");

    /// <summary>The finished outcome of a request, or null when it has not finished.</summary>
    public RunOutcome? TryLoad(RunRequest r)
    {
        string folder = FolderOf(r);
        string resp = Path.Combine(folder, "response.csv"), stats = Path.Combine(folder, "stats.txt");
        if (!File.Exists(resp) || !File.Exists(stats)) return null;
        try
        {
            var s = File.ReadAllText(stats).Trim().Split(' ');
            var st = new EngineRunStats(long.Parse(s[0], CultureInfo.InvariantCulture), long.Parse(s[1], CultureInfo.InvariantCulture),
                double.Parse(s[2], CultureInfo.InvariantCulture));
            return new RunOutcome(r, TwoPortResponse.FromCsv(File.ReadAllText(resp)), st, true);
        }
        catch (Exception e) when (e is FormatException or InvalidDataException or IndexOutOfRangeException)
        {
            return null;
        }
    }

    /// <summary>Runs a request with the engine (clearing an unfinished folder first) and stores its outcome.</summary>
    public async Task<RunOutcome> RunAsync(OpenEmsEngine engine, RunRequest r, CancellationToken cancel, int threads = 1)
    {
        string folder = FolderOf(r);
        if (Directory.Exists(folder)) Directory.Delete(folder, recursive: true);
        Directory.CreateDirectory(folder);
        string xml = Path.Combine(folder, "model.xml");
        await File.WriteAllTextAsync(xml, r.Xml, cancel);
        var stats = await engine.RunAsync(xml, cancel, threads);
        int ports = r.Model.Ports.Count;
        var response = TwoPortResponse.FromProbes(folder, r.BroadWallMeters, r.FrequenciesHz, ports, r.Model.Probes.Select(p => p.Name).ToList());
        WriteAtomic(Path.Combine(folder, "stats.txt"), string.Create(CultureInfo.InvariantCulture, $"{stats.Cells} {stats.Timesteps} {stats.Seconds:R}\n"));
        WriteAtomic(Path.Combine(folder, "response.csv"), response.ToCsv());
        return new RunOutcome(r, response, stats, false);
    }

    /// <summary>Mean throughput of the finished runs in the store, cell updates per second per run, or null when none has finished.</summary>
    public double? MeasuredThroughput()
    {
        if (!Directory.Exists(Root)) return null;
        var rates = new List<double>();
        foreach (string f in Directory.GetFiles(Root, "stats.txt", SearchOption.AllDirectories))
        {
            var s = File.ReadAllText(f).Trim().Split(' ');
            if (s.Length == 3 && double.TryParse(s[0], CultureInfo.InvariantCulture, out double c) && double.TryParse(s[1], CultureInfo.InvariantCulture, out double n)
                && double.TryParse(s[2], CultureInfo.InvariantCulture, out double t) && t > 0 && c * n > 0) rates.Add(c * n / t);
        }
        return rates.Count > 0 ? rates.Average() : null;
    }

    /// <summary>The engine version its log states ("openEMS v0.0.35"), from the first of <paramref name="runs"/> that has a log; "unknown" otherwise.</summary>
    public string EngineVersion(IEnumerable<RunRequest> runs)
    {
        foreach (var r in runs)
        {
            string log = Path.Combine(FolderOf(r), "engine.log");
            if (!File.Exists(log)) continue;
            var m = System.Text.RegularExpressions.Regex.Match(File.ReadAllText(log), @"openEMS\s+\S*\s*-- version (v[0-9.]+)");
            if (m.Success) return m.Groups[1].Value;
        }
        return "version unknown";
    }

    private static void WriteAtomic(string path, string text)
    {
        string tmp = path + ".tmp";
        File.WriteAllText(tmp, text);
        File.Move(tmp, path, overwrite: true);
    }
}
