using NodaTime;

namespace CanopyAdvisor.Server.Tests.Support;

/// <summary>A clock the tests set and move (token expiry, default forecast start).</summary>
public sealed class TestClock(Instant start) : IClock
{
    private long _ticks = start.ToUnixTimeTicks();

    public Instant GetCurrentInstant() => Instant.FromUnixTimeTicks(Interlocked.Read(ref _ticks));

    public void Advance(Duration by) => Interlocked.Add(ref _ticks, by.BclCompatibleTicks);
}
