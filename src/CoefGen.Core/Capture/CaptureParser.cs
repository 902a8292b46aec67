using System.Buffers.Binary;
using System.Globalization;
using System.Text;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Capture;

/// <summary>
/// Parses capture bytes into signed codes, checking every code against the ADC of the readout file.
/// CSV: one pixel cycle per line (a stream: one code per line), integers separated by commas, blank
/// lines and lines starting with '#' skipped, and a first line of names (every field starting with a
/// letter) taken as a header. Raw: little-endian words, read as signed for a two's-complement ADC and
/// unsigned for an offset-binary one. Offset-binary codes are converted by subtracting 2^(B-1).
/// </summary>
public static class CaptureParser
{
    /// <summary>Fewest samples accepted: enough for 15 averaged Welch segments of 64 samples.</summary>
    public const int MinimumSamples = 512;

    /// <summary>Fewest pixel cycles accepted in a pixel-synchronous capture.</summary>
    public const int MinimumCycles = 16;

    /// <summary>Errors reported before the parser stops looking (the rest are counted).</summary>
    public const int MaxErrors = 20;

    public static CaptureParseResult Parse(ReadOnlySpan<byte> content, string path, CaptureFormat format, AdcSpec adc)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(format);
        ArgumentNullException.ThrowIfNull(adc);
        if (format.Layout == CaptureLayout.PixelSynchronous && format.CycleLength < 1)
        {
            throw new ArgumentException("a pixel-synchronous capture needs a cycle length >= 1", nameof(format));
        }

        var cycle = format.Layout == CaptureLayout.Stream ? 1 : format.CycleLength;
        var errors = new List<Diagnostic>();
        var skipped = 0;
        void Report(Diagnostic d)
        {
            if (errors.Count < MaxErrors)
            {
                errors.Add(d);
            }
            else
            {
                skipped++;
            }
        }

        var codes = format.Encoding == CaptureEncoding.Csv
            ? ParseCsv(content, path, cycle, adc, Report)
            : ParseRaw(content, path, format.Encoding == CaptureEncoding.Raw16 ? 2 : 4, cycle, adc, Report);

        if (errors.Count == 0)
        {
            CheckSize(codes.Count, cycle, format.Layout, path, Report);
        }

        if (skipped > 0)
        {
            errors.Add(Diagnostic.Error(errors[^1].Code, SourceLocation.FileOnly(path), $"{skipped.ToString(CultureInfo.InvariantCulture)} more errors not shown"));
        }

