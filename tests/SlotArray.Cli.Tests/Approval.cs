using System.Runtime.CompilerServices;

namespace SlotArray.Cli.Tests;

/// <summary>
/// Approval files of the command line (Approved/, see its README): a text is compared with its reviewed
/// <c>.approved.</c> file; on a difference (or when there is none yet) the new text is written beside it as
/// <c>.received.</c> and the test fails saying which file to review.
/// </summary>
internal static class Approval
{
    /// <summary>The folder of the approval files, next to this source file.</summary>
    public static string Folder([CallerFilePath] string path = "") => Path.Combine(Path.GetDirectoryName(path)!, "Approved");

    /// <summary>
    /// Compares <paramref name="actual"/> with Approved/<paramref name="name"/> (its name holds ".approved."); line ends
    /// are compared as written. Writes the .received. file and fails on a difference; deletes a stale .received. file on a match.
    /// </summary>
    public static void Verify(string name, string actual)
    {
        string approved = Path.Combine(Folder(), name);
        string received = approved.Replace(".approved.", ".received.", StringComparison.Ordinal);
        if (File.Exists(approved) && File.ReadAllText(approved) == actual)
        {
            if (File.Exists(received)) File.Delete(received);
            return;
        }
        Directory.CreateDirectory(Path.GetDirectoryName(received)!);
        File.WriteAllText(received, actual);
        string first = File.Exists(approved) ? FirstDifference(File.ReadAllText(approved), actual) : "no approved file yet";
        Assert.Fail($"{name} differs from what the program now gives ({first}). If the change is deliberate, review "
            + $"{received} and rename it to {Path.GetFileName(approved)}; else fix the change.");
    }

    private static string FirstDifference(string approved, string actual)
    {
        var a = approved.Split('\n');
        var b = actual.Split('\n');
        for (int i = 0; i < Math.Max(a.Length, b.Length); i++)
        {
            string x = i < a.Length ? a[i].TrimEnd('\r') : "(end of file)", y = i < b.Length ? b[i].TrimEnd('\r') : "(end of file)";
            if (x != y) return $"line {i + 1}: approved '{x}', now '{y}'";
        }
        return "line ends differ";
    }
}
