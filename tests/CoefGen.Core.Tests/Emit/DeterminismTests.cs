using System.Globalization;
using CoefGen.Core.Emit;

namespace CoefGen.Core.Tests.Emit;

/// <summary>Same input, same bytes, whatever the current culture.</summary>
public class DeterminismTests
{
    [Fact]
    public void Builtin_outputs_are_byte_identical_under_a_German_style_culture()
    {
        var model = TemplateModel.Create(TestDesigns.Fixed() with { GainErrorPpm = -1.5e-3 }, TestDesigns.Provenance with { PredictedReadNoiseElectrons = 12.345678 });
        var invariant = BuiltinTemplates.All.Select(t => BuiltinRender.Render(model, t.Name)).ToList();
        var saved = CultureInfo.CurrentCulture;
        try
        {
            // InvariantGlobalization forbids de-DE itself, so build a culture that formats like it (and worse).
            var hostile = (CultureInfo)CultureInfo.InvariantCulture.Clone();
            hostile.NumberFormat.NumberDecimalSeparator = ",";
            hostile.NumberFormat.NumberGroupSeparator = ".";
            hostile.NumberFormat.NegativeSign = "\u2212";
            CultureInfo.CurrentCulture = hostile;
            var german = BuiltinTemplates.All.Select(t => BuiltinRender.Render(model, t.Name)).ToList();
            Assert.Equal(invariant, german);
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }

        Assert.All(invariant, s => Assert.DoesNotContain("\r", s, StringComparison.Ordinal));
        Assert.Contains("12.35 e- rms", invariant[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Number_formatting_paths_use_the_invariant_culture()
    {
        // InvariantGlobalization makes every culture invariant-like here, so check the formatting code directly too.
        Assert.Equal("-0.0015", LiteralFormat.RoundTrip(-1.5e-3));
        Assert.Equal("(-2147483647 - 1)", LiteralFormat.C(int.MinValue, wide: false));
        Assert.Equal("(-INT64_C(9223372036854775807) - 1)", LiteralFormat.C(long.MinValue, wide: true));
        Assert.Equal("(-INT64_C(5))", LiteralFormat.C(-5, wide: true));
        Assert.Equal("(-18'sd131071 - 18'sd1)", LiteralFormat.VerilogSigned(-131072, 18));
        Assert.Equal("-18'sd5", LiteralFormat.VerilogSigned(-5, 18));
        Assert.Equal("3fffb", LiteralFormat.MaskedHex(-5, 18));
        Assert.Equal("\"11011\"", LiteralFormat.VhdlBits(-5, 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => LiteralFormat.VerilogSigned(131072, 18));
    }

    [Theory]
    [InlineData("Red Ch0", "red_ch0")]
    [InlineData("signal", "cg_signal")]
    [InlineData("Module", "cg_module")]
    [InlineData("9lives", "cg_9lives")]
    [InlineData("__a--b__", "a_b")]
    [InlineData("", "design")]
    [InlineData("é", "design")]
    public void Identifier_prefix_follows_the_documented_rule(string name, string expected) =>
        Assert.Equal(expected, IdentifierPrefix.FromName(name));
}
