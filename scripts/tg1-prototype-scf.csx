// TIDEGLASS TG-1 water: prototype a method at the prompt. This script takes the overlap S, the core
// Hamiltonian H and the two-electron integrals (ij|kl) from the library, and writes its own small
// closed-shell SCF loop (Roothaan-Hall equations with symmetric orthogonalisation and a core guess; no DIIS).
// It then runs the library's RHF on the same basis: both must agree (the test suite checks to 1e-6 Eh).
//
//   orbitarium run scripts/tg1-prototype-scf.csx [basis]

string basisName = Args.Count > 0 ? Args[0] : "STO-3G";
string xyz = Path.Combine(ScriptDirectory, "..", "examples", "tg1-water.xyz");
var water = Molecule.FromXyzFile(xyz);
var basis = MolecularBasis.Create(water, BasisSetLibrary.Get(basisName));
int n = basis.FunctionCount, occupied = water.ElectronCount / 2;

var S = OneElectronIntegrals.Overlap(basis);
var H = OneElectronIntegrals.CoreHamiltonian(basis);
var eri = ElectronRepulsionTensor.Compute(basis, cancellationToken: Token);

// X = S^(-1/2): symmetric orthogonalisation.
var evd = S.Evd(Symmetricity.Symmetric);
var X = evd.EigenVectors * Matrix<double>.Build.DiagonalOfDiagonalVector(evd.EigenValues.Map(c => 1 / Math.Sqrt(c.Real))) * evd.EigenVectors.Transpose();

Matrix<double> DensityOf(Matrix<double> fock)
{
    var f = X.Transpose() * fock * X;
    var e = f.Evd(Symmetricity.Symmetric);               // eigenvalues come sorted ascending
    var c = X * e.EigenVectors;
    var cOcc = c.SubMatrix(0, n, 0, occupied);
    return 2 * cOcc * cOcc.Transpose();                  // closed shell: two electrons per orbital
}

Matrix<double> FockOf(Matrix<double> d)
{
    var g = Matrix<double>.Build.Dense(n, n);
    for (int i = 0; i < n; i++)
        for (int j = 0; j < n; j++)
        {
            double sum = 0;
            for (int k = 0; k < n; k++)
                for (int l = 0; l < n; l++)
                    sum += d[k, l] * (eri[i, j, k, l] - 0.5 * eri[i, k, j, l]);
            g[i, j] = sum;
        }
    return H + g;
}

var D = DensityOf(H);                                    // core-Hamiltonian guess
double energy = 0, previous = double.NaN;
int iteration = 0;
for (; iteration < 100; iteration++)
{
    Token.ThrowIfCancellationRequested();
    var F = FockOf(D);
    energy = 0.5 * D.PointwiseMultiply(H + F).Enumerate().Sum() + water.NuclearRepulsionEnergyHartree;
    if (Math.Abs(energy - previous) < 1e-10) break;
    previous = energy;
    D = DensityOf(F);
}
Print(FormattableString.Invariant($"prototype SCF: E = {energy:F10} Eh after {iteration} iterations ({n} basis functions, {basisName})"));

var library = water.WithBasis(basisName).RunRhf(Progress, Token);
Print(FormattableString.Invariant($"library RHF:   E = {library.TotalEnergyHartree:F10} Eh after {library.Iterations} iterations"));
Print(FormattableString.Invariant($"difference:    {(energy - library.TotalEnergyHartree):E2} Eh"));
