using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Server.Hosting;

/// <summary>The service's clock: the system clock, or, when the <c>Canopy:ClockStartsAt</c> setting gives an instant
/// (ISO 8601, e.g. <c>2026-12-03T12:00:00Z</c>), a clock that starts there and runs at the system clock's rate. The
/// setting is for trying out and testing schedules (e.g. a job missed while the service was down); leave it unset in
/// real use. Quartz fires its triggers on the system clock either way.</summary>
internal sealed class StartingClock(Instant startsAt) : IClock
{
    /// <summary>The setting's configuration key.</summary>
    public const string SettingKey = "Canopy:ClockStartsAt";

    private readonly Instant _systemAtStart = SystemClock.Instance.GetCurrentInstant();

    /// <inheritdoc />
    public Instant GetCurrentInstant() => startsAt + (SystemClock.Instance.GetCurrentInstant() - _systemAtStart);

    /// <summary>The clock the settings ask for.</summary>
    /// <exception cref="InvalidOperationException">The setting is not an ISO 8601 instant.</exception>
    public static IClock FromSettings(IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        if (configuration[SettingKey] is not { Length: > 0 } text)
        {
            return SystemClock.Instance;
        }

        ParseResult<Instant> parsed = InstantPattern.ExtendedIso.Parse(text);
        return parsed.Success
            ? new StartingClock(parsed.Value)
            : throw new InvalidOperationException($"{SettingKey} must be an ISO 8601 instant such as 2026-12-03T12:00:00Z, not '{text}'.");
    }
}
