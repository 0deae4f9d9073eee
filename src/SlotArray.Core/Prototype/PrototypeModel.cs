using System.Collections.Concurrent;
using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Prototype;

/// <summary>
/// The design's own network model of the plate as cut, with the errors of <see cref="PrototypeErrors"/> applied: what
/// the fit adjusts. Longitudinal (offset) slots are always analysed with the coupled network
/// (<see cref="CoupledArrayNetwork"/>, mutual coupling included) whatever coupling the design was made with, because a
/// design made without coupling misses by exactly that coupling (architecture.md, "Measurements come in at the edge
/// too"); edge slots, for which no coupled model exists here, with the isolated-slot network (<see cref="ArrayNetwork"/>).
/// </summary>
/// <remarks>
/// <para>Applied errors: length L_n (1 + s_L) + ΔL_n; coupling |c_n| + Δc_n (sign kept); slot admittance × k_G
/// (<see cref="CalibratedSlotModel"/>); guide wavelength × (1 + s_g) at the design frequency, realised as the broad wall
/// a' of the line with β' = β/(1 + s_g), (π/a')² = εr k² − β'² (TE10, D. M. Pozar, <i>Microwave Engineering</i>, 4th ed.,
/// Wiley 2012, eq. 3.84, from memory); the slot model keeps the nominal guide.</para>
/// <para>Speed: the mutual impedances are held at one geometry (the constructor's <c>couplingGeometry</c>)
/// while a fit iterates, and the fit re-freezes them at its converged point; their change over a fit's small length
/// changes is of second order in the coupling (itself a correction).</para>
/// </remarks>
internal sealed class PrototypeModel
{
    private readonly ConcurrentDictionary<double, CouplingMatrix> frozen = new();
    private readonly LongitudinalSlotPlacement[]? placements;
    private readonly Lazy<CouplingAcrossBand?> across;

    /// <summary>The model of a plate as cut.</summary>
    /// <param name="asCut">The design as cut (lengths as on the cut list, prototype margin included).</param>
    /// <param name="slot">The slot model for fitting (normally a <see cref="FrequencyInterpolatedSlotModel"/> over a <see cref="SlotSurfaceModel"/>).</param>
    /// <param name="couplingGeometry">Errors at which the mutual impedances are evaluated (and then held); null: none.</param>
    /// <param name="couplingBand">The band over which the mutual impedances are interpolated from a few fills
    /// (<see cref="CouplingAcrossBand"/>); null, or a band wider than <see cref="CouplingAcrossBand.MaximumRelativeWidth"/>:
    /// filled at every frequency asked for.</param>
    public PrototypeModel(ArrayDesign asCut, IShuntSlotModel slot, PrototypeErrors? couplingGeometry = null, (Frequency Low, Frequency High)? couplingBand = null)
    {
        ArgumentNullException.ThrowIfNull(asCut);
        ArgumentNullException.ThrowIfNull(slot);
        AsCut = asCut;
        Slot = slot;
        CouplingGeometry = couplingGeometry ?? PrototypeErrors.None(asCut.Count);
        IsCoupled = asCut.CouplingKind == SlotCouplingKind.Offset;
        if (IsCoupled)
            placements = Apply(CouplingGeometry).Slots
                .Select(s => new LongitudinalSlotPlacement(s.Position, Length.FromMeters(s.Coupling), 0.5 * s.Length)).ToArray();
        CouplingBand = couplingBand;
        across = new Lazy<CouplingAcrossBand?>(() => placements is not null && couplingBand is { } b && CouplingAcrossBand.Interpolates(b.Low, b.High)
            ? new CouplingAcrossBand(placements, asCut.Slots[0].Width, b.Low, b.High, CoupledSlotImpedances.Scaled(asCut.MutualCouplingScale))
            : null);
    }

    /// <summary>The band over which the mutual impedances are interpolated, or null.</summary>
    public (Frequency Low, Frequency High)? CouplingBand { get; }

    /// <summary>The same model with the mutual impedances interpolated over [low, high] (see <see cref="CouplingAcrossBand"/>).</summary>
    public PrototypeModel WithCouplingBand(Frequency low, Frequency high) => new(AsCut, Slot, CouplingGeometry, (low, high));

    /// <summary>The plate as cut.</summary>
    public ArrayDesign AsCut { get; }

    /// <summary>The slot model.</summary>
    public IShuntSlotModel Slot { get; }

    /// <summary>The errors at which the mutual impedances are held.</summary>
    public PrototypeErrors CouplingGeometry { get; }

    /// <summary>Whether the coupled network is used (offset slots); false: isolated slots (edge slots).</summary>
    public bool IsCoupled { get; }

    /// <summary>The same model with the mutual impedances re-evaluated at <paramref name="errors"/>.</summary>
    public PrototypeModel RefreezeAt(PrototypeErrors errors) => new(AsCut, Slot, errors, CouplingBand);

