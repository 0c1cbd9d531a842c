using MathNet.Numerics.LinearAlgebra;
using Orbitarium.Chemistry;
using Orbitarium.Shell.Repl;
using Orbitarium.Shell.Repl.Rendering;
using Spectre.Console;

namespace Orbitarium.Tests.Shell.Repl;

public class RenderingTests
{
    private static string RenderToText(object? value, ConsoleSettings? settings = null, ValueRendererRegistry? registry = null)
    {
        var writer = new StringWriter();
        var console = TestConsoles.Plain(writer);
        console.Write((registry ?? ValueRendererRegistry.CreateDefault()).Render(value, settings ?? new ConsoleSettings()));
        return writer.ToString();
    }

    public class MatrixRenderer
    {
        [Fact]
        public void A_small_matrix_shows_every_element_aligned()
        {
            var m = Matrix<double>.Build.DenseOfArray(new[,] { { 1.0, -0.25 }, { -0.25, 10.5 } });
            string text = RenderToText(m);
            Assert.Contains("2×2 matrix", text);
            Assert.Contains("-0.250000", text);
            Assert.Contains("10.500000", text);
            Assert.DoesNotContain("…", text);
        }

        [Fact]
        public void A_large_matrix_is_truncated_and_says_so()
        {
            var m = Matrix<double>.Build.Dense(30, 25, (i, j) => i + j / 100.0);
            string text = RenderToText(m, new ConsoleSettings { MatrixMaxRows = 5, MatrixMaxColumns = 4 });
            Assert.Contains("30×25 matrix (showing 5×4", text);
            Assert.Contains("…", text);
            Assert.Contains("4.030000", text);
            Assert.DoesNotContain("5.000000", text);
        }
    }

    public class Registry
    {
        private sealed record Figure(string Name);

        [Fact]
        public void A_registered_renderer_is_used_for_its_type()
        {
            var registry = ValueRendererRegistry.CreateDefault().Register<Figure>(f => new Text($"[figure {f.Name}]"));
            Assert.Contains("[figure orbitals]", RenderToText(new Figure("orbitals"), registry: registry));
        }

        [Fact]
        public void Unregistered_values_show_as_CSharp_displays_them()
        {
            Assert.Contains("\"text\"", RenderToText("text"));
            Assert.Contains("int[3] { 1, 2, 3 }", RenderToText(new[] { 1, 2, 3 }));
            Assert.Contains("null", RenderToText(null));
        }

        [Fact]
        public void Library_values_with_their_own_summary_show_it_unwrapped()
        {
            // Results and vectors write their own text; the C# display would wrap it in brackets.
            string text = RenderToText(new Vector3D(1, 2, 3)).Trim();
            Assert.StartsWith("(1.000000, 2.000000, 3.000000)", text);
        }

        [Fact]
        public void A_failing_renderer_falls_back_to_text()
        {
            var registry = new ValueRendererRegistry().Register<Figure>(_ => throw new InvalidOperationException("no terminal"));
            string text = RenderToText(new Figure("x"), registry: registry);
            Assert.Contains("Figure { Name = x }", text);
            Assert.Contains("no terminal", text);
        }
    }

    public class MoleculeRenderer
    {
        [Fact]
        public void Shows_each_atom_in_angstrom_with_charge_and_multiplicity()
        {
            var oh = Molecule.Empty.AddAtom("O", 0, 0, 0).AddAtom("H", 0, 0, 0.97);
            string text = RenderToText(oh);
            Assert.Contains("HO", text);
            Assert.Contains("0.970000", text);
            Assert.Contains("multiplicity 2", text);
            Assert.Contains("9 electrons", text);
        }
    }
}
