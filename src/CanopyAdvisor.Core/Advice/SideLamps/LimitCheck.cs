namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>Whether a bench's PPFD ceiling or uniformity floor holds with the proposed lamps.</summary>
public enum LimitCheck
{
    /// <summary>No limit was set for the bench.</summary>
    NotSet,

    /// <summary>The limit holds with the proposed lamps.</summary>
    Met,

    /// <summary>The limit did not hold before either, and the lamps do not make it worse.</summary>
    UnmetBefore,

    /// <summary>The limit does not hold with the proposed lamps and they make it worse.</summary>
    Unmet,
}
