using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Safety;

/// <summary>Issue 11 safety items: the near-field wording and the face used by the 4P/A bound.</summary>
public class ArraySafetyTests
{
    private static readonly RectangularWaveguide Wr90 =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);

    [Fact]
    public void Issue11_the_4P_over_A_bound_of_edge_slots_uses_the_narrow_face_b_plus_2t()
    {
        var spacing = Length.FromMillimeters(20);
        var (lengthEdge, widthEdge) = ArraySafety.Aperture(SlotType.Edge, Wr90, 64, spacing);
        var (lengthBroad, widthBroad) = ArraySafety.Aperture(SlotType.Longitudinal, Wr90, 64, spacing);
        // WR-90: b = 10.16 mm, a = 22.86 mm inside (EIA RS-261-B), t = 1.27 mm: b + 2t = 12.70 mm, a + 2t = 25.40 mm.
        Check.Absolute(12.70e-3, widthEdge.Meters, 1e-12, "EIA RS-261-B inside b plus two walls");
        Check.Absolute(25.40e-3, widthBroad.Meters, 1e-12, "EIA RS-261-B inside a plus two walls");
        Check.Absolute(1.28, lengthEdge.Meters, 1e-12, "64 × 20 mm");
        Assert.Equal(lengthEdge, lengthBroad);
        // 4P/A with A the slotted face (FCC OET Bulletin 65, 1997): 4 × 25 W / (1.28 m × 12.7 mm) = 6151.6 W/m².
        var e = ExposureAssessment.Assess(25, 30, Frequency.FromGigahertz(9.41), lengthEdge, widthEdge);
        Check.Relative(4 * 25 / (1.28 * 0.0127), e.NearFieldBound, 1e-12, "OET-65 near-field bound 4P/A");
        Assert.Equal(ArraySafety.Aperture(SlotType.InclinedSeries, Wr90, 64, spacing).Width, widthBroad);   // series slots sit in the broad wall
    }

    [Fact]
    public void Issue11_the_near_field_note_never_says_a_distance_beyond_2D2_over_lambda_lies_inside()
    {
        // D = 0.3 m at 5.8 GHz: 2D²/λ = 2 × 0.09 / 0.051688 m = 3.483 m. 100 W at 20 dBi reaches 10, 40, 50 W/m² beyond
        // it (8.92, 4.46, 3.99 m: R = √(P G / (4π S)), Friis 1946) and 200 W/m² inside it (1.995 m).
        var f = Frequency.FromGigahertz(5.8);
        var mixed = ExposureAssessment.Assess(100, 20, f, Length.FromMeters(0.3), Length.FromMeters(0.044));
        double ff = 2 * 0.3 * 0.3 / (299_792_458.0 / 5.8e9);
        Check.Relative(ff, mixed.FarFieldDistance.Meters, 1e-12, "2D²/λ");
        Assert.All(mixed.Distances, d => Assert.Equal(d.Stationary.Meters < ff, d.InsideFarFieldDistance));
        Assert.Contains(mixed.Distances, d => d.InsideFarFieldDistance);
        Assert.Contains(mixed.Distances, d => !d.InsideFarFieldDistance);
        string note = SafetyCautions.NearFieldNote(mixed)!;
        Assert.DoesNotContain("These distances", note);
        string insidePart = note[..note.IndexOf("lie inside", StringComparison.Ordinal)];
        string beyondPart = note[note.IndexOf("); ", StringComparison.Ordinal)..];
        int Metres(string text) => System.Text.RegularExpressions.Regex.Count(text, @"\d m\b");
        Assert.Equal(mixed.Distances.Count(d => d.InsideFarFieldDistance), Metres(insidePart));
        Assert.Equal(mixed.Distances.Count(d => !d.InsideFarFieldDistance), Metres(beyondPart));
        Assert.Single(SafetyCautions.For(mixed), c => c.Code == "exposure-near-field");
        Assert.Contains(mixed.Warnings, w => w.Message.StartsWith("1 of the 4 reference-level distances lie inside", StringComparison.Ordinal));

        // All beyond (1 W, D = 5 cm: 2D²/λ = 9.7 cm, nearest distance 0.2 m) at all; all inside (10 kW into a 2.4 m aperture): "all lie inside".
        Assert.Null(SafetyCautions.NearFieldNote(ExposureAssessment.Assess(1, 20, f, Length.FromMeters(0.05), Length.FromMeters(0.044))));
        var inside = ExposureAssessment.Assess(10e3, 30, Frequency.FromGigahertz(9.41), Length.FromMeters(2.4), Length.FromMeters(0.15));
        Assert.StartsWith("These distances all lie inside", SafetyCautions.NearFieldNote(inside));
    }
}
