using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.FixedPoint;

/// <summary>The target profiles describe FPGA arithmetic in the trade's neutral words, never a vendor's name for its block.</summary>
public class TargetWordingTests
{
    [Fact]
    public void Target_profiles_and_their_readme_use_neutral_words()
    {
        var folder = Path.Combine(RepoPaths.Root, "targets");
        var files = Directory.GetFiles(folder, "*.toml").Append(Path.Combine(folder, "README.md")).ToList();
        Assert.True(files.Count >= 5);
        foreach (var f in files)
        {
            var text = File.ReadAllText(f);
            Assert.DoesNotContain("slice", text, StringComparison.OrdinalIgnoreCase);
            Assert.DoesNotContain("DSP48", text, StringComparison.OrdinalIgnoreCase);
        }

        Assert.All(Directory.GetFiles(folder, "*acc48.toml"), f => Assert.Contains("hard multiply-accumulate block", File.ReadAllText(f), StringComparison.Ordinal));
    }
}
