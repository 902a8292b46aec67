namespace CoefGen.Cli.Output;

/// <summary>A one-line progress bar on a terminal's stderr (only created when stderr is not redirected).</summary>
internal sealed class SweepProgress(TextWriter error, int total)
{
    private readonly object _lock = new();
    private int _shown = -1;

    public void Report(int done)
    {
        var width = 40;
        var filled = total == 0 ? width : done * width / total;
        lock (_lock)
        {
            if (done <= _shown)
            {
                return;
            }

            _shown = done;
            error.Write($"\r[{new string('#', filled)}{new string(' ', width - filled)}] {Eng.Int(done)}/{Eng.Int(total)}");
        }
    }

    public void Finish()
    {
        lock (_lock)
        {
            error.Write("\r" + new string(' ', 60) + "\r");
        }
    }
}
