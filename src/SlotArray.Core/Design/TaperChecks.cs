namespace SlotArray.Core.Design;

/// <summary>Checks every array designer makes of the taper it is handed, with messages that say what to change.</summary>
internal static class TaperChecks
{
    /// <summary>
    /// At least 2 slots, one finite, non-zero amplitude per slot. Throws <see cref="InfeasibleDesignException"/>.
    /// </summary>
    /// <param name="stick">The stick: its slot count, amplitudes and taper family (named in the message).</param>
    /// <param name="arrayKind">"standing-wave" or "travelling-wave", for the message.</param>
    public static void Require(StickRequest stick, string arrayKind)
    {
        var amplitudes = stick.Amplitudes;
        int n = stick.Count;
        if (n < 2)
            throw new InfeasibleDesignException($"a {arrayKind} array needs at least 2 slots, the request has {n}: set slots.count ≥ 2");
        if (amplitudes.Count != n)
            throw new InfeasibleDesignException(
                $"the taper gives {amplitudes.Count} amplitudes but the array has {n} slots: give {n} weights or set slots.count: {amplitudes.Count}");
        for (int i = 0; i < n; i++)
        {
            double a = amplitudes[i];
            if (!double.IsFinite(a))
                throw new InfeasibleDesignException($"slot {i + 1} has amplitude {a}: the taper weights must be finite numbers");
            if (a == 0)
                throw new InfeasibleDesignException(
                    $"slot {i + 1} has amplitude 0, which needs a slot that does not radiate: remove that slot or give it a non-zero weight ({stick.Taper} taper)");
        }
    }
}
