namespace CanopyAdvisor.Core.Advice.SideLamps;

/// <summary>One candidate lamp in the planner's search: rail, type, position fraction, aim and dimming (radians).</summary>
internal readonly record struct Placement(int Rail, int Type, double Fraction, double YawRadians, double TiltRadians, double Dimming);
