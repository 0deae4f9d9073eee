using MathNet.Numerics;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;

namespace SlotArray.Core.Prototype;

/// <summary>One slot of a trim plan.</summary>
/// <param name="Slot">Slot number.</param>
/// <param name="CutLength">Equivalent length as cut, m.</param>
/// <param name="Trim">Length to add, m (negative: the slot would have to get shorter, which a trim cannot do).</param>
internal sealed record SlotTrim(int Slot, double CutLength, double Trim)
{
    /// <summary>Whether the slot is too long for a trim to fix (more than 5 µm).</summary>
    public bool TooLong => Trim < -TrimPlan.Resolution;
}

/// <summary>The trim-only fix of the plate: each slot lengthened (never shortened), and what the fitted model then predicts.</summary>
/// <param name="UniformExtension">The common fractional lengthening u that best matches at the design frequency.</param>
/// <param name="Slots">Per slot: the trim (u L_n minus the slot's own fitted error, referred to the cut).</param>
/// <param name="Works">Whether every trim is a lengthening (within <see cref="Resolution"/>).</param>
/// <param name="Verdict">The plain-words verdict.</param>
/// <param name="After">The fitted plate with the trims as made (negative ones left out).</param>
/// <param name="S11AtDesignBefore">|S11| at the design frequency of the fitted plate before trimming, dB.</param>
/// <param name="S11AtDesignAfter">|S11| at the design frequency after trimming, dB.</param>
internal sealed record TrimPlan(double UniformExtension, IReadOnlyList<SlotTrim> Slots, bool Works, string Verdict, PrototypeErrors After,
    double S11AtDesignBefore, double S11AtDesignAfter)
{
    /// <summary>Smallest trim that counts: 5 µm (below any shop's resolution; common practice, no source).</summary>
    public const double Resolution = 5e-6;
}

/// <summary>
/// The trim-only fix: lengthen slot n by t_n = u L_n − ΔL_n/(1 + s_L), which removes its own fitted error ΔL_n and
/// lengthens every slot by the common fraction u; u minimises |S11| at the design frequency on the fitted plate
/// (golden-section search, MathNet <c>FindMinimum.OfScalarFunctionConstrained</c>, over ±3 %). A slot can only get longer:
/// when u &lt; 0 the slots are too long and no trim helps; a slot whose t_n &lt; 0 is left as it is and named.
/// </summary>
internal static class TrimProposal
{
    /// <summary>Proposes the trims of the diagnosed plate.</summary>
    public static TrimPlan Propose(PrototypeDiagnosis diagnosis)
    {
        ArgumentNullException.ThrowIfNull(diagnosis);
        var model = diagnosis.Model;
        var e = diagnosis.Errors;
        var cut = model.AsCut;
        var f0 = cut.DesignFrequency;
        double s = 1 + e.LengthScale;
        PrototypeErrors With(double u, bool clip)
        {
            var dl = cut.Slots.Select((sl, i) =>
            {
                double t = u * sl.Length.Meters - e.SlotLengthErrors[i] / s;
                if (clip && t < 0) t = 0;
                return e.SlotLengthErrors[i] + t * s;
            }).ToArray();
            return e with { SlotLengthErrors = dl };
        }
        double Mag(PrototypeErrors x) => model.Solve(x, f0).S11.Magnitude;
        double best = FindMinimum.OfScalarFunctionConstrained(u => Mag(With(u, false)), -0.03, 0.03, 1e-7);
        var trims = cut.Slots.Select((sl, i) => new SlotTrim(sl.Index, sl.Length.Meters, best * sl.Length.Meters - e.SlotLengthErrors[i] / s)).ToArray();
        var after = With(best, true);
        double before = Db(Mag(e)), afterDb = Db(Mag(after));
        var tooLong = trims.Where(t => t.TooLong).Select(t => t.Slot).ToArray();
        bool works = tooLong.Length == 0;
        string verdict;
        if (best < -TrimPlan.Resolution / cut.Slots.Average(x => x.Length.Meters))
            verdict = FormattableString.Invariant(
                $"the fit says the slots are too long, by {-best * 100:0.###} % on average: a trim can only lengthen a slot, so it cannot help; cut the next plate (below), or cut the next prototype with a larger fabrication.prototype_margin");
        else if (!works)
            verdict = FormattableString.Invariant(
                $"trim every slot as listed, except slot{(tooLong.Length > 1 ? "s" : "")} {string.Join(", ", tooLong)}: {(tooLong.Length > 1 ? "they are" : "it is")} already longer than needed and a trim cannot shorten {(tooLong.Length > 1 ? "them" : "it")}; predicted |S11| at {f0}: {before:0.0} dB now, {afterDb:0.0} dB after the trims");
        else
            verdict = FormattableString.Invariant(
                $"trim-only fix works: lengthen the slots as listed (common lengthening {best * 100:0.###} %); predicted |S11| at {f0}: {before:0.0} dB now, {afterDb:0.0} dB after the trims");
        if (diagnosis.ConductanceScale is { } g && !g.Contains(1))
            verdict += FormattableString.Invariant(
                $". The slots couple {(g.Value - 1) * 100:+0.#;-0.#} % {(g.Value > 1 ? "more" : "less")} than the model: a trim in length cannot change that (it needs new offsets: the next plate)");
        return new TrimPlan(best, trims, works, verdict, after, before, afterDb);
    }

    private static double Db(double magnitude) => 20 * Math.Log10(Math.Max(magnitude, 1e-15));
}
