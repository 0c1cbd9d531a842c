using Orbitarium.Plots;

namespace Orbitarium.Tests.Plots;

public class TerminalPreviewTests
{
    [Fact]
    public void A_rising_line_fills_the_bottom_left_and_top_right_braille_cells()
    {
        // Unicode braille patterns U+2800–U+28FF: dot 7 (bottom left) is bit 0x40, dot 4 (top right) bit 0x08.
        string text = TerminalPreview.Curves([([0.0, 1.0], [0.0, 1.0])], width: 10, height: 3);
        var rows = text.Split('\n');
        Assert.True((rows[2][rows[2].IndexOf('┤') + 1] - 0x2800 & 0x40) != 0);
        Assert.True((rows[0][rows[0].IndexOf('┤') + 10] - 0x2800 & 0x08) != 0);
    }

    [Fact]
    public void A_signed_map_uses_blocks_for_positive_and_dashes_for_negative_values()
    {
        var map = new double[2, 2] { { 1, -1 }, { 1, -1 } };
        string text = TerminalPreview.Map(map, signed: true, width: 2, height: 2);
        Assert.Equal("█≡\n█≡", text);
    }
}
