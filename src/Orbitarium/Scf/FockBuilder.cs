using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;

namespace Orbitarium.Scf;

/// <summary>Builds the spin Fock (or Kohn–Sham) matrices and the energy parts from α and β densities.</summary>
/// <remarks>F^σ = H + J[D^α + D^β] − x K[D^σ] + V_xc^σ, with x the exact-exchange fraction (1 for Hartree–Fock).
/// E = Σ D·H + ½ Σ D·J − ½ x Σ_σ D^σ·K^σ + E_xc (Szabo &amp; Ostlund eqs. 3.184 and 3.348).
/// For an integral-direct kernel J and K are built incrementally (<see cref="IncrementalCoulombExchange"/>) unless
/// <paramref name="incremental"/> is false.</remarks>
internal sealed class FockBuilder(MolecularBasis basis, ScfIntegrals integrals, IExchangeCorrelationPotential? xc, bool closedShell, bool spinPolarized,
    bool incremental = false)
{
    private readonly IncrementalCoulombExchange _coulombExchange = new(integrals.Kernel, incremental);

    /// <summary>Whether the last build added J/K increments to stored matrices rather than building them in full.</summary>
    public bool LastBuildWasIncremental => _coulombExchange.LastBuildWasIncremental;

    /// <summary>Makes the next build a full one.</summary>
    public void RequestFullBuild() => _coulombExchange.RequestFullBuild();

    public FockMatrices Build(Matrix<double> densityAlpha, Matrix<double> densityBeta, CancellationToken cancellationToken)
    {
        double x = xc?.ExactExchangeFraction ?? 1.0;
        bool withExchange = x != 0;
        var h = integrals.CoreHamiltonian;
        Matrix<double> fa, fb;
        double e1, e2, exc = 0;
        string? description = null;
        if (closedShell)
        {
            var jk = _coulombExchange.Build([densityAlpha], withExchange, cancellationToken);
            var j = jk.Coulomb[0];
            fa = h + j.Multiply(2);
            e1 = 2 * Dot(densityAlpha, h);
            e2 = 2 * Dot(densityAlpha, j);
            if (withExchange)
            {
                var k = jk.Exchange![0];
                fa = fa - k.Multiply(x);
                e2 -= x * Dot(densityAlpha, k);
            }
            if (xc is not null)
            {
                var c = xc.Evaluate(basis, densityAlpha, densityAlpha, false, cancellationToken);
                fa = fa + c.PotentialAlpha;
                exc = c.EnergyHartree;
                description = c.Description;
            }
            fb = fa;
        }
        else
        {
            var jk = _coulombExchange.Build([densityAlpha, densityBeta], withExchange, cancellationToken);
            var jt = jk.Coulomb[0] + jk.Coulomb[1];
            var dt = densityAlpha + densityBeta;
            fa = h + jt;
            fb = fa.Clone();
            e1 = Dot(dt, h);
            e2 = 0.5 * Dot(dt, jt);
            if (withExchange)
            {
                var ka = jk.Exchange![0];
                var kb = jk.Exchange![1];
                fa = fa - ka.Multiply(x);
                fb = fb - kb.Multiply(x);
                e2 -= 0.5 * x * (Dot(densityAlpha, ka) + Dot(densityBeta, kb));
            }
            if (xc is not null)
            {
                var c = xc.Evaluate(basis, densityAlpha, densityBeta, spinPolarized, cancellationToken);
                fa = fa + c.PotentialAlpha;
                fb = fb + c.PotentialBeta;
                exc = c.EnergyHartree;
                description = c.Description;
            }
        }
        return new FockMatrices(fa, fb, e1, e2, exc, description);
    }

    /// <summary>Σ_μν A_μν B_μν.</summary>
    public static double Dot(Matrix<double> a, Matrix<double> b)
    {
        var x = a.AsColumnMajorArray() ?? a.ToColumnMajorArray();
        var y = b.AsColumnMajorArray() ?? b.ToColumnMajorArray();
        double s = 0;
        for (int i = 0; i < x.Length; i++) s += x[i] * y[i];
        return s;
    }
}

/// <summary>The spin Fock matrices of one density and the energy parts (hartree).</summary>
internal sealed record FockMatrices(Matrix<double> Alpha, Matrix<double> Beta, double OneElectronEnergy, double TwoElectronEnergy,
    double ExchangeCorrelationEnergy, string? ExchangeCorrelationDescription);
