using System.Diagnostics;
using BenchmarkDotNet.Attributes;
using SlotArray.Core.Design;
using SlotArray.Spec;

namespace SlotArray.Benchmarks;

/// <summary>
/// <c>design</c> of the README demo (arrays/harbour-surveillance-16.yaml: 16 moment-method slots, 201-point sweep, both
/// VSWR band searches, every output file). Issue 5's target: ≤ 1.5 s process wall time with the slot cache warm.
/// The process benchmarks start <c>dotnet slotarray.dll</c> exactly as a user would (runtime start-up and JIT
/// included); the in-process ones time the pipeline alone, with the moment-method characterisation already in memory,
/// through the frequency-interpolated slot model (the default) and with direct solves at every frequency.
/// </summary>
public class DesignBenchmarks
{
    private string dll = null!, demo = null!, work = null!, warmCache = null!;
    private ArrayRequest request = null!;
    private int run;

    /// <summary>Finds the CLI and the demo, warms the disk cache once.</summary>
    [GlobalSetup]
    public void Setup()
    {
        dll = Path.Combine(Path.GetDirectoryName(typeof(DesignBenchmarks).Assembly.Location)!, "slotarray.dll");
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SlotArray.sln"))) dir = dir.Parent;
        demo = Path.Combine(dir?.FullName ?? throw new InvalidOperationException("no SlotArray.sln above the benchmark"), "arrays", "harbour-surveillance-16.yaml");
        work = Path.Combine(Path.GetTempPath(), "slotarray-bench-" + Environment.ProcessId);
        warmCache = Path.Combine(work, "cache");
        Design("--cache-dir", warmCache);
        request = SpecLoader.LoadFile(demo).Request!;
        ArrayPipeline.Run(request);   // the characterisation at the design frequency, in memory
    }

    /// <summary>Removes the temporary folders.</summary>
    [GlobalCleanup]
    public void Cleanup()
    {
        if (Directory.Exists(work)) Directory.Delete(work, recursive: true);
    }

    /// <summary>The process with the slot cache warm (the target).</summary>
    [Benchmark]
    public int ProcessWarmCache() => Design("--cache-dir", warmCache);

    /// <summary>The process without the disk cache: the characterisation is computed.</summary>
    [Benchmark]
    public int ProcessCold() => Design("--no-cache");

    /// <summary>The pipeline in-process, interpolated slot admittances (default options).</summary>
    [Benchmark]
    public double PipelineInterpolated() => ArrayPipeline.Run(request).AtDesign.GainDbi;

    /// <summary>The pipeline in-process, a moment-method solve at every frequency (the path before interpolation).</summary>
    [Benchmark]
    public double PipelineDirectSolves() => ArrayPipeline.Run(request, new AnalysisOptions(AdmittanceStep: 0)).AtDesign.GainDbi;

    private int Design(params string[] extra)
    {
        var psi = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in new[] { dll, "design", demo, "-o", Path.Combine(work, "out" + run++) }.Concat(extra)) psi.ArgumentList.Add(a);
        using var p = Process.Start(psi)!;
        var err = p.StandardError.ReadToEndAsync();
        p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        if (p.ExitCode != 0) throw new InvalidOperationException($"slotarray design exited {p.ExitCode}: {err.Result}");
        return p.ExitCode;
    }
}
