using System.CommandLine;
using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Prototype;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Reports;
using SlotArray.Reports.Compare;
using SlotArray.Spec;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray synthesise DESIGN_DIR -o DIR [errors] [noise]</c>: writes synthetic "measured" files of the plate in
/// DESIGN_DIR with known injected errors (<c>measured.s1p</c> or <c>.s2p</c>, <c>cut-1.csv</c> …), generated from the
/// design's own coupled network (<see cref="SyntheticMeasurements"/>) and marked SYNTHETIC in their headers: to try
/// <c>compare</c> and to test it, never a stand-in for a bench.
/// </summary>
internal static class SynthesiseCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var dir = new Argument<string>("design-dir") { Description = "The output folder of 'slotarray design'" };
        var outDir = new Option<string>("--output", "-o") { Description = "Folder for the synthetic files", Required = true };
        var length = new Option<string>("--length-error") { Description = "Uniform slot-length error, e.g. 0.6%", DefaultValueFactory = _ => "0%" };
        var conductance = new Option<double>("--conductance-scale") { Description = "Factor on every slot's admittance", DefaultValueFactory = _ => 1.0 };
        var guide = new Option<string>("--guide-wavelength-error") { Description = "Guide-wavelength error, e.g. 0.2%", DefaultValueFactory = _ => "0%" };
        var slots = new Option<string[]>("--slot-length-error") { Description = "Per-slot length error SLOT=LENGTH, e.g. 5=0.1mm (repeat)", AllowMultipleArgumentsPerToken = true };
        var cutsAt = new Option<string[]>("--cut-frequency") { Description = "Frequency of a pattern cut (repeat); default: the design frequency", AllowMultipleArgumentsPerToken = true };
        var noiseDb = new Option<double>("--noise-db") { Description = "± uniform level noise, dB", DefaultValueFactory = _ => 0.05 };
        var noiseDeg = new Option<double>("--noise-deg") { Description = "± uniform phase noise, deg", DefaultValueFactory = _ => 0.5 };
        var seed = new Option<int>("--seed") { Description = "Seed of the noise", DefaultValueFactory = _ => 1 };
        var (cacheDir, noCache) = DesignCommand.CacheOptions();
        var cmd = new Command("synthesise", "Write synthetic measured files of a design with injected errors (marked SYNTHETIC), to try compare")
            { dir, outDir, length, conductance, guide, slots, cutsAt, noiseDb, noiseDeg, seed, cacheDir, noCache };
        cmd.SetAction(pr => Run(pr.GetValue(dir)!, pr.GetValue(outDir)!, pr.GetValue(length)!, pr.GetValue(conductance), pr.GetValue(guide)!,
            pr.GetValue(slots) ?? [], pr.GetValue(cutsAt) ?? [], pr.GetValue(noiseDb), pr.GetValue(noiseDeg), pr.GetValue(seed),
            DesignCommand.CacheOf(pr, cacheDir, noCache), output, error));
        return cmd;
    }

    private static int Run(string dir, string outDir, string lengthError, double conductanceScale, string guideError, string[] slotErrors,
        string[] cutFrequencies, double noiseDb, double noiseDeg, int seed, SlotCache? cache, TextWriter output, TextWriter error)
    {
        string spec = Path.Combine(dir, "spec.yaml");
        if (!File.Exists(spec)) throw new UserInputException($"{dir}: no spec.yaml: give the output folder of 'slotarray design'");
        var request = DesignCommand.Load(spec, error, "nothing written");
        double sl = Percent(lengthError, "--length-error"), sg = Percent(guideError, "--guide-wavelength-error");
        if (!(conductanceScale > 0)) throw new UserInputException("--conductance-scale must be positive");
        var result = DesignCommand.Analyse(request, cache, error, false);
        var design = result.Design;
        var dl = new double[design.Count];
        foreach (string item in slotErrors)
        {
            var parts = item.Split('=');
            if (parts.Length != 2 || !int.TryParse(parts[0], NumberStyles.None, Inv, out int n) || n < 1 || n > design.Count
                || !QuantityParser.TryParseLength(parts[1], out var len, out _))
                throw new UserInputException($"--slot-length-error '{item}': write SLOT=LENGTH with SLOT 1..{design.Count}, e.g. 5=0.1mm");
            dl[n - 1] += len.Meters;
        }
        var freqs = cutFrequencies.Length == 0 ? [design.DesignFrequency] : cutFrequencies.Select(t =>
            QuantityParser.TryParseFrequency(t, out var f, out string why) ? f : throw new UserInputException($"--cut-frequency '{t}': {why}")).ToArray();
        var truth = PrototypeErrors.None(design.Count) with { LengthScale = sl, ConductanceScale = conductanceScale, GuideWavelengthScale = sg, SlotLengthErrors = dl };
        var model = new PrototypeModel(design, ArrayPipeline.AnalysisModel(request, design, result.SlotModel, AnalysisOptions.Default));
        bool twoPort = request.Feed.Type == FeedType.TravellingWave;
        // A sweep of ±2.5 % around the design frequency (or the band, when wider), as a bench would sweep a prototype.
        var low = Frequency.FromHertz(Math.Min(request.BandLow.Hertz, 0.975 * design.DesignFrequency.Hertz));
        var high = Frequency.FromHertz(Math.Max(request.BandHigh.Hertz, 1.025 * design.DesignFrequency.Hertz));
        var data = SyntheticMeasurements.Generate(model, truth, low, high, 201, freqs, 0.5, noiseDb, noiseDeg, seed, twoPort);
        string[] provenance =
        [
            $"SYNTHETIC measurement of '{request.Name}' generated by 'slotarray synthesise' from the design's own coupled network: not a bench measurement",
            string.Format(Inv, "injected: uniform length error {0:0.###} %, conductance scale {1:0.###}, guide-wavelength error {2:0.###} %, per-slot length errors {3}",
                sl * 100, conductanceScale, sg * 100, slotErrors.Length == 0 ? "none" : string.Join(" ", slotErrors)),
            string.Format(Inv, "noise: ±{0} dB on levels, ±{1} deg on phases (uniform), seed {2}", noiseDb, noiseDeg, seed),
        ];
        Directory.CreateDirectory(outDir);
        string net = Path.Combine(outDir, twoPort ? "measured.s2p" : "measured.s1p");
        AtomicFile.WriteText(net, MeasurementFiles.Touchstone(data.Network!, provenance));
        var written = new List<string> { Path.GetFileName(net) };
        for (int i = 0; i < data.Cuts.Count; i++)
        {
            string name = string.Format(Inv, "cut-{0}.csv", i + 1);
            AtomicFile.WriteText(Path.Combine(outDir, name), MeasurementFiles.Cut(data.Cuts[i], provenance));
            written.Add(name);
        }
        output.WriteLine($"wrote {outDir}/: {string.Join(", ", written)} (SYNTHETIC)");
        return ExitCodes.Ok;
    }

    private static double Percent(string text, string option)
        => QuantityParser.TryParsePercent(text, out double v, out string why) ? v : throw new UserInputException($"{option}: {why}");
}
