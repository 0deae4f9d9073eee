using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;

namespace SlotArray.Reports;

/// <summary>An output folder the user cannot use as given (a file, the root folder, read-only, holding other files): bad input.</summary>
/// <param name="message">What is wrong and what to give instead.</param>
public sealed class OutputFolderException(string message) : IOException(message);

/// <summary>
/// Checks an output folder before any computation, so a run never spends minutes only to fail at the end, and clears
/// what killed runs left behind. Every command that writes files calls <see cref="Prepare"/> first.
/// </summary>
/// <remarks>
/// Refused (with <see cref="OutputFolderException"/>): the root folder; a path that is a file (or runs through one);
/// a folder (or, when it does not exist yet, its nearest existing parent) the process cannot write into; and, for a
/// command that replaces the folder whole (<c>design</c>), a folder holding entries no command of this tool writes.
/// Files of every command count as ours: a folder with a <c>tolerance</c> run's files is a valid <c>design</c>
/// folder and the reverse. Cleared: the hidden sibling folders <c>.NAME.tmp-PID-…</c> and <c>.NAME.old-…</c> and the
/// hidden files <c>.FILE.PID.tmp</c> of a run whose process PID no longer runs. An orphaned <c>.old</c> folder (a run
/// killed between its two renames) is moved back into place when the output folder itself is missing.
/// </remarks>
internal static partial class OutputFolderCheck
{
    /// <summary>The files the <c>tolerance</c> command writes.</summary>
    public static readonly IReadOnlyList<string> ToleranceFiles = ["tolerance.json", "tolerance.png", "sensitivity.csv"];

    /// <summary>Every file name a command of this tool writes into an output folder.</summary>
    public static IReadOnlySet<string> OwnFiles { get; } =
        new HashSet<string>(OutputFolder.Files.Select(f => f.Name).Concat(ToleranceFiles), StringComparer.Ordinal);

    /// <summary>Checks <paramref name="directory"/> (see the class remarks) and removes stale temporaries; returns its full path.</summary>
    /// <param name="directory">The output folder as the user gave it.</param>
    /// <param name="replacesWhole">True for a command that replaces the folder whole (it must then hold only our files).</param>
    /// <param name="extraOwnFiles">Further names the caller writes (a test seam), or null.</param>
    /// <exception cref="OutputFolderException">The folder cannot be used; the message says why and what to give instead.</exception>
    public static string Prepare(string directory, bool replacesWhole, IEnumerable<string>? extraOwnFiles = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(directory);
        string target = Path.TrimEndingDirectorySeparator(Path.GetFullPath(directory));
        string? parent = Path.GetDirectoryName(target);
        if (parent is null)
            throw new OutputFolderException($"cannot write the output into the root folder '{target}': give a sub-folder with -o, e.g. -o out/my-array");
        if (File.Exists(target))
            throw new OutputFolderException($"-o names a file, not a folder: '{target}'; give a folder (it is created if missing)");
        string existing = NearestExistingAncestor(target);
        if (!Directory.Exists(existing))
            throw new OutputFolderException($"cannot create the output folder '{target}': '{existing}' is a file; give a folder path with -o");

        ClearStale(parent, Path.GetFileName(target), target);
        if (Directory.Exists(target))
        {
            // design writes a temporary sibling and renames it into place: the parent must be writable too.
            if (!CanWrite(target) || (replacesWhole && !CanWrite(parent)))
                throw new OutputFolderException($"output folder '{target}' is read-only (cannot create files {(CanWrite(target) ? $"beside it in '{parent}'" : "in it")}); give a folder you can write to with -o");
            ClearStaleFiles(target);
            if (replacesWhole) RefuseForeign(target, extraOwnFiles);
        }
        else if (!CanWrite(existing))
        {
            throw new OutputFolderException($"cannot create the output folder '{target}': '{existing}' is read-only; give a folder you can write to with -o");
        }
        return target;
    }

