using System.CommandLine;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.FixedPoint;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen targets [--json]`: lists the hardware arithmetic profiles.</summary>
internal static class TargetsCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var json = new Option<bool>("--json") { Description = "Print the profiles as a JSON array." };
        var cmd = new Command(
            "targets",
            "List the hardware arithmetic profiles in targets/ (multiplier operands, accumulator, limits). " +
            "A readout file selects one with fixed_point.target and may override any width.")
        {
            json,
        };
        cmd.SetAction(parse =>
        {
            var catalog = InputFiles.LoadTargets();
            if (catalog.Diagnostics.Count > 0)
            {
                DiagnosticPrinter.Print(error, catalog.Diagnostics);
            }

            var profiles = catalog.Names.Select(n => catalog.TryGet(n, out var p) ? p : null).OfType<TargetProfile>().ToArray();
            output.Write(parse.GetValue(json) ? Json(profiles) : Text(profiles));
            return ExitCodes.Ok;
        });
        return cmd;
    }

    private static string Text(IReadOnlyList<TargetProfile> profiles)
    {
        var t = new TextTable("target", "multiplier", "accumulator", "post-mult", "output", "max coefs", "description") { LeftAlignLast = true };
        foreach (var p in profiles)
        {
            t.Add(
                p.Name,
                $"{p.CoefOperandBits} x {p.SampleOperandBits}",
                $"{p.AccBits} {(p.Accumulator == AccumulatorMode.Wrap ? "wrap" : "saturate")}",
                p.PostMultiplierBits.ToString(System.Globalization.CultureInfo.InvariantCulture),
                p.OutputBits.ToString(System.Globalization.CultureInfo.InvariantCulture),
                p.MaxCoefficients.ToString(System.Globalization.CultureInfo.InvariantCulture),
                p.Description);
        }

        return t.Render("");
    }

    private static string Json(IReadOnlyList<TargetProfile> profiles)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, NewLine = "\n", Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            w.WriteStartArray();
            foreach (var p in profiles)
            {
                w.WriteStartObject();
                w.WriteString("name", p.Name);
                w.WriteString("description", p.Description);
                w.WriteNumber("coef_operand_bits", p.CoefOperandBits);
                w.WriteNumber("sample_operand_bits", p.SampleOperandBits);
                w.WriteNumber("acc_bits", p.AccBits);
                w.WriteString("accumulator", p.Accumulator == AccumulatorMode.Wrap ? "wrap" : "saturate");
                w.WriteNumber("post_multiplier_bits", p.PostMultiplierBits);
                w.WriteNumber("output_bits", p.OutputBits);
                w.WriteNumber("max_coefficients", p.MaxCoefficients);
                w.WriteEndObject();
            }

            w.WriteEndArray();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }
}
