using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Vectors;

public class DumpReaderTests
{
    [Fact]
    public void Hex_words_are_read_as_twos_complement_at_the_output_width()
    {
        var r = DumpReader.Parse("0003fffe\nfffffffe\n7fffffff\n80000000\n", "d.txt", 32, DumpFormat.Auto);
        Assert.Equal(DumpFormat.Hex, r.Format);
        Assert.Equal([0x3fffe, -2, int.MaxValue, int.MinValue], r.Values!);
        var narrow = DumpReader.Parse("3ffff\n20000\n0x00005\n", "d.txt", 18, DumpFormat.Hex);
        Assert.Equal([-1, -131072, 5], narrow.Values!);
    }

    [Fact]
    public void Signed_decimal_is_detected_and_comments_and_blank_lines_are_skipped()
    {
        var r = DumpReader.Parse("# dut\n-5\n\n  12 \n// end\n0\n", "d.txt", 24, DumpFormat.Auto);
        Assert.Equal(DumpFormat.DecimalText, r.Format);
        Assert.Equal([-5, 12, 0], r.Values!);
    }

    [Fact]
    public void Zero_padded_words_of_exactly_the_hex_width_are_taken_as_hex()
    {
        var r = DumpReader.Parse("00000010\n00000020\n", "d.txt", 32, DumpFormat.Auto);
        Assert.Equal(DumpFormat.Hex, r.Format);
        Assert.Equal([16, 32], r.Values!);
    }

    [Fact]
    public void An_unknown_value_is_reported_with_its_line_number()
    {
        var r = DumpReader.Parse("1\n2\n\nxxxx\n5\n", "dut.txt", 16, DumpFormat.Auto);
        Assert.Null(r.Values);
        var d = Assert.Single(r.Diagnostics);
        Assert.Equal(VectorCodes.DumpUnparsable, d.Code);
        Assert.Equal(4, d.Location.Line);
    }

    [Fact]
    public void Values_outside_the_output_width_are_bad_input()
    {
        Assert.Equal(VectorCodes.DumpOutOfRange, Assert.Single(DumpReader.Parse("40000\n", "d", 18, DumpFormat.Hex).Diagnostics).Code);
        Assert.Equal(VectorCodes.DumpOutOfRange, Assert.Single(DumpReader.Parse("131072\n", "d", 18, DumpFormat.DecimalText).Diagnostics).Code);
        Assert.Empty(DumpReader.Parse("-131072\n", "d", 18, DumpFormat.DecimalText).Diagnostics);
    }

    [Fact]
    public void Comparison_lists_every_differing_pixel_with_the_difference_in_LSB()
    {
        var c = OutputComparison.Compare([1, 2, 3, -4], [1, 3, 3, -6]);
        Assert.Equal(4, c.Compared);
        Assert.Equal([(1, 1), (3, -2)], c.Mismatches.Select(m => (m.Pixel, (int)m.DifferenceLsb)).ToArray());
    }
}
