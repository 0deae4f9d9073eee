using SlotArray.Core.Prototype;

namespace SlotArray.Core.Tests.Prototype;

/// <summary>Issue 13: the next plate advances the drawing's revision letter (A, B, … Z, AA, … ZZ; common practice, no source).</summary>
public class NextRevisionTests
{
    [Theory]
    [InlineData("A", "B")]
    [InlineData("H", "I")]
    [InlineData("Y", "Z")]
    [InlineData("Z", "AA")]
    [InlineData("AA", "AB")]
    [InlineData("AZ", "BA")]
    [InlineData("ZY", "ZZ")]
    public void The_next_revision_follows_the_letter_sequence(string previous, string next)
        => Assert.Equal(next, NextPlate.NextRevision(previous));

    [Theory]
    [InlineData("ZZ")]
    [InlineData("a")]
    [InlineData("")]
    [InlineData("ABC")]
    [InlineData("1")]
    public void There_is_no_revision_after_ZZ_or_after_a_malformed_letter(string previous)
        => Assert.Throws<ArgumentException>(() => NextPlate.NextRevision(previous));
}
