namespace SlotArray.Reports;

/// <summary>Atomic file writes: a failed write leaves no half-written file behind.</summary>
internal static class AtomicFile
{
    /// <summary>Writes through a temporary file in the target folder and renames it into place.</summary>
    public static void Write(string path, Action<Stream> write)
    {
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full)!;
        Directory.CreateDirectory(dir);
        string tmp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}.tmp");
        try
        {
            using (var fs = new FileStream(tmp, FileMode.Create, FileAccess.Write, FileShare.None))
                write(fs);
            File.Move(tmp, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(tmp)) File.Delete(tmp);
        }
    }

    /// <summary>Writes text (UTF-8, no byte-order mark, '\n' line ends as given) atomically.</summary>
    public static void WriteText(string path, string text)
        => Write(path, s => { var b = new System.Text.UTF8Encoding(false).GetBytes(text); s.Write(b, 0, b.Length); });
}
