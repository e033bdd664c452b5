using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sky;

namespace CanopyAdvisor.Core.Tests.Sky;

public class ErbsDecompositionTests
{
    // Erbs, Klein & Duffie (1982) correlation; values computed from the published polynomial (MODEL.md §1.3).
    [Theory]
    [InlineData(0.1, 0.9910)]
    [InlineData(0.3, 0.9486)]
    [InlineData(0.5, 0.6591)]
    [InlineData(0.7, 0.2440)]
    [InlineData(0.9, 0.165)]
    public void DiffuseFraction_MatchesPublishedCorrelation(double kt, double expected) =>
        Assert.Equal(expected, ErbsDecomposition.DiffuseFraction(kt), 4);

    // The published pieces nearly meet at the break points (Erbs et al. 1982): at kt = 0.22, 0.9802 (linear piece)
    // vs 0.9799 (polynomial); at 0.80, 0.1653 (polynomial) vs 0.165 (constant); all computed from the formulas.
    [Fact]
    public void DiffuseFraction_PiecesNearlyMeet()
    {
        Assert.Equal(0.9802, ErbsDecomposition.DiffuseFraction(0.22), 4);
        Assert.Equal(0.9799, ErbsDecomposition.DiffuseFraction(0.2200001), 4);
        Assert.Equal(0.1653, ErbsDecomposition.DiffuseFraction(0.8), 4);
        Assert.Equal(0.165, ErbsDecomposition.DiffuseFraction(0.8000001), 4);
    }

    // Split at z = 60°, I0n = 1367, GHI = 341.75 → kt = 341.75/(1367·0.5) = 0.5 (computed), DHI = 0.6591·GHI,
    // DNI = (GHI − DHI)/cos z (definitions).
    [Fact]
    public void Split_FollowsDefinitions()
    {
        DiffuseSplit split = ErbsDecomposition.Split(341.75, Angle.FromDegrees(60), 1367.0);
        Assert.Equal(0.5, split.ClearnessIndex, 9);
        Assert.Equal(0.6591, split.Irradiance.DiffuseHorizontalWm2 / 341.75, 4);
        Assert.Equal((341.75 - split.Irradiance.DiffuseHorizontalWm2) / 0.5, split.Irradiance.DirectNormalWm2, 9);
        Assert.Equal(341.75, split.Irradiance.GlobalHorizontalWm2);
    }

    // Near the horizon (z > 87°, the documented guard) and below it, everything is diffuse.
    [Theory]
    [InlineData(88.0)]
    [InlineData(93.0)]
    public void Split_NearHorizonIsAllDiffuse(double zenithDeg)
    {
        DiffuseSplit split = ErbsDecomposition.Split(20.0, Angle.FromDegrees(zenithDeg), 1367.0);
        Assert.Equal(0.0, split.Irradiance.DirectNormalWm2);
        Assert.Equal(20.0, split.Irradiance.DiffuseHorizontalWm2);
    }
}
