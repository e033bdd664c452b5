using CanopyAdvisor.Core.Forecast;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>The site with each lot's canopy on its bench, as the lean forecast compiles it.</summary>
/// <remarks>
/// The same rule as <see cref="BenchForecaster"/> (see its remarks, "Canopy"): height = the lot's measured height,
/// sensing depth = half the crop's growth zone (at most the height), leaf area density = the crop's LAD × (reference
/// spacing / lot spacing)². The planner must see the light the forecast's stems see, canopy attenuation of low side
/// light included (Beer–Lambert, <see cref="Light.CanopyAttenuation"/>). Keep the two in step.
/// </remarks>
internal static class LotCanopies
{
    public static Site Apply(ForecastRequest request)
    {
        Site site = request.Site;
        var benches = site.Benches.ToBuilder();
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = benches.Count - 1; i >= 0; i--)
        {
            index[benches[i].Id] = i;
        }

        foreach (Lot lot in site.Lots)
        {
            if (!index.TryGetValue(lot.BenchId, out int b) || !request.Crops.TryGetValue(lot.CropId, out Crop? crop))
            {
                continue;
            }

            benches[b] = benches[b] with { Canopy = LotCanopy.For(lot, crop, request.ReferenceSpacingM) };
        }

        return site with { Benches = benches.MoveToImmutable() };
    }
}
