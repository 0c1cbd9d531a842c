using Orbitarium.Chemistry;
using Orbitarium.Integrals;

namespace Orbitarium.Tests.Integrals;

/// <summary>Seeded random raw shells for algorithm cross-checks.</summary>
internal static class RandomShells
{
    /// <summary>A contracted raw shell with 1–3 primitives, exponents 0.1–10 bohr⁻², centre within ±1.5 bohr.</summary>
    public static RawShell Create(Random rng, int l, int maxPrimitives = 3)
    {
        int n = 1 + rng.Next(maxPrimitives);
        var exps = new double[n];
        var coefs = new double[n];
        for (int i = 0; i < n; i++)
        {
            exps[i] = 0.1 * Math.Pow(100, rng.NextDouble());
            coefs[i] = 0.2 + rng.NextDouble();
        }
        var c = new Vector3D(3 * rng.NextDouble() - 1.5, 3 * rng.NextDouble() - 1.5, 3 * rng.NextDouble() - 1.5);
        return new RawShell(l, c, exps, coefs);
    }
}
