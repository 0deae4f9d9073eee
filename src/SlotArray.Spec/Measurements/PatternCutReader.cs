using System.Globalization;
using SlotArray.Core.Prototype;
using SlotArray.Core.Quantities;

namespace SlotArray.Spec.Measurements;

/// <summary>Defaults for what a cut file does not say in its <c>#</c> header lines (from command-line options).</summary>
/// <param name="Frequency">Frequency of the cut, or null.</param>
/// <param name="Plane">Plane, or null (default: the plane of the guide axis).</param>
/// <param name="Polarisation">Polarisation, or null (default: co).</param>
internal sealed record CutDefaults(Frequency? Frequency = null, string? Plane = null, string? Polarisation = null);

/// <summary>What a cut file said about itself, to show back to the user.</summary>
/// <param name="Frequency">Frequency and where it came from.</param>
/// <param name="Plane">Plane and where it came from.</param>
/// <param name="Polarisation">Polarisation and where it came from.</param>
/// <param name="Points">Number of angles.</param>
/// <param name="HasPhase">Whether a phase column was read.</param>
internal sealed record CutHeader(string Frequency, string Plane, string Polarisation, int Points, bool HasPhase)
{
    /// <summary>One line for the user.</summary>
    public string Describe() => $"pattern cut, {Points} angles (deg), level in dB{(HasPhase ? ", phase in deg" : ", no phase")}; frequency {Frequency}; plane {Plane}; polarisation {Polarisation}";
}

/// <summary>
/// Reads a measured pattern cut from CSV (RFC 4180 without quoted fields): columns angle (deg), level (dB) and optionally
/// phase (deg), in that order or named by a header row (<c>angle_deg,level_db,phase_deg</c>); <c>#</c> lines carry
/// <c># frequency: 9.41 GHz</c>, <c># plane: guide-axis</c> and <c># polarisation: co</c> (also <c>polarization</c>), and
/// anything else as free text. Angles from broadside in degrees, strictly increasing, within ±90°, θ &gt; 0 toward the datum
/// end (the end short or load), as in the tool's own pattern. Only co-polarised cuts in the plane of the guide axis are
/// compared (the other plane is the element pattern alone and carries nothing about the slot excitations).
/// </summary>
internal static class PatternCutReader
{
    /// <summary>Reads a file.</summary>
    /// <exception cref="MeasurementFormatException">The file is malformed (file:line: message).</exception>
    public static (MeasuredCut Cut, CutHeader Header) ReadFile(string path, CutDefaults? defaults = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (!System.IO.File.Exists(path)) throw new MeasurementFormatException(path, 0, "file not found");
        return Read(System.IO.File.ReadAllLines(path), path, defaults);
    }

