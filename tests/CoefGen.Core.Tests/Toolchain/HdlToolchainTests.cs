using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>The HDL packages analyse, lint and simulate, and every coefficient read back equals the design's.</summary>
public class HdlToolchainTests
{
    /// <summary>Includes the extreme coefficient -2^(CoefBits-1), which needs the careful literal forms.</summary>
    private static IntegerDesign WithExtremes(int coefBits)
    {
        var min = -(1L << (coefBits - 1));
        var max = (1L << (coefBits - 1)) - 1;
        var d = TestDesigns.Make("Edge-Case #1", [min, -5, 0], [max, 1, 0, -1], p: 10, fracBits: 0, pixelSamples: 9, resetStart: 0, signalStart: 4,
            coefBits: coefBits, coding: AdcCoding.OffsetBinary, accumulator: AccumulatorMode.Saturate);
        return d;
    }

    [Fact]
    public void Vhdl_package_analyses_with_Werror_and_coef_at_returns_every_coefficient() => HdlChecks.Vhdl(TestDesigns.Fixed());

    [Fact]
    public void Vhdl_package_handles_the_most_negative_32_bit_coefficient() => HdlChecks.Vhdl(WithExtremes(32));

    [Fact]
    public void Vhdl_package_uses_signed_constants_for_coefficients_wider_than_32_bits() => HdlChecks.Vhdl(WithExtremes(40));

    [Fact]
    public void Sv_package_lints_in_Verilator_and_simulates_in_Icarus() => HdlChecks.SystemVerilog(TestDesigns.Fixed());

    [Fact]
    public void Sv_package_writes_extreme_coefficients_as_exact_sized_literals() => HdlChecks.SystemVerilog(WithExtremes(18));

    [Fact]
    public void Verilog_include_compiles_in_Icarus_2005_and_lints_in_Verilator() => HdlChecks.Verilog(TestDesigns.Fixed());

    [Fact]
    public void Verilog_include_writes_extreme_coefficients_as_exact_sized_literals() => HdlChecks.Verilog(WithExtremes(40));

    /// <summary>Negative control: the same benches fail when one coefficient in the vectors differs by one.</summary>
    [Fact]
    public void Hdl_benches_fail_when_one_coefficient_differs()
    {
        var d = TestDesigns.Fixed();
        var coefs = d.Coefficients.ToArray();
        coefs[5] += 1;
        var tampered = d with { Coefficients = coefs };
        HdlChecks.Vhdl(d, tampered);
        HdlChecks.SystemVerilog(d, tampered);
        HdlChecks.Verilog(d, tampered);
    }
}
