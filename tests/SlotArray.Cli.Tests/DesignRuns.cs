using System.Globalization;
using SlotArray.Cli;

namespace SlotArray.Cli.Tests;

/// <summary>Runs the command line in-process with captured writers; temporary folders for outputs and the slot cache.</summary>
internal static class DesignRuns
{
    public static (int Code, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = CommandLine.Run(args, o, e);
        return (code, o.ToString(), e.ToString());
    }

    public static string TempFolder(string tag)
    {
        string dir = Path.Combine(Path.GetTempPath(), "slotarray-tests", tag + "-" + Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(dir);
        return dir;
    }

    /// <summary>Writes a spec into a fresh folder and returns its path.</summary>
    public static string Spec(string tag, string yaml)
    {
        string path = Path.Combine(TempFolder(tag), tag + ".yaml");
        File.WriteAllText(path, yaml);
        return path;
    }

    /// <summary>
    /// A small fast spec (8 longitudinal slots in WR-90, Chebyshev −20 dB, standing-wave) named <paramref name="tag"/>,
    /// with <paramref name="extra"/> YAML lines appended; written into a fresh folder, its path returned.
    /// </summary>
    public static string SmallSpec(string tag, string extra = "") => Spec(tag, $$"""
        spec: 1
        name: {{tag}}
        frequency: 9.375 GHz
        band: [9.35 GHz, 9.40 GHz]
        guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
        feed: {type: standing-wave}
        slots: {type: longitudinal, count: 8, width: 1.6 mm, cutter: 1.6 mm}
        taper: {type: chebyshev, sidelobes: -20 dB}

        """ + extra);

    /// <summary>The column-header record of cutlist.csv, then its slot records (RFC 4180, CRLF); comment and feature records left out.</summary>
    public static List<string[]> CsvRecords(string path)
    {
        var all = Records(File.ReadAllText(path)).Where(r => !r[0].StartsWith('#')).ToList();
        return [all[0], .. all.Skip(1).Where(r => r[0] == "slot")];
    }

    /// <summary>Every record of an RFC 4180 text (IETF RFC 4180, 2005, §2: quoted fields with doubled quotes, CRLF record ends).</summary>
    public static List<string[]> Records(string text)
    {
        var records = new List<string[]>();
        var fields = new List<string>();
        var field = new System.Text.StringBuilder();
        bool quoted = false;
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"') { field.Append('"'); i++; }
                else if (c == '"') quoted = false;
                else field.Append(c);
            }
            else if (c == '"') quoted = true;
            else if (c == ',') { fields.Add(field.ToString()); field.Clear(); }
            else if (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n')
            {
                fields.Add(field.ToString()); field.Clear();
                records.Add([.. fields]); fields.Clear();
                i++;
            }
            else field.Append(c);
        }
        return records;
    }

    public static double Mm(string field) => double.Parse(field, CultureInfo.InvariantCulture) * 1e-3;
}
