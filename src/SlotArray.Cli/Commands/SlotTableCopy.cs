using System.Security.Cryptography;
using System.Text.RegularExpressions;
using SlotArray.Core.Design;
using SlotArray.Reports.Model;

namespace SlotArray.Cli.Commands;

/// <summary>
/// A design folder rebuilds its design on its own (<c>compare</c> and <c>verify</c> read its spec.yaml): when the spec
/// takes its slots from a table (<c>slots.data</c>, a path relative to the spec), the folder gets a copy of that table
/// as <see cref="DesignReport.SlotTableFileName"/> and its spec.yaml names the copy, with a comment saying what was
/// copied from where and its SHA-256 (the same as design.json records).
/// </summary>
internal static partial class SlotTableCopy
{
    /// <summary>The spec text to write into the folder and the table bytes to copy (null without a table).</summary>
    /// <param name="specPath">The spec's path as given.</param>
    /// <param name="specText">The spec's text as read.</param>
    /// <param name="request">The request built from it.</param>
    /// <param name="error">Where a warning goes when the table cannot be copied or named.</param>
    public static (string SpecText, byte[]? Table) For(string specPath, string specText, ArrayRequest request, TextWriter error)
    {
        if (request.Slots.Data is not { } table) return (specText, null);
        string path = Path.Combine(Path.GetDirectoryName(Path.GetFullPath(specPath)) ?? ".", table.Source);
        byte[] bytes;
        try { bytes = File.ReadAllBytes(path); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"warning: the slot table {path} could not be read again to copy it into the design folder ({e.Message}); compare and verify on that folder need it at '{table.Source}' relative to the folder");
            return (specText, null);
        }
        if (Convert.ToHexStringLower(SHA256.HashData(bytes)) != table.Sha256)
        {
            error.WriteLine($"warning: the slot table {path} changed while the design ran; it was not copied into the design folder (design again)");
            return (specText, null);
        }
        var lines = specText.Split('\n');
        int named = 0;
        for (int i = 0; i < lines.Length; i++)
        {
            var m = DataLine().Match(lines[i].TrimEnd('\r'));
            if (!m.Success || m.Groups["path"].Value != table.Source) continue;
            lines[i] = m.Groups["key"].Value + DesignReport.SlotTableFileName + m.Groups["rest"].Value + (lines[i].EndsWith('\r') ? "\r" : "");
            named++;
        }
        if (named != 1)
        {
            error.WriteLine($"warning: spec.yaml in the design folder keeps 'data: {table.Source}' as written (the key is not on a line of its own); the table's copy is {DesignReport.SlotTableFileName}");
            return (specText, bytes);
        }
        string header = $"# slots.data names {DesignReport.SlotTableFileName}, the copy 'slotarray design' made of '{table.Source}' (SHA-256 {table.Sha256})\n";
        return (header + string.Join('\n', lines), bytes);
    }

    /// <summary>A block-style <c>data:</c> line: indentation and key, the path (optionally quoted), an optional comment.</summary>
    [GeneratedRegex("""^(?<key>\s*data:\s*)(?<q>["']?)(?<path>[^"'#]*?)\k<q>(?<rest>\s*(#.*)?)$""")]
    private static partial Regex DataLine();
}
