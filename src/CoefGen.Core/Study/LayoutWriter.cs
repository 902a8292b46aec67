namespace CoefGen.Core.Study;

/// <summary>Writes a window layout into a readout text (null with the reason when it cannot).</summary>
internal delegate string? LayoutWriter(WindowLayout layout, string text, out string? error);
