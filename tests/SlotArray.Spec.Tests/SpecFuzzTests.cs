using System.Text;
using SlotArray.Spec;
using SlotArray.Tests.Shared;

namespace SlotArray.Spec.Tests;

/// <summary>
/// Randomly mutated example specs (fixed seed, so every run feeds the same inputs) must end as a valid request
/// or as positioned errors, never as an exception.
/// </summary>
public class SpecFuzzTests
{
    private const int MutationsPerExample = 1000;   // two examples: 2,000 inputs

    private static readonly string[] UnitTokens = ["GHz", "MHz", "Hz", "mm", "m", "in", "mil", "um", "dB", "%", "kW", "W", "deg", "S/m", "guide-wavelength", "furlong", ""];
    private static readonly string[] NumberReplacements = ["1e400", "-1e400", "-5", "-0.001", "0", "1e30", "NaN", "abc", "1,5", "∞", "", "999999999999999999999", "0x10", "~", "[1, 2]", "{a: 1}", "\"", "&x", "*y"];

    [Fact]
    public void Mutated_examples_end_as_requests_or_positioned_errors()
    {
        var rng = new Random(20261201);
        int valid = 0, rejected = 0;
        foreach (string path in RepoFiles.Examples)
        {
            string[] original = File.ReadAllLines(path);
            for (int i = 0; i < MutationsPerExample; i++)
            {
                var lines = original.ToList();
                int edits = 1 + rng.Next(3);
                for (int k = 0; k < edits; k++) Mutate(lines, rng);
                string text = string.Join("\n", lines);
                SpecResult r;
                try
                {
                    r = SpecLoader.Parse(text, "fuzz.yaml");
                }
                catch (Exception e)
                {
                    Assert.Fail($"mutation {i} of {Path.GetFileName(path)} threw {e.GetType().Name}: {e.Message}\n--- input ---\n{text}");
                    return;
                }
                if (r.Request is not null)
                {
                    Assert.Empty(r.Errors);
                    valid++;
                }
                else
                {
                    Assert.NotEmpty(r.Errors);
                    Assert.All(r.Errors, e =>
                    {
                        Assert.True(e.Line >= 1 && e.Column >= 1, $"unpositioned error {e}\n--- input ---\n{text}");
                        Assert.False(string.IsNullOrWhiteSpace(e.Message));
                        Assert.DoesNotContain("please report it", e.Message); // an internal failure caught, not a user error
                    });
                    rejected++;
                }
            }
        }
        Assert.Equal(RepoFiles.Examples.Count * MutationsPerExample, valid + rejected);
        Assert.True(valid > 0 && rejected > 0, $"valid {valid}, rejected {rejected}: the mutations should produce both");
    }

    private static void Mutate(List<string> lines, Random rng)
    {
        if (lines.Count == 0) { lines.Add(RandomBytes(rng)); return; }
        int i = rng.Next(lines.Count);
        switch (rng.Next(7))
        {
            case 0: lines.RemoveAt(i); break;
            case 1: lines.Insert(i, lines[i]); break;
            case 2:
                int j = rng.Next(lines.Count);
                (lines[i], lines[j]) = (lines[j], lines[i]);
                break;
            case 3:
                foreach (string u in UnitTokens.Where(u => u.Length > 0))
                    if (lines[i].Contains(" " + u, StringComparison.Ordinal))
                    {
                        lines[i] = lines[i].Replace(" " + u, " " + UnitTokens[rng.Next(UnitTokens.Length)]);
                        break;
                    }
                break;
            case 4:
                lines[i] = System.Text.RegularExpressions.Regex.Replace(lines[i], @"-?\d+(\.\d+)?",
                    _ => NumberReplacements[rng.Next(NumberReplacements.Length)], System.Text.RegularExpressions.RegexOptions.None, TimeSpan.FromSeconds(1));
                break;
            case 5:
                int at = rng.Next(lines[i].Length + 1);
                lines[i] = lines[i][..at] + RandomBytes(rng) + lines[i][at..];
                break;
            default:
                lines[i] = new string(' ', rng.Next(4)) + lines[i].TrimStart();
                break;
        }
    }

    /// <summary>1 to 8 random bytes read as Latin-1 characters (control characters included).</summary>
    private static string RandomBytes(Random rng)
    {
        var bytes = new byte[1 + rng.Next(8)];
        rng.NextBytes(bytes);
        return Encoding.Latin1.GetString(bytes);
    }
}
