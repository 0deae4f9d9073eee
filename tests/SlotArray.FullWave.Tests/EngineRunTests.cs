using System.Numerics;
using SlotArray.FullWave.Engine;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Runs;
using SlotArray.FullWave.Slots;
using SlotArray.Tests.Shared;
using Xunit.Abstractions;

namespace SlotArray.FullWave.Tests;

/// <summary>
/// Runs the openEMS engine (CI installs the Debian package `openems`) on the coarse mesh: the XML this project
/// writes is read back by the engine, and its de-embedded results are checked against closed forms.
/// </summary>
public sealed class EngineRunTests(ITestOutputHelper log)
{
    private static readonly GuideSection Wr90 = new(22.86, 10.16, 1.27); // EIA WR-90 inside 0.900 × 0.400 in (common practice, from memory)
    private const double F0 = 9.375e9;

    private static RunStore Store() => new(Path.Combine(Path.GetTempPath(), "slotarray-fullwave-tests", Guid.NewGuid().ToString("N")));

    private static IReadOnlyList<double> Frequencies => [8.5e9, 9.375e9, 10.25e9];

    private static TubeLayout Plain(double portZ) => new(Wr90, [], false, null, -portZ, portZ, F0, 1.4e9, MeshDensity.Coarse, false);

    // TE10 of the air-filled guide: β = √(k² − (π/a)²) (Pozar 2012, eq. 3.84, from memory).
    private static double Beta(double fHz) => Results.PortWaves.Te10PhaseConstant(fHz, Wr90.AMm * 1e-3);

    [Fact]
    public async Task A_plain_guide_section_transmits_fully_with_the_phase_beta_L()
    {
        const double d = 30;
        var req = new RunRequest("plain", TubeModel.Build(Plain(d), "plain WR-90"), Wr90.AMm * 1e-3, Frequencies);
        var o = await Store().RunAsync(OpenEmsEngine.Locate(null), req, CancellationToken.None);
        foreach (var p in o.Response.Points)
        {
            double expected = -Beta(p.FrequencyHz) * 2 * d * 1e-3;
            double phaseErrDeg = Math.IEEERemainder(p.S21.Phase - expected, 2 * Math.PI) * 180 / Math.PI;
            log.WriteLine($"f {p.FrequencyHz / 1e9:0.000} GHz |S11| {p.S11.Magnitude:0.0000} |S21| {p.S21.Magnitude:0.0000} phase error {phaseErrDeg:0.00} deg ({o.Stats.Cells} cells, {o.Stats.Timesteps} steps, {o.Stats.Seconds:0.0} s)");
            // A matched TE10 line: |S21| = 1, S11 = 0, ∠S21 = −βL (Pozar 2012, section 3.3, from memory). The coarse
            // mesh (λ/15) lags 0.4–1.5° over 60 mm (measured): FDTD numerical dispersion (A. Taflove and S. C. Hagness,
            // Computational Electrodynamics, 3rd ed., Artech House 2005, ch. 4) is what the calibration run removes.
            Check.Absolute(1.0, p.S21.Magnitude, 0.03, "lossless matched line, Pozar 2012 section 3.3");
            Check.Absolute(0.0, p.S11.Magnitude, 0.03, "lossless matched line, Pozar 2012 section 3.3");
            Check.Absolute(0.0, phaseErrDeg, 3, "∠S21 = −βL, Pozar 2012 eq. 3.84; coarse-mesh dispersion allowance");
        }
    }

    [Fact]
    public async Task A_short_de_embedded_with_the_plain_guide_run_reflects_minus_one_at_its_face()
    {
        const double d = 30;
        var store = Store();
        var engine = OpenEmsEngine.Locate(null);
        var cal = new RunRequest("cal", TubeModel.Build(Plain(d), "plain WR-90"), Wr90.AMm * 1e-3, Frequencies);
        var shortLayout = new TubeLayout(Wr90, [], false, ShortZMm: 0, Port1ZMm: d, Port2ZMm: null, F0, 1.4e9, MeshDensity.Coarse, false);
        var sh = new RunRequest("short", TubeModel.Build(shortLayout, "shorted WR-90"), Wr90.AMm * 1e-3, Frequencies);
        var outcomes = await RunQueue.RunAllAsync(engine, store, [cal, sh], 2, null, CancellationToken.None);
        for (int k = 0; k < Frequencies.Count; k++)
        {
            var c = outcomes[0].Response.Points[k];
            var s = outcomes[1].Response.Points[k];
            // The short is d from the port: the round trip is 2d, the calibration's path: S11 at the face = S11,port / S21,cal.
            var (atFace, _) = SlotPlaneDeembedding.ToSlotPlane(s.S11, Complex.Zero, Complex.Zero, c.S21);
            log.WriteLine($"f {c.FrequencyHz / 1e9:0.000} GHz S11 at the short's face {atFace.Real:0.0000} {atFace.Imaginary:+0.0000;-0.0000}j");
            // A perfect short: Γ = −1 at its face (Pozar 2012, eq. 2.40 with Z_L = 0, from memory).
            Check.Absolute(-1.0, atFace.Real, 0.05, "Γ = −1 of a short, Pozar 2012 eq. 2.40");
            Check.Absolute(0.0, atFace.Imaginary, 0.06, "Γ = −1 of a short, Pozar 2012 eq. 2.40");
        }
    }

    [Fact]
    public async Task A_longitudinal_slot_on_the_coarse_mesh_is_a_lossy_shunt_element()
    {
        var cut = new LongitudinalCut(3.0, 15.3, 1.5875, null);
        var layout = new TubeLayout(Wr90, [new PlacedSlot(cut, 0)], true, null, -33, 33, F0, 1.4e9, MeshDensity.Coarse, false);
        var store = Store();
        var runs = new[] { new RunRequest("cal", TubeModel.Build(layout with { CutSlots = false }, "cal"), Wr90.AMm * 1e-3, [F0]),
                           new RunRequest("slot", TubeModel.Build(layout, "slot"), Wr90.AMm * 1e-3, [F0]) };
        var o = await RunQueue.RunAllAsync(OpenEmsEngine.Locate(null), store, runs, 2, null, CancellationToken.None);
        var (s11, s21) = SlotPlaneDeembedding.ToSlotPlane(o[1].Response.Points[0].S11, o[1].Response.Points[0].S21, o[0].Response.Points[0].S11, o[0].Response.Points[0].S21);
        var y = SlotPlaneDeembedding.ShuntAdmittance(s11);
        double residual = SlotPlaneDeembedding.ShuntResidual(s11, s21);
        log.WriteLine($"y = {y.Real:0.0000} {y.Imaginary:+0.0000;-0.0000}j, |1+S11-S21| = {residual:0.0000}; {o[1].Stats.Cells} cells, {o[1].Stats.Timesteps} steps, {o[1].Stats.Seconds:0.0} s");
        // A longitudinal broad-wall slot is a shunt element (Stevenson, J. Appl. Phys. 19, 1948): 1 + S11 = S21.
        Check.Absolute(0.0, residual, 0.05, "shunt element: 1 + S11 − S21 = 0, Stevenson 1948");
        // It radiates: Re y > 0; near resonance at a 3 mm offset in WR-90 its conductance is of the order of
        // Stevenson's g = 2.09 (a/b)(λg/λ) cos²(πλ/2λg) sin²(πx/a) ≈ 0.26 (Stevenson 1948, eq. for the shunt slot; evaluated here).
        Assert.InRange(y.Real, 0.1, 0.5);
    }
}
