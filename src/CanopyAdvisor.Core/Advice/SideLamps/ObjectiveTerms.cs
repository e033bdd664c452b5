namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>The parts of the planner's objective (see <see cref="SideLampPlanner"/>).</summary>
internal readonly record struct ObjectiveTerms(double Lateral, double Energy, double Ceiling, double Uniformity)
{
    public double Total => Lateral + Energy + Ceiling + Uniformity;
}
