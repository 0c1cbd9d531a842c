using MathNet.Numerics.LinearAlgebra;
using Orbitarium.BasisSets;
using Orbitarium.Chemistry;

namespace Orbitarium.Shell.Repl.Rendering;

/// <summary>The renderers every session starts with; add new built-in ones here.</summary>
internal static class BuiltInRenderers
{
    public static void AddTo(ValueRendererRegistry registry)
    {
        registry.Register<Molecule>(MoleculeRenderer.Render);
        registry.Register<Matrix<double>>(MatrixRenderer.Render);
        registry.Register<Vector<double>>(MatrixRenderer.RenderVector);
        registry.Register<MolecularBasis>(MolecularBasisRenderer.Render);
        registry.Register<Orbitarium.Scf.ScfResult>(ScfResultRenderer.Render);
        registry.Register<Orbitarium.Plots.PlotFile>(PlotFileRenderer.Render);
    }
}
