using MathNet.Numerics.LinearAlgebra;

namespace Orbitarium.Analysis;

/// <summary>The orbitals of one spin (or the doubly occupied set of a restricted calculation).</summary>
/// <param name="SpinLabel">"" for restricted orbitals, "α" or "β" for unrestricted ones.</param>
/// <param name="Coefficients">N × M coefficients, one orbital per column.</param>
/// <param name="EnergiesHartree">Orbital energies in hartree, one per column.</param>
/// <param name="Occupations">Electrons in each orbital (0..2 restricted, 0..1 unrestricted).</param>
public sealed record OrbitalSet(string SpinLabel, Matrix<double> Coefficients, IReadOnlyList<double> EnergiesHartree, IReadOnlyList<double> Occupations);