    /// <summary>The design with the errors applied (lengths, couplings, guide wavelength).</summary>
    public ArrayDesign Apply(PrototypeErrors errors)
    {
        ArgumentNullException.ThrowIfNull(errors);
        if (errors.Count != AsCut.Count) throw new ArgumentException($"{errors.Count} slot errors for {AsCut.Count} slots", nameof(errors));
        var slots = AsCut.Slots.Select((s, i) =>
        {
            double c = Math.Abs(s.Coupling) + errors.SlotCouplingErrors[i];
            return s with
            {
                Length = Length.FromMeters(s.Length.Meters * (1 + errors.LengthScale) + errors.SlotLengthErrors[i]),
                Coupling = (s.Coupling < 0 ? -1 : 1) * c,
            };
        }).ToArray();
        var guide = AsCut.Guide;
        if (errors.GuideWavelengthScale != 0)
        {
            var f0 = AsCut.DesignFrequency;
            double k2 = guide.RelativePermittivity * Math.Pow(2 * Math.PI * f0.Hertz / PhysicalConstants.SpeedOfLight, 2);
            double beta = guide.PhaseConstant(f0) / (1 + errors.GuideWavelengthScale);
            double kc2 = k2 - beta * beta;
            if (!(kc2 > 0)) throw new ArgumentOutOfRangeException(nameof(errors), errors.GuideWavelengthScale, "this guide-wavelength error puts the guide beyond cutoff");
            guide = guide with { BroadWall = Length.FromMeters(Math.PI / Math.Sqrt(kc2)) };
        }
        return AsCut with { Slots = Array.AsReadOnly(slots), Guide = guide };
    }

    /// <summary>The slot model with the conductance scale applied.</summary>
    public IShuntSlotModel SlotModel(PrototypeErrors errors)
        => errors.ConductanceScale == 1 ? Slot : new CalibratedSlotModel(Slot, 0, errors.ConductanceScale);

    /// <summary>The network solution of the plate with these errors at frequency f.</summary>
    public NetworkSolution Solve(PrototypeErrors errors, Frequency f) => Solve(Apply(errors), SlotModel(errors), f);

    /// <summary>The network solution of an already perturbed design (see <see cref="Apply"/>) at frequency f.</summary>
    public NetworkSolution Solve(ArrayDesign design, IShuntSlotModel slot, Frequency f)
        => IsCoupled ? CoupledArrayNetwork.Solve(design, slot, f, Frozen) : ArrayNetwork.Solve(design, slot, f);

    private CouplingMatrix Frozen(IReadOnlyList<LongitudinalSlotPlacement> slots, Length width, Frequency f)
        => frozen.GetOrAdd(f.Hertz, _ => across.Value is { } band && band.Covers(f)
            ? band.At(f)
            : CoupledSlotImpedances.Scaled(AsCut.MutualCouplingScale)(placements!, width, f));

    /// <summary>
    /// The co-polarised far field in the plane of the guide axis at the given angles (rad, the tool's sign: θ &gt; 0 toward
    /// the datum end), from a network solution: as <see cref="ArrayFigures.At"/> (element pattern times the array factor of
    /// the slot excitations at −z_n), unnormalised.
    /// </summary>
    public static Complex[] Field(ArrayDesign design, IReadOnlyList<Complex> excitations, Frequency f, IReadOnlyList<double> angles)
    {
        var basis = FieldBasis(design, f, angles);
        var e = new Complex[angles.Count];
        for (int a = 0; a < angles.Count; a++)
        {
            var s = Complex.Zero;
            for (int n = 0; n < design.Count; n++) s += basis[a, n] * excitations[n];
            e[a] = s;
        }
        return e;
    }

    /// <summary>
    /// B[a, n]: the far field at angle a of a unit excitation of slot n (element pattern × co-polar factor × e^{−j k z_n sin θ}),
    /// so that E(θ_a) = Σ_n B[a, n] e_n.
    /// </summary>
    public static Complex[,] FieldBasis(ArrayDesign design, Frequency f, IReadOnlyList<double> angles)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(angles);
        double k = f.FreeSpaceWavenumber;
        bool tilt = design.CouplingKind == SlotCouplingKind.Tilt;
        var element = tilt ? CrossPolarPattern.EdgeSlotCoPolarElement : ElementPatterns.HalfWaveSlotHPlane;
        var co = tilt ? CrossPolarPattern.CoPolarSources(Enumerable.Repeat(Complex.One, design.Count).ToArray(), design.Slots.Select(s => s.Coupling).ToArray())
            : Enumerable.Repeat(Complex.One, design.Count).ToArray();
        var b = new Complex[angles.Count, design.Count];
        for (int a = 0; a < angles.Count; a++)
        {
            double el = element(angles[a]), u = Math.Sin(angles[a]);
            for (int n = 0; n < design.Count; n++)
                b[a, n] = el * co[n] * Complex.FromPolarCoordinates(1, -k * design.Slots[n].Position.Meters * u);
        }
        return b;
    }
}
