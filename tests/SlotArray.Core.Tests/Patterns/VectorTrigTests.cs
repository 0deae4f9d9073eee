using System.Runtime.Intrinsics;
using SlotArray.Core.Patterns;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Patterns;

/// <summary>The vector sine/cosine against Math.Sin/Math.Cos (the runtime's correctly rounded-ish libm).</summary>
public class VectorTrigTests
{
    [Fact]
    public void Sin_and_cos_agree_with_the_scalar_library_over_array_phases()
    {
        var rng = new Random(5);
        double worst = 0;
        for (int t = 0; t < 20000; t++)
        {
            double scale = t % 4 == 0 ? 10 : t % 4 == 1 ? 1e3 : t % 4 == 2 ? 3e4 : 1;
            var x = Vector256.Create(scale * (2 * rng.NextDouble() - 1), scale * (2 * rng.NextDouble() - 1), -Math.PI / 2, Math.PI / 4 * (t % 9));
            var (s, c) = VectorTrig.SinCos(x);
            for (int i = 0; i < 4; i++)
            {
                worst = Math.Max(worst, Math.Abs(s[i] - Math.Sin(x[i])));
                worst = Math.Max(worst, Math.Abs(c[i] - Math.Cos(x[i])));
            }
        }
        // Reduction error grows like |x|·ε: at |x| = 3e4, about 3e4 · 1.1e-16 ≈ 4e-12.
        Check.Absolute(0, worst, 1e-11, "System.Math.Sin/Cos");
    }
}
