using System.Runtime.InteropServices;
using Orbitarium.Dft.Functionals;

namespace Orbitarium.Dft.Libxc;

/// <summary>
/// A functional component evaluated by the system libxc library (libxc.so.9) through P/Invoke: offers libxc's
/// LDA and GGA functionals by their libxc number or name, where the library is installed.
/// </summary>
/// <remarks>Optional back-end; Orbitarium's own components never need it. libxc: Lehtola et al., SoftwareX 7, 1 (2018).
/// For a libxc hybrid, only the semi-local part is evaluated here; add its <see cref="ExactExchangeFraction"/> to
/// the composed functional. Instances are safe to use from several threads (each call initialises its own handle).</remarks>
public sealed class LibxcFunctionalComponent : FunctionalComponent
{
    private readonly int _family;

    private LibxcFunctionalComponent(int id, string name, int family, double exx)
    {
        LibxcId = id;
        Name = name;
        _family = family;
        ExactExchangeFraction = exx;
    }

    /// <summary>Whether libxc.so.9 can be loaded on this machine.</summary>
    public static bool IsLibraryAvailable => LibxcNative.IsAvailable;

    /// <summary>The libxc version string, or null when the library is absent.</summary>
    public static string? LibraryVersion => IsLibraryAvailable ? Marshal.PtrToStringUTF8(LibxcNative.VersionString()) : null;

    /// <summary>The libxc functional number, e.g. 106 for B88.</summary>
    public int LibxcId { get; }

    /// <inheritdoc />
    public override string Name { get; }

    /// <inheritdoc />
    public override bool IsGradientCorrected => _family is LibxcNative.FamilyGga or LibxcNative.FamilyHybridGga;

    /// <inheritdoc />
    public override string Source => $"libxc functional {LibxcId}";

    /// <summary>Exact-exchange fraction libxc reports for a hybrid (0 otherwise).</summary>
    public double ExactExchangeFraction { get; }

    /// <summary>Creates the component for a libxc functional name, e.g. "gga_x_b88" or "hyb_gga_xc_b3lyp".</summary>
    /// <exception cref="OrbitariumInputException">libxc is not installed or does not know the name.</exception>
    public static LibxcFunctionalComponent Create(string libxcName)
    {
        ArgumentNullException.ThrowIfNull(libxcName);
        RequireLibrary();
        int id = LibxcNative.FunctionalGetNumber(libxcName);
        if (id <= 0) throw new OrbitariumInputException($"libxc does not know a functional named \"{libxcName}\".");
        return Create(id, libxcName);
    }

    /// <summary>Creates the component for a libxc functional number, e.g. 106 (GGA_X_B88).</summary>
    /// <exception cref="OrbitariumInputException">libxc is not installed, does not know the number, or the functional is not LDA/GGA.</exception>
    public static LibxcFunctionalComponent Create(int libxcId, string? name = null)
    {
        RequireLibrary();
        if (LibxcNative.FamilyFromId(libxcId, out int family, out _) < 0)
            throw new OrbitariumInputException($"libxc does not know functional number {libxcId}.");
        if (family is not (LibxcNative.FamilyLda or LibxcNative.FamilyGga or LibxcNative.FamilyHybridGga or LibxcNative.FamilyHybridLda))
            throw new OrbitariumInputException($"libxc functional {libxcId} is not of the LDA or GGA kind; only those are supported.");
        double exx = 0;
        var h = Init(libxcId, LibxcNative.Unpolarized);
        try { if (family is LibxcNative.FamilyHybridGga or LibxcNative.FamilyHybridLda) exx = LibxcNative.HybridExactExchangeCoefficient(h); }
        finally { Release(h); }
        if (family == LibxcNative.FamilyHybridLda) family = LibxcNative.FamilyLda;
        return new LibxcFunctionalComponent(libxcId, name ?? $"libxc:{libxcId}", family, exx);
    }

    private static void RequireLibrary()
    {
        if (!IsLibraryAvailable)
            throw new OrbitariumInputException("The libxc library (libxc.so.9) is not installed; install it (Debian: apt-get install libxc9) or use a built-in functional.");
    }

