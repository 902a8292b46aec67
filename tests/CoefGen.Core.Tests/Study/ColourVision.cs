namespace CoefGen.Core.Tests.Study;

/// <summary>CIELAB distances of sRGB colours under simulated colour vision deficiency (Machado, Oliveira and Fernandes 2009, severity 1).</summary>
internal static class ColourVision
{
    private static readonly double[][][] Simulations =
    [
        [[1, 0, 0], [0, 1, 0], [0, 0, 1]],
        [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]], // protanopia
        [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.011820, 0.042940, 0.968881]], // deuteranopia
        [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.303900]], // tritanopia
    ];

    /// <summary>Smallest CIE76 distance between any two of the colours under any of the four visions.</summary>
    public static double MinDistance(IReadOnlyList<string> colours)
    {
        var min = double.PositiveInfinity;
        foreach (var m in Simulations)
        {
            var lab = colours.Select(c => Lab(Simulate(Linear(c), m))).ToList();
            for (var i = 0; i < lab.Count; i++)
            {
                for (var j = i + 1; j < lab.Count; j++)
                {
                    min = Math.Min(min, Math.Sqrt(lab[i].Zip(lab[j], (a, b) => (a - b) * (a - b)).Sum()));
                }
            }
        }

        return min;
    }

    private static double[] Linear(string hex) => [.. Enumerable.Range(0, 3).Select(i =>
    {
        var c = Convert.ToInt32(hex.Substring(1 + (2 * i), 2), 16) / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.Pow((c + 0.055) / 1.055, 2.4);
    })];

    private static double[] Simulate(double[] rgb, double[][] m) => [.. m.Select(row => Math.Clamp((row[0] * rgb[0]) + (row[1] * rgb[1]) + (row[2] * rgb[2]), 0, 1))];

    private static double[] Lab(double[] rgb)
    {
        // sRGB (D65) to XYZ to CIELAB.
        var x = ((0.4124 * rgb[0]) + (0.3576 * rgb[1]) + (0.1805 * rgb[2])) / 0.95047;
        var y = (0.2126 * rgb[0]) + (0.7152 * rgb[1]) + (0.0722 * rgb[2]);
        var z = ((0.0193 * rgb[0]) + (0.1192 * rgb[1]) + (0.9505 * rgb[2])) / 1.08883;
        static double F(double t) => t > 0.008856 ? Math.Cbrt(t) : (7.787 * t) + (16.0 / 116);
        return [(116 * F(y)) - 16, 500 * (F(x) - F(y)), 200 * (F(y) - F(z))];
    }
}
