using System.Collections.Concurrent;
using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// A decorator that makes a frequency sweep of fixed slots cheap: for each slot geometry (signed coupling, length) met,
/// the inner model's admittance y(f) is evaluated on demand at the nodes f_k = f_ref (1 + k h) of one uniform grid and
/// interpolated between them by the Lagrange polynomial through the <see cref="Order"/> nearest nodes. Every other
/// member, and the admittance outside the grid's reach, is the inner model's own.
/// </summary>
/// <remarks>
/// <para>Method: polynomial interpolation on equally spaced nodes; the error of the degree-(n − 1) interpolant through n
/// nodes is |y⁽ⁿ⁾(ξ)/n!| ∏|f − f_k| (E. Isaacson and H. B. Keller, <i>Analysis of Numerical Methods</i>, Wiley 1966,
/// Ch. 6, Theorem 1, from memory), i.e. O((h/F)ⁿ) when y varies on a frequency scale F. A slot's admittance near
/// resonance varies on the scale of its own bandwidth, several per cent of f (Elliott 1981, Ch. 8: y vs l/l_r), so
/// with h = 0.4 % and n = 6 the interpolation error is far below the model's accuracy; the tests compare it with
/// direct solves. At a node, including f_ref itself, the value is the inner model's exactly.</para>
/// <para>Deterministic: a node's value depends only on the slot geometry and the node frequency, never on the order in
/// which nodes were first asked for; thread-safe.</para>
/// </remarks>
internal sealed class FrequencyInterpolatedSlotModel : IShuntSlotModel
{
    /// <summary>Default node spacing h as a fraction of the reference frequency, 0.004.</summary>
    public const double DefaultStep = 0.004;

    /// <summary>Default number of nodes per interpolant (degree 5), 6.</summary>
    public const int DefaultOrder = 6;

    private readonly ConcurrentDictionary<(double Coupling, double Length, long Node), Lazy<Complex>> _nodes = new();
    private readonly bool memoise;

    /// <summary>Wraps <paramref name="inner"/>.</summary>
    /// <param name="inner">The model whose admittance is interpolated.</param>
    /// <param name="reference">The reference frequency f_ref of the node grid (normally the design frequency), &gt; 0.</param>
    /// <param name="step">Node spacing h as a fraction of f_ref, 1e-5 ≤ h ≤ 0.05; default <see cref="DefaultStep"/>.</param>
    /// <param name="order">Number of nodes per interpolant, 2 ≤ n ≤ 12; default <see cref="DefaultOrder"/>.</param>
    /// <param name="memoise">Whether node values are kept per slot geometry (true: a sweep of fixed slots); false for an
    /// inner model that is itself cheap and caches what it needs, asked about ever-new geometries (a fit), where keeping
    /// every node would only grow memory. The values are the same either way.</param>
    public FrequencyInterpolatedSlotModel(IShuntSlotModel inner, Frequency reference, double step = DefaultStep, int order = DefaultOrder, bool memoise = true)
    {
        ArgumentNullException.ThrowIfNull(inner);
        if (!(reference.Hertz > 0 && double.IsFinite(reference.Hertz)))
            throw new ArgumentOutOfRangeException(nameof(reference), reference.ToString(), "the reference frequency must be positive");
        if (!(step >= 1e-5 && step <= 0.05))
            throw new ArgumentOutOfRangeException(nameof(step), step, "the node spacing must lie between 1e-5 and 0.05 of the reference frequency");
        if (order is < 2 or > 12)
            throw new ArgumentOutOfRangeException(nameof(order), order, "the interpolant needs 2 to 12 nodes");
        Inner = inner;
        this.memoise = memoise;
        Reference = reference;
        Step = step;
        Order = order;
    }

    /// <summary>The wrapped model.</summary>
    public IShuntSlotModel Inner { get; }

    /// <summary>Reference frequency of the node grid.</summary>
    public Frequency Reference { get; }

    /// <summary>Node spacing as a fraction of <see cref="Reference"/>.</summary>
    public double Step { get; }

    /// <summary>Nodes per interpolant.</summary>
    public int Order { get; }

    /// <summary>Number of node values computed so far (each one inner admittance evaluation).</summary>
    public int NodeCount => _nodes.Count;

    /// <inheritdoc />
    public RectangularWaveguide Guide => Inner.Guide;