    /// <summary>Reads the lines of a cut file named <paramref name="name"/>.</summary>
    /// <exception cref="MeasurementFormatException">The file is malformed (file:line: message).</exception>
    public static (MeasuredCut Cut, CutHeader Header) Read(IReadOnlyList<string> lines, string name, CutDefaults? defaults = null)
    {
        ArgumentNullException.ThrowIfNull(lines);
        defaults ??= new CutDefaults();
        Frequency? freq = null;
        string? plane = null, pol = null;
        int freqLine = 0, planeLine = 0, polLine = 0;
        int colAngle = 0, colLevel = 1, colPhase = 2;
        bool headerRow = false, sawData = false;
        var angles = new List<double>();
        var levels = new List<double>();
        var phases = new List<double>();
        int phaseCount = -1;
        for (int i = 0; i < lines.Count; i++)
        {
            int ln = i + 1;
            string text = lines[i].Trim();
            if (text.Length == 0) continue;
            if (text.StartsWith('#'))
            {
                string body = text.TrimStart('#').Trim();
                int colon = body.IndexOf(':');
                if (colon < 0) continue;
                string key = body[..colon].Trim().ToLowerInvariant(), value = body[(colon + 1)..].Trim().TrimEnd(',').Trim();
                switch (key)
                {
                    case "frequency":
                        if (!QuantityParser.TryParseFrequency(value, out var f, out string err)) throw new MeasurementFormatException(name, ln, $"frequency: {err}");
                        freq = f; freqLine = ln; break;
                    case "plane": plane = value.ToLowerInvariant(); planeLine = ln; break;
                    case "polarisation" or "polarization": pol = value.ToLowerInvariant(); polLine = ln; break;
                }
                continue;
            }
            var cells = text.Split(',').Select(c => c.Trim()).ToArray();
            if (!sawData && !headerRow && !double.TryParse(cells[0], NumberStyles.Float, CultureInfo.InvariantCulture, out _))
            {
                headerRow = true;
                var names = cells.Select(c => c.ToLowerInvariant()).ToList();
                colAngle = names.FindIndex(c => c.StartsWith("angle", StringComparison.Ordinal) || c.StartsWith("theta", StringComparison.Ordinal));
                colLevel = names.FindIndex(c => c.StartsWith("level", StringComparison.Ordinal) || c.StartsWith("amplitude", StringComparison.Ordinal) || c.StartsWith("gain", StringComparison.Ordinal));
                colPhase = names.FindIndex(c => c.StartsWith("phase", StringComparison.Ordinal));
                if (colAngle < 0 || colLevel < 0) throw new MeasurementFormatException(name, ln, $"header row '{text}' names no angle and level columns: write angle_deg,level_db[,phase_deg]");
                continue;
            }
            sawData = true;
            double Cell(int c, string what)
            {
                if (c >= cells.Length) throw new MeasurementFormatException(name, ln, $"missing {what} column (found {cells.Length} field{(cells.Length == 1 ? "" : "s")})");
                return double.TryParse(cells[c], NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v) ? v
                    : throw new MeasurementFormatException(name, ln, $"{what} '{cells[c]}' is not a number (a dot is the decimal separator)");
            }
            double a = Cell(colAngle, "angle");
            if (Math.Abs(a) >= 90) throw new MeasurementFormatException(name, ln, $"angle {a} deg: angles from broadside lie strictly within ±90 deg");
            if (angles.Count > 0 && a <= angles[^1] * 180 / Math.PI) throw new MeasurementFormatException(name, ln, $"angle {a} deg is not above the previous one: angles must increase");
            angles.Add(a * Math.PI / 180);
            levels.Add(Cell(colLevel, "level"));
            bool hasPhase = colPhase >= 0 && colPhase < cells.Length && cells[colPhase].Length > 0;
            int here = hasPhase ? 1 : 0;
            if (phaseCount < 0) phaseCount = here;
            else if (phaseCount != here) throw new MeasurementFormatException(name, ln, "phase given on some rows and not on others: give it on every row or on none");
            if (hasPhase) phases.Add(Cell(colPhase, "phase") * Math.PI / 180);
        }
        if (angles.Count < 3) throw new MeasurementFormatException(name, 0, $"{angles.Count} data rows: a cut needs at least 3 angles");
        string freqFrom = freq is not null ? $"(from line {freqLine})" : "(from --cut-frequency)";
        freq ??= defaults.Frequency ?? throw new MeasurementFormatException(name, 0, "no frequency: add a line '# frequency: 9.41 GHz' or give --cut-frequency");
        string planeFrom = plane is not null ? $"(from line {planeLine})" : defaults.Plane is not null ? "(from --cut-plane)" : "(default)";
        plane ??= defaults.Plane?.ToLowerInvariant() ?? "guide-axis";
        if (plane is not ("guide-axis" or "axial"))
            throw new MeasurementFormatException(name, planeLine, $"plane '{plane}': only cuts in the plane of the guide axis (plane: guide-axis) are compared; the other plane is the element pattern alone and says nothing about the slots");
        string polFrom = pol is not null ? $"(from line {polLine})" : defaults.Polarisation is not null ? "(from --cut-polarisation)" : "(default)";
        pol ??= defaults.Polarisation?.ToLowerInvariant() ?? "co";
        if (pol is not ("co" or "co-polar" or "copolar"))
            throw new MeasurementFormatException(name, polLine, $"polarisation '{pol}': only co-polarised cuts are compared (polarisation: co)");
        var cut = new MeasuredCut(System.IO.Path.GetFileName(name), freq.Value, angles, levels, phaseCount == 1 ? phases : null);
        var header = new CutHeader($"{freq.Value} {freqFrom}", $"{plane} {planeFrom}", $"{pol} {polFrom}", angles.Count, cut.HasPhase);
        return (cut, header);
    }
}
