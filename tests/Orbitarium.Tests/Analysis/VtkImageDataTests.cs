using System.Xml.Linq;
using Orbitarium.Analysis;
using Orbitarium.Chemistry;
using Orbitarium.Tests.Plots;

namespace Orbitarium.Tests.Analysis;

public class VtkImageDataTests
{
    [Fact]
    public void Writes_well_formed_image_data_with_the_atoms()
    {
        using var dir = new PlotTestFolder();
        var r = AnalysisSystems.DihydrogenRhfSto3g;
        var box = BoxGrid.AroundMolecule(r.Molecule, 1.0, 0.25);
        var rho = ScfFields.Density(r, box);
        var path = VtkImageData.Write(dir.File("h2.vti"), rho, ScfFields.Orbital(r, 1, box));
        // VTK XML ImageData layout (Kitware, "VTK File Formats").
        var doc = XDocument.Load(path);
        var image = doc.Root!.Element("ImageData")!;
        Assert.Equal("ImageData", doc.Root.Attribute("type")!.Value);
        Assert.Equal($"0 {box.CountX - 1} 0 {box.CountY - 1} 0 {box.CountZ - 1}", image.Attribute("WholeExtent")!.Value);
        var arrays = image.Descendants("DataArray").ToList();
        Assert.Equal("1 1", string.Join(" ", arrays.Single(a => a.Attribute("Name")!.Value == "AtomicNumbers").Value.Split([' ', '\n'], StringSplitOptions.RemoveEmptyEntries)));
        var values = arrays.Single(a => a.Attribute("Name")!.Value == "electron_density").Value.Split([' ', '\n'], StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(box.PointCount, values.Length);
        Assert.Empty(Directory.GetFiles(dir.Path, "*.tmp"));
    }

    [Fact]
    public void Binary_arrays_hold_the_values_exactly_in_less_space()
    {
        // VTK XML "binary" data arrays (Kitware, "VTK File Formats"): base64 of a header (UInt64 byte count, as declared
        // by header_type) followed by the raw little-endian numbers.
        using var dir = new PlotTestFolder();
        var r = AnalysisSystems.DihydrogenRhfSto3g;
        var box = BoxGrid.AroundMolecule(r.Molecule, 1.0, 0.25);
        var rho = ScfFields.Density(r, box);
        var binary = VtkImageData.Write(dir.File("h2-binary.vti"), VtkEncoding.Binary, rho);
        var ascii = VtkImageData.Write(dir.File("h2-ascii.vti"), rho);
        var doc = XDocument.Load(binary);
        Assert.Equal("UInt64", doc.Root!.Attribute("header_type")!.Value);
        var array = doc.Descendants("DataArray").Single(a => a.Attribute("Name")!.Value == "electron_density");
        Assert.Equal("binary", array.Attribute("format")!.Value);
        byte[] bytes = Convert.FromBase64String(array.Value.Trim());
        var expected = rho.ToArray();
        Assert.Equal((ulong)(8 * expected.Length), BitConverter.ToUInt64(bytes, 0));
        for (int i = 0; i < expected.Length; i++) Assert.Equal(expected[i], BitConverter.ToDouble(bytes, 8 + 8 * i));
        // Base64 takes 32/3 characters per double against about 17 for "G10" text and a separator.
        Assert.True(new FileInfo(binary).Length < 0.75 * new FileInfo(ascii).Length);
    }

    [SkippableFact]
    public void The_reference_VTK_reader_reads_both_encodings_back()
    {
        // The VTK library itself (Debian python3-vtk9, vtkXMLImageDataReader) is the reference reader of the format.
        // Binary arrays come back bit for bit; ASCII ones to the 10 significant digits written.
        const string python = "/usr/bin/python3";
        Skip.IfNot(File.Exists(python) && RunPython(python, "import vtk") is { ExitCode: 0 },
            "the VTK Python module is not installed (apt-get install python3-vtk9)");
        using var dir = new PlotTestFolder();
        var r = AnalysisSystems.DihydrogenRhfSto3g;
        var box = BoxGrid.AroundMolecule(r.Molecule, 1.0, 0.25);
        var rho = ScfFields.Density(r, box);
        var expected = rho.ToArray();
        foreach (var (encoding, tolerance) in new[] { (VtkEncoding.Binary, 0.0), (VtkEncoding.Ascii, 1e-9) })
        {
            string path = VtkImageData.Write(dir.File($"h2-{encoding}.vti"), encoding, rho);
            string script = "import vtk\nr = vtk.vtkXMLImageDataReader()\nr.SetFileName(" + Quote(path) + ")\nr.Update()\n" +
                            "img = r.GetOutput()\na = img.GetPointData().GetArray('electron_density')\n" +
                            "print(*img.GetDimensions())\nprint(*img.GetSpacing())\n" +
                            "print('\\n'.join(repr(a.GetValue(i)) for i in range(a.GetNumberOfTuples())))\n";
            var (code, text) = RunPython(python, script);
            Assert.True(code == 0, text);
            var lines = text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
            Assert.Equal($"{box.CountX} {box.CountY} {box.CountZ}", lines[0]);
            Assert.Equal(box.SpacingBohr, double.Parse(lines[1].Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture), 1e-14);
            Assert.Equal(expected.Length, lines.Length - 2);
            for (int i = 0; i < expected.Length; i++)
            {
                double read = double.Parse(lines[i + 2], System.Globalization.CultureInfo.InvariantCulture);
                Assert.True(Math.Abs(read - expected[i]) <= tolerance * Math.Abs(expected[i]), $"{encoding} value {i}: wrote {expected[i]:R}, read {read:R}");
            }
        }
    }

    private static string Quote(string s) => "'" + s.Replace("\\", "\\\\").Replace("'", "\\'") + "'";

    private static (int ExitCode, string Output) RunPython(string python, string script)
    {
        var start = new System.Diagnostics.ProcessStartInfo(python) { RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true };
        start.ArgumentList.Add("-");
        using var process = System.Diagnostics.Process.Start(start)!;
        process.StandardInput.Write(script);
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        string stderr = process.StandardError.ReadToEnd();
        process.WaitForExit(60_000);
        return (process.ExitCode, stdout.Result + stderr);
    }

    [Fact]
    public void A_field_on_a_plane_is_refused()
    {
        var m = AnalysisSystems.Dihydrogen(0.74);
        var plane = PlaneGrid.ContainingBond(m, 0, 1);
        var f = new GridField(plane, m, new double[plane.PointCount], "zero", "", false);
        Assert.Throws<OrbitariumInputException>(() => VtkImageData.Write("x.vti", f));
    }

    [Fact]
    public void An_unwritable_path_gives_a_clear_message_and_leaves_nothing()
    {
        var m = AnalysisSystems.Dihydrogen(0.74);
        var box = BoxGrid.AroundMolecule(m, 0.5, 0.5);
        var f = new GridField(box, m, new double[box.PointCount], "zero", "", false);
        var e = Assert.Throws<OrbitariumInputException>(() => VtkImageData.Write("/nonexistent-folder-xyz/a.vti", f));
        Assert.Contains("does not exist", e.Message);
    }
}
