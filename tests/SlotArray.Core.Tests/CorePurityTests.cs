using System.Reflection;
using System.Reflection.Metadata;
using System.Reflection.PortableExecutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace SlotArray.Core.Tests;

/// <summary>
/// House rules for Core: it references MathNet.Numerics and the framework only, touches no files, processes or console,
/// and its folders (namespaces SlotArray.Core.X) form a pipeline without cycles: a stage never reaches back up.
/// </summary>
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

    /// <summary>Framework types that reach files, processes, the console or the network; Core uses none of them.</summary>
    private static readonly HashSet<string> InputOutputTypes =
    [
        "System.IO.File", "System.IO.Directory", "System.IO.FileStream", "System.IO.FileInfo", "System.IO.DirectoryInfo",
        "System.IO.FileSystemInfo", "System.IO.StreamReader", "System.IO.StreamWriter", "System.IO.FileSystemWatcher",
        "System.IO.DriveInfo", "System.IO.Path", "System.IO.Stream", "System.IO.TextReader", "System.IO.TextWriter",
        "System.Diagnostics.Process", "System.Diagnostics.ProcessStartInfo",
        "System.Console",
        "System.Net.Http.HttpClient", "System.Net.WebClient", "System.Net.Sockets.Socket",
    ];

    [Fact]
    public void Core_uses_no_files_processes_or_console()
    {
        // Every framework type Core's IL names (calls, fields, casts, signatures) is a row of the TypeReference table.
        using var pe = new PEReader(File.OpenRead(typeof(DesignWarning).Assembly.Location));
        var md = pe.GetMetadataReader();
        var used = md.TypeReferences.Select(h => md.GetTypeReference(h))
            .Select(t => $"{md.GetString(t.Namespace)}.{md.GetString(t.Name)}").ToHashSet(StringComparer.Ordinal);
        Assert.Contains("System.Math", used);   // the table is read: Core certainly calls Math
        var io = used.Where(InputOutputTypes.Contains).Order(StringComparer.Ordinal).ToList();
        Assert.True(io.Count == 0, "Core must stay free of I/O (files, processes, console, network); it uses " + string.Join(", ", io));
    }

    /// <summary>
    /// The stages of Core, lowest first (DEVELOPERS.md, "The stages"): a folder uses only folders of earlier stages. A
    /// folder not listed here is held to <see cref="Core_folders_form_no_cycle"/> only; add it where it belongs.
    /// </summary>
    private static readonly string[][] Stages =
    [
        ["Core"], ["Quantities"], ["Waveguides"], ["Patterns", "Coupling"], ["Tapers", "Slots"], ["Stick"],
        ["Network", "Fabrication"], ["Marine"], ["Design"], ["Planar"], ["Safety"], ["Verdicts"], ["Tolerance"], ["Prototype"],
    ];

    private static readonly Lazy<Dictionary<(string From, string To), List<string>>> Edges = new(FolderEdges);

    [Fact]
    public void Core_folders_use_only_earlier_stages()
    {
        var stage = Stages.SelectMany((names, i) => names.Select(n => (n, i))).ToDictionary(x => x.n, x => x.i);
        var upward = Edges.Value.Where(e => stage.TryGetValue(e.Key.From, out int from) && stage.TryGetValue(e.Key.To, out int to) && to >= from)
            .Select(e => $"{e.Key.From} -> {e.Key.To}: {string.Join("; ", e.Value.Take(3))}").Order(StringComparer.Ordinal).ToList();
        Assert.True(upward.Count == 0, "Core folders that reach up the pipeline or sideways (move the type to the stage that owns it):\n"
            + string.Join("\n", upward));
    }

    [Fact]
    public void Core_folders_form_no_cycle()
    {
        var edges = Edges.Value;
        Assert.Contains(("Network", "Waveguides"), edges.Keys);   // the walk sees references: the network reads the guide
        var twoWay = edges.Keys.Where(e => string.CompareOrdinal(e.From, e.To) < 0 && edges.ContainsKey((e.To, e.From)))
            .Select(e => $"{e.From} <-> {e.To}: {edges[e][0]} / {edges[(e.To, e.From)][0]}").Order(StringComparer.Ordinal).ToList();
        Assert.True(twoWay.Count == 0, "Core folders that use each other (move the type to the stage that owns it):\n" + string.Join("\n", twoWay));
        var cycle = FindCycle(edges.Keys);
        Assert.True(cycle is null, "Core folders in a cycle (a stage reaches back up the pipeline): "
            + (cycle is null ? "" : string.Join(" -> ", cycle) + "\n" + string.Join("\n",
                cycle.Zip(cycle.Skip(1), (a, b) => $"{a} -> {b}: {edges[(a, b)][0]}"))));
    }

    /// <summary>
    /// Folder → folder edges of Core (the segment after "SlotArray.Core."; "Core" for the root namespace), each with the
    /// places that make it: every <c>using SlotArray.Core.X</c> line and every name (also partly or fully qualified) that
    /// binds to a type or member declared in another folder.
    /// </summary>
    private static Dictionary<(string From, string To), List<string>> FolderEdges()
    {
        var compilation = SourceTree.CoreCompilation();
        var errors = compilation.GetDiagnostics().Where(d => d.Severity == DiagnosticSeverity.Error).Take(5).ToList();
        Assert.True(errors.Count == 0, "Core does not compile from its sources here: " + string.Join("; ", errors));
        var edges = new Dictionary<(string, string), List<string>>();
        var coreNames = CoreDeclaredNames(compilation);
        foreach (var tree in compilation.SyntaxTrees)
        {
            var root = tree.GetRoot();
            var declared = root.DescendantNodes().OfType<BaseNamespaceDeclarationSyntax>().FirstOrDefault();
            if (declared is null) continue;
            string from = Folder(declared.Name.ToString());
            var model = compilation.GetSemanticModel(tree);
            void Add(string? to, SyntaxNode at)
            {
                if (to is null || to == from) return;
                var line = at.GetLocation().GetLineSpan();
                string where = $"{Path.GetFileName(line.Path)}:{line.StartLinePosition.Line + 1} {at}";
                if (!edges.TryGetValue((from, to), out var list)) edges[(from, to)] = list = [];
                list.Add(where);
            }
            foreach (var u in root.DescendantNodes().OfType<UsingDirectiveSyntax>())
                if (u.Name?.ToString() is { } n && n.StartsWith("SlotArray.Core", StringComparison.Ordinal)) Add(Folder(n), u);
            foreach (var name in root.DescendantNodes().OfType<SimpleNameSyntax>())
            {
                if (!coreNames.Contains(name.Identifier.ValueText)) continue;   // binds to nothing of Core: skip the costly lookup
                if (declared.Name.Span.Contains(name.Span) || name.Ancestors().Any(a => a is UsingDirectiveSyntax)) continue;
                var symbol = model.GetSymbolInfo(name).Symbol ?? model.GetSymbolInfo(name).CandidateSymbols.FirstOrDefault();
                Add(FolderOf(symbol), name);
            }
        }
        return edges;
    }

    /// <summary>The names of every type and member declared in Core: a name spelt otherwise cannot bind to Core.</summary>
    private static HashSet<string> CoreDeclaredNames(CSharpCompilation compilation)
    {
        var names = new HashSet<string>(StringComparer.Ordinal);
        void Walk(INamespaceOrTypeSymbol container)
        {
            foreach (var member in container.GetMembers())
            {
                names.Add(member.Name);
                if (member is INamespaceOrTypeSymbol inner) Walk(inner);
            }
        }
        Walk(compilation.Assembly.GlobalNamespace);
        return names;
    }

    private static string? FolderOf(ISymbol? symbol)
    {
        if (symbol is null or INamespaceSymbol or ITypeParameterSymbol or ILocalSymbol or IParameterSymbol or IRangeVariableSymbol) return null;
        if (symbol is IMethodSymbol { ReducedFrom: { } extension }) symbol = extension;
        var ns = (symbol as ITypeSymbol ?? symbol.ContainingType)?.ContainingNamespace?.ToDisplayString();
        return ns is not null && (ns == "SlotArray.Core" || ns.StartsWith("SlotArray.Core.", StringComparison.Ordinal)) ? Folder(ns) : null;
    }

    private static string Folder(string ns)
    {
        var parts = ns.Split('.');
        return parts.Length > 2 && parts[0] == "SlotArray" && parts[1] == "Core" ? parts[2] : "Core";
    }

    /// <summary>A cycle of the directed graph (first node repeated at the end), or null.</summary>
    private static List<string>? FindCycle(IEnumerable<(string From, string To)> edgeList)
    {
        var next = edgeList.GroupBy(e => e.From).ToDictionary(g => g.Key, g => g.Select(e => e.To).Order(StringComparer.Ordinal).ToList());
        var state = new Dictionary<string, int>();   // 1: on the current path, 2: done
        var path = new List<string>();
        List<string>? Visit(string node)
        {
            state[node] = 1;
            path.Add(node);
            foreach (var to in next.GetValueOrDefault(node) ?? [])
            {
                if (state.GetValueOrDefault(to) == 1) return [.. path.Skip(path.IndexOf(to)), to];
                if (state.GetValueOrDefault(to) == 0 && Visit(to) is { } found) return found;
            }
            path.RemoveAt(path.Count - 1);
            state[node] = 2;
            return null;
        }
        foreach (var node in next.Keys.Order(StringComparer.Ordinal))
            if (state.GetValueOrDefault(node) == 0 && Visit(node) is { } cycle) return cycle;
        return null;
    }
}