        return errors.Count > 0
            ? new CaptureParseResult(null, errors)
            : new CaptureParseResult(new SampleCapture(path, format.Layout, cycle, [.. codes]), []);
    }

    private static void CheckSize(int count, int cycle, CaptureLayout layout, string path, Action<Diagnostic> report)
    {
        var rows = count / cycle;
        if (count < MinimumSamples || (layout == CaptureLayout.PixelSynchronous && rows < MinimumCycles))
        {
            var need = layout == CaptureLayout.PixelSynchronous
                ? $"at least {MinimumCycles.ToString(CultureInfo.InvariantCulture)} pixel cycles and {MinimumSamples.ToString(CultureInfo.InvariantCulture)} samples"
                : $"at least {MinimumSamples.ToString(CultureInfo.InvariantCulture)} samples";
            report(Diagnostic.Error(CaptureCodes.TooFewSamples, SourceLocation.FileOnly(path),
                $"the capture holds {count.ToString(CultureInfo.InvariantCulture)} samples ({rows.ToString(CultureInfo.InvariantCulture)} cycles of {cycle.ToString(CultureInfo.InvariantCulture)}); a spectrum needs {need}"));
        }
    }

    private static List<long> ParseCsv(ReadOnlySpan<byte> content, string path, int cycle, AdcSpec adc, Action<Diagnostic> report)
    {
        var codes = new List<long>();
        string text;
        try
        {
            text = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true).GetString(content);
        }
        catch (DecoderFallbackException)
        {
            report(Diagnostic.Error(CaptureCodes.NotNumeric, SourceLocation.FileOnly(path),
                "the capture is not UTF-8 text; give raw captures the extension .i16 or .i32 (or the matching format)"));
            return codes;
        }

        var lineNo = 0;
        var seenData = false;
        foreach (var raw in text.Split('\n'))
        {
            lineNo++;
            var line = raw.TrimEnd('\r').Trim();
            if (line.Length == 0 || line[0] == '#')
            {
                continue;
            }

            var fields = line.Split(',');
            if (!seenData && fields.All(f => f.Trim().Length > 0 && char.IsLetter(f.Trim()[0])))
            {
                seenData = true;
                continue;
            }

            seenData = true;
            if (fields.Length != cycle)
            {
                var expected = cycle == 1 ? "1 code (a stream has one code per line)" : $"{cycle.ToString(CultureInfo.InvariantCulture)} codes (timing.pixel_samples)";
                report(Diagnostic.Error(CaptureCodes.WrongRowLength, new SourceLocation(path, lineNo, 1),
                    $"the row has {fields.Length.ToString(CultureInfo.InvariantCulture)} codes; each row must hold {expected}"));
                continue;
            }

            var column = 1;
            foreach (var field in fields)
            {
                var f = field.Trim();
                var location = new SourceLocation(path, lineNo, column);
                if (!long.TryParse(f, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var code))
                {
                    report(Diagnostic.Error(CaptureCodes.NotNumeric, location,
                        $"\"{Clip(f)}\" is not an integer ADC code"));
                }
                else if (Convert(code, adc, location, report) is { } signed)
                {
                    codes.Add(signed);
                }

                column += field.Length + 1;
            }
        }

        return codes;
    }

    private static List<long> ParseRaw(ReadOnlySpan<byte> content, string path, int width, int cycle, AdcSpec adc, Action<Diagnostic> report)
    {
        var codes = new List<long>(content.Length / width);
        var wordBytes = width * cycle;
        if (content.Length % width != 0 || content.Length % wordBytes != 0)
        {
            var whole = content.Length / wordBytes;
            report(Diagnostic.Error(CaptureCodes.Truncated, SourceLocation.FileOnly(path),
                $"the raw capture has {content.Length.ToString(CultureInfo.InvariantCulture)} bytes, not a whole number of {(cycle == 1 ? "samples" : "pixel cycles")} of {wordBytes.ToString(CultureInfo.InvariantCulture)} bytes ({width.ToString(CultureInfo.InvariantCulture)}-byte codes); it ends {(content.Length - (whole * wordBytes)).ToString(CultureInfo.InvariantCulture)} bytes into cycle {whole.ToString(CultureInfo.InvariantCulture)} (truncated file, wrong word size or wrong cycle length?)"));
            return codes;
        }

        var unsigned = adc.Coding == AdcCoding.OffsetBinary;
        for (var k = 0; k < content.Length / width; k++)
        {
            var bytes = content.Slice(k * width, width);
            long code = width == 2
                ? unsigned ? BinaryPrimitives.ReadUInt16LittleEndian(bytes) : BinaryPrimitives.ReadInt16LittleEndian(bytes)
                : unsigned ? BinaryPrimitives.ReadUInt32LittleEndian(bytes) : BinaryPrimitives.ReadInt32LittleEndian(bytes);

            // Raw data has no lines: the message carries the sample number and byte offset.
            var location = new SourceLocation(path, 0, 0);
            if (Convert(code, adc, location, report, $" at sample {k.ToString(CultureInfo.InvariantCulture)} (byte offset {(k * width).ToString(CultureInfo.InvariantCulture)}, cycle {(k / cycle).ToString(CultureInfo.InvariantCulture)})") is { } signed)
            {
                codes.Add(signed);
            }
        }

        return codes;
    }

    private static long? Convert(long code, AdcSpec adc, SourceLocation location, Action<Diagnostic> report, string where = "")
    {
        var offset = adc.Coding == AdcCoding.OffsetBinary ? 1L << (adc.Bits - 1) : 0L;
        var min = adc.MinCode + offset;
        var max = adc.MaxCode + offset;
        if (code < min || code > max)
        {
            var coding = adc.Coding == AdcCoding.OffsetBinary ? "offset-binary" : "two's-complement";
            report(Diagnostic.Error(CaptureCodes.OutOfRange, location,
                $"code {code.ToString(CultureInfo.InvariantCulture)}{where} is outside the {adc.Bits.ToString(CultureInfo.InvariantCulture)}-bit {coding} range {min.ToString(CultureInfo.InvariantCulture)}..{max.ToString(CultureInfo.InvariantCulture)} of adc.bits / adc.coding"));
            return null;
        }

        return code - offset;
    }

    private static string Clip(string s) => s.Length <= 24 ? s : s[..24] + "...";
}
