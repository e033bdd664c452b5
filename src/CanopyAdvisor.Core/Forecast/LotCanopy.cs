using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Forecast;

/// <summary>The canopy a lot makes on its bench, for the light field: the forecast's rule (see <see cref="BenchForecaster"/>,
/// "Canopy"), shared by everything that compiles light for lots.</summary>
internal static class LotCanopy
{
    /// <summary>Height = the lot's measured height; leaf area density = the crop's LAD × (reference spacing / lot
    /// spacing)²; sensing depth = half the crop's growth zone, at most the height.</summary>
    /// <param name="lot">The lot.</param>
    /// <param name="crop">Its crop.</param>
    /// <param name="referenceSpacingM">The spacing at which the crop's LAD holds (<see cref="ForecastRequest.ReferenceSpacingM"/>).</param>
    public static Canopy For(Lot lot, Crop crop, double referenceSpacingM)
    {
        double heightM = lot.HeightMm / ModelConstants.MillimetresPerMetre;
        double depthM = Math.Min(heightM, crop.GrowthZoneLengthMm.Value / ModelConstants.MillimetresPerMetre / 2);
        double spacingRatio = referenceSpacingM / lot.SpacingM;
        double lad = crop.LeafAreaDensityM2PerM3.Value * spacingRatio * spacingRatio;
        return new Canopy(heightM, depthM, lad);
    }
}
