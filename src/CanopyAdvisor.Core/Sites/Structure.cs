namespace CanopyAdvisor.Core.Sites;

/// <summary>What encloses the benches: a glasshouse range that lets daylight in, or an indoor room that does not.</summary>
public abstract record Structure;
