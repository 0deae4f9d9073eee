using System.Numerics;
using CutList = SlotArray.Core.Fabrication.CutList;
using CutListGuide = SlotArray.Core.Fabrication.CutListGuide;
using FabricationPlan = SlotArray.Core.Fabrication.FabricationPlan;
using FeatureTolerances = SlotArray.Core.Fabrication.FeatureTolerances;
using SlotCutInput = SlotArray.Core.Fabrication.SlotCutInput;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Tests;

/// <summary>
/// An invented 8-slot standing-wave array in WR-90 at 9.375 GHz, for the writer tests. The guide figures are the
/// Pozar 2012, Sec. 3.3 check values (λg = 44.74288 mm, Z_TE = 527.115 Ω); spacing λg/2 and short distance λg/4
/// follow Elliott 1981, Ch. 8; overall lengths use the equal-area round-end rule (common practice [C]). Amplitudes, conductances and pattern
/// figures are made up: the writers only print them.
/// </summary>
internal static class ReportFixture
{
    public const double LambdaG = 44.74288e-3;          // Pozar 2012, Sec. 3.3 [N]
    public const double WaveImpedance = 527.115;        // Pozar 2012, Sec. 3.3 [N]
    public const double SlotWidth = 1.5875e-3;          // 1/16 in cutter

    /// <summary>The 8-slot model; the guide designation contains a comma and the name a double quote (CSV quoting).</summary>
    public static DesignReport Eight(int count = 8, bool tilt = false)
    {
        double[] taper = [0.55, 0.72, 0.89, 1.0, 1.0, 0.89, 0.72, 0.55];
        var slots = new List<SlotReport>();
        double sumSq = 0;
        for (int i = 0; i < count; i++) sumSq += Math.Pow(taper[i % 8], 2);
        for (int i = 0; i < count; i++)
        {
            double a = taper[i % 8];
            double g = a * a / sumSq;                          // Σ g = 1 (resonant array condition)
            double len = 14.80e-3 + 0.013e-3 * i;
            slots.Add(new SlotReport
            {
                Index = i + 1,
                Position = LambdaG / 4 + i * LambdaG / 2,
                Offset = tilt ? null : (i % 2 == 0 ? 1 : -1) * (1.2e-3 + 0.11e-3 * i),
                TiltDeg = tilt ? (i % 2 == 0 ? 1 : -1) * (8.0 + 0.7 * i) : null,
                CutDepth = tilt ? 3.1e-3 + 0.05e-3 * i : null,
                Length = len,
                OverallLength = len + (1 - Math.PI / 4) * SlotWidth, // equal-area rule [C]
                Width = SlotWidth,
                EndForm = SlotEndForm.Round,
                Conductance = g,
                TargetAmplitude = a,
                AchievedAmplitude = a * (1 + 0.003 * (i - 3.5)),
                AchievedPhaseDeg = 0.4 * (i - 3.5),
            });
        }
        var plan = PlanFor(slots, tilt);
        for (int i = 0; i < slots.Count; i++)
        {
            var row = plan.Slots[i].Row;
            slots[i] = slots[i] with { OverallLength = row.OverallLength.Meters, CutDepth = tilt ? row.DepthOfCut?.Meters ?? 0 : null };
        }
        double[] angles = [.. Enumerable.Range(0, 181).Select(k => k - 90.0)];
        double[] levels = [.. angles.Select(t => Math.Max(-80, 20 * Math.Log10(Math.Abs(Sinc(8 * Math.Sin(t * Math.PI / 180) / 1.4)) + 1e-9)))];
        var sweep = new List<SweepPoint>();
        for (int k = 0; k <= 20; k++)
        {
            double f = 9.2e9 + k * 0.02e9;
            double d = (f - 9.375e9) / 0.2e9;
            sweep.Add(new SweepPoint
            {
                FrequencyHz = f,
                S11 = new Complex(0.45 * d * d, 0.3 * d) + new Complex(0.01, -0.004),
                BeamDeg = 3.0 * d,
                PeakSidelobeDb = -24.5 + Math.Abs(d),
                GainDbi = 15.2 - d * d,
            });
        }
        return new DesignReport
        {
            Name = "bench \"eight\" demo",
            FrequencyHz = 9.375e9,
            BandLowHz = 9.3e9,
            BandHighHz = 9.45e9,
            Guide = new GuideReport
            {
                Designation = "WR-90, custom anodised",
                A = 22.86e-3,
                B = 10.16e-3,
                Wall = 1.27e-3,
                Metal = "aluminium 6061",
                GuideWavelength = LambdaG,
                WaveImpedanceOhm = WaveImpedance,
            },
            Slots = slots,
            Fabrication = plan,
            Termination = new TerminationReport { Type = "short", Distance = LambdaG / 4 },
            Pattern = new PatternReport
            {
                BeamDeg = 0,
                HpbwDeg = 8.1,
                PeakSidelobeDb = -24.8,
                FirstSidelobeDb = -24.8,
                DirectivityDbi = 15.6,
                GainDbi = 15.3,
                DesignSidelobeDb = -25,
                CutAngleDeg = angles,
                CutLevelDb = levels,
            },
            Match = new MatchReport { S11DbAtDesign = -39.2, VswrAtDesign = 1.022, BandwidthVswr15Hz = 101e6, BandwidthVswr2Hz = 183e6 },
            Sweep = sweep,
            Inputs = new InputsSummary
            {
                SlotType = tilt ? "edge" : "longitudinal",
                FeedType = "standing-wave, end-fed",
                TaperDescription = "Dolph-Chebyshev, -25 dB",
                SlotModelName = "moment method, finite wall",
                CutTolerance = 0.025e-3,
            },
            Warnings = ["mutual coupling is not in this model yet", "slot 1: offset near the edge of the validated range"],
            Cautions = [],
            Requirements =
            [
                new RequirementResult { Description = "peak sidelobe at the design frequency", Required = "≤ -24.0 dB", Achieved = "-24.8 dB", Passed = true },
                new RequirementResult { Description = "VSWR over the band", Required = "≤ 1.5", Achieved = "1.71 at 9.450 GHz", Passed = false },
            ],
        };
    }

    /// <summary>
    /// The fabrication plan of the fixture's slots, laid out by Core (end short at z = 0 for offset slots, a flanged
    /// matched-load end for edge slots; feed plane at the last slot; ±0.025 mm defaults; aluminium).
    /// </summary>
    public static FabricationPlan PlanFor(IReadOnlyList<SlotReport> slots, bool tilt)
    {
        var guide = new CutListGuide(Length.FromMillimeters(22.86), Length.FromMillimeters(10.16), Length.FromMillimeters(1.27));
        var inputs = slots.Select(s => new SlotCutInput(s.Index, Length.FromMeters(s.Position),
            tilt ? null : Length.FromMeters(s.Offset!.Value), tilt ? Angle.FromDegrees(s.TiltDeg!.Value) : null,
            Length.FromMeters(s.Length), Length.FromMeters(SlotWidth), Length.FromMeters(SlotWidth), Length.FromMillimeters(0.025))).ToList();
        var cut = CutList.Build(guide, inputs);
        return FabricationPlan.Layout(cut, FeatureTolerances.From(null), tilt, Length.FromMeters(slots[^1].Position), null,
            Length.FromMeters(LambdaG), "aluminium");
    }

    private static double Sinc(double x) => x == 0 ? 1 : Math.Sin(Math.PI * x) / (Math.PI * x);
}
