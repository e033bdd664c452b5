namespace CanopyAdvisor.Benchmarks;

/// <summary>Which real lamp distribution the benchmark scene's lamps use.</summary>
public enum BeamKind
{
    /// <summary><c>LambertianDistribution.Instance</c> (closed form, axially symmetric).</summary>
    Lambertian,

    /// <summary><c>CosinePowerDistribution.FromBeamAngle(90°)</c> (closed form with a power, axially symmetric).</summary>
    CosinePower,

    /// <summary>A <c>TabulatedDistribution</c> read from an IES type C text (asymmetric, bilinear lookup).</summary>
    IesTabulated,
}
