using System.Globalization;
using System.Text;
using SlotArray.Core;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;

namespace SlotArray.Spec.Tests;

/// <summary>
/// Issue 11: every spec that the check accepts designs or says why. A fixed-seed generator mutates small example specs
/// key by key (every key of the spec, with ordinary, edge and out-of-range values), reads each one as the <c>check</c>
/// command does (<see cref="SpecLoader.Parse"/>) and runs each accepted one through the design pipeline
/// (<see cref="ArrayPipeline.Run"/>) in-process with a coarse analysis grid. The only failures allowed are the ones a
/// user can act on: a positioned spec error, <see cref="InfeasibleDesignException"/> and <see cref="ConvergenceException"/>.
/// Every delivered design is then checked, independently of the pipeline's own clearance check, for slots that
/// overlap each other or run past the guide's side walls, its end short, its load or its feed flange.
/// </summary>
public class DesignFuzzTests
{
    private const int Specs = 2000;
    private const int Seed = 20261205;

    /// <summary>
    /// A coarse analysis (the fuzz looks for failures, not figures): the band edges only and no VSWR-band search; the slot
    /// admittance solved directly at those few frequencies, except under mutual coupling, whose best-match search samples
    /// the band densely and is cheaper through the interpolating model.
    /// </summary>
    internal static AnalysisOptions Coarse(ArrayRequest request) => request.Coupling == CouplingMode.Mutual
        ? new(SweepPoints: 2, BandSearchFraction: 0) { MatchPoints = 2 }
        : new(SweepPoints: 2, BandSearchFraction: 0, AdmittanceStep: 0) { MatchPoints = 2 };

    /// <summary>
    /// Found by this fuzz: a coarse match sweep of two points slid to pass through f0 left the guide's single-mode band
    /// (9.41 to 15.95 GHz in WR-90, above the TE20 cutoff 13.11 GHz) and ended in an internal error. The slide now keeps the
    /// span inside the band or, when it cannot, leaves it unslid.
    /// </summary>
    [Fact]
    public void A_two_point_match_sweep_over_a_wide_band_stays_inside_the_single_mode_band()
    {
        const string yaml = "spec: 1\nname: fuzz-broad\nfrequency: 9.41 GHz\nband: [7.528 GHz, 11.292 GHz]\n"
            + "guide:\n  size: WR-90\n  wall: 1.27 mm\n  metal: aluminium\n"
            + "slots:\n  type: longitudinal\n  count: 8\n  width: 1.6 mm\n  cutter: 1.6 mm\n  model: moment-method\n"
            + "feed:\n  type: standing-wave\n  spacing: 0.7 guide-wavelength\n  position: end\n  short: 0.25 guide-wavelength\n"
            + "taper:\n  type: taylor\n  sidelobes: -26 dB\n  nbar: 3\ncoupling: none\n";
        var check = SpecLoader.Parse(yaml, "fuzz.yaml");
        Assert.True(check.IsValid, string.Join("\n", check.Errors));
        var result = ArrayPipeline.Run(check.Request!, Coarse(check.Request!));
        var (low, high) = check.Request!.Guide.SingleModeBand;
        Assert.All(result.MatchSweep!.Points, p => Assert.InRange(p.Frequency.Hertz, low.Hertz, high.Hertz));
    }

    [Fact]
    public void Every_spec_the_check_accepts_designs_or_says_why()
    {
        var rng = new Random(Seed);
        var internalErrors = new List<string>();
        var badGeometry = new List<string>();
        int accepted = 0, designed = 0, infeasible = 0;
        var keysTouched = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < Specs; i++)
        {
            var spec = FuzzSpec.Generate(rng, keysTouched);
            string text = spec.Render();
            var check = SpecLoader.Parse(text, "fuzz.yaml");
            if (check.Request is null)
            {
                foreach (var e in check.Errors.Where(e => e.Message.Contains("please report it", StringComparison.Ordinal)))
                    internalErrors.Add($"spec {i}: check: {e}\n{text}");
                continue;
            }
            accepted++;
            ArrayResult result;
            try
            {
                result = ArrayPipeline.Run(check.Request, Coarse(check.Request));
            }
            catch (Exception e) when (e is InfeasibleDesignException or ConvergenceException)
            {
                infeasible++;
                continue;
            }
            catch (Exception e)
            {
                internalErrors.Add($"spec {i}: design: {e.GetType().Name}: {e.Message}\n{text}");
                continue;
            }
            designed++;
            foreach (string problem in CuttableGeometry.Problems(check.Request, result.Design))
                badGeometry.Add($"spec {i}: {problem}\n{text}");
        }
        string summary = string.Format(CultureInfo.InvariantCulture, "{0} specs: {1} accepted by the check, {2} designed, {3} infeasible or not converged; {4} internal errors, {5} bad geometries",
            Specs, accepted, designed, infeasible, internalErrors.Count, badGeometry.Count);
        Assert.True(internalErrors.Count == 0 && badGeometry.Count == 0,
            summary + "\n" + string.Join("\n\n", internalErrors.Concat(badGeometry).Take(12)));
        // The generator must reach every key and leave enough specs valid for the design stage to be exercised.
        Assert.Equal(FuzzSpec.AllKeys.OrderBy(k => k, StringComparer.Ordinal), keysTouched.OrderBy(k => k, StringComparer.Ordinal));
        Assert.True(designed >= Specs / 10 && infeasible > 0 && accepted < Specs, summary);
    }
}
