namespace CanopyAdvisor.Core.Plants;

/// <summary>The terms of one <see cref="StemBundle"/> walk that all its stems share (decided once per step).</summary>
internal readonly struct StemBundleWalkTerms
{
    /// <summary>Whether the walk senses and bends (else it only redraws).</summary>
    public bool Bend { get; init; }

    /// <summary>e^{−λh}, the curvature's relaxation over the step.</summary>
    public double Decay { get; init; }

    /// <summary>(1 − e^{−λh})/λ, the weight of the held stimulus over the step, h.</summary>
    public double Gain { get; init; }

    /// <summary>ε̇β/L_gz, the gravitropic coefficient.</summary>
    public double CGravity { get; init; }

    /// <summary>The delay-history slot written this step, or −1.</summary>
    public int PushSlot { get; init; }

    /// <summary>The older history slot read, or −1 without delay.</summary>
    public int Read0 { get; init; }

    /// <summary>The newer history slot read.</summary>
    public int Read1 { get; init; }

    /// <summary>Interpolation weight between the two slots read.</summary>
    public double ReadWeight { get; init; }

    /// <summary>How much of the basal segment the nutation still bends (its part not yet matured), 0 to 1.</summary>
    public double NutationWeight { get; init; }

    /// <summary>The nutation curvature, u component, 1/m.</summary>
    public double NutationU { get; init; }

    /// <summary>The nutation curvature, v component, 1/m.</summary>
    public double NutationV { get; init; }

    /// <summary>Whether the basal segment is drawn with its growth-weighted mean divided by <see cref="OldWeight"/>.</summary>
    public bool BasalFromSums { get; init; }

    /// <summary>Metres grown since the basal segment became basal, before this step.</summary>
    public double OldWeight { get; init; }

    /// <summary>Whether this step's growth is added to the basal segment's weighted sums.</summary>
    public bool Accumulate { get; init; }

    /// <summary>Length grown this step, m.</summary>
    public double GrownM { get; init; }

    /// <summary>1 / (metres grown since the basal segment became basal, after this step).</summary>
    public double InverseWeight { get; init; }

    /// <summary>Whether the basal segment is drawn with its new state (bending without growth, nothing accumulated).</summary>
    public bool BasalTakesState { get; init; }
}
