using System.Security.Cryptography;
using System.Text;
using SlotArray.Core;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Core.Tolerance;
using SlotArray.Reports;
using SlotArray.Reports.Model;
using SlotArray.Spec;

namespace SlotArray;

/// <summary>
/// The library's front door: the four steps of <c>slotarray design</c> and <c>slotarray tolerance</c> as calls. Load a
/// spec (<see cref="LoadSpec"/>, <see cref="ParseSpec"/>, or <see cref="ArraySpec.FromRequest"/> for a request built in
/// code), design and analyse it (<see cref="Design(ArraySpec, CancellationToken, IProgress{WorkProgress}?)"/>), run the
/// Monte Carlo of machining errors (<see cref="Tolerance"/>) and write the output folder (<see cref="WriteOutputs"/>).
/// </summary>
/// <remarks>
/// The calls are pure apart from the file reads and writes their names say: same spec (and seed) → the same numbers and
/// byte-identical files. Units are SI throughout (metres, hertz, radians inside the request; the report adds degrees
/// and dB where its property names say so).
/// </remarks>
/// <example>
/// <code>
/// var design = SlotArrayDesigner.Design(SlotArrayDesigner.LoadSpec("arrays/harbour-surveillance-16.yaml"));
/// Console.WriteLine($"peak sidelobe {design.PeakSidelobeDb:0.00} dB");
/// SlotArrayDesigner.WriteOutputs(design, "out/harbour");
/// </code>
/// </example>
public static class SlotArrayDesigner
{
    /// <summary>
    /// Reads and validates a YAML spec file. A path of the form <c>arrays/&lt;name&gt;.yaml</c> that does not exist on
    /// disk is read from the library's own copy of the bundled examples (<see cref="BundledExamples"/>), so the examples
    /// load from any working folder.
    /// </summary>
    /// <param name="path">The spec file, e.g. <c>arrays/harbour-surveillance-16.yaml</c>.</param>
    /// <exception cref="InvalidSpecException">The file is missing, or the spec has errors (each with file:line:column).</exception>
    public static ArraySpec LoadSpec(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (File.Exists(path))
        {
            byte[] bytes = File.ReadAllBytes(path);
            return Valid(SpecLoader.LoadFile(path), path, File.ReadAllText(path)) with { Sha256 = Convert.ToHexStringLower(SHA256.HashData(bytes)) };
        }
        if (BundledExample(path) is { } bundled)
        {
            string text = new StreamReader(new MemoryStream(bundled), new UTF8Encoding(false)).ReadToEnd();
            return Valid(SpecLoader.Parse(text, path), path, text) with { Sha256 = Convert.ToHexStringLower(SHA256.HashData(bundled)) };
        }
        throw new InvalidSpecException($"spec file not found: {path}", []);
    }

    /// <summary>The bundled example specs the library carries, as <c>arrays/&lt;name&gt;.yaml</c> paths for <see cref="LoadSpec"/>.</summary>
    public static IReadOnlyList<string> BundledExamples { get; } =
        [.. typeof(SlotArrayDesigner).Assembly.GetManifestResourceNames().Where(n => n.StartsWith("arrays/", StringComparison.Ordinal)).Order(StringComparer.Ordinal)];

