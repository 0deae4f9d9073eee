using System.Reflection;

namespace SlotArray.Core.Tests;

/// <summary>House rule: Core references MathNet.Numerics and the framework only (no YAML, plotting, console or file packages).</summary>
public class CorePurityTests
{
    [Fact]
    public void Core_references_only_the_framework_and_MathNet()
    {
        var core = typeof(DesignWarning).Assembly;
        var refs = core.GetReferencedAssemblies().Select(a => a.Name!).ToList();
        var foreign = refs.Where(n => !(n.StartsWith("System", StringComparison.Ordinal) || n == "netstandard"
            || n == "mscorlib" || n.StartsWith("Microsoft.", StringComparison.Ordinal) || n == "MathNet.Numerics")).ToList();
        Assert.Empty(foreign);
        Assert.DoesNotContain(refs, n => n.Contains("Yaml") || n.Contains("OxyPlot") || n.Contains("Skia") || n.Contains("Spectre") || n.Contains("CommandLine"));
    }

    [Fact]
    public void Core_types_do_not_use_console_or_file_io()
    {
        // Scan IL-level member references is heavy; instead check that no Core type has a field or parameter
        // of an I/O type. The folder layout and review keep the rest honest.
        var ioTypes = new[] { typeof(Stream), typeof(TextWriter), typeof(TextReader), typeof(FileInfo) };
        foreach (var t in typeof(DesignWarning).Assembly.GetTypes())
            foreach (var m in t.GetMethods(BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly))
                foreach (var p in m.GetParameters())
                    Assert.False(ioTypes.Any(io => io.IsAssignableFrom(p.ParameterType)), $"{t.Name}.{m.Name} takes {p.ParameterType.Name}");
    }
}
