using System.Text;
using CoefGen.Core.Capture;

namespace CoefGen.Core.Tests.Capture;

public sealed class CaptureParserTests
{
    private static readonly CaptureFormat Csv40 = new(CaptureEncoding.Csv, CaptureLayout.PixelSynchronous, 40);

    private static string Rows(int count, Func<int, string>? row = null) =>
        string.Concat(Enumerable.Range(0, count).Select(r => (row?.Invoke(r) ?? string.Join(",", Enumerable.Repeat("12", 40))) + "\n"));

    private static CaptureParseResult Parse(string text, CaptureFormat format) =>
        CaptureParser.Parse(Encoding.UTF8.GetBytes(text), "cap.csv", format, CaptureFixtures.Bench.Adc);

    [Fact]
    public void A_valid_csv_with_a_header_and_comments_parses()
    {
        var text = "# idle\n" + string.Join(",", Enumerable.Range(0, 40).Select(i => $"s{i}")) + "\n" + Rows(20);
        var r = Parse(text, Csv40);
        Assert.Empty(r.Diagnostics);
        Assert.Equal(20, r.Capture!.Rows);
    }

    [Fact]
    public void A_non_numeric_value_is_located_by_line_and_column()
    {
        var r = Parse(Rows(20, i => i == 4 ? "1,x2," + string.Join(",", Enumerable.Repeat("3", 38)) : string.Join(",", Enumerable.Repeat("3", 40))), Csv40);
        var d = Assert.Single(r.Diagnostics);
        Assert.Equal((CaptureCodes.NotNumeric, 5, 3), (d.Code, d.Location.Line, d.Location.Column));
        Assert.Null(r.Capture);
    }

    [Fact]
    public void A_row_of_the_wrong_length_is_located_by_line()
    {
        var r = Parse(Rows(20, i => string.Join(",", Enumerable.Repeat("3", i == 7 ? 39 : 40))), Csv40);
        var d = Assert.Single(r.Diagnostics);
        Assert.Equal((CaptureCodes.WrongRowLength, 8), (d.Code, d.Location.Line));
    }

    [Fact]
    public void A_code_outside_the_adc_range_is_an_error()
    {
        var r = Parse(Rows(20, i => i == 2 ? "40000," + string.Join(",", Enumerable.Repeat("3", 39)) : string.Join(",", Enumerable.Repeat("3", 40))), Csv40);
        Assert.Equal((CaptureCodes.OutOfRange, 3), (r.Diagnostics[0].Code, r.Diagnostics[0].Location.Line));
    }

    [Fact]
    public void Truncated_raw_data_is_an_error()
    {
        var bytes = new byte[(40 * 2 * 20) + 3];
        var r = CaptureParser.Parse(bytes, "cap.i16", new CaptureFormat(CaptureEncoding.Raw16, CaptureLayout.PixelSynchronous, 40), CaptureFixtures.Bench.Adc);
        Assert.Equal(CaptureCodes.Truncated, Assert.Single(r.Diagnostics).Code);
    }

    [Fact]
    public void Too_few_samples_is_an_error()
    {
        var r = Parse(Rows(5), Csv40);
        Assert.Equal(CaptureCodes.TooFewSamples, Assert.Single(r.Diagnostics).Code);
    }

    [Fact]
    public void Offset_binary_codes_are_centred_and_raw_int32_is_read_little_endian()
    {
        var adc = CaptureFixtures.Bench.Adc with { Coding = CoefGen.Core.Readout.AdcCoding.OffsetBinary };
        var bytes = new byte[4 * 600];
        BitConverter.TryWriteBytes(bytes.AsSpan(0, 4), 32768 + 5);
        var r = CaptureParser.Parse(bytes, "s.i32", new CaptureFormat(CaptureEncoding.Raw32, CaptureLayout.Stream, 1), adc);
        Assert.Empty(r.Diagnostics);
        Assert.Equal(5, r.Capture!.Codes[0]);
        Assert.Equal(-32768, r.Capture.Codes[1]);
    }
}
