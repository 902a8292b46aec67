using CoefGen.Cli.Diagnostics;
using CoefGen.Core.Capture;
using CoefGen.Core.Emit;
using CoefGen.Core.Readout;
using CoefGen.Core.Vectors;

namespace CoefGen.Cli.Tests.BadInput;

/// <summary>
/// The command-line and file-system half of the bad-input corpus (issue 15): command-line mistakes, hostile or
/// oversized input files, output destinations that cannot be written, and sweeps that cannot mean what was asked.
/// </summary>
internal static class BadInputCorpus
{
    private const string Ir = "ir_measured.toml";
    private const string Cap = "capture_bench.toml";
    private const string PsdLine = "psd_table = \"ir_measured_psd.csv\"";
    private const string CaptureLine = "capture = \"capture_bench_idle.i16\"";
    private const string VhPath = "path = \"tile7_v3_coefs.vh\"";

    private static readonly string Long = new('a', 300);

    public static IReadOnlyList<BadInputCase> All { get; } =
    [
        // Command line: exit 2, located at the option or command, no type names, no help dump.
        new("command-typo", s => ["desgin", s.Fast], CliCodes.UnknownCommand, _ => "coefgen", Absent: "Usage"),
        new("no-command", _ => [], CliCodes.BadOption, _ => "coefgen", Absent: "Usage"),
        new("readout-argument-missing", _ => ["design"], CliCodes.BadOption, _ => "<readout>"),
        new("unknown-option", s => ["design", s.Fast, "--bogus"], CliCodes.UnknownOption, _ => "--bogus"),
        new("unexpected-argument", s => ["design", s.Fast, "extra"], CliCodes.UnknownOption, _ => "design"),
        new("targets-extra-argument", _ => ["targets", "x"], CliCodes.UnknownOption, _ => "targets"),
        new("seed-not-a-number", s => ["vectors", s.Fast, "--out", s.Path("v"), "--seed", "abc"], CliCodes.BadOption, _ => "--seed", Absent: "System."),
        new("pixels-fraction", s => ["vectors", s.Fast, "--out", s.Path("v"), "--pixels", "1.5"], CliCodes.BadOption, _ => "--pixels", Absent: "System."),
        new("pixels-overflow", s => ["vectors", s.Fast, "--out", s.Path("v"), "--pixels", "99999999999"], CliCodes.BadOption, _ => "--pixels", Absent: "System."),
        new("pixels-zero", s => ["vectors", s.Fast, "--out", s.Path("v"), "--pixels", "0"], VectorCodes.PixelCount, _ => "--pixels"),
        new("vectors-out-missing", s => ["vectors", s.Fast], CliCodes.BadOption, _ => "--out"),
        new("report-out-missing", s => ["report", s.Fast], CliCodes.BadOption, _ => "--out"),
        new("option-value-missing", s => ["vectors", s.Fast, "--out"], CliCodes.BadOption, _ => "--out"),
        new("verify-format-word", s => ["verify", s.Fast, "--vectors", s.Root, "--dut", s.Fast, "--format", "nope"], CliCodes.BadOption, _ => "--format"),
        new("target-noise-not-a-number", s => ["sweep", s.Fast, "--target-noise-e", "abc"], CliCodes.BadOption, _ => "--target-noise-e", Absent: "System."),
        new("fit-segment-not-a-number", s => ["fit", s.Path("capture_bench_idle.i16"), "--readout", s.Path(Cap), "--segment", "x"], CliCodes.BadOption, _ => "--segment"),
        new("fit-segment-not-a-power-of-two", s => ["fit", s.Path("capture_bench_idle.i16"), "--readout", s.Path(Cap), "--segment", "100"], CaptureCodes.TooFewSamples, _ => "--segment"),
        new("fit-format-word", s => ["fit", s.Path("capture_bench_idle.i16"), "--readout", s.Path(Cap), "--format", "xml"], CaptureCodes.WrongLayout, _ => "--format"),
        new("fit-readout-option-missing", s => ["fit", s.Path("capture_bench_idle.i16")], CliCodes.BadOption, _ => "--readout"),

        // The readout file itself.
        new("readout-missing", s => ["design", s.Path("nope.toml")], "CG0002", s => s.Path("nope.toml")),
        new("readout-is-a-folder", s => ["design", s.Dir("folder.toml")], CliCodes.InputNotRegular, s => s.Path("folder.toml")),
        new("readout-is-dev-zero", _ => ["design", "/dev/zero"], CliCodes.InputNotRegular, _ => "/dev/zero"),
        new("readout-is-a-fifo", s => ["design", s.Fifo("pipe.toml")], CliCodes.InputNotRegular, s => s.Path("pipe.toml")),
        new("readout-too-large", s => ["design", s.Sparse("huge.toml", 5L << 20)], CliCodes.InputTooLarge, s => s.Path("huge.toml")),
        new("readout-not-utf8", s => ["design", WriteBytes(s, "bin.toml", [0xFF, 0xFE, 0x00, 0x1B, 0x5B])], ReadoutCodes.TomlSyntax, s => s.Path("bin.toml") + ":1:1"),
        new("readout-toml-syntax", s => ["design", s.Write("syntax.toml", "name = \"x\"\n[adc\nbits = 3\n")], ReadoutCodes.TomlSyntax, s => s.Path("syntax.toml") + ":2:"),
        new("readout-unknown-key", s => ["design", s.Edit("fast_imaging.toml", "bits = 14", "bitz = 14")], ReadoutCodes.UnknownKey, s => At(s, "edited_fast_imaging.toml", "bitz")),
        new("readout-wrong-type", s => ["design", s.Edit("fast_imaging.toml", "bits = 14", "bits = \"fourteen\"")], ReadoutCodes.WrongType, s => At(s, "edited_fast_imaging.toml", "bits =")),
        new("emit-after-readout-error", s => ["emit", s.Edit("fast_imaging.toml", "bits = 14", "bitz = 14")], ReadoutCodes.UnknownKey, s => At(s, "edited_fast_imaging.toml", "bitz")),
        new("vectors-after-readout-error", s => ["vectors", s.Edit("fast_imaging.toml", "bits = 14", "bitz = 14"), "--out", s.Path("vec")], ReadoutCodes.UnknownKey, s => At(s, "edited_fast_imaging.toml", "bitz")),
        new("report-after-readout-error", s => ["report", s.Edit("fast_imaging.toml", "bits = 14", "bitz = 14"), "--out", s.Path("rep")], ReadoutCodes.UnknownKey, s => At(s, "edited_fast_imaging.toml", "bitz")),

        // psd_table: never echo a file that is not a table, never flood, regular files within the limit only.
        new("psd-is-etc-passwd", s => ["design", s.Edit(Ir, PsdLine, "psd_table = \"/etc/passwd\"")], ReadoutCodes.PsdTableBadLine, _ => "/etc/passwd:1:1", Absent: ":0:0:"),
        new("psd-is-a-secret", s => ["design", Psd(s, string.Concat(Enumerable.Repeat("TOKEN-abcdef-1234 do not print\n", 200)))], ReadoutCodes.PsdTableBadLine, s => s.Path("table.csv") + ":1:1", Absent: "TOKEN-abcdef"),
        new("psd-secret-with-commas", s => ["design", Psd(s, "10,1\n20,TOKEN-abcdef-1234-and-a-long-tail-that-is-cut-off-here-XYZW-more-more\n")], ReadoutCodes.PsdTableBadLine, s => s.Path("table.csv") + ":2:1", Absent: "XYZW"),
        new("psd-control-bytes", s => ["design", Psd(s, "\u001b[31mred,1\n10,1\n20,1\n")], ReadoutCodes.PsdTableBadLine, s => s.Path("table.csv") + ":1:1", Absent: "\u001b"),
        new("psd-million-bad-rows", s => ["design", Psd(s, string.Concat(Enumerable.Repeat("x,1\n", 1_000_000)))], ReadoutCodes.PsdTableBadLine, s => s.Path("table.csv") + ":1:1"),
        new("psd-is-a-folder", s => { s.Dir("tables"); return ["design", s.Edit(Ir, PsdLine, "psd_table = \"tables\"")]; }, ReadoutCodes.PsdTableUnreadable, s => At(s, "edited_" + Ir, "psd_table")),
        new("psd-is-dev-zero", s => ["design", s.Edit(Ir, PsdLine, "psd_table = \"/dev/zero\"")], ReadoutCodes.PsdTableUnreadable, s => At(s, "edited_" + Ir, "psd_table")),
        new("psd-is-a-fifo", s => { s.Fifo("table.fifo"); return ["design", s.Edit(Ir, PsdLine, "psd_table = \"table.fifo\"")]; }, ReadoutCodes.PsdTableUnreadable, s => At(s, "edited_" + Ir, "psd_table")),
        new("psd-missing", s => ["design", s.Edit(Ir, PsdLine, "psd_table = \"nope.csv\"")], ReadoutCodes.PsdTableUnreadable, s => At(s, "edited_" + Ir, "psd_table")),
        new("psd-too-large", s => { s.Sparse("huge.csv", 33L << 20); return ["design", s.Edit(Ir, PsdLine, "psd_table = \"huge.csv\"")]; }, ReadoutCodes.PsdTableUnreadable, s => At(s, "edited_" + Ir, "psd_table")),
        new("psd-one-row", s => ["design", Psd(s, "10,1\n")], ReadoutCodes.PsdTableTooShort, s => At(s, "edited_" + Ir, "psd_table")),

        // noise.capture and fit's capture argument.
        new("capture-missing", s => ["design", s.Edit(Cap, CaptureLine, "capture = \"nope.i16\"")], CaptureCodes.Unreadable, s => At(s, "edited_" + Cap, "capture =")),
        new("capture-is-dev-zero", s => ["design", s.Edit(Cap, CaptureLine, "capture = \"/dev/zero\"")], CliCodes.InputNotRegular, s => At(s, "edited_" + Cap, "capture =")),
        new("capture-is-a-folder", s => { s.Dir("cap.i16"); return ["design", s.Edit(Cap, CaptureLine, "capture = \"cap.i16\"")]; }, CliCodes.InputNotRegular, s => At(s, "edited_" + Cap, "capture =")),
        new("capture-is-a-fifo", s => { s.Fifo("cap.i16"); return ["emit", s.Edit(Cap, CaptureLine, "capture = \"cap.i16\""), "-f", "c-header"]; }, CliCodes.InputNotRegular, s => At(s, "edited_" + Cap, "capture =")),
        new("capture-too-large", s => { s.Sparse("cap.i16", 300L << 20); return ["design", s.Edit(Cap, CaptureLine, "capture = \"cap.i16\"")]; }, CliCodes.InputTooLarge, s => At(s, "edited_" + Cap, "capture =")),
        // Captures of a general cycle (examples/cycles/skipper_capture.toml: 200 samples per cycle, 128 weighted).
        new("fit-cycle-capture-not-whole-cycles", s => ["fit", SkipperCapture(s, (50 * 200) + 37), "--readout", Skipper(s)], CaptureCodes.Truncated, s => s.Path("cycles/skipper_capture_idle.i16")),
        new("fit-cycle-capture-too-short", s => ["fit", SkipperCapture(s, 5 * 200), "--readout", Skipper(s)], CaptureCodes.TooFewSamples, s => s.Path("cycles/skipper_capture_idle.i16")),
        new("design-cycle-capture-too-short", s => { SkipperCapture(s, 5 * 200); return ["design", Skipper(s)]; }, CaptureCodes.TooFewSamples, s => s.Path("cycles/skipper_capture_idle.i16")),
        new("design-cycle-capture-not-whole-cycles", s => { SkipperCapture(s, (64 * 200) + 1); return ["design", Skipper(s), "--json"]; }, CaptureCodes.Truncated, s => s.Path("cycles/skipper_capture_idle.i16")),
        new("fit-cycle-too-large-for-a-capture", s => ["fit", SkipperCapture(s, 20 * 3200), "--readout", Skipper(s, ("times = 8", "times = 129"), ("pixel_samples = 200", "pixel_samples = 3200"))], CaptureCodes.CycleTooLarge, s => At(s, "cycles/skipper_capture.toml", "[[timing.window]]")),
        new("design-cycle-too-large-for-a-capture", s => { SkipperCapture(s, 20 * 3200); return ["design", Skipper(s, ("times = 8", "times = 129"), ("pixel_samples = 200", "pixel_samples = 3200"))]; }, CaptureCodes.CycleTooLarge, s => At(s, "cycles/skipper_capture.toml", "capture =")),
        new("fit-capture-is-a-folder", s => ["fit", s.Dir("c.i16"), "--readout", s.Path(Cap)], CliCodes.InputNotRegular, s => s.Path("c.i16")),
        new("fit-capture-is-dev-zero", s => ["fit", "/dev/zero", "--readout", s.Path(Cap), "--format", "raw16"], CliCodes.InputNotRegular, _ => "/dev/zero"),
        new("fit-readout-missing", s => ["fit", s.Path("capture_bench_idle.i16"), "--readout", s.Path("nope.toml")], "CG0002", s => s.Path("nope.toml")),

        // Templates.
        new("template-is-a-folder", s => ["emit", s.Fast, "--out", s.Path("o"), "--template", s.Dir("t.h.scriban")], CliCodes.InputNotRegular, s => s.Path("t.h.scriban")),
        new("template-is-dev-zero", s => ["emit", s.Fast, "--out", s.Path("o"), "--template", "/dev/zero", "--template-out", "z.h"], CliCodes.InputNotRegular, _ => "/dev/zero"),
        new("template-missing", s => ["emit", s.Fast, "--out", s.Path("o"), "--template", s.Path("nope.h.scriban")], TemplateDiagnosticCodes.TemplateNotFound, s => s.Path("nope.h.scriban")),
        new("template-too-large", s => ["emit", s.Fast, "--out", s.Path("o"), "--template", s.Sparse("big.h.scriban", 5L << 20)], CliCodes.InputTooLarge, s => s.Path("big.h.scriban")),
        new("template-include-too-large", s => { s.Sparse("big.inc", 5L << 20); return ["emit", s.Fast, "--out", s.Path("o"), "--template", s.Write("inc.h.scriban", "// x\n{{ include 'big.inc' }}\n")]; }, TemplateDiagnosticCodes.IncludeRefused, s => s.Path("inc.h.scriban") + ":2:"),
        new("emit-entry-template-missing", s => ["emit", s.Edit("fast_imaging.toml", "template = \"sv-package\"", "template = \"missing.sv.scriban\"")], TemplateDiagnosticCodes.TemplateNotFound, s => At(s, "edited_fast_imaging.toml", "missing.sv.scriban")),

        // Output destinations: nothing written, not even the files that could have been.
        new("emit-second-target-is-a-folder", s => { s.Dir("tile7_v3_coefs.vh"); return ["emit", s.Fast]; }, CliCodes.OutputIsDirectory, s => At(s, "fast_imaging.toml", VhPath)),
        new("emit-out-is-a-file", s => ["emit", s.Fast, "--out", s.Fast], CliCodes.OutputFolderIsFile, _ => "--out"),
        new("emit-out-parent-is-a-file", s => ["emit", s.Fast, "--out", s.Path("fast_imaging.toml/sub")], CliCodes.OutputFolderIsFile, _ => "--out"),
        new("emit-out-is-dev-null", s => ["emit", s.Fast, "--out", "/dev/null"], CliCodes.OutputFolderIsFile, _ => "--out"),
        new("emit-out-unwritable", s => ["emit", s.Fast, "--out", "/proc/coefgen-out"], CliCodes.OutputNotWritable, _ => "--out"),
        new("emit-template-out-too-long", s => ["emit", s.Fast, "--out", s.Path("o"), "--template", Path.Combine(RepoPaths.Root, "templates", "c-header.h.scriban"), "--template-out", Long], CliCodes.OutputNameTooLong, _ => "--template-out"),
        new("emit-path-too-long", s => ["emit", s.Edit("fast_imaging.toml", VhPath, $"path = \"{Long}.vh\"")], CliCodes.OutputNameTooLong, s => At(s, "edited_fast_imaging.toml", Long)),
        new("emit-name-too-long", s => ["emit", s.Edit("fast_imaging.toml", "name = \"tile7_v3\"", $"name = \"t{Long}\""), "-f", "c-header", "--out", s.Path("o")], CliCodes.OutputNameTooLong, s => At(s, "edited_fast_imaging.toml", "name =")),
        new("emit-out-name-too-long", s => ["emit", s.Fast, "--out", s.Path(Long)], CliCodes.OutputNameTooLong, _ => "--out"),
        new("emit-through-a-link-outside", s => { s.Link("tile7_v3_coefs.vh", Path.Combine(Path.GetTempPath(), "coefgen-outside-" + Guid.NewGuid().ToString("N") + ".vh")); return ["emit", s.Fast]; }, CliCodes.OutputEscapes, s => At(s, "fast_imaging.toml", VhPath)),
        new("emit-through-a-linked-folder-outside", s => { s.Link("lnk", RepoPaths.TempDir()); return ["emit", s.Edit("fast_imaging.toml", VhPath, "path = \"lnk/x.vh\"")]; }, CliCodes.OutputEscapes, s => At(s, "edited_fast_imaging.toml", "lnk/x.vh")),
        new("vectors-out-is-a-file", s => ["vectors", s.Fast, "--out", s.Fast, "--pixels", "20"], CliCodes.OutputFolderIsFile, _ => "--out"),
        new("vectors-out-unwritable", s => ["vectors", s.Fast, "--out", "/proc/coefgen-vec", "--pixels", "20"], CliCodes.OutputNotWritable, _ => "--out"),
        new("vectors-manifest-is-a-folder", s => { s.Dir("vec/manifest.json"); return ["vectors", s.Fast, "--out", s.Path("vec"), "--pixels", "20"]; }, CliCodes.OutputIsDirectory, _ => "--out"),
        new("report-out-is-a-file", s => ["report", s.Fast, "--out", s.Fast], CliCodes.OutputFolderIsFile, _ => "--out"),
        new("report-html-is-a-folder", s => { s.Dir("rep/report.html"); return ["report", s.Fast, "--out", s.Path("rep")]; }, CliCodes.OutputIsDirectory, _ => "--out"),
        new("report-out-unwritable", s => ["report", s.Fast, "--out", "/proc/coefgen-rep"], CliCodes.OutputNotWritable, _ => "--out"),
        new("fit-out-is-a-file", s => ["fit", s.Path("capture_bench_idle.i16"), "--readout", s.Path(Cap), "--out", s.Fast], CliCodes.OutputFolderIsFile, _ => "--out"),
        new("fit-svg-is-a-folder", s => { s.Dir("fo/fit_spectrum.svg"); return ["fit", s.Path("capture_bench_idle.i16"), "--readout", s.Path(Cap), "--out", s.Path("fo")]; }, CliCodes.OutputIsDirectory, _ => "--out"),
        new("sweep-csv-is-a-folder", s => ["sweep", s.Fast, "--vary", "adc.rate_hz=40M,80M", "--csv", s.Dir("s.csv")], CliCodes.OutputIsDirectory, _ => "--csv"),
        new("sweep-plot-parent-is-a-file", s => ["sweep", s.Fast, "--vary", "adc.rate_hz=40M,80M", "--plot", s.Path("fast_imaging.toml/p.svg")], CliCodes.OutputFolderIsFile, _ => "--plot"),
        new("sweep-plot-folder-keeps-csv-out", s => ["sweep", s.Fast, "--vary", "adc.rate_hz=40M,80M", "--csv", s.Path("ok.csv"), "--plot", s.Dir("p.svg")], CliCodes.OutputIsDirectory, _ => "--plot"),
        new("sweep-csv-unwritable", s => ["sweep", s.Fast, "--vary", "adc.rate_hz=40M,80M", "--csv", "/proc/coefgen.csv"], CliCodes.OutputNotWritable, _ => "--csv"),

        // Sweeps that cannot mean what was asked.
        new("sweep-misspelt-key", s => ["sweep", s.Fast, "--vary", "adc.rate_hzz=40M,80M", "--csv", s.Path("s.csv")], CliCodes.SweepUnknownKey, _ => "--vary"),
        new("sweep-key-twice", s => ["sweep", s.Fast, "--vary", "adc.rate_hz=40M,80M", "--vary", "adc.rate_hz=20M", "--csv", s.Path("s.csv")], CliCodes.SweepDuplicateKey, _ => "--vary"),
        new("sweep-every-point-invalid", s => ["sweep", s.Fast, "--vary", "timing.signal.count=200,300", "--csv", s.Path("s.csv"), "--plot", s.Path("s.svg")], CliCodes.SweepAllInvalid, _ => "--vary"),
        new("sweep-bad-spec", s => ["sweep", s.Fast, "--vary", "adc.rate_hz=1:2"], CliCodes.BadOption, _ => "--vary"),
        new("sweep-nothing-to-do", s => ["sweep", s.Fast], CliCodes.BadOption, _ => "sweep"),
        new("sweep-csv-without-vary", s => ["sweep", s.Fast, "--split-pixel-time", "--csv", s.Path("s.csv")], CliCodes.BadOption, _ => "--csv"),
        new("sweep-scheme-word", s => ["sweep", s.Fast, "--split-pixel-time", "--scheme", "best"], CliCodes.BadOption, _ => "--scheme"),
        new("sweep-target-zero", s => ["sweep", s.Fast, "--target-noise-e", "0"], CliCodes.BadOption, _ => "--target-noise-e"),
        new("sweep-readout-is-a-folder", s => ["sweep", s.Dir("d.toml"), "--vary", "adc.rate_hz=40M"], CliCodes.InputNotRegular, s => s.Path("d.toml")),
    ];

