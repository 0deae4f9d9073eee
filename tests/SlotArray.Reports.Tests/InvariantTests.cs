using System.Globalization;
using System.Runtime.CompilerServices;

namespace SlotArray.Reports.Tests;

public class InvariantTests
{
    [Theory]
    [InlineData(1.23449, 3, "1.234")]
    [InlineData(-1.2346, 3, "-1.235")]
    [InlineData(-0.0004, 3, "0.000")]   // never "-0.000" on a cut list
    [InlineData(-0.0, 2, "0.00")]
    [InlineData(double.NaN, 3, "n/a")]
    public void Fixed_prints_culture_free_fixed_decimals(double value, int decimals, string expected)
    {
        var saved = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.InvariantCulture;
            Assert.Equal(expected, Invariant.Fixed(value, decimals));
        }
        finally { CultureInfo.CurrentCulture = saved; }
    }
}

// Approval test: the cut list of the fixture is frozen in Approved/cutlist.eight.approved.csv,
// a file reviewed by eye against the equal-area round-end rule and baseline dimensioning (common practice [C]). A deliberate format change updates that file.
public class CutListApprovalTests
{
    private static string Dir([CallerFilePath] string path = "") => Path.Combine(Path.GetDirectoryName(path)!, "Approved");

    [Fact]
    public void Cut_list_of_the_fixture_matches_the_approved_file()
    {
        string approved = Path.Combine(Dir(), "cutlist.eight.approved.csv");
        string actual = CutListCsv.ToText(ReportFixture.Eight());
        if (!File.Exists(approved))
        {
            File.WriteAllText(approved.Replace(".approved.", ".received."), actual);
            Assert.Fail($"no approved file: review {approved.Replace(".approved.", ".received.")} and rename it to .approved.");
        }
        Assert.Equal(File.ReadAllText(approved), actual);
    }
}
