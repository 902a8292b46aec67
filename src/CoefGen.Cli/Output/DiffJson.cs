using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using CoefGen.Core.Instrument;

namespace CoefGen.Cli.Output;

/// <summary>`coefgen diff --json`, schema "coefgen.diff/1": the two versions and one object per changed quantity.</summary>
internal static class DiffJson
{
    public const string Schema = "coefgen.diff/1";

    public static string Render(string before, string after, IReadOnlyList<DiffEntry> entries)
    {
        using var stream = new MemoryStream();
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, NewLine = "\n" };
        using (var w = new Utf8JsonWriter(stream, options))
        {
            w.WriteStartObject();
            w.WriteString("schema", Schema);
            w.WriteString("tool_version", ToolInfo.Version);
            w.WriteString("before", before);
            w.WriteString("after", after);
            w.WriteBoolean("changed", entries.Count > 0);
            w.WriteStartArray("changes");
            foreach (var e in entries)
            {
                w.WriteStartObject();
                w.WriteString("table", e.Table);
                w.WriteString("quantity", e.Quantity);
                w.WriteString("before", e.Before);
                w.WriteString("after", e.After);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }
}