    /// <summary>Validates a YAML spec given as text.</summary>
    /// <param name="yaml">The spec's text.</param>
    /// <param name="name">The name its errors and warnings carry in place of a file name.</param>
    /// <exception cref="InvalidSpecException">The spec has errors (each with name:line:column).</exception>
    public static ArraySpec ParseSpec(string yaml, string name = "spec.yaml")
    {
        ArgumentNullException.ThrowIfNull(yaml);
        var parsed = SpecLoader.Parse(yaml, name);
        return Valid(parsed, name, yaml) with { Sha256 = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(yaml))) };
    }

    /// <summary>
    /// Designs the array the spec asks for and analyses it across its band: slot geometry, the network's match and slot
    /// excitations, the pattern and its figures, requirement verdicts and safety screens (what <c>slotarray design</c>
    /// computes, with the built-in slot models or the spec's own slot table).
    /// </summary>
    /// <param name="spec">The spec.</param>
    /// <param name="cancellation">Stops a long run (a coupled design, a large band sweep) with <see cref="OperationCanceledException"/>.</param>
    /// <param name="progress">Receives the step, count and total of long stages; null for none.</param>
    /// <exception cref="InfeasibleDesignException">The spec cannot be realised; the message names the slot, the numbers and what to change.</exception>
    /// <exception cref="ConvergenceException">A solver did not converge; the message names the slot or stage.</exception>
    public static DesignedArray Design(ArraySpec spec, CancellationToken cancellation = default, IProgress<WorkProgress>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(spec);
        if (spec.Request.Planar is not null)
            throw new InfeasibleDesignException("planar arrays (array: {type: planar}) are designed by 'slotarray design'; this facade returns linear designs only so far");
        var source = SlotSource.For(spec.Request, new ResonantCharacterisationCache());
        var options = AnalysisOptions.Default with { Cancellation = cancellation, Progress = progress };
        var result = ArrayPipeline.Run(spec.Request, options, source);
        var document = DocumentInfo.Unnamed with { SpecSha256 = spec.Sha256 };
        var report = DesignReportBuilder.Build(result, document) with { SpecText = spec.Text };
        return new DesignedArray(spec, result, report);
    }

    /// <summary>Designs a request built in code (<see cref="ArraySpec.FromRequest"/>).</summary>
    /// <param name="request">The request.</param>
    /// <exception cref="InfeasibleDesignException">The request cannot be realised; the message says what to change.</exception>
    public static DesignedArray Design(ArrayRequest request) => Design(ArraySpec.FromRequest(request));

    /// <summary>
    /// Monte Carlo of machining errors on a design: peak sidelobe, gain loss, pointing error and match statistics over the
    /// trials, and each slot's sensitivity, with the tolerances of the spec's <c>tolerance:</c> block.
    /// </summary>
    /// <param name="design">The nominal design.</param>
    /// <param name="trials">Number of trials; the spec's when null.</param>
    /// <param name="seed">Random seed; the spec's when null. Same seed → the same numbers, whatever the thread count.</param>
    /// <param name="cancellation">Stops the run with <see cref="OperationCanceledException"/>.</param>
    /// <exception cref="ArgumentException">The spec has no <c>tolerance:</c> block.</exception>
    public static ToleranceResult Tolerance(DesignedArray design, int? trials = null, int? seed = null, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(design);
        var given = design.Spec.Request.Tolerance
            ?? throw new ArgumentException("the spec has no tolerance: block; add one, e.g. 'tolerance: {offset: 0.02 mm, length: 0.02 mm, trials: 2000, seed: 1}'", nameof(design));
        var tolerance = given with { Trials = trials ?? given.Trials, Seed = seed ?? given.Seed };
        return ToleranceAnalysis.Run(design.Analysis, tolerance, ToleranceOptions.Default with { Cancellation = cancellation });
    }

    /// <summary>
    /// Writes the output folder of <c>slotarray design</c>: design.json, cutlist.csv, the drawings (SVG, DXF), the plots,
    /// input.s1p, summary.md and spec.yaml. The folder is replaced whole on success and left untouched on failure.
    /// </summary>
    /// <param name="design">The design.</param>
    /// <param name="folder">The output folder (created if missing).</param>
    /// <param name="tolerance">A tolerance result to summarise in design.json and summary.md; null for none.</param>
    /// <returns>The names of the files written.</returns>
    /// <exception cref="OutputFolderException">The folder cannot be used (e.g. it is a file, or not writable).</exception>
    public static IReadOnlyList<string> WriteOutputs(DesignedArray design, string folder, ToleranceResult? tolerance = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(folder);
        var report = tolerance is null ? design.Report : design.Report with { Tolerance = ToleranceSummary.Lines(tolerance) };
        string target = OutputFolderCheck.Prepare(folder, replacesWhole: true);
        OutputFolder.WriteAll(report, target);
        return OutputFolder.NamesFor(report);
    }

    private static byte[]? BundledExample(string path)
    {
        string name = path.Replace('\\', '/');
        string? key = BundledExamples.FirstOrDefault(n => name == n || name.EndsWith("/" + n, StringComparison.Ordinal));
        if (key is null) return null;
        using var stream = typeof(SlotArrayDesigner).Assembly.GetManifestResourceStream(key)!;
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return copy.ToArray();
    }

    private static ArraySpec Valid(SpecResult result, string source, string text)
    {
        if (!result.IsValid)
            throw new InvalidSpecException($"{source}: {result.Errors.Count} error(s); nothing designed", result.Errors);
        return new ArraySpec { Request = result.Request!, Text = text, Source = source, Warnings = result.Warnings };
    }
}
