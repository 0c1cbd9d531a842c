using System.Runtime.InteropServices;

namespace Orbitarium.Dft.Libxc;

/// <summary>
/// P/Invoke declarations for the system libxc library (libxc.so.9, e.g. Debian's libxc9, libxc 5.x), loaded
/// on demand. Nothing in Orbitarium's built-in functionals depends on it.
/// </summary>
/// <remarks>S. Lehtola, C. Steigemann, M. J. T. Oliveira &amp; M. A. L. Marques, SoftwareX 7, 1 (2018).
/// Signatures from the library's public header xc.h (version 5).</remarks>
internal static partial class LibxcNative
{
    private const string LibraryName = "libxc.so.9";

    public const int Unpolarized = 1, Polarized = 2;

    private static readonly Lazy<bool> s_available = new(() =>
    {
        if (!NativeLibrary.TryLoad(LibraryName, typeof(LibxcNative).Assembly, null, out var handle)) return false;
        return NativeLibrary.TryGetExport(handle, "xc_func_alloc", out _);
    });

    /// <summary>Whether libxc.so.9 can be loaded on this machine.</summary>
    public static bool IsAvailable => s_available.Value;

    [LibraryImport(LibraryName, EntryPoint = "xc_func_alloc")]
    public static partial IntPtr FuncAlloc();

    [LibraryImport(LibraryName, EntryPoint = "xc_func_init")]
    public static partial int FuncInit(IntPtr func, int functional, int nspin);

    [LibraryImport(LibraryName, EntryPoint = "xc_func_end")]
    public static partial void FuncEnd(IntPtr func);

    [LibraryImport(LibraryName, EntryPoint = "xc_func_free")]
    public static partial void FuncFree(IntPtr func);

    [LibraryImport(LibraryName, EntryPoint = "xc_functional_get_number", StringMarshalling = StringMarshalling.Utf8)]
    public static partial int FunctionalGetNumber(string name);

    [LibraryImport(LibraryName, EntryPoint = "xc_family_from_id")]
    public static partial int FamilyFromId(int id, out int family, out int number);

    [LibraryImport(LibraryName, EntryPoint = "xc_hyb_exx_coef")]
    public static partial double HybridExactExchangeCoefficient(IntPtr func);

    [LibraryImport(LibraryName, EntryPoint = "xc_version_string")]
    public static partial IntPtr VersionString();

    [LibraryImport(LibraryName, EntryPoint = "xc_lda_exc_vxc")]
    public static unsafe partial void LdaExcVxc(IntPtr func, nuint np, double* rho, double* zk, double* vrho);

    [LibraryImport(LibraryName, EntryPoint = "xc_gga_exc_vxc")]
    public static unsafe partial void GgaExcVxc(IntPtr func, nuint np, double* rho, double* sigma, double* zk, double* vrho, double* vsigma);

    /// <summary>libxc family codes (xc.h): LDA 1, GGA 2, hybrid GGA 32, hybrid LDA 128.</summary>
    public const int FamilyLda = 1, FamilyGga = 2, FamilyHybridGga = 32, FamilyHybridLda = 128;
}
