namespace CanopyAdvisor.Core.Geometry;

/// <summary>A vector in the site frame: x east, y north, z up, in metres (or unitless for directions).</summary>
/// <remarks>Immutable value type; all operations allocate nothing. See MODEL.md §0 for the frame.</remarks>
/// <param name="X">East component.</param>
/// <param name="Y">North component.</param>
/// <param name="Z">Up component.</param>
public readonly record struct Vector3(double X, double Y, double Z)
{
    /// <summary>The zero vector.</summary>
    public static Vector3 Zero => default;

    /// <summary>Unit vector east.</summary>
    public static Vector3 UnitX => new(1, 0, 0);

    /// <summary>Unit vector north.</summary>
    public static Vector3 UnitY => new(0, 1, 0);

    /// <summary>Unit vector up (the zenith).</summary>
    public static Vector3 UnitZ => new(0, 0, 1);

    /// <summary>Euclidean length.</summary>
    public double Length => Math.Sqrt((X * X) + (Y * Y) + (Z * Z));

    /// <summary>Squared Euclidean length.</summary>
    public double LengthSquared => (X * X) + (Y * Y) + (Z * Z);

    /// <summary>This vector scaled to unit length; the zero vector stays zero.</summary>
    public Vector3 Normalized()
    {
        double length = Length;
        return length > 0 ? this / length : Zero;
    }

    /// <summary>Dot product.</summary>
    public static double Dot(Vector3 a, Vector3 b) => (a.X * b.X) + (a.Y * b.Y) + (a.Z * b.Z);

    /// <summary>Cross product a × b.</summary>
    public static Vector3 Cross(Vector3 a, Vector3 b) =>
        new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));

    /// <summary>Component-wise sum.</summary>
    public static Vector3 operator +(Vector3 a, Vector3 b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    /// <summary>Component-wise difference.</summary>
    public static Vector3 operator -(Vector3 a, Vector3 b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    /// <summary>Negation.</summary>
    public static Vector3 operator -(Vector3 a) => new(-a.X, -a.Y, -a.Z);

    /// <summary>Scaling.</summary>
    public static Vector3 operator *(Vector3 a, double s) => new(a.X * s, a.Y * s, a.Z * s);

    /// <summary>Scaling.</summary>
    public static Vector3 operator *(double s, Vector3 a) => new(a.X * s, a.Y * s, a.Z * s);

    /// <summary>Division by a scalar.</summary>
    public static Vector3 operator /(Vector3 a, double s) => new(a.X / s, a.Y / s, a.Z / s);

    /// <summary>Named alternative to the + operator.</summary>
    public static Vector3 Add(Vector3 a, Vector3 b) => a + b;

    /// <summary>Named alternative to the - operator.</summary>
    public static Vector3 Subtract(Vector3 a, Vector3 b) => a - b;

    /// <summary>Named alternative to the unary - operator.</summary>
    public static Vector3 Negate(Vector3 a) => -a;

    /// <summary>Named alternative to the * operator.</summary>
    public static Vector3 Multiply(Vector3 a, double s) => a * s;

    /// <summary>Named alternative to the / operator.</summary>
    public static Vector3 Divide(Vector3 a, double s) => a / s;
}
