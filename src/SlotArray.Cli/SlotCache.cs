using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Reports;

namespace SlotArray.Cli;

/// <summary>
/// The disk cache of longitudinal-slot resonant characterisations (<see cref="ResonantCharacterisationTable"/>): the
/// CLI owns the files, Core stays pure. One JSON file per table, named by a hash of its key; the key holds every input
/// of the table and its format version (<see cref="ResonantCharacterisation.KeyOf"/>), and the file carries a SHA-256
/// checksum of its table. A file that cannot be read, has another version or key, or fails its checksum is ignored,
/// never fatal. Doubles are stored in their shortest round-trip form, so a warm run computes the same splines from
/// the same numbers as a cold one: results are identical.
/// </summary>
/// <param name="Directory">Folder of the cache files.</param>
internal sealed record SlotCache(string Directory)
{
    /// <summary>Version of the file layout (the table carries its own format version in its key).</summary>
    public const int FileVersion = 1;

    private static readonly JsonSerializerOptions Json = new() { WriteIndented = false };

    /// <summary>The default folder: $XDG_CACHE_HOME/slotarray, else ~/.cache/slotarray.</summary>
    public static string DefaultDirectory()
    {
        string? xdg = Environment.GetEnvironmentVariable("XDG_CACHE_HOME");
        string root = !string.IsNullOrWhiteSpace(xdg) && Path.IsPathRooted(xdg)
            ? xdg
            : Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), ".cache");
        return Path.Combine(root, "slotarray");
    }

    /// <summary>
    /// Preloads every stored table that matches the request's guide and slot width (default moment-method options,
    /// as the spec's slot models use) into the run's in-memory cache, and the spec family's stored moment-method solves
    /// (<see cref="SlotAdmittanceStore"/>). Returns the number of tables preloaded; reasons for ignored files go to
    /// <paramref name="log"/>.
    /// </summary>
    public int Load(ArrayRequest request, ResonantCharacterisationCache memory, TextWriter log)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(memory);
        ArgumentNullException.ThrowIfNull(log);
        if (request.Slots.Type != SlotType.Longitudinal || !System.IO.Directory.Exists(Directory)) return 0;
        var solver = new LongitudinalSlotMomentMethod(request.Guide, request.Slots.Width);
        SlotAdmittanceStore.Load(Directory, request, memory, log);
        int loaded = 0;
        foreach (string file in System.IO.Directory.EnumerateFiles(Directory, "characterisation-*.json").Order(StringComparer.Ordinal))
        {
            try
            {
                var table = Read(file);
                if (table is null) { log.WriteLine($"slot cache: ignored {file} (unreadable, another version or a bad checksum)"); continue; }
                string key = ResonantCharacterisation.KeyOf(solver, Core.Quantities.Frequency.FromHertz(table.FrequencyHertz), table.OffsetsMeters.Count);
                if (key != table.Key) continue;   // another guide, width or frequency: not this run's
                memory.Preload(solver, table);
                loaded++;
            }
            catch (Exception e) when (IsUnreadable(e))
            {
                log.WriteLine($"slot cache: ignored {file} ({e.Message})");
            }
        }
        return loaded;
    }

    /// <summary>
    /// Stores every table the run's in-memory cache holds that the disk cache lacks, and the run's moment-method solves
    /// in the request family's file (<see cref="SlotAdmittanceStore"/>). Write failures are reported to <paramref name="log"/>, never thrown.
    /// </summary>
    public int Save(ArrayRequest request, ResonantCharacterisationCache memory, TextWriter log)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(memory);
        ArgumentNullException.ThrowIfNull(log);
        SlotAdmittanceStore.Save(Directory, request, memory, log);
        int saved = 0;
        foreach (var table in memory.Tables())
        {
            string file = FileFor(table.Key);
            if (File.Exists(file) && Read(file)?.Key == table.Key) continue;
            try
            {
                AtomicFile.WriteText(file, Serialise(table));
                saved++;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                log.WriteLine($"slot cache: could not write {file} ({e.Message}); the next run recomputes it");
            }
        }
        return saved;
    }

    /// <summary>The file a table of the given key is stored in.</summary>
    internal string FileFor(string key) =>
        Path.Combine(Directory, "characterisation-" + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(key)))[..24] + ".json");

    /// <summary>The file's text for a table: version, checksum of the table's JSON, the table.</summary>
    internal static string Serialise(ResonantCharacterisationTable table)
    {
        string body = JsonSerializer.Serialize(table, Json);
        return JsonSerializer.Serialize(new CacheFile(FileVersion, Checksum(body), JsonDocument.Parse(body).RootElement), Json) + "\n";
    }

    /// <summary>Reads a cache file; null when it is not a valid file of this version with a matching checksum.</summary>
    internal static ResonantCharacterisationTable? Read(string file)
    {
        try
        {
            var f = JsonSerializer.Deserialize<CacheFile>(File.ReadAllText(file), Json);
            if (f is null || f.Version != FileVersion || f.Sha256 is null || f.Table.ValueKind != JsonValueKind.Object) return null;
            string body = f.Table.GetRawText();
            if (Checksum(body) != f.Sha256) return null;
            var t = JsonSerializer.Deserialize<ResonantCharacterisationTable>(body, Json);
            if (t is null || t.FormatVersion != ResonantCharacterisationTable.CurrentFormatVersion || t.OffsetsMeters is null
                || t.ResonantLengthsMeters is null || t.Conductances is null || t.ShuntAsymmetries is null || t.Key is null)
                return null;
            int n = t.OffsetsMeters.Count;
            if (n < 4 || t.ResonantLengthsMeters.Count != n || t.Conductances.Count != n || t.ShuntAsymmetries.Count != n) return null;
            return t;
        }
        catch (Exception e) when (IsUnreadable(e))
        {
            return null;
        }
    }

    /// <summary>
    /// Whatever reading a damaged or foreign cache file can throw (I/O, JSON, a missing member read as an undefined
    /// element, a wrong shape): such a file is ignored and rewritten, never fatal.
    /// </summary>
    internal static bool IsUnreadable(Exception e) => e is IOException or UnauthorizedAccessException or JsonException or NotSupportedException
        or InvalidOperationException or ArgumentException or FormatException or OverflowException;

    private static string Checksum(string body) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(body)));

    /// <summary>The file layout.</summary>
    /// <param name="Version">File layout version.</param>
    /// <param name="Sha256">SHA-256 of the table's JSON text (lower-case hex).</param>
    /// <param name="Table">The table.</param>
    private sealed record CacheFile(int Version, string Sha256, JsonElement Table);
}
