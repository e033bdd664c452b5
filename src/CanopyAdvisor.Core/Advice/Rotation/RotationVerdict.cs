namespace CanopyAdvisor.Core.Advice.Rotation;

/// <summary>What a rotation policy search concluded for one bench.</summary>
public enum RotationVerdict
{
    /// <summary>Without any turn the bench lean stays within the grade limit with the margin to the sale.</summary>
    NoRotationNeeded,

    /// <summary>A policy holds the lean within the grade limit with the margin, even with every turn made late in its window.</summary>
    Rotate,

    /// <summary>No policy tried holds the lean within the grade limit with the margin (or the lean is already over now):
    /// the light must be balanced, e.g. with side lamps. The best policy found is still given.</summary>
    RotationCannotHold,
}
