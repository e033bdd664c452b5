using CanopyAdvisor.Core.Lamps;

namespace CanopyAdvisor.Core.Tests.Lamps;

/// <summary>Independent midpoint-rule quadrature over the sphere, used to check normalisation and flux.</summary>
internal static class SphereIntegral
{
    public static double Of(BeamDistribution d, int polarSteps = 1800, int aroundSteps = 360)
    {
        double dt = Math.PI / polarSteps;
        double dp = 2 * Math.PI / aroundSteps;
        double total = 0;
        for (int i = 0; i < polarSteps; i++)
        {
            double t = (i + 0.5) * dt;
            double ring = 0;
            for (int j = 0; j < aroundSteps; j++)
            {
                ring += d.IntensityPerUnitFlux(t, (j + 0.5) * dp);
            }

            total += ring * Math.Sin(t) * dt * dp;
        }

        return total;
    }
}
