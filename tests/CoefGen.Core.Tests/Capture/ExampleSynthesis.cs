namespace CoefGen.Core.Tests.Capture;

/// <summary>A shipped synthetic capture must be exactly its recipe's bytes; COEFGEN_WRITE_EXAMPLE_CAPTURE=1 rewrites it first.</summary>
internal static class ExampleSynthesis
{
    public static void AssertFileIs(string path, byte[] expected)
    {
        if (Environment.GetEnvironmentVariable("COEFGEN_WRITE_EXAMPLE_CAPTURE") == "1")
        {
            File.WriteAllBytes(path, expected);
        }

        Assert.Equal(expected, File.ReadAllBytes(path));
    }
}
