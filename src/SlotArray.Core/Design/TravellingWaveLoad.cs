using System.Globalization;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;

namespace SlotArray.Core.Design;

/// <summary>
/// The smallest load fraction a travelling-wave array can be designed with (<c>feed.load: auto</c>), and the nearest
/// feasible load and slot count for a request that cannot be designed.
/// </summary>
/// <remarks>
/// <para>What limits the load. Every watt not left for the load is radiated, so a smaller P_L makes every slot take a
/// larger share of the power reaching it. Two limits stop it: a shunt conductance on a matched line absorbs at most
/// half the power it receives (p = 4g/(2 + g)² ≤ 0.5, reached at g = 2; the single shunt on a matched line, derived
/// from the shunt's reflection and transmission coefficients, e.g. D. M. Pozar, <i>Microwave Engineering</i>, 4th ed.,
/// Wiley 2012, §4.4), and the slot model's largest conductance (the longitudinal slot at its largest offset, the edge
/// slot at its largest tilt and cut depth), which is usually the tighter one. Both grow monotonically harder as P_L
/// falls, so feasibility is monotone in P_L and a bisection finds the boundary.</para>
/// <para>The design tried at each load is the whole travelling-wave design including its pointing correction
/// (<see cref="TravellingWavePointing"/>), so the load returned designs as delivered.</para>
/// </remarks>
internal static class TravellingWaveLoad
{
    /// <summary>Resolution of the load search, as a fraction of the input power (0.05 %).</summary>
    public const double Resolution = 0.0005;

    /// <summary>Largest load fraction searched (90 %).</summary>
    public const double Largest = 0.9;

