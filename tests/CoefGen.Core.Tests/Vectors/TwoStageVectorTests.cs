using System.Globalization;
using System.Numerics;
using CoefGen.Core.Tests.Cycle;
using CoefGen.Core.Vectors;
using CoefGen.Core.Vectors.TwoStage;

namespace CoefGen.Core.Tests.Vectors;

/// <summary>Golden vectors of the two-stage datapath: expected outputs and read sums from the two-stage model, checked against the BigInteger reference.</summary>
public class TwoStageVectorTests
{
    [Fact]
    public void Expected_outputs_and_read_sums_equal_the_BigInteger_reference_and_the_files_agree()
    {
        var r = TwoStageCases.SharedReset();
        var d = r.TwoStage!.Quantised;
        var source = TwoStageVectorGenerator.Source(r, new VectorOptions(80, Seed: 3));
        var pixels = source.Pixels.ToList();
        Assert.Equal(80, pixels.Count);
        foreach (var p in pixels)
        {
            var grid = TwoStageCases.GridCodes(r, [.. p.Codes]);
            Assert.Equal(TwoStageCases.Reference(d, grid, out var sums), (BigInteger)p.Expected.Output);
            Assert.Equal(sums, p.ReadSums!.Select(v => (BigInteger)v));
        }

        // The proof's worst cases of both stages are among the pixels, and the noise ladder follows them.
        Assert.Contains(pixels, p => p.Kind.StartsWith(PixelKind.WorstPrefix + "stage", StringComparison.Ordinal));
        var output = d.Proof.Checks.Single(c => c.Name == "output");
        Assert.Contains(pixels, p => p.Expected.Output == output.MinValue || p.Expected.Output == output.MaxValue);
        Assert.Contains(pixels, p => p.Kind == PixelKind.ChargeFull);

        var files = TwoStageVectorFileWriter.Render(TwoStageVectorGenerator.Source(r, new VectorOptions(80, Seed: 3)), "coefgen", "test").ToDictionary(f => f.Name, f => f.Text);
        var expected = files[VectorFileNames.ExpectedDecimal].Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var readSums = files[TwoStageVectorFileWriter.ReadSums].Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(80, expected.Length);
        for (var i = 0; i < 80; i++)
        {
            Assert.Equal(pixels[i].Expected.Output, long.Parse(expected[i].Split(' ')[0], CultureInfo.InvariantCulture));
            Assert.Equal(pixels[i].ReadSums, readSums[i].Split(' ').Select(v => long.Parse(v, CultureInfo.InvariantCulture)));
        }

        // verify reads the manifest unchanged.
        var (manifest, problems) = VectorManifest.Parse(files[VectorFileNames.Manifest], "manifest.json");
        Assert.Empty(problems);
        Assert.Equal(80, manifest!.Pixels);
        Assert.Equal(d.OutputBits, manifest.OutputBits);
    }

    [Fact]
    public void The_same_seed_gives_the_same_bytes()
    {
        var r = TwoStageCases.SharedReset();
        string Bytes() => string.Concat(TwoStageVectorFileWriter.Render(TwoStageVectorGenerator.Source(r, new VectorOptions(40, Seed: 9)), "coefgen", "test").Select(f => f.Name + f.Text));
        Assert.Equal(Bytes(), Bytes());
    }
}