    private static IntPtr Init(int id, int nspin)
    {
        var h = LibxcNative.FuncAlloc();
        if (LibxcNative.FuncInit(h, id, nspin) != 0)
        {
            LibxcNative.FuncFree(h);
            throw new OrbitariumInputException($"libxc could not initialise functional {id}.");
        }
        return h;
    }

    private static void Release(IntPtr h)
    {
        LibxcNative.FuncEnd(h);
        LibxcNative.FuncFree(h);
    }

    /// <inheritdoc />
    public override FunctionalPointValue Evaluate(double rhoAlpha, double rhoBeta, double sigmaAlphaAlpha = 0, double sigmaAlphaBeta = 0, double sigmaBetaBeta = 0)
    {
        var batch = new XcPointBatch(1, true) { Count = 1 };
        batch.RhoA[0] = rhoAlpha; batch.RhoB[0] = rhoBeta;
        batch.SigmaAA[0] = sigmaAlphaAlpha; batch.SigmaAB[0] = sigmaAlphaBeta; batch.SigmaBB[0] = sigmaBetaBeta;
        Accumulate(batch, 1);
        return new FunctionalPointValue(batch.EnergyDensity[0], batch.VRhoA[0], batch.VRhoB[0], batch.VSigmaAA[0], batch.VSigmaAB[0], batch.VSigmaBB[0]);
    }

    /// <inheritdoc />
    public override UnpolarizedFunctionalPointValue EvaluateUnpolarized(double rho, double sigma = 0)
    {
        var batch = new XcPointBatch(1, false) { Count = 1 };
        batch.RhoA[0] = rho; batch.SigmaAA[0] = sigma;
        Accumulate(batch, 1);
        return new UnpolarizedFunctionalPointValue(batch.EnergyDensity[0], batch.VRhoA[0], batch.VSigmaAA[0]);
    }

    internal override unsafe void Accumulate(XcPointBatch batch, double weight)
    {
        int n = batch.Count;
        if (n == 0) return;
        bool pol = batch.SpinPolarized, gga = IsGradientCorrected;
        int ns = pol ? 2 : 1, nsig = pol ? 3 : 1;
        var rho = new double[ns * n]; var sigma = new double[nsig * n];
        var zk = new double[n]; var vrho = new double[ns * n]; var vsigma = new double[nsig * n];
        for (int p = 0; p < n; p++)
        {
            if (pol)
            {
                rho[2 * p] = batch.RhoA[p]; rho[2 * p + 1] = batch.RhoB[p];
                sigma[3 * p] = batch.SigmaAA[p]; sigma[3 * p + 1] = batch.SigmaAB[p]; sigma[3 * p + 2] = batch.SigmaBB[p];
            }
            else { rho[p] = batch.RhoA[p]; sigma[p] = batch.SigmaAA[p]; }
        }
        var h = Init(LibxcId, pol ? LibxcNative.Polarized : LibxcNative.Unpolarized);
        try
        {
            fixed (double* pr = rho, ps = sigma, pz = zk, pv = vrho, pvs = vsigma)
            {
                if (gga) LibxcNative.GgaExcVxc(h, (nuint)n, pr, ps, pz, pv, pvs);
                else LibxcNative.LdaExcVxc(h, (nuint)n, pr, pz, pv);
            }
        }
        finally { Release(h); }
        for (int p = 0; p < n; p++)
        {
            double total = pol ? rho[2 * p] + rho[2 * p + 1] : rho[p];
            batch.EnergyDensity[p] += weight * zk[p] * total;
            if (pol)
            {
                batch.VRhoA[p] += weight * vrho[2 * p]; batch.VRhoB[p] += weight * vrho[2 * p + 1];
                if (gga)
                {
                    batch.VSigmaAA[p] += weight * vsigma[3 * p]; batch.VSigmaAB[p] += weight * vsigma[3 * p + 1];
                    batch.VSigmaBB[p] += weight * vsigma[3 * p + 2];
                }
            }
            else
            {
                batch.VRhoA[p] += weight * vrho[p];
                if (gga) batch.VSigmaAA[p] += weight * vsigma[p];
            }
        }
    }
}
