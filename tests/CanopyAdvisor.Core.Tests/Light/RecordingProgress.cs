namespace CanopyAdvisor.Core.Tests.Light;

/// <summary>Progress that records reports synchronously (Progress&lt;T&gt; posts them later).</summary>
internal sealed class RecordingProgress : IProgress<double>
{
    public List<double> Reports { get; } = [];

    public void Report(double value) => Reports.Add(value);
}
