using BenchmarkDotNet.Attributes;
using SlotArray.Core.Design;
using SlotArray.Spec;

namespace SlotArray.Benchmarks;

/// <summary>
/// Issue 12's size targets, in-process, the whole pipeline (taper, slot model, designer, 201-point band sweep, pattern and
/// gain) from a spec: an end-fed standing-wave WR-90 array of N moment-method slots (9.41 GHz, Taylor −30 dB n̄ 4, 1.27 mm
/// aluminium), isolated slots (targets: N = 1,000 ≤ 5 s, allocated memory in the MemoryDiagnoser column; peak working set
/// ≤ 300 MB is a process figure, see scripts/perf/time-design.sh) and with mutual coupling, Elliott's procedure
/// (targets: N = 256 ≤ 10 s, N = 1,000 ≤ 60 s). Each iteration starts from a fresh slot source, so the moment-method
/// characterisation is part of the time, as in a cold process without the disk cache. The specs are written as YAML so
/// the benchmark reads the spec the way a user's run does. Run one case at a time with --job dry on a shared machine,
/// e.g. <c>--filter '*Scaling*Isolated*' --job dry</c>.
/// </summary>
[MemoryDiagnoser]
public class ScalingBenchmarks
{
    private ArrayRequest isolated = null!, coupled = null!;

    /// <summary>Number of slots.</summary>
    [Params(256, 1000)]
    public int N { get; set; }

    /// <summary>Parses the two specs.</summary>
    [GlobalSetup]
    public void Setup()
    {
        isolated = Parse("none");
        coupled = Parse("mutual");
    }

    private ArrayRequest Parse(string coupling)
    {
        string yaml = $"""
            spec: 1
            name: scaling-{N}-{coupling}
            frequency: 9.41 GHz
            band: [9.35 GHz, 9.47 GHz]
            guide:
              size: WR-90
              wall: 1.27 mm
              metal: aluminium
            slots:
              type: longitudinal
              count: {N}
              width: 1.6 mm
              model: moment-method
            feed:
              type: standing-wave
              spacing: 0.5 guide-wavelength
              position: end
              short: 0.25 guide-wavelength
            taper:
              type: taylor
              sidelobes: -30 dB
              nbar: 4
            coupling: {coupling}
            """;
        var loaded = SpecLoader.Parse(yaml, $"scaling-{N}.yaml");
        return loaded.Request ?? throw new InvalidOperationException(string.Join("\n", loaded.Errors));
    }

    /// <summary>Design and analysis with isolated slots.</summary>
    [Benchmark]
    public double Isolated() => ArrayPipeline.Run(isolated).AtDesign.GainDbi;

    /// <summary>Elliott's coupled design and its coupled analysis.</summary>
    [Benchmark]
    public double Coupled() => ArrayPipeline.Run(coupled).AtDesign.GainDbi;
}
