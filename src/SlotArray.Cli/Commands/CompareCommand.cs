using System.CommandLine;
using System.Globalization;
using SlotArray.Core.Stick;
using SlotArray.Core;
using SlotArray.Core.Design;
using SlotArray.Core.Prototype;
using SlotArray.Reports;
using SlotArray.Reports.Compare;
using SlotArray.Reports.Model;
using SlotArray.Reports.Plots;
using SlotArray.Spec;
using SlotArray.Spec.Measurements;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray compare DESIGN_DIR FILE… [-o DIR]</c>: reads a prototype's Touchstone file and pattern cuts, compares
/// them with the design in DESIGN_DIR (rebuilt from its spec.yaml), fits the design's own coupled network to them
/// (<see cref="PrototypeFit"/>), proposes the trims and the next plate, prints the table and the diagnosis and writes
/// the overlays, the trim list and the next plate's outputs. Malformed files: <c>file:line: message</c>, exit 2; a
/// measurement of another design: the reason, exit 2.
/// </summary>
internal static class CompareCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var dir = new Argument<string>("design-dir") { Description = "The output folder of 'slotarray design' for the plate that was cut" };
        var files = new Argument<string[]>("files") { Description = "Measurements: one Touchstone file (.s1p, .s2p) and/or pattern cuts (.csv)", Arity = ArgumentArity.OneOrMore };
        var outDir = new Option<string?>("--output", "-o") { Description = "Output folder (default <design-dir>-compare)" };
        var freq = new Option<string?>("--cut-frequency") { Description = "Frequency of cuts whose file does not say it, e.g. 9.41GHz" };
        var plane = new Option<string?>("--cut-plane") { Description = "Plane of cuts whose file does not say it (guide-axis)" };
        var pol = new Option<string?>("--cut-polarisation") { Description = "Polarisation of cuts whose file does not say it (co)" };
        var (cacheDir, noCache) = DesignCommand.CacheOptions();
        var cmd = new Command("compare", "Compare a prototype's measurements with its design, diagnose what went wrong, propose trims and the next plate")
            { dir, files, outDir, freq, plane, pol, cacheDir, noCache };
        cmd.SetAction(pr => Run(pr.GetValue(dir)!, pr.GetValue(files)!, pr.GetValue(outDir), pr.GetValue(freq), pr.GetValue(plane), pr.GetValue(pol),
            DesignCommand.CacheOf(pr, cacheDir, noCache), output, error));
        return cmd;
    }

    /// <summary>
    /// The cut plate's drawing number, revision and sheet from its design.json (fabrication section); revision A and the
    /// array's name when the folder has none (an older design folder).
    /// </summary>
    private static DocumentInfo CutDocument(string dir)
    {
        string path = Path.Combine(dir, "design.json");
        if (!File.Exists(path)) return DocumentInfo.Unnamed;
        try
        {
            using var doc = System.Text.Json.JsonDocument.Parse(File.ReadAllText(path));
            if (!doc.RootElement.TryGetProperty("fabrication", out var fab)) return DocumentInfo.Unnamed;
            string? Str(string key) => fab.TryGetProperty(key, out var v) && v.ValueKind == System.Text.Json.JsonValueKind.String ? v.GetString() : null;
            string revision = Str("revision") is { Length: 1 or 2 } r && r.All(char.IsAsciiLetterUpper) && r != "ZZ" ? r : "A";
            return DocumentInfo.Unnamed with { DrawingNumber = Str("drawing_number"), Revision = revision };
        }
        catch (System.Text.Json.JsonException)
        {
            throw new UserInputException($"{path}: not readable JSON: give the output folder of 'slotarray design' unchanged (or design again)");
        }
    }

    private static int Run(string dir, string[] files, string? outDir, string? cutFrequency, string? cutPlane, string? cutPolarisation,
        SlotCache? cache, TextWriter output, TextWriter error)
    {
        string spec = Path.Combine(dir, "spec.yaml");
        if (!File.Exists(spec))
            throw new UserInputException($"{dir}: no spec.yaml: give the output folder of 'slotarray design' (it writes the spec beside its outputs; run design again if the folder is older)");
        var request = DesignCommand.Load(spec, error, "nothing compared");

        Core.Quantities.Frequency? defaultFrequency = null;
        if (cutFrequency is not null)
        {
            if (!QuantityParser.TryParseFrequency(cutFrequency, out var f, out string why)) throw new UserInputException($"--cut-frequency: {why}");
            defaultFrequency = f;
        }
        var defaults = new CutDefaults(defaultFrequency, cutPlane, cutPolarisation);
        MeasuredNetwork? network = null;
        var cuts = new List<MeasuredCut>();
        var inputs = new List<string>();
        try
        {
            foreach (string file in files)
            {
                if (Path.GetExtension(file).Equals(".csv", StringComparison.OrdinalIgnoreCase))
                {
                    var (cut, header) = PatternCutReader.ReadFile(file, defaults);
                    cuts.Add(cut);
                    inputs.Add($"{file}: {header.Describe()}");
                }
                else
                {
                    if (network is not null) throw new UserInputException($"{file}: a second network file; give one Touchstone file per comparison");
                    var (net, header) = TouchstoneReader.ReadFile(file);
                    network = net;
                    inputs.Add($"{file}: {header.Describe()}; S taken as referred to the guide's TE10 wave impedance (a waveguide calibration): the reference resistance is shown, not used to renormalise");
                }
            }
        }
        catch (MeasurementFormatException e)
        {
            error.WriteLine(e.Message);
            return ExitCodes.BadInput;
        }
        foreach (var line in inputs) error.WriteLine($"read {line}");

        var result = DesignCommand.Analyse(request, cache, error, false);
        var data = new PrototypeMeasurements(network, cuts);
        PrototypeDiagnosis diagnosis;
        try
        {
            error.WriteLine("fitting the design's network model to the measurements ...");
            diagnosis = PrototypeFit.Run(result.Design, result.SlotModel, request.Feed.Type == FeedType.TravellingWave, data);
        }
        catch (MeasurementMismatchException e)
        {
            error.WriteLine($"refused: {e.Message}");
            return ExitCodes.BadInput;
        }
        var trim = TrimProposal.Propose(diagnosis);
        ArrayResult? next = null;
        string? problem = null;
        try
        {
            error.WriteLine("designing the next plate on the corrected model ...");
            next = NextPlate.Design(request, result.SlotModel, diagnosis);
        }
        catch (InfeasibleDesignException e)
        {
            problem = $"the next plate cannot be designed on the corrected model: {e.Message}";
        }
        var report = ComparisonReportBuilder.Build(result, data, inputs, diagnosis, trim, next, problem);

        string folder = outDir ?? Path.TrimEndingDirectorySeparator(dir) + "-compare";
        Directory.CreateDirectory(folder);
        string text = ComparisonMarkdown.Text(report);
        AtomicFile.WriteText(Path.Combine(folder, "comparison.md"), text);
        AtomicFile.WriteText(Path.Combine(folder, "trim.csv"), ComparisonMarkdown.TrimCsv(report));
        if (data.Network is not null)
        {
            AtomicFile.Write(Path.Combine(folder, "return-loss.png"), s => PlotExport.Write(ComparePlots.ReturnLoss(report), s, "png"));
            AtomicFile.Write(Path.Combine(folder, "vswr.png"), s => PlotExport.Write(ComparePlots.Vswr(report), s, "png"));
        }
        for (int i = 0; i < report.Cuts.Count; i++)
        {
            var overlay = report.Cuts[i];
            AtomicFile.Write(Path.Combine(folder, string.Format(CultureInfo.InvariantCulture, "cut-{0}.png", i + 1)), s => PlotExport.Write(ComparePlots.Cut(overlay), s, "png"));
        }
        if (next is not null) WriteNextPlate(spec, dir, folder, next, result, request, error);
        output.Write(text);
        error.WriteLine($"wrote {folder}/: comparison.md, trim.csv{(data.Network is null ? "" : ", return-loss.png, vswr.png")}{string.Concat(report.Cuts.Select((_, i) => $", cut-{i + 1}.png"))}{(next is null ? "" : ", next-plate/")}");
        return ExitCodes.Ok;
    }

    /// <summary>The next plate: the next revision of the cut plate's drawing, its letter advanced, the changed rows flagged.</summary>
    private static void WriteNextPlate(string spec, string dir, string folder, ArrayResult next, ArrayResult result, ArrayRequest request, TextWriter error)
    {
        string original = File.ReadAllText(spec);
        string nextSpec = "# Next plate designed by 'slotarray compare' on the slot model corrected by the prototype's fit.\n"
            + "# This spec is the prototype's: designing it again does not reproduce this plate (see comparison.md).\n" + original;
        // The next plate is the next revision of the cut plate's drawing: its letter advanced, the rows that changed flagged.
        var cutDocument = CutDocument(dir);
        var document = cutDocument with
        {
            Revision = NextPlate.NextRevision(cutDocument.Revision),
            Date = null,
            SpecSha256 = Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.UTF8.GetBytes(nextSpec))),
        };
        string tableCopy = Path.Combine(dir, DesignReport.SlotTableFileName);
        var nextReport = DesignReportBuilder.Build(next, document, NextPlate.Plan(next, result)) with
        {
            SpecText = nextSpec,
            SlotTableBytes = request.Slots.Data is not null && File.Exists(tableCopy) ? File.ReadAllBytes(tableCopy) : null,
        };
        error.WriteLine($"next plate: revision {document.Revision} of drawing {document.DrawingNumber ?? request.Name} ({nextReport.Fabrication?.Changed.Count ?? 0} features changed)");
        OutputFolder.WriteAll(nextReport, Path.Combine(folder, "next-plate"));
    }
}
