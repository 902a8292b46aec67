using System.Text;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.FixedPoint;

public class TargetProfileTests
{
    private static readonly string[] Shipped = ["dsp16-acc40", "dsp18x18-acc48", "dsp18x27-acc48", "dsp25x18-acc48", "mcu32-acc64"];

    [Fact]
    public void Every_shipped_target_profile_loads_without_diagnostics()
    {
        var catalog = ShippedCatalog();
        Assert.Empty(catalog.Diagnostics);
        Assert.Equal(Shipped, catalog.Names);
        Assert.True(catalog.TryGet("dsp18x27-acc48", out var p));
        Assert.Equal((18, 27, 48, AccumulatorMode.Wrap), (p.CoefOperandBits, p.SampleOperandBits, p.AccBits, p.Accumulator));
        Assert.True(catalog.TryGet("dsp16-acc40", out var dsp));
        Assert.Equal(AccumulatorMode.Saturate, dsp.Accumulator);
    }

    [Fact]
    public void A_profile_with_a_bad_value_and_an_unknown_key_is_reported_at_their_lines()
    {
        var text = "name = \"x\"\ndescription = \"d\"\n[multiplier]\ncoef_bits = 99\nsample_bits = 18\ncolour = \"red\"\n[accumulator]\nbits = 48\n[output]\nbits = 32\n[limits]\nmax_coefficients = 10\n";
        var r = TargetProfileLoader.Load(Encoding.UTF8.GetBytes(text), "targets/x.toml");
        Assert.Null(r.Profile);
        var bad = Assert.Single(r.Diagnostics, d => d.Code == FixedPointCodes.ProfileBadValue);
        Assert.Equal(4, bad.Location.Line);
        var unknown = Assert.Single(r.Diagnostics, d => d.Code == FixedPointCodes.ProfileUnknownKey);
        Assert.Equal(6, unknown.Location.Line);
        Assert.Equal("multiplier.colour", unknown.Key);
    }

    [Fact]
    public void A_profile_that_is_not_toml_gives_a_syntax_diagnostic_with_a_line()
    {
        var r = TargetProfileLoader.Load(Encoding.UTF8.GetBytes("name = \"x\"\n[multiplier\n"), "targets/x.toml");
        var d = Assert.Single(r.Diagnostics.Take(1));
        Assert.Equal(FixedPointCodes.ProfileSyntax, d.Code);
        Assert.Equal(2, d.Location.Line);
    }

    [Fact]
    public void Default_target_is_used_and_sample_width_defaults_to_the_adc_bits()
    {
        var res = FixedPointSettingsResolver.Resolve(Description(new FixedPointSpec(null, null, null, null, null, null, null, null, null)), ShippedCatalog());
        var s = Assert.IsType<FixedPointSettings>(res.Settings);
        Assert.Equal(("dsp18x27-acc48", 18, 16, 48), (s.TargetName, s.CoefBits, s.SampleBits, s.AccBits));
    }

    [Fact]
    public void Unknown_target_is_located_and_suggests_the_nearest_names()
    {
        var res = Resolve(new FixedPointSpec("dsp18x72-acc48", null, null, null, null, null, null, null, null));
        var d = Assert.Single(res.Diagnostics);
        Assert.Equal(FixedPointCodes.UnknownTarget, d.Code);
        Assert.Equal(7, d.Location.Line);
        Assert.Contains("did you mean", d.Message, StringComparison.Ordinal);
        Assert.Contains("'dsp18x27-acc48'", d.Message, StringComparison.Ordinal);
        Assert.Contains("mcu32-acc64", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Coefficient_width_that_cannot_hold_one_sample_is_located()
    {
        var d = Assert.Single(Resolve(new FixedPointSpec(null, 1, null, null, null, null, null, null, null)).Diagnostics);
        Assert.Equal((FixedPointCodes.CoefficientTooNarrow, 8), (d.Code, d.Location.Line));
    }

    [Fact]
    public void Accumulator_narrower_than_a_product_is_located()
    {
        // 18 x 16 bit products need 34 bits; a 30-bit accumulator cannot hold even one.
        var d = Assert.Single(Resolve(new FixedPointSpec(null, null, null, 30, null, null, null, null, null)).Diagnostics);
        Assert.Equal((FixedPointCodes.AccumulatorNarrowerThanProduct, 9), (d.Code, d.Location.Line));
    }

    [Fact]
    public void Adc_wider_than_the_sample_operand_and_too_many_coefficients_are_reported_together()
    {
        var desc = Description(new FixedPointSpec("dsp16-acc40", null, null, null, null, null, null, null, null), adcBits: 18, signal: 20000);
        var codes = FixedPointSettingsResolver.Resolve(desc, ShippedCatalog()).Diagnostics.Select(d => d.Code).ToArray();
        Assert.Contains(FixedPointCodes.AdcWiderThanSampleOperand, codes);
        Assert.Contains(FixedPointCodes.TooManyCoefficients, codes);
    }

    [Fact]
    public void Bad_widths_and_modes_get_their_own_codes()
    {
        var codes = Resolve(new FixedPointSpec(null, 20, null, 60, 1, null, "round", "floor", "clip")).Diagnostics.Select(d => d.Code).ToArray();
        Assert.Equal([FixedPointCodes.BadWidth, FixedPointCodes.BadWidth, FixedPointCodes.BadWidth, FixedPointCodes.BadMode, FixedPointCodes.BadMode, FixedPointCodes.BadMode], codes);
    }

    internal static TargetCatalog ShippedCatalog()
    {
        var dir = AppContext.BaseDirectory;
        while (!Directory.Exists(Path.Combine(dir, "targets")))
        {
            dir = Path.GetDirectoryName(dir) ?? throw new InvalidOperationException("targets/ not found above the test binaries");
        }

        return TargetCatalog.Create(Shipped.Select(n => (n, File.ReadAllBytes(Path.Combine(dir, "targets", n + ".toml")))));
    }

    private static FixedPointResolution Resolve(FixedPointSpec spec) => FixedPointSettingsResolver.Resolve(Description(spec), ShippedCatalog());

    private static ReadoutDescription Description(FixedPointSpec spec, int adcBits = 16, int signal = 64) => new()
    {
        Name = "t",
        SourcePath = "r.toml",
        ContentSha256 = "",
        Adc = new AdcSpec(1e6, adcBits, 2.0, AdcCoding.TwosComplement, 0.5),
        Sensor = new SensorSpec(5, 1),
        Timing = new TimingSpec(2 * signal + 10, 70e-6, new SampleWindow(0, 64), new SampleWindow(70, signal), StepModel.Ideal, []),
        Noise = new NoiseSpec([], null, 1e6, null, null),
        Weights = new WeightsSpec(WeightScheme.Boxcar, WindowShape.Triangle, 0, null, null, false),
        FixedPoint = spec,
        Emit = [],
        KeyLocations = new Dictionary<string, SourceLocation>
        {
            ["fixed_point.target"] = new("r.toml", 7, 1),
            ["fixed_point.coef_bits"] = new("r.toml", 8, 1),
            ["fixed_point.acc_bits"] = new("r.toml", 9, 1),
        },
    };
}
