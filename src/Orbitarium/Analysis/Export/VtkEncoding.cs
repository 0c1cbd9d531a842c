namespace Orbitarium.Analysis;

/// <summary>How <see cref="VtkImageData"/> stores the numbers of its data arrays.</summary>
public enum VtkEncoding
{
    /// <summary>Decimal text (values to 10 significant digits): readable, about 1.6 times the size of binary.</summary>
    Ascii,

    /// <summary>Base64 of the raw little-endian numbers behind a UInt64 byte count (the VTK XML "binary" format):
    /// exact to the last bit (10.7 characters per value against about 17 for ASCII) and faster to read.</summary>
    Binary,
}
