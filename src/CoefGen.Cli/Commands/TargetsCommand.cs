using System.CommandLine;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen targets`: lists the hardware arithmetic profiles.</summary>
internal static class TargetsCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var json = new Option<bool>("--json") { Description = "Print the profiles as JSON." };
        var cmd = new Command("targets", "List the hardware arithmetic profiles (multiplier, accumulator widths) a readout file can select with fixed_point.target.")
        {
            json,
        };
        cmd.SetAction(parse =>
        {
            output.WriteLine(parse.GetValue(json) ? "[]" : "no targets");
            error.Flush();
            return ExitCodes.Ok;
        });
        return cmd;
    }
}
