namespace SlotArray.Core.Waveguides;

/// <summary>A wall metal: a name and its DC conductivity at room temperature.</summary>
/// <param name="Name">Lower-case name as written in a spec (e.g. "aluminium").</param>
/// <param name="Conductivity">Conductivity σ, S/m; &gt; 0.</param>
/// <param name="Source">Where the value comes from, or "from memory".</param>
public sealed record Metal(string Name, double Conductivity, string Source)
{
    /// <summary>Annealed copper, 100 % IACS = 58.0 MS/m.</summary>
    public static readonly Metal Copper = new("copper", 5.80e7,
        "International Annealed Copper Standard, 100 % IACS = 1/1.7241 µΩ·cm (IEC 60028, from memory)");
    /// <summary>Pure aluminium, ≈ 2.65 µΩ·cm at 20 °C.</summary>
    public static readonly Metal Aluminium = new("aluminium", 3.77e7,
        "CRC Handbook of Chemistry and Physics, resistivity of Al 2.65 µΩ·cm at 20 °C (from memory)");
    /// <summary>Aluminium alloy 6061-T6, ≈ 43 % IACS.</summary>
    public static readonly Metal Aluminium6061 = new("6061", 2.5e7,
        "ASM Handbook vol. 2, 6061-T6 about 43 % IACS (from memory)");
    /// <summary>Cartridge brass (C26000), ≈ 28 % IACS.</summary>
    public static readonly Metal Brass = new("brass", 1.6e7,
        "ASM Handbook vol. 2, C26000 about 28 % IACS (from memory)");
    /// <summary>Silver, ≈ 1.59 µΩ·cm at 20 °C.</summary>
    public static readonly Metal Silver = new("silver", 6.29e7,
        "CRC Handbook of Chemistry and Physics, resistivity of Ag 1.59 µΩ·cm at 20 °C (from memory)");

    /// <summary>Every metal the spec can name.</summary>
    public static IReadOnlyList<Metal> All { get; } = [Copper, Aluminium, Aluminium6061, Brass, Silver];

    /// <summary>Other names accepted for a metal (lower case), each with the <see cref="Name"/> it stands for.</summary>
    public static IReadOnlyList<KeyValuePair<string, string>> Aliases { get; } =
    [
        new("aluminum", "aluminium"), new("al", "aluminium"), new("6061-t6", "6061"), new("al-6061", "6061"),
        new("aluminium-6061", "6061"), new("cu", "copper"), new("ag", "silver"),
    ];

    /// <summary>Finds a metal by name (case-insensitive; also accepts the <see cref="Aliases"/>, e.g. "aluminum" and "al-6061").</summary>
    public static Metal? Find(string name)
    {
        string n = name.Trim().ToLowerInvariant();
        n = Aliases.FirstOrDefault(p => p.Key == n).Value ?? n;
        return All.FirstOrDefault(m => m.Name == n);
    }
}
