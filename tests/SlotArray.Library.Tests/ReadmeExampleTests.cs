using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using SlotArray.Cli.Tests;
using SlotArray.Tests.Shared;

namespace SlotArray.Library.Tests;

/// <summary>
/// The README's "Use it from C#" example, so that it never goes stale: the FIRST <c>csharp</c> block of README.md is
/// compiled unchanged as Program.cs of a fresh console project (outside the repository, referencing the library project
/// <c>src/SlotArray.Library</c>), run from that project's own folder, and what it prints is checked against design.json of
/// <c>slotarray design</c> on the same spec.
/// </summary>
public partial class ReadmeExampleTests
{
    /// <summary>The first <c>```csharp</c> block of the README, exactly as written.</summary>
    internal static string FirstCSharpBlock(string readme)
    {
        var m = Regex.Match(readme.ReplaceLineEndings("\n"), "^```csharp\n(?<code>.*?)^```$", RegexOptions.Singleline | RegexOptions.Multiline);
        Assert.True(m.Success, "README.md has no ```csharp block");
        return m.Groups["code"].Value;
    }

    [Fact]
    public void The_first_csharp_block_is_the_complete_demo_program()
    {
        string code = FirstCSharpBlock(File.ReadAllText(Path.Combine(RepoFiles.Root, "README.md")));
        Assert.Contains("SlotArrayDesigner.LoadSpec(\"arrays/harbour-surveillance-16.yaml\")", code, StringComparison.Ordinal);
        Assert.Contains("SlotArrayDesigner.Design(", code, StringComparison.Ordinal);
        Assert.Contains("PeakSidelobeDb", code, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_readme_program_builds_in_a_fresh_console_project_and_prints_the_design_json_values()
    {
        string code = FirstCSharpBlock(File.ReadAllText(Path.Combine(RepoFiles.Root, "README.md")));
        string project = DesignRuns.TempFolder("readme-example");
        File.WriteAllText(Path.Combine(project, "Program.cs"), code);
        File.WriteAllText(Path.Combine(project, "ReadmeExample.csproj"), $"""
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <OutputType>Exe</OutputType>
                <TargetFramework>net10.0</TargetFramework>
                <ImplicitUsings>enable</ImplicitUsings>
                <Nullable>enable</Nullable>
              </PropertyGroup>
              <ItemGroup>
                <ProjectReference Include="{Path.Combine(RepoFiles.Root, "src", "SlotArray.Library", "SlotArray.Library.csproj")}" />
              </ItemGroup>
            </Project>
            """);

        var build = await Dotnet(project, "build", "-c", "Release", "-nologo", "-v", "quiet");
        Assert.True(build.Code == 0, "the README example does not build:\n" + build.Out + build.Err);
        var run = await Dotnet(project, "run", "--no-build", "-c", "Release");
        Assert.True(run.Code == 0, "the README example failed:\n" + run.Out + run.Err);

        // The reference: design.json of the command line on the bundled demo file.
        string outDir = DesignRuns.TempFolder("readme-reference");
        var (cliCode, _, cliErr) = DesignRuns.Run("design", RepoFiles.Demo, "-o", outDir, "--no-cache");
        Assert.True(cliCode == 0, cliErr);
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "design.json")));
        var root = json.RootElement;
        var slots = root.GetProperty("slots").EnumerateArray().ToList();
        const string Source = "design.json of slotarray design on arrays/harbour-surveillance-16.yaml, half a unit of the printed digits";

        var lines = run.Out.ReplaceLineEndings("\n").Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var head = HeadLine().Match(lines[0]);
        Assert.True(head.Success, "first line: " + lines[0]);
        Assert.Equal(root.GetProperty("name").GetString(), head.Groups["name"].Value);
        Assert.Equal(slots.Count, int.Parse(head.Groups["n"].Value, CultureInfo.InvariantCulture));
        Check.Absolute(root.GetProperty("pattern").GetProperty("peak_sidelobe_db").GetDouble(), Number(head.Groups["psl"].Value), 0.005 + 1e-9, Source);

        var rows = lines.Skip(2).Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries)).ToList();
        Assert.Equal(slots.Count, rows.Count);
        for (int i = 0; i < rows.Count; i++)
        {
            var s = slots[i];
            Assert.Equal(s.GetProperty("index").GetInt32(), int.Parse(rows[i][0], CultureInfo.InvariantCulture));
            Check.Absolute(s.GetProperty("position_m").GetDouble() * 1e3, Number(rows[i][1]), 0.0005 + 1e-9, Source + ": position");
            Check.Absolute(s.GetProperty("offset_m").GetDouble() * 1e3, Number(rows[i][2]), 0.0005 + 1e-9, Source + ": offset");
            Check.Absolute(s.GetProperty("length_m").GetDouble() * 1e3, Number(rows[i][3]), 0.0005 + 1e-9, Source + ": length");
            Check.Absolute(s.GetProperty("conductance").GetDouble(), Number(rows[i][4]), 0.000005 + 1e-12, Source + ": conductance");
        }
    }

    private static double Number(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    [GeneratedRegex(@"^(?<name>.+): (?<n>\d+) slots, peak sidelobe (?<psl>-?\d+\.\d+) dB$")]
    private static partial Regex HeadLine();

    /// <summary>Runs the dotnet CLI in <paramref name="folder"/> without the MSBuild settings of the test host's own build.</summary>
    private static async Task<(int Code, string Out, string Err)> Dotnet(string folder, params string[] args)
    {
        var info = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = folder,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (string a in args) info.ArgumentList.Add(a);
        foreach (string key in info.Environment.Keys.Where(k => k.StartsWith("MSBUILD", StringComparison.OrdinalIgnoreCase)).ToList())
            info.Environment.Remove(key);
        info.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        info.Environment["DOTNET_NOLOGO"] = "1";
        using var p = Process.Start(info)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        using var limit = new CancellationTokenSource(TimeSpan.FromMinutes(15));
        await p.WaitForExitAsync(limit.Token);
        return (p.ExitCode, await stdout, await stderr);
    }
}
