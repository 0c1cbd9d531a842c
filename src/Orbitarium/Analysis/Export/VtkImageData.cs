using System.Globalization;
using System.Text;
using System.Xml;

namespace Orbitarium.Analysis;

/// <summary>
/// Writes fields on a 3D <see cref="BoxGrid"/> as VTK XML image data (.vti), an open format read by general-purpose
/// scientific viewers. Coordinates (origin, spacing, atom positions) are in bohr and values in atomic units; the
/// atoms are stored as field data arrays "AtomicNumbers" and "AtomPositionsBohr".
/// </summary>
/// <remarks>Format: Kitware, "VTK File Formats" (XML ImageData; data arrays as ASCII text or inline base64 "binary"
/// with a UInt64 header).</remarks>
public static class VtkImageData
{
    /// <summary>Writes one or more fields that share the same box grid, atomically, as ASCII text.</summary>
    /// <param name="path">Output path, normally ending in ".vti".</param>
    /// <param name="fields">The fields; all on the same <see cref="BoxGrid"/>.</param>
    /// <returns>The full path written.</returns>
    /// <exception cref="OrbitariumInputException">No field, a field not on a box grid, fields on different grids, or an unwritable path.</exception>
    public static string Write(string path, params GridField[] fields) => Write(path, VtkEncoding.Ascii, fields);

    /// <summary>Writes one or more fields that share the same box grid, atomically, in the given encoding
    /// (<see cref="VtkEncoding.Binary"/> for large boxes: exact to the last bit and about 60 % of the ASCII size).</summary>
    /// <param name="path">Output path, normally ending in ".vti".</param>
    /// <param name="encoding">ASCII text or base64 binary data arrays.</param>
    /// <param name="fields">The fields; all on the same <see cref="BoxGrid"/>.</param>
    /// <returns>The full path written.</returns>
    /// <exception cref="OrbitariumInputException">No field, a field not on a box grid, fields on different grids, or an unwritable path.</exception>
    public static string Write(string path, VtkEncoding encoding, params GridField[] fields)
    {
        ArgumentNullException.ThrowIfNull(fields);
        if (fields.Length == 0) throw new OrbitariumInputException("Give at least one field to write.");
        if (fields[0].Grid is not BoxGrid box)
            throw new OrbitariumInputException("VTK image data needs a field on a 3D box grid (BoxGrid); evaluate the quantity on a box first.");
        foreach (var f in fields)
            if (!ReferenceEquals(f.Grid, box))
                throw new OrbitariumInputException("All fields written to one .vti file must share the same box grid.");
        return AtomicFile.Write(path, stream => WriteTo(stream, box, fields, encoding));
    }

    private static void WriteTo(Stream stream, BoxGrid box, GridField[] fields, VtkEncoding encoding)
    {
        var settings = new XmlWriterSettings { Indent = true, Encoding = new UTF8Encoding(false) };
        using var w = XmlWriter.Create(stream, settings);
        var inv = CultureInfo.InvariantCulture;
        var molecule = fields[0].Molecule;
        w.WriteStartDocument();
        w.WriteStartElement("VTKFile");
        w.WriteAttributeString("type", "ImageData");
        w.WriteAttributeString("version", "1.0");
        w.WriteAttributeString("byte_order", "LittleEndian");
        w.WriteAttributeString("header_type", "UInt64");
        w.WriteStartElement("ImageData");
        string extent = string.Create(inv, $"0 {box.CountX - 1} 0 {box.CountY - 1} 0 {box.CountZ - 1}");
        w.WriteAttributeString("WholeExtent", extent);
        w.WriteAttributeString("Origin", string.Create(inv, $"{box.OriginBohr.X:R} {box.OriginBohr.Y:R} {box.OriginBohr.Z:R}"));
        w.WriteAttributeString("Spacing", string.Create(inv, $"{box.SpacingBohr:R} {box.SpacingBohr:R} {box.SpacingBohr:R}"));

        w.WriteStartElement("FieldData");
        WriteArray(w, "Int32", "AtomicNumbers", 1, molecule.AtomCount, molecule.Atoms.Select(a => a.NuclearCharge.ToString(inv)));
        WriteArray(w, "Float64", "AtomPositionsBohr", 3, molecule.AtomCount,
            molecule.Atoms.Select(a => string.Create(inv, $"{a.PositionBohr.X:R} {a.PositionBohr.Y:R} {a.PositionBohr.Z:R}")));
        w.WriteEndElement();

        w.WriteStartElement("Piece");
        w.WriteAttributeString("Extent", extent);
        w.WriteStartElement("PointData");
        w.WriteAttributeString("Scalars", SafeName(fields[0].Quantity));
        foreach (var f in fields)
        {
            var values = f.ToArray();
            if (encoding == VtkEncoding.Binary) WriteBinaryArray(w, SafeName(f.Quantity), values);
            else WriteArray(w, "Float64", SafeName(f.Quantity), 1, values.Length, values.Select(v => v.ToString("G10", inv)));
        }
        w.WriteEndElement();
        w.WriteStartElement("CellData");
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteEndElement();
        w.WriteEndDocument();
    }

    private static void WriteArray(XmlWriter w, string type, string name, int components, int tuples, IEnumerable<string> items)
    {
        w.WriteStartElement("DataArray");
        w.WriteAttributeString("type", type);
        w.WriteAttributeString("Name", name);
        if (components > 1) w.WriteAttributeString("NumberOfComponents", components.ToString(CultureInfo.InvariantCulture));
        w.WriteAttributeString("NumberOfTuples", tuples.ToString(CultureInfo.InvariantCulture));
        w.WriteAttributeString("format", "ascii");
        var sb = new StringBuilder();
        int k = 0;
        foreach (var s in items)
        {
            sb.Append(s).Append(++k % 6 == 0 ? '\n' : ' ');
            if (sb.Length > 1 << 16) { w.WriteString(sb.ToString()); sb.Clear(); }
        }
        w.WriteString(sb.ToString());
        w.WriteEndElement();
    }

    private static void WriteBinaryArray(XmlWriter w, string name, double[] values)
    {
        w.WriteStartElement("DataArray");
        w.WriteAttributeString("type", "Float64");
        w.WriteAttributeString("Name", name);
        w.WriteAttributeString("NumberOfTuples", values.Length.ToString(CultureInfo.InvariantCulture));
        w.WriteAttributeString("format", "binary");
        // One base64 block: the byte count as UInt64, then the doubles, little-endian.
        var bytes = new byte[8 + 8 * values.Length];
        System.Buffers.Binary.BinaryPrimitives.WriteUInt64LittleEndian(bytes, (ulong)(8 * values.Length));
        for (int i = 0; i < values.Length; i++)
            System.Buffers.Binary.BinaryPrimitives.WriteDoubleLittleEndian(bytes.AsSpan(8 + 8 * i), values[i]);
        w.WriteBase64(bytes, 0, bytes.Length);
        w.WriteEndElement();
    }

    private static string SafeName(string quantity)
    {
        var sb = new StringBuilder();
        foreach (char c in quantity) sb.Append(char.IsLetterOrDigit(c) || c is '-' or '.' ? c : '_');
        return sb.Length == 0 ? "values" : sb.ToString();
    }
}