    /// <summary>
    /// The smallest load fraction (rounded up to <see cref="Resolution"/>) with which
    /// <paramref name="design"/> succeeds, or null when even <see cref="Largest"/> fails.
    /// </summary>
    /// <param name="request">The request; its load fraction is replaced by each trial value.</param>
    /// <param name="design">The designer to try (throws <see cref="InfeasibleDesignException"/> or <see cref="ConvergenceException"/> when it cannot).</param>
    public static double? Smallest(ArrayRequest request, Func<ArrayRequest, object> design)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(design);
        bool Works(double load)
        {
            try { design(WithLoad(request, load)); return true; }
            catch (Exception e) when (e is InfeasibleDesignException or ConvergenceException) { return false; }
        }
        if (!Works(Largest)) return null;
        // Feasibility is monotone in the load (remarks): bisect on the grid of the resolution.
        int lo = 0, hi = (int)Math.Round(Largest / Resolution);   // lo fails (0 % load is never feasible), hi works
        while (hi - lo > 1)
        {
            int mid = (lo + hi) / 2;
            if (Works(mid * Resolution)) hi = mid; else lo = mid;
        }
        return hi * Resolution;
    }

    /// <summary>The smallest load for the isolated-slot travelling-wave design with its pointing correction.</summary>
    /// <param name="request">The request.</param>
    /// <param name="slot">The slot model.</param>
    /// <param name="amplitudes">Aperture amplitudes, slot 1 first.</param>
    public static double? Smallest(ArrayRequest request, IShuntSlotModel slot, IReadOnlyList<double> amplitudes)
        => Smallest(request, r => TravellingWavePointing.Design(StickRequest.Of(r, slot, amplitudes)));

    /// <summary>The request with another load fraction.</summary>
    /// <param name="request">The request.</param>
    /// <param name="load">Load fraction, 0 &lt; P_L &lt; 1.</param>
    public static ArrayRequest WithLoad(ArrayRequest request, double load)
    {
        ArgumentNullException.ThrowIfNull(request);
        return request with { Feed = request.Feed with { LoadFraction = load } };
    }

    /// <summary>
    /// Words for an infeasible request: the nearest feasible load at this count, and the smallest count (up to four times
    /// the asked one) that designs at the asked load, e.g. "the nearest feasible load with 16 slots is 9.5 %; 18 slots
    /// design with 8 %". Empty when neither is found.
    /// </summary>
    /// <param name="request">The infeasible request.</param>
    /// <param name="design">The designer of a request with another count or load (the taper resynthesised by the caller).</param>
    public static string NearestFeasible(ArrayRequest request, Func<ArrayRequest, object> design)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(design);
        var parts = new List<string>();
        int n = request.Slots.Count;
        if (Smallest(request, design) is { } load)
            parts.Add(string.Create(CultureInfo.InvariantCulture, $"the nearest feasible load with {n} slots is {load * 100:0.##} %"));
        if (request.Taper.Type == TaperType.Given) return string.Join("; ", parts);   // given weights fix the count
        bool Works(int count)
        {
            try { design(request with { Slots = request.Slots with { Count = count } }); return true; }
            catch (Exception e) when (e is InfeasibleDesignException or ConvergenceException) { return false; }
        }
        // Doubling steps, then bisection (feasibility grows with the count: each slot takes a smaller share).
        int bad = n, step = 1, good = -1, limit = Math.Min(4 * n, 1000);
        while (bad + step <= limit)
        {
            if (Works(bad + step)) { good = bad + step; break; }
            bad += step;
            step *= 2;
        }
        if (good > 0)
        {
            while (good - bad > 1)
            {
                int mid = (good + bad) / 2;
                if (Works(mid)) good = mid; else bad = mid;
            }
            parts.Add(string.Create(CultureInfo.InvariantCulture, $"{good} slots design with {request.Feed.LoadFraction * 100:0.##} %"));
        }
        return string.Join("; ", parts);
    }

    /// <summary>
    /// The request as it will be designed: with <c>feed.load: auto</c> the load fraction replaced by
    /// <see cref="Smallest(ArrayRequest, IShuntSlotModel, IReadOnlyList{double})"/>; any other request unchanged.
    /// </summary>
    /// <param name="request">The request.</param>
    /// <param name="slot">The slot model.</param>
    /// <param name="amplitudes">Aperture amplitudes, slot 1 first.</param>
    /// <exception cref="InfeasibleDesignException">No load up to <see cref="Largest"/> designs.</exception>
    public static ArrayRequest Resolve(ArrayRequest request, IShuntSlotModel slot, IReadOnlyList<double> amplitudes)
    {
        ArgumentNullException.ThrowIfNull(request);
        if (request.Feed.Type != FeedType.TravellingWave || !request.Feed.AutoLoad) return request;
        var load = Smallest(request, slot, amplitudes) ?? throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
            $"load: auto found no load fraction up to {Largest * 100:0} % with which the {request.Slots.Count} {slot.Name} slots design: change the spacing, the taper or the slot count"));
        return WithLoad(request, load);
    }

    /// <summary>
    /// Runs <paramref name="run"/>; when a travelling-wave request is infeasible, rethrows with the nearest feasible load
    /// and count appended (<see cref="NearestFeasible"/>, designs with <paramref name="design"/>).
    /// </summary>
    /// <typeparam name="T">What <paramref name="run"/> returns.</typeparam>
    /// <param name="request">The request.</param>
    /// <param name="design">Designs a variant of the request (another load or count).</param>
    /// <param name="run">The run.</param>
    public static T Explained<T>(ArrayRequest request, Func<ArrayRequest, object> design, Func<T> run)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(run);
        try { return run(); }
        catch (InfeasibleDesignException e) when (request.Feed.Type == FeedType.TravellingWave)
        {
            string nearest = NearestFeasible(request, design);
            if (nearest.Length == 0)
                throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                    $"{e.Message.TrimEnd('.')}. No load fraction up to {Largest * 100:0} % with {request.Slots.Count} slots designs, nor {request.Feed.LoadFraction * 100:0.##} % with up to {Math.Min(4 * request.Slots.Count, 1000)} slots: change the spacing or the taper."));
            throw new InfeasibleDesignException($"{e.Message.TrimEnd('.')}. Nearest feasible: {nearest}.");
        }
    }
}
