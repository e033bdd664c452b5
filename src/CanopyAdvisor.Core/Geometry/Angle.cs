namespace CanopyAdvisor.Core.Geometry;

/// <summary>A plane angle. Radians inside the model; degrees only at the edges (files, API, reports).</summary>
/// <remarks>Keeping the unit in the type means no public member of Core takes a bare double angle.</remarks>
public readonly record struct Angle : IComparable<Angle>
{
    private Angle(double radians) => Radians = radians;

    /// <summary>Radians in one degree, π/180.</summary>
    public const double RadiansPerDegree = Math.PI / 180.0;

    /// <summary>Degrees in one radian, 180/π.</summary>
    public const double DegreesPerRadian = 180.0 / Math.PI;

    /// <summary>The angle in radians.</summary>
    public double Radians { get; }

    /// <summary>The angle in degrees.</summary>
    public double Degrees => Radians * DegreesPerRadian;

    /// <summary>Zero.</summary>
    public static Angle Zero => default;

    /// <summary>A right angle.</summary>
    public static Angle RightAngle => new(Math.PI / 2);

    /// <summary>Creates an angle from radians.</summary>
    public static Angle FromRadians(double radians) => new(radians);

    /// <summary>Creates an angle from degrees.</summary>
    public static Angle FromDegrees(double degrees) => new(degrees * RadiansPerDegree);

    /// <summary>This angle wrapped into [0, 360°).</summary>
    public Angle Normalized()
    {
        double r = Radians % (2 * Math.PI);
        return new(r < 0 ? r + (2 * Math.PI) : r);
    }

    /// <summary>Sine.</summary>
    public double Sin() => Math.Sin(Radians);

    /// <summary>Cosine.</summary>
    public double Cos() => Math.Cos(Radians);

    /// <summary>Tangent.</summary>
    public double Tan() => Math.Tan(Radians);

    /// <summary>Sum.</summary>
    public static Angle operator +(Angle a, Angle b) => new(a.Radians + b.Radians);

    /// <summary>Difference.</summary>
    public static Angle operator -(Angle a, Angle b) => new(a.Radians - b.Radians);

    /// <summary>Negation.</summary>
    public static Angle operator -(Angle a) => new(-a.Radians);

    /// <summary>Scaling.</summary>
    public static Angle operator *(Angle a, double s) => new(a.Radians * s);

    /// <summary>Ordering.</summary>
    public static bool operator <(Angle a, Angle b) => a.Radians < b.Radians;

    /// <summary>Ordering.</summary>
    public static bool operator >(Angle a, Angle b) => a.Radians > b.Radians;

    /// <summary>Ordering.</summary>
    public static bool operator <=(Angle a, Angle b) => a.Radians <= b.Radians;

    /// <summary>Ordering.</summary>
    public static bool operator >=(Angle a, Angle b) => a.Radians >= b.Radians;

    /// <summary>Named alternative to +.</summary>
    public static Angle Add(Angle a, Angle b) => a + b;

    /// <summary>Named alternative to -.</summary>
    public static Angle Subtract(Angle a, Angle b) => a - b;

    /// <summary>Named alternative to unary -.</summary>
    public static Angle Negate(Angle a) => -a;

    /// <summary>Named alternative to *.</summary>
    public static Angle Multiply(Angle a, double s) => a * s;

    /// <inheritdoc />
    public int CompareTo(Angle other) => Radians.CompareTo(other.Radians);

    /// <inheritdoc />
    public override string ToString() => FormattableString.Invariant($"{Degrees:0.######}°");
}
