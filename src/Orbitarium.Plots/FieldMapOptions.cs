namespace Orbitarium.Plots;

/// <summary>How a map of a quantity in a plane is drawn. Immutable; change with <c>with</c>.</summary>
public sealed record FieldMapOptions
{
    /// <summary>The defaults: 800 pixels wide, height from the plane's aspect, contours on, automatic colour range and levels.</summary>
    public static FieldMapOptions Default { get; } = new();

    /// <summary>Image width in pixels (default 800).</summary>
    public int WidthPixels { get; init; } = 800;

    /// <summary>Image height in pixels; null (the default) fits the plane's aspect ratio.</summary>
    public int? HeightPixels { get; init; }

    /// <summary>Title; null uses the field's quantity name.</summary>
    public string? Title { get; init; }

    /// <summary>Whether contour lines are drawn over the colour map (default true).</summary>
    public bool ShowContours { get; init; } = true;

    /// <summary>Contour levels in the field's unit; null picks a geometric series: ±0.02·2^k (signed quantities; the
    /// zero contour drawn dashed) or 0.001·2^k bohr⁻³ (densities), k ≥ 0, below the largest value.</summary>
    public IReadOnlyList<double>? ContourLevels { get; init; }

    /// <summary>Largest magnitude of the colour scale; null uses the field's largest |value| (signed quantities are
    /// always centred on zero).</summary>
    public double? ColorLimit { get; init; }

    /// <summary>Atoms farther than this from the plane (Å) are drawn hollow; default 0.3 Å.</summary>
    public double InPlaneToleranceAngstrom { get; init; } = 0.3;
}
