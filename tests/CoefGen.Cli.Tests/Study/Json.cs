using System.Text.Json;
using System.Text.RegularExpressions;

namespace CoefGen.Cli.Tests.Study;

/// <summary>Follows a path such as "schemes[2].budget[0].share" into a JSON document.</summary>
internal static partial class Json
{
    [GeneratedRegex(@"([a-z_0-9]+)|\[(\d+)\]")]
    private static partial Regex Segment();

    public static JsonElement At(JsonElement root, string path)
    {
        var e = root;
        foreach (Match m in Segment().Matches(path))
        {
            e = m.Groups[1].Success ? e.GetProperty(m.Groups[1].Value) : e[int.Parse(m.Groups[2].Value, System.Globalization.CultureInfo.InvariantCulture)];
        }

        return e;
    }
}
