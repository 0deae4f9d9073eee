using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace SlotArray.Core.Tests;

/// <summary>
/// The repository's C# sources as Roslyn syntax trees (and Core as a compilation with a semantic model), for the tests
/// that check the code's shape: namespace cycles, I/O in Core, method lengths.
/// </summary>
internal static class SourceTree
{
    /// <summary>The repository root: the first folder above the test's working directory that holds SlotArray.sln.</summary>
    public static string RepositoryRoot { get; } = FindRoot();

    /// <summary>Every .cs file under <paramref name="folder"/> (relative to the root), bin/ and obj/ excluded, in ordinal order.</summary>
    public static IReadOnlyList<string> Files(string folder)
    {
        string full = Path.Combine(RepositoryRoot, folder);
        return [.. Directory.EnumerateFiles(full, "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal)
                && !f.Contains($"{Path.DirectorySeparatorChar}bin{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)];
    }

    /// <summary>Parses one file with the language version the projects use.</summary>
    public static SyntaxTree Parse(string path)
        => CSharpSyntaxTree.ParseText(File.ReadAllText(path), new CSharpParseOptions(LanguageVersion.Preview), path);

    /// <summary>
    /// SlotArray.Core compiled from its sources against the framework and MathNet.Numerics (the assemblies this test
    /// process has loaded), with the project's implicit usings.
    /// </summary>
    public static CSharpCompilation CoreCompilation()
    {
        var options = new CSharpParseOptions(LanguageVersion.Preview);
        var trees = Files("src/SlotArray.Core").Select(Parse).ToList();
        // Sources the build generates into obj/ and compiles in (the edge-slot calibration table as a string constant).
        trees.AddRange(Directory.EnumerateFiles(Path.Combine(RepositoryRoot, "src/SlotArray.Core/obj"), "*.g.cs", SearchOption.TopDirectoryOnly)
            .Order(StringComparer.Ordinal).Select(Parse));
        trees.Add(CSharpSyntaxTree.ParseText("""
            global using System;
            global using System.Collections.Generic;
            global using System.IO;
            global using System.Linq;
            global using System.Net.Http;
            global using System.Threading;
            global using System.Threading.Tasks;
            """, options, "ImplicitUsings.cs"));
        _ = typeof(MathNet.Numerics.Complex32);   // loads MathNet.Numerics into this process
        var references = ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
            .Concat(AppDomain.CurrentDomain.GetAssemblies().Where(a => !a.IsDynamic && a.Location.Length > 0).Select(a => a.Location))
            .Distinct(StringComparer.Ordinal)
            .Select(p => MetadataReference.CreateFromFile(p));
        return CSharpCompilation.Create("SlotArray.Core.Check", trees, references,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));
    }

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "SlotArray.sln"))) return dir.FullName;
        throw new InvalidOperationException("SlotArray.sln not found above " + AppContext.BaseDirectory);
    }
}
