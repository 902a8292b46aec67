using System.CommandLine;
using CoefGen.Cli.Output;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen design FILE [--json]`: the description as understood, noise of every scheme, budget, integer design.</summary>
internal static class DesignCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file (TOML) describing one channel." };
        var json = new Option<bool>("--json") { Description = "Print one JSON document (schema coefgen.design/1, documented in the README) instead of the terminal summary." };
        var weights = new Option<bool>("--weights") { Description = "Also list every real-valued and integer weight of the chosen scheme in the terminal summary." };
        var requireSafe = UnsafeDesign.RequireSafeOption();
        var cmd = new Command(
            "design",
            "Read a readout file, model its noise at the sample instants, derive boxcar, weighted and optimal weights, " +
            "predict their read noise (V at the ADC, ADU, e- at the sense node) with a per-source budget, and quantise " +
            "the chosen scheme to integers with a width proof for the target. Writes nothing; exit 2 on bad input, 1 with --require-safe when the width proof rejects the design.")
        {
            file,
            json,
            weights,
            requireSafe,
        };
        cmd.SetAction(parse =>
        {
            if (InstrumentRunner.IsInstrument(parse.GetRequiredValue(file).ToString()))
            {
                return InstrumentCommands.Design(parse.GetRequiredValue(file).ToString(), parse.GetValue(json), output, error);
            }

            var result = DesignRunner.TryRun(parse.GetRequiredValue(file).ToString(), error);
            if (result is null)
            {
                return ExitCodes.BadInput;
            }

            if (parse.GetValue(json))
            {
                DesignJson.Write(output, result);
            }
            else
            {
                output.Write(DesignText.Render(result, parse.GetValue(weights)));
            }

            return UnsafeDesign.RequireSafe(result, parse.GetValue(requireSafe), error) ?? ExitCodes.Ok;
        });
        return cmd;
    }
}
