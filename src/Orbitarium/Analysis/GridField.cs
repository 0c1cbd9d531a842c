using System.Globalization;
using Orbitarium.Chemistry;

namespace Orbitarium.Analysis;

/// <summary>
/// A quantity evaluated on a grid: one value per grid point (atomic units: bohr^{−3/2} for an orbital, bohr⁻³ for a
/// density), with the molecule it belongs to.
/// </summary>
public sealed class GridField
{
    private readonly double[] _values;

    /// <summary>Wraps values computed on a grid.</summary>
    /// <param name="grid">The grid.</param>
    /// <param name="molecule">The molecule (for atoms on pictures and in exports).</param>
    /// <param name="values">One value per grid point, in the grid's point order.</param>
    /// <param name="quantity">What the values are, e.g. "MO 3 (α)" or "electron density".</param>
    /// <param name="unit">Unit of the values, e.g. "bohr⁻³".</param>
    /// <param name="isSigned">True for quantities with both signs (orbitals, differences): maps use a diverging colour scale centred on zero.</param>
    public GridField(IGrid grid, Molecule molecule, double[] values, string quantity, string unit, bool isSigned)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(values);
        if (values.Length != grid.PointCount)
            throw new ArgumentException($"The grid has {grid.PointCount} points but {values.Length} values were given.", nameof(values));
        Grid = grid;
        Molecule = molecule;
        _values = values;
        Quantity = quantity ?? "";
        Unit = unit ?? "";
        IsSigned = isSigned;
    }

    /// <summary>The grid.</summary>
    public IGrid Grid { get; }

    /// <summary>The molecule whose quantity this is.</summary>
    public Molecule Molecule { get; }

    /// <summary>The values in grid point order (do not keep the span beyond the field's life).</summary>
    public ReadOnlySpan<double> Values => _values;

    /// <summary>Value at point <paramref name="index"/>.</summary>
    /// <param name="index">Grid point index.</param>
    public double this[int index] => _values[index];

    /// <summary>What the values are.</summary>
    public string Quantity { get; }

    /// <summary>Unit of the values.</summary>
    public string Unit { get; }

    /// <summary>Whether the quantity takes both signs (diverging colour scale) or is a non-negative density (sequential scale).</summary>
    public bool IsSigned { get; }

    /// <summary>Smallest value.</summary>
    public double Minimum => _values.Length == 0 ? 0 : _values.Min();

    /// <summary>Largest value.</summary>
    public double Maximum => _values.Length == 0 ? 0 : _values.Max();

    /// <summary>A copy of the values.</summary>
    public double[] ToArray() => (double[])_values.Clone();

    /// <summary>The values of a plane grid as a [row v, column u] array (rows along the plane's V axis).</summary>
    /// <exception cref="InvalidOperationException">The grid is not a <see cref="PlaneGrid"/>.</exception>
    public double[,] ToPlaneArray()
    {
        if (Grid is not PlaneGrid plane) throw new InvalidOperationException("Only a field on a plane grid has a 2D array of values.");
        var a = new double[plane.CountV, plane.CountU];
        for (int j = 0; j < plane.CountV; j++)
            for (int i = 0; i < plane.CountU; i++) a[j, i] = _values[j * plane.CountU + i];
        return a;
    }

    /// <summary>The integral over a 3D box, Σ value × voxel volume (a simple Riemann sum; accurate when the
    /// spacing resolves the function and the box holds it).</summary>
    /// <exception cref="InvalidOperationException">The grid is not a <see cref="BoxGrid"/>.</exception>
    public double IntegrateOverBox()
    {
        if (Grid is not BoxGrid box) throw new InvalidOperationException("Only a field on a 3D box grid can be integrated over space.");
        double sum = 0;
        foreach (double v in _values) sum += v;
        return sum * box.VoxelVolumeBohr3;
    }

    /// <summary>A new field with each value multiplied by <paramref name="factor"/>.</summary>
    /// <param name="factor">The factor.</param>
    /// <param name="quantity">Name of the scaled quantity (default: unchanged).</param>
    public GridField Scaled(double factor, string? quantity = null)
    {
        var v = new double[_values.Length];
        for (int i = 0; i < v.Length; i++) v[i] = factor * _values[i];
        return new GridField(Grid, Molecule, v, quantity ?? Quantity, Unit, IsSigned);
    }

    /// <summary>This field minus another on the same grid (a signed difference).</summary>
    /// <param name="other">A field on the same grid.</param>
    /// <param name="quantity">Name of the difference.</param>
    public GridField Minus(GridField other, string? quantity = null)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (!ReferenceEquals(other.Grid, Grid) && other.Grid.PointCount != Grid.PointCount)
            throw new OrbitariumInputException("The two fields lie on different grids; evaluate both on the same grid before subtracting.");
        var v = new double[_values.Length];
        for (int i = 0; i < v.Length; i++) v[i] = _values[i] - other._values[i];
        return new GridField(Grid, Molecule, v, quantity ?? $"{Quantity} − {other.Quantity}", Unit, true);
    }

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"{Quantity} on {Grid.Describe()}: min {Minimum:G4}, max {Maximum:G4} {Unit}");
}