    /// <inheritdoc />
    public Length Width => Inner.Width;

    /// <inheritdoc />
    public SlotCouplingKind CouplingKind => Inner.CouplingKind;

    /// <inheritdoc />
    public string Name => Inner.Name;

    /// <inheritdoc />
    public double MaximumCoupling => Inner.MaximumCoupling;

    /// <inheritdoc />
    public SlotDataRange Range => Inner.Range;

    /// <summary>Node frequency f_k = f_ref (1 + k h).</summary>
    /// <param name="k">Node number (0 at the reference frequency).</param>
    public Frequency NodeFrequency(long k) => Frequency.FromHertz(Reference.Hertz * (1 + k * Step));

    /// <summary>
    /// The interpolated admittance: y at the node when f is one, else the Lagrange interpolant through the
    /// <see cref="Order"/> nodes nearest f (centred stencil). Falls back to the inner model when a node of the stencil
    /// would lie at or below the guide's TE10 cutoff.
    /// </summary>
    public Complex Admittance(double coupling, Length length, Frequency f)
    {
        double u = (f.Hertz / Reference.Hertz - 1) / Step;
        if (!double.IsFinite(u)) return Inner.Admittance(coupling, length, f);
        double nearest = Math.Round(u);
        if (Math.Abs(u - nearest) <= 1e-9) return Node(coupling, length, (long)nearest);
        long first = (long)Math.Floor(u) - (Order / 2 - 1);
        if (!AboveCutoff(first)) return Inner.Admittance(coupling, length, f);
        var sum = Complex.Zero;
        for (int i = 0; i < Order; i++)
        {
            long ki = first + i;
            double w = 1;
            for (int j = 0; j < Order; j++)
                if (j != i) w *= (u - (first + j)) / (double)(ki - (first + j));
            sum += w * Node(coupling, length, ki);
        }
        return sum;
    }

    /// <summary>
    /// Computes, in parallel, every node a sweep of the given slots from <paramref name="low"/> to <paramref name="high"/>
    /// will use (the results are the same with or without this call; it only uses the cores).
    /// </summary>
    /// <param name="slots">(coupling, length) of each slot.</param>
    /// <param name="low">Lowest frequency of the sweep.</param>
    /// <param name="high">Highest frequency of the sweep.</param>
    public void Prepare(IReadOnlyList<(double Coupling, Length Length)> slots, Frequency low, Frequency high)
    {
        ArgumentNullException.ThrowIfNull(slots);
        long k0 = (long)Math.Floor((low.Hertz / Reference.Hertz - 1) / Step) - (Order / 2 - 1);
        long k1 = (long)Math.Ceiling((high.Hertz / Reference.Hertz - 1) / Step) + Order / 2;
        if (!AboveCutoff(k0)) return;
        var work = slots.Select(s => (Coupling: Math.Abs(s.Coupling), s.Length)).Distinct().SelectMany(s => Enumerable.Range(0, (int)(k1 - k0 + 1)).Select(i => (s, k: k0 + i))).ToArray();
        Parallel.ForEach(work, w => Node(w.s.Coupling, w.s.Length, w.k));
    }

    /// <summary>Whether node k lies above the guide's TE10 cutoff (below it the inner model has no admittance).</summary>
    private bool AboveCutoff(long k) => NodeFrequency(k).Hertz > Guide.CutoffTe10.Hertz * (1 + 1e-6);

    private Complex Node(double coupling, Length length, long k)
    {
        double c = Math.Abs(coupling);   // y is even in the coupling (see remarks)
        if (!memoise) return Inner.Admittance(c, length, NodeFrequency(k));
        return _nodes.GetOrAdd((c, length.Meters, k), key => new Lazy<Complex>(() => Inner.Admittance(c, length, NodeFrequency(k)))).Value;
    }

    /// <inheritdoc />
    public SlotResonance Resonance(double coupling, Frequency f) => Inner.Resonance(coupling, f);

    /// <inheritdoc />
    public SlotResonance ForConductance(double conductance, Frequency f) => Inner.ForConductance(conductance, f);

    /// <inheritdoc />
    public double MaximumConductance(Frequency f) => Inner.MaximumConductance(f);

    /// <inheritdoc />
    public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f) => Inner.Warnings(coupling, f);
}
