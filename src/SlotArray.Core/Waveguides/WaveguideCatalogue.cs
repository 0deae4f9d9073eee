namespace SlotArray.Core.Waveguides;

/// <summary>Standard rectangular waveguides, WR-650 down to WR-28.</summary>
/// <remarks>
/// Sources: EIA RS-261-B (1979), "Rectangular Waveguides (WR3 to WR2300)", for the WR numbers and inside
/// dimensions in inches; IEC 60153-2 (2016) for the R numbers; the recommended bands from the
/// (RF Cafe waveguide selection chart; scikit-rf <c>skrf/instances.py</c>
/// for WR-51 to WR-28). Dimensions are stored in inches, the standard's unit, so millimetres are exact.
/// </remarks>
public static class WaveguideCatalogue
{
    /// <summary>All standard sizes, largest first.</summary>
    public static IReadOnlyList<StandardWaveguide> All { get; } =
    [
        new("WR-650", "R14", 6.500, 3.250, 1.12, 1.70),
        new("WR-510", "R18", 5.100, 2.550, 1.45, 2.20),
        new("WR-430", "R22", 4.300, 2.150, 1.70, 2.60),
        new("WR-340", "R26", 3.400, 1.700, 2.20, 3.30),
        new("WR-284", "R32", 2.840, 1.340, 2.60, 3.95),
        new("WR-229", "R40", 2.290, 1.145, 3.30, 4.90),
        new("WR-187", "R48", 1.872, 0.872, 3.95, 5.85),
        new("WR-159", "R58", 1.590, 0.795, 4.90, 7.05),
        new("WR-137", "R70", 1.372, 0.622, 5.85, 8.20),
        new("WR-112", "R84", 1.122, 0.497, 7.05, 10.00),
        new("WR-90", "R100", 0.900, 0.400, 8.20, 12.40),
        new("WR-75", "R120", 0.750, 0.375, 10.00, 15.00),
        new("WR-62", "R140", 0.622, 0.311, 12.40, 18.00),
        new("WR-51", "R180", 0.510, 0.255, 15.00, 22.00),
        new("WR-42", "R220", 0.420, 0.170, 18.00, 26.50),
        new("WR-34", "R260", 0.340, 0.170, 22.00, 33.00),
        new("WR-28", "R320", 0.280, 0.140, 26.50, 40.00),
    ];

    /// <summary>
    /// Finds a standard guide by EIA or IEC name, ignoring case, spaces and the hyphen
    /// ("WR-90", "wr90", "R100"). Returns null when there is none.
    /// </summary>
    public static StandardWaveguide? Find(string name)
    {
        string key = Normalise(name);
        return All.FirstOrDefault(g => Normalise(g.Designation) == key || Normalise(g.Iec) == key);
    }

    private static string Normalise(string s) => s.Replace("-", "").Replace(" ", "").ToUpperInvariant();
}
