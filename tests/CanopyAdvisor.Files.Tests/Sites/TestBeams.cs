using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Photometry;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Files.Tests.Sites;

/// <summary>
/// A test double for the beam seam: records what the reader asked for and returns labelled distributions.
/// The real distributions (Core/Lamps) and the IES reader (Files/Photometry) are tested in their own test classes.
/// </summary>
internal sealed class TestBeams : IBeamFactory
{
    public List<string> Calls { get; } = [];

    /// <summary>IES loads by file name: a valid file returns this flux; any name in <see cref="BadIesFiles"/> fails.</summary>
    public double IesPpf { get; init; } = 1234;

    public HashSet<string> BadIesFiles { get; } = new(StringComparer.Ordinal);

    public BeamDistribution Isotropic()
    {
        Calls.Add("isotropic");
        return new Labelled("isotropic");
    }

    public BeamDistribution Lambertian()
    {
        Calls.Add("lambertian");
        return new Labelled("lambertian");
    }

    public BeamDistribution CosinePower(Angle beamAngle)
    {
        Calls.Add(FormattableString.Invariant($"cosinePower {beamAngle.Degrees:0.###}"));
        return new Labelled(FormattableString.Invariant($"cosinePower {beamAngle.Degrees:0.###}"));
    }

    public IesBeam LoadIes(string fullPath, IesValueUnits unit, double? micromolesPerLumen)
    {
        Calls.Add(FormattableString.Invariant($"ies {Path.GetFileName(fullPath)} {unit} {micromolesPerLumen}"));
        if (BadIesFiles.Contains(Path.GetFileName(fullPath)))
        {
            throw new InvalidInputException(Path.GetFileName(fullPath) + ":3", "expected TILT=");
        }

        if (!File.Exists(fullPath))
        {
            throw new FileNotFoundException("file not found", fullPath);
        }

        return new IesBeam(new Labelled("ies " + Path.GetFileName(fullPath)), IesPpf);
    }

    /// <summary>A distribution that only carries a label for assertions; never evaluated in these tests.</summary>
    internal sealed class Labelled(string label) : BeamDistribution
    {
        public string Label { get; } = label;

        public override bool IsAxiallySymmetric => true;

        public override double IntensityPerUnitFlux(double polarRadians, double aroundRadians) =>
            throw new NotSupportedException("label-only test double");
    }
}