    private static void RefuseForeign(string target, IEnumerable<string>? extra)
    {
        var known = new HashSet<string>(OwnFiles, StringComparer.Ordinal);
        if (extra is not null) known.UnionWith(extra);
        var foreign = Directory.EnumerateFileSystemEntries(target).Select(Path.GetFileName)
            .Where(n => !known.Contains(n!) && !OutputFolder.Files.Any(f => f.Owns?.Invoke(n!) == true)).Order(StringComparer.Ordinal).ToArray();
        if (foreign.Length > 0)
            throw new OutputFolderException($"output folder '{target}' holds {foreign.Length} entr{(foreign.Length == 1 ? "y" : "ies")} that this tool did not write ({string.Join(", ", foreign.Take(5))}{(foreign.Length > 5 ? ", ..." : "")}); it would replace the folder whole, so give a new or empty folder with -o");
    }

    private static string NearestExistingAncestor(string path)
    {
        string? p = path;
        while (p is not null && !Directory.Exists(p) && !File.Exists(p)) p = Path.GetDirectoryName(p);
        return p ?? path;
    }

    /// <summary>Whether a file can be created in <paramref name="folder"/>: a hidden probe file created and deleted (the
    /// only test that also holds for read-only mounts, access-control lists and a process running as root).</summary>
    private static bool CanWrite(string folder)
    {
        string probe = Path.Combine(folder, $".slotarray-probe-{Environment.ProcessId.ToString(CultureInfo.InvariantCulture)}-{Guid.NewGuid():N}");
        try
        {
            using (new FileStream(probe, FileMode.CreateNew, FileAccess.Write, FileShare.None, 1, FileOptions.DeleteOnClose)) { }
            return true;
        }
        catch (Exception e) when (e is UnauthorizedAccessException or IOException)
        {
            return false;
        }
    }

    /// <summary>The temporary sibling folder of a run, <c>.NAME.tmp-PID-xxxxxxxx</c> (or <c>.old-</c> for the replaced output).</summary>
    internal static string Sibling(string parent, string leaf, string kind, string stamp) => Path.Combine(parent, $".{leaf}.{kind}-{stamp}");

    /// <summary>The unique part of a run's temporary names: its process id and eight random hex digits.</summary>
    internal static string NewStamp() => Environment.ProcessId.ToString(CultureInfo.InvariantCulture) + "-" + Guid.NewGuid().ToString("N")[..8];

    [GeneratedRegex(@"^\.(?<leaf>.+)\.(?<kind>tmp|old)-(?<pid>\d{1,10})-[0-9a-f]{8}$", RegexOptions.CultureInvariant)]
    private static partial Regex SiblingName();

    [GeneratedRegex(@"^\.(?<file>.+)\.(?<pid>\d{1,10})\.tmp$", RegexOptions.CultureInvariant)]
    private static partial Regex AtomicTempName();

    private static void ClearStale(string parent, string leaf, string target)
    {
        if (!Directory.Exists(parent)) return;
        foreach (string dir in Directory.EnumerateDirectories(parent, $".{leaf}.*"))
        {
            var m = SiblingName().Match(Path.GetFileName(dir));
            if (!m.Success || m.Groups["leaf"].Value != leaf || IsRunning(m.Groups["pid"].Value)) continue;
            if (m.Groups["kind"].Value == "old" && !Directory.Exists(target))
                Directory.Move(dir, target);         // the run was killed between its two renames: put the older output back
            else
                Directory.Delete(dir, recursive: true);
        }
    }

    private static void ClearStaleFiles(string target)
    {
        foreach (string file in Directory.EnumerateFiles(target, ".*.tmp"))
        {
            var m = AtomicTempName().Match(Path.GetFileName(file));
            if (m.Success && OwnFiles.Contains(m.Groups["file"].Value) && !IsRunning(m.Groups["pid"].Value)) File.Delete(file);
        }
    }

    /// <summary>Whether the process with this id still runs (then its temporaries are left alone).</summary>
    private static bool IsRunning(string pidText)
    {
        if (!int.TryParse(pidText, NumberStyles.None, CultureInfo.InvariantCulture, out int pid)) return false;
        if (pid == Environment.ProcessId) return true;
        try
        {
            using var p = Process.GetProcessById(pid);
            return !p.HasExited;
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException)
        {
            return false;
        }
    }
}
