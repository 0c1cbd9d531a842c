using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using Spectre.Console;
using Spectre.Console.Rendering;

namespace Orbitarium.Shell.Repl.Rendering;

/// <summary>
/// Shows a matrix as an aligned grid with row and column indices; large matrices show their first
/// <see cref="ConsoleSettings.MatrixMaxRows"/> rows and <see cref="ConsoleSettings.MatrixMaxColumns"/> columns
/// and say how much was left out.
/// </summary>
public static class MatrixRenderer
{
    /// <summary>Renders <paramref name="matrix"/>.</summary>
    public static IRenderable Render(Matrix<double> matrix, ConsoleSettings settings)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        ArgumentNullException.ThrowIfNull(settings);
        int rows = Math.Min(matrix.RowCount, Math.Max(1, settings.MatrixMaxRows));
        int columns = Math.Min(matrix.ColumnCount, Math.Max(1, settings.MatrixMaxColumns));
        bool moreRows = rows < matrix.RowCount, moreColumns = columns < matrix.ColumnCount;
        string format = "F" + Math.Clamp(settings.Decimals, 0, 15).ToString(CultureInfo.InvariantCulture);

        var grid = new Grid();
        grid.AddColumn(new GridColumn().RightAligned().PadRight(2));
        for (int j = 0; j < columns; j++) grid.AddColumn(new GridColumn().RightAligned().PadLeft(1));
        if (moreColumns) grid.AddColumn(new GridColumn().PadLeft(1));

        var header = new List<IRenderable> { new Text("") };
        for (int j = 0; j < columns; j++) header.Add(new Text(j.ToString(CultureInfo.InvariantCulture), new Style(Color.Grey)));
        if (moreColumns) header.Add(new Text("…", new Style(Color.Grey)));
        grid.AddRow([.. header]);

        for (int i = 0; i < rows; i++)
        {
            var cells = new List<IRenderable> { new Text(i.ToString(CultureInfo.InvariantCulture), new Style(Color.Grey)) };
            for (int j = 0; j < columns; j++) cells.Add(new Text(matrix[i, j].ToString(format, CultureInfo.InvariantCulture)));
            if (moreColumns) cells.Add(new Text("…", new Style(Color.Grey)));
            grid.AddRow([.. cells]);
        }
        if (moreRows)
        {
            var cells = new List<IRenderable> { new Text("⋮", new Style(Color.Grey)) };
            for (int j = 0; j < columns + (moreColumns ? 1 : 0); j++) cells.Add(new Text(""));
            grid.AddRow([.. cells]);
        }

        string shape = string.Create(CultureInfo.InvariantCulture, $"{matrix.RowCount}×{matrix.ColumnCount} matrix");
        if (moreRows || moreColumns)
            shape += string.Create(CultureInfo.InvariantCulture, $" (showing {rows}×{columns}; Settings.MatrixMaxRows/MatrixMaxColumns change this)");
        return new Rows(new Text(shape, new Style(Color.Grey)), grid);
    }

    /// <summary>Renders a vector as a one-column matrix.</summary>
    public static IRenderable RenderVector(Vector<double> vector, ConsoleSettings settings)
    {
        ArgumentNullException.ThrowIfNull(vector);
        return Render(vector.ToColumnMatrix(), settings);
    }
}
