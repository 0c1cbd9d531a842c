namespace Orbitarium.Dft.Functionals;

/// <summary>
/// Density inputs and accumulated functional outputs for a batch of grid points (structure of arrays).
/// Closed shell: <see cref="RhoA"/> holds ρ, <see cref="SigmaAA"/> holds σ = |∇ρ|², and the outputs are
/// <see cref="EnergyDensity"/>, <see cref="VRhoA"/> (∂e/∂ρ) and <see cref="VSigmaAA"/> (∂e/∂σ).
/// </summary>
internal sealed class XcPointBatch
{
    public XcPointBatch(int capacity, bool spinPolarized)
    {
        SpinPolarized = spinPolarized;
        RhoA = new double[capacity]; RhoB = new double[capacity];
        SigmaAA = new double[capacity]; SigmaAB = new double[capacity]; SigmaBB = new double[capacity];
        EnergyDensity = new double[capacity];
        VRhoA = new double[capacity]; VRhoB = new double[capacity];
        VSigmaAA = new double[capacity]; VSigmaAB = new double[capacity]; VSigmaBB = new double[capacity];
    }

    public bool SpinPolarized { get; }
    public int Count { get; set; }
    public int Capacity => RhoA.Length;
    public double[] RhoA, RhoB, SigmaAA, SigmaAB, SigmaBB;
    public double[] EnergyDensity, VRhoA, VRhoB, VSigmaAA, VSigmaAB, VSigmaBB;

    /// <summary>Zeroes the outputs of the first <see cref="Count"/> points.</summary>
    public void ClearOutputs()
    {
        int n = Count;
        Array.Clear(EnergyDensity, 0, n); Array.Clear(VRhoA, 0, n); Array.Clear(VRhoB, 0, n);
        Array.Clear(VSigmaAA, 0, n); Array.Clear(VSigmaAB, 0, n); Array.Clear(VSigmaBB, 0, n);
    }
}
