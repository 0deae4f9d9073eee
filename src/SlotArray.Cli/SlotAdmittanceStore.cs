using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Reports;

namespace SlotArray.Cli;

/// <summary>
/// The disk side of the run cache's moment-method solves (<see cref="ResonantCharacterisationCache.Admittance"/>): one JSON file per spec family (guide, wall, slot width,
/// design frequency) holding every moment-method solve a run made (the design's frequency nodes, the tolerance
/// surrogates and sensitivities), with a SHA-256 checksum. Doubles are stored in their shortest round-trip form, so a
/// warm run uses the very numbers a cold run computes: results are identical. A file that cannot be read, has another
/// version or fails its checksum is ignored and rewritten, never fatal.
/// </summary>
internal static class SlotAdmittanceStore
{
    /// <summary>Version of the file layout.</summary>
    public const int FileVersion = 1;

    /// <summary>The file of a request's family in <paramref name="directory"/>.</summary>
    public static string FileFor(string directory, ArrayRequest request)
    {
        var solver = new LongitudinalSlotMomentMethod(request.Guide, request.Slots.Width);
        string key = string.Create(CultureInfo.InvariantCulture, $"admittances;v{FileVersion};{ResonantCharacterisationCache.AdmittanceKeyOf(solver)};f={request.DesignFrequency.Hertz:R}");
        return Path.Combine(directory, "admittances-" + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(key)))[..24] + ".json");
    }

    /// <summary>Preloads the request family's stored solves; returns how many (0 when there is no valid file).</summary>
    public static int Load(string directory, ArrayRequest request, ResonantCharacterisationCache memory, TextWriter log)
    {
        if (request.Slots.Type != SlotType.Longitudinal) return 0;
        string file = FileFor(directory, request);
        if (!File.Exists(file)) return 0;
        var entries = Read(file);
        if (entries is null)
        {
            log.WriteLine($"slot cache: ignored {file} (unreadable, another version or a bad checksum); it is rewritten");
            return 0;
        }
        return memory.PreloadAdmittances(entries);
    }

    /// <summary>Stores every solve the run remembers when the file lacks some (write failures go to <paramref name="log"/>).</summary>
    public static void Save(string directory, ArrayRequest request, ResonantCharacterisationCache memory, TextWriter log)
    {
        if (request.Slots.Type != SlotType.Longitudinal || memory.AdmittanceCount == 0) return;
        string file = FileFor(directory, request);
        var entries = memory.Admittances();
        if (File.Exists(file) && Read(file)?.Count == entries.Count) return;
        try
        {
            AtomicFile.WriteText(file, Serialise(entries));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            log.WriteLine($"slot cache: could not write {file} ({e.Message}); the next run recomputes it");
        }
    }

    /// <summary>The file's text: version, checksum of the body, the solver keys and one row [solver, x, L, f, Re y, Im y] per solve.</summary>
    internal static string Serialise(IReadOnlyList<SlotAdmittanceEntry> entries)
    {
        var solvers = entries.Select(e => e.Solver).Distinct().ToList();
        var index = solvers.Select((s, i) => (s, i)).ToDictionary(p => p.s, p => p.i);
        var body = new Body(solvers, [.. entries.Select(e => new[] { index[e.Solver], e.OffsetMeters, e.LengthMeters, e.FrequencyHertz, e.Real, e.Imaginary })]);
        string text = JsonSerializer.Serialize(body);
        return JsonSerializer.Serialize(new StoreFile(FileVersion, Checksum(text), JsonDocument.Parse(text).RootElement)) + "\n";
    }

    /// <summary>Reads a file; null when it is not a valid file of this version with a matching checksum.</summary>
    internal static IReadOnlyList<SlotAdmittanceEntry>? Read(string file)
    {
        try
        {
            var f = JsonSerializer.Deserialize<StoreFile>(File.ReadAllText(file));
            if (f is null || f.Version != FileVersion || f.Sha256 is null || f.Body.ValueKind != JsonValueKind.Object) return null;
            string text = f.Body.GetRawText();
            if (Checksum(text) != f.Sha256) return null;
            var body = JsonSerializer.Deserialize<Body>(text);
            if (body?.Solvers is null || body.Rows is null) return null;
            var list = new List<SlotAdmittanceEntry>(body.Rows.Count);
            foreach (var r in body.Rows)
            {
                if (r is null || r.Length != 6 || r[0] < 0 || r[0] >= body.Solvers.Count || r[0] != Math.Floor(r[0])) return null;
                list.Add(new SlotAdmittanceEntry(body.Solvers[(int)r[0]], r[1], r[2], r[3], r[4], r[5]));
            }
            return list;
        }
        catch (Exception e) when (SlotCache.IsUnreadable(e))
        {
            return null;
        }
    }

    private static string Checksum(string body) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(body)));

    /// <summary>The file layout.</summary>
    /// <param name="Version">File layout version.</param>
    /// <param name="Sha256">SHA-256 of the body's JSON text (lower-case hex).</param>
    /// <param name="Body">The solver keys and rows.</param>
    private sealed record StoreFile(int Version, string Sha256, JsonElement Body);

    /// <summary>The stored solves.</summary>
    /// <param name="Solvers">Solver keys (<see cref="ResonantCharacterisationCache.AdmittanceKeyOf"/>).</param>
    /// <param name="Rows">[solver index, x (m), L (m), f (Hz), Re y, Im y].</param>
    private sealed record Body(List<string> Solvers, List<double[]> Rows);
}