    /// <summary>The repeated-reads example written into the sandbox's cycles/ folder, with textual edits.</summary>
    private static string Skipper(Sandbox s, params (string From, string To)[] edits)
    {
        var text = File.ReadAllText(Path.Combine(RepoPaths.Root, "examples", "cycles", "skipper_capture.toml"));
        foreach (var (from, to) in edits)
        {
            Assert.Contains(from, text, StringComparison.Ordinal);
            text = text.Replace(from, to, StringComparison.Ordinal);
        }

        return s.Write("cycles/skipper_capture.toml", text);
    }

    /// <summary>An idle capture of <paramref name="samples"/> int16 codes (all 0) where the example's readout looks for it.</summary>
    private static string SkipperCapture(Sandbox s, int samples)
    {
        var path = s.Path("cycles/skipper_capture_idle.i16");
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllBytes(path, new byte[2 * samples]);
        return path;
    }

    private static string At(Sandbox s, string file, string text)
    {
        var path = s.Path(file);
        return $"{path}:{s.LineOf(path, text)}:";
    }

    private static string Psd(Sandbox s, string table)
    {
        s.Write("table.csv", table);
        return s.Edit(Ir, PsdLine, "psd_table = \"table.csv\"");
    }

    private static string WriteBytes(Sandbox s, string name, byte[] bytes)
    {
        File.WriteAllBytes(s.Path(name), bytes);
        return s.Path(name);
    }
}
