using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Validation;
using NodaTime;

namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>What a rotation policy search tries and how safe its choice must be (<see cref="RotationPolicyPlanner"/>).</summary>
/// <remarks>Immutable; <see cref="Default"/> holds the documented defaults.</remarks>
public sealed record RotationPolicyOptions
{
    /// <summary>The default interval grid: 12 h, 1, 1.5, 2, 3, 4, 5, 7, 10 and 14 days (common practice spans "every
    /// day" to "every week or two"; 12 h is the shortest a day crew can keep).</summary>
    public static ImmutableArray<Duration> DefaultIntervals { get; } =
    [
        Duration.FromHours(12), Duration.FromDays(1), Duration.FromHours(36), Duration.FromDays(2), Duration.FromDays(3),
        Duration.FromDays(4), Duration.FromDays(5), Duration.FromDays(7), Duration.FromDays(10), Duration.FromDays(14),
    ];

    /// <summary>The default options (declared after <see cref="DefaultIntervals"/>, which it uses).</summary>
    public static RotationPolicyOptions Default { get; } = new();

    /// <summary>The intervals tried (each at least 1 hour, distinct; any order, searched from the longest down).</summary>
    public ImmutableArray<Duration> Intervals { get; init; } = DefaultIntervals;

    /// <summary>The turns tried: 180° and 90° by default (only these two are accepted).</summary>
    public ImmutableArray<Angle> Angles { get; init; } = [Angle.FromDegrees(180), Angle.FromDegrees(90)];

    /// <summary>The safety margin: a plan holds when the bench lean stays at or below (1 − margin) × the crop's grade
    /// limit to the sale; in [0, 1), <see cref="ModelConstants.RotationGradeMargin"/> (0.2, an estimate) by default.</summary>
    public double Margin { get; init; } = ModelConstants.RotationGradeMargin;

    /// <summary>The earliest time a turn may be made (e.g. the next working morning); null: the forecast start.</summary>
    public Instant? FirstTurnNotBefore { get; init; }

    /// <summary>The half-width of each task's window as a fraction of the interval, in [0, 0.5);
    /// <see cref="ModelConstants.RotationWindowFraction"/> (0.25) by default. A plan is only chosen when it still holds
    /// with every turn made at the latest end of its window, and with turns alternately at either end; otherwise the window is halved once, and if that fails
    /// too the next shorter interval is tried.</summary>
    public double WindowFraction { get; init; } = ModelConstants.RotationWindowFraction;

    /// <summary>Every problem with these options, with paths under <paramref name="path"/>.</summary>
    /// <param name="path">The prefix of the error paths (e.g. <c>options</c>).</param>
    public IReadOnlyList<ValidationError> Validate(string path = "options")
    {
        var errors = new List<ValidationError>();
        if (Intervals.IsDefaultOrEmpty)
        {
            errors.Add(new ValidationError($"{path}.intervals", "give at least one interval"));
        }
        else
        {
            for (int i = 0; i < Intervals.Length; i++)
            {
                if (Intervals[i] < Duration.FromHours(1))
                {
                    errors.Add(new ValidationError($"{path}.intervals[{i}]", "must be at least 1 hour"));
                }
                else if (Intervals.Take(i).Contains(Intervals[i]))
                {
                    errors.Add(new ValidationError($"{path}.intervals[{i}]", "is listed twice"));
                }
            }
        }

        if (Angles.IsDefaultOrEmpty)
        {
            errors.Add(new ValidationError($"{path}.angles", "give 90° or 180° or both"));
        }
        else
        {
            for (int i = 0; i < Angles.Length; i++)
            {
                double d = Angles[i].Degrees;
                if (Math.Abs(d - 90) > 1e-9 && Math.Abs(d - 180) > 1e-9)
                {
                    errors.Add(new ValidationError($"{path}.angles[{i}]", "must be 90° or 180°"));
                }
                else if (Angles.Take(i).Any(a => Math.Abs(a.Degrees - d) < 1e-9))
                {
                    errors.Add(new ValidationError($"{path}.angles[{i}]", "is listed twice"));
                }
            }
        }

        if (!(Margin >= 0 && Margin < 1))
        {
            errors.Add(new ValidationError($"{path}.margin", "must be at least 0 and below 1"));
        }

        if (!(WindowFraction >= 0 && WindowFraction < 0.5))
        {
            errors.Add(new ValidationError($"{path}.windowFraction", "must be at least 0 and below 0.5"));
        }

        return errors;
    }
}
