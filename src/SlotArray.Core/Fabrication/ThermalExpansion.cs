using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>The linear thermal expansion coefficient of a wall metal, with its source.</summary>
/// <param name="Metal">The metal's name as the spec writes it.</param>
/// <param name="Coefficient">Linear expansion coefficient α near room temperature, 1/K.</param>
/// <param name="Source">Where α comes from.</param>
public sealed record ThermalExpansion(string Metal, double Coefficient, string Source)
{
    /// <summary>
    /// The reference temperature of every dimension, 20 °C (ISO 1:2016, "Geometrical product specifications (GPS) —
    /// Standard reference temperature for the specification of geometrical and dimensional properties").
    /// </summary>
    public const double ReferenceTemperatureCelsius = 20;

    private const string Crc = "CRC Handbook of Chemistry and Physics, table \"Thermal expansion of metals and alloys\", α at 20–25 °C (from memory)";
    private const string Asm = "ASM Handbook vol. 2 (1990), properties of wrought alloys, mean α 20–100 °C (from memory)";

    /// <summary>The metals the spec can name (guide.metal) and their α.</summary>
    public static IReadOnlyList<ThermalExpansion> Known { get; } =
    [
        new("copper", 16.5e-6, Crc),
        new("aluminium", 23.1e-6, Crc),
        new("6061", 23.6e-6, Asm),
        new("brass", 19.9e-6, Asm + ", C26000 cartridge brass"),
        new("silver", 18.9e-6, Crc),
    ];

    /// <summary>α of a metal by its spec name (case-insensitive), or null when it is not known (e.g. a tube given only by its conductivity).</summary>
    /// <param name="metalName">The metal's name, e.g. "aluminium".</param>
    public static ThermalExpansion? For(string? metalName)
    {
        if (metalName is null) return null;
        var metal = Waveguides.Metal.Find(metalName);
        return metal is null ? null : Known.FirstOrDefault(k => k.Metal == metal.Name);
    }

    /// <summary>Length change per kelvin of a part of the given length: ΔL/ΔT = α L (linear expansion, small ΔT).</summary>
    /// <param name="length">Length of the part at the reference temperature, ≥ 0.</param>
    public Length ChangePerKelvin(Length length)
    {
        if (!(length.Meters >= 0)) throw new ArgumentOutOfRangeException(nameof(length), length.ToString(), "the length must be zero or positive");
        return Length.FromMeters(Coefficient * length.Meters);
    }
}
