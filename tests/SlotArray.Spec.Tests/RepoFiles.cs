namespace SlotArray.Tests.Shared;

/// <summary>Finds files of the repository by walking up from the test binary to the folder holding SlotArray.sln.</summary>
internal static class RepoFiles
{
    /// <summary>The repository root.</summary>
    public static string Root
    {
        get
        {
            for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
                if (File.Exists(Path.Combine(dir.FullName, "SlotArray.sln"))) return dir.FullName;
            throw new InvalidOperationException($"no SlotArray.sln above {AppContext.BaseDirectory}");
        }
    }

    /// <summary>Every example spec in arrays/, sorted by name.</summary>
    public static IReadOnlyList<string> Examples =>
        Directory.GetFiles(Path.Combine(Root, "arrays"), "*.yaml").OrderBy(p => p, StringComparer.Ordinal).ToList();

    /// <summary>The README demo spec.</summary>
    public static string Demo => Path.Combine(Root, "arrays", "harbour-surveillance-16.yaml");

    /// <summary>The custom-tube example spec.</summary>
    public static string Tube => Path.Combine(Root, "arrays", "sector-5g8-tube.yaml");
}
