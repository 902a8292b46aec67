namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads the [[emit]] entries.</summary>
internal static class EmitSectionReader
{
    public static IReadOnlyList<EmitSpec>? Read(TableReader root)
    {
        var errorsBefore = root.Context.ErrorCount;
        var result = new List<EmitSpec>();
        foreach (var emit in root.SectionArray("emit"))
        {
            emit.RejectUnknown("template", "path");
            var template = emit.Text("template", required: true);
            var path = emit.Text("path", required: true);
            if (template is not null && path is not null)
            {
                result.Add(new EmitSpec(template, path));
            }
        }

        return root.Context.ErrorCount > errorsBefore ? null : result;
    }
}
