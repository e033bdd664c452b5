using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Structures;

namespace CanopyAdvisor.Core.Tests.Light;

// View factors from a horizontal element to a rectangle, from Howell, A Catalog of Radiation Heat Transfer
// Configuration Factors (B-3: parallel rectangle with a corner over the element; B-4: perpendicular rectangle, element
// at the level of its lower edge, opposite one corner). The sky is seen only through the rectangle, built with the real
// envelope facets or with real obstruction boxes, and integrated with a fine quadrature (300 zenith bands, 229 189
// directions; its edge error is about 0.1 %, so a 0.5 % tolerance leaves margin without hiding real errors).
public sealed class SkyViewHowellTests
{
    private const int FineBands = 300;
    private static readonly Lazy<HemisphereQuadrature> Fine = new(() => HemisphereQuadrature.Create(FineBands));

    // Clear opening: n = 1, no absorption, so τ = 1 at every angle (Fresnel reflectance vanishes for n = 1).
    private static readonly Cover Clear = new("clear opening", false, 1.0, 0, 0, 1);
    private static readonly Cover Dark = Cover.OpaqueSurface("opaque");

    // Howell B-3 closed form: F = (1/2π)[A/√(1+A²) atan(B/√(1+A²)) + B/√(1+B²) atan(A/√(1+B²))], A = a/c, B = b/c.
    private static double HowellB3(double a, double b, double c)
    {
        double aa = a / c, bb = b / c;
        double sa = Math.Sqrt(1 + (aa * aa)), sb = Math.Sqrt(1 + (bb * bb));
        return ((aa / sa * Math.Atan(bb / sa)) + (bb / sb * Math.Atan(aa / sb))) / (2 * Math.PI);
    }

    // Howell B-4 closed form: F = (1/2π)[atan(1/Y) − Y/√(X²+Y²) atan(1/√(X²+Y²))], X = h/w, Y = c/w.
    private static double HowellB4(double w, double h, double c)
    {
        double x = h / w, y = c / w, r = Math.Sqrt((x * x) + (y * y));
        return (Math.Atan(1 / y) - (y / r * Math.Atan(1 / r))) / (2 * Math.PI);
    }

    [Theory]
    // (a, b, c) → Howell B-3 values 0.138531606 and 0.220777622 (MODEL.md §3; closed form above).
    [InlineData(1.0, 1.0, 1.0, 0.138531606)]
    [InlineData(2.0, 1.0, 0.5, 0.220777622)]
    public void B3_opening_in_a_ceiling_through_envelope_facets(double a, double b, double c, double expected)
    {
        Assert.Equal(expected, HowellB3(a, b, c), 8);

        // Flat clear roof a × b at gutter height c, all walls opaque; the point is the floor corner under the roof's corner.
        var house = new Glasshouse(new Footprint(0, 0, Angle.Zero, a, b), 1, b, c, Angle.Zero, Clear, Dark, Dark, Dark, Dark, 0);
        IEnclosure enclosure = EnclosureBuilder.Build(house, []);
        SkyView view = SkyViewIntegrator.Integrate(Fine.Value, enclosure, Vector3.Zero);
        Assert.Equal(expected, view.ViewFactor, expected * 0.005);
    }

    [Theory]
    [InlineData(1.0, 1.0, 1.0, 0.138531606)]
    [InlineData(2.0, 1.0, 0.5, 0.220777622)]
    public void B3_opening_in_a_ceiling_through_obstruction_boxes(double a, double b, double c, double expected)
    {
        // An opaque ceiling slab at height c made of four boxes around the opening x ∈ [0, a], y ∈ [0, b]; "infinite"
        // extent 10⁶ m (the missing sky beyond it is below 10⁻⁶ rad of elevation); thickness 10⁻⁷ m.
        const double far = 1e6, thick = 1e-7;
        Obstruction[] ceiling =
        [
            Slab("west", -far, -far, far, 2 * far, c, thick),             // x < 0
            Slab("east", a, -far, far, 2 * far, c, thick),                // x > a
            Slab("south", 0, -far, a, far, c, thick),                     // 0 ≤ x ≤ a, y < 0
            Slab("north", 0, b, a, far, c, thick),                        // 0 ≤ x ≤ a, y > b
        ];
        IEnclosure room = EnclosureBuilder.Build(new IndoorRoom(new Footprint(-1, -1, Angle.Zero, 1, 1), 1), [.. ceiling]);
        SkyView view = SkyViewIntegrator.Integrate(Fine.Value, d => room.IsBlocked(Vector3.Zero, d * (10 * far)) ? 0 : 1);
        Assert.Equal(expected, view.ViewFactor, expected * 0.005);
    }

    [Theory]
    // (w, h, c) = (width along the wall, height, distance) → Howell B-4 values 0.055734197 and 0.135488397
    // (MODEL.md §3 lists them as (1,1,1) and (2,1,0.5); X = h/w, Y = c/w).
    [InlineData(1.0, 1.0, 1.0, 0.055734197)]
    [InlineData(2.0, 1.0, 0.5, 0.135488397)]
    public void B4_window_in_a_wall_through_envelope_facets(double w, double h, double c, double expected)
    {
        Assert.Equal(expected, HowellB4(w, h, c), 8);

        // Glasshouse with a flat opaque roof at height h, clear right (east) wall of length w, everything else opaque;
        // the point is on the floor at the front (south) wall, a distance c west of the clear wall.
        double width = c + 1;
        var house = new Glasshouse(new Footprint(0, 0, Angle.Zero, w, width), 1, width, h, Angle.Zero, Dark, Dark, Clear, Dark, Dark, 0);
        IEnclosure enclosure = EnclosureBuilder.Build(house, []);
        SkyView view = SkyViewIntegrator.Integrate(Fine.Value, enclosure, new Vector3(width - c, 0, 0));
        Assert.Equal(expected, view.ViewFactor, expected * 0.005);
        // The window lies to the east-north-east: the sky vector points that way.
        Assert.True(view.SkyVector.X > 0 && view.SkyVector.Y > 0);
    }

    [Theory]
    [InlineData(1.0, 1.0, 1.0, 0.055734197)]
    [InlineData(2.0, 1.0, 0.5, 0.135488397)]
    public void B4_window_in_a_wall_through_obstruction_boxes(double w, double h, double c, double expected)
    {
        // A vertical opaque wall in the plane y = c (thickness 10⁻⁷ m) with a window x ∈ [0, w], z ∈ [0, h], and an
        // opaque block behind the point (y < −10⁻⁹) so that only the window shows sky.
        const double far = 1e6, thick = 1e-7;
        Obstruction[] boxes =
        [
            Wall("below", -far, c, 2 * far, -far, 0, thick),
            Wall("above", -far, c, 2 * far, h, far, thick),
            Wall("left", -far, c, far, 0, h, thick),
            Wall("right", w, c, far, 0, h, thick),
            new Obstruction("behind", new Footprint(-far, -far, Angle.Zero, far - 1e-9, 2 * far), -far, far),
        ];
        IEnclosure room = EnclosureBuilder.Build(new IndoorRoom(new Footprint(-1, -1, Angle.Zero, 1, 1), 1), [.. boxes]);

        // The scene is turned 17° about the vertical relative to the quadrature (f depends only on d.z, so F is
        // unchanged): some quadrature directions lie exactly in the plane y = 0, and a ray running exactly along the
        // face of the block behind the point would escape between the boxes.
        double turn = 17 * Math.PI / 180;
        SkyView view = SkyViewIntegrator.Integrate(Fine.Value, d =>
        {
            var turned = new Vector3((d.X * Math.Cos(turn)) - (d.Y * Math.Sin(turn)), (d.X * Math.Sin(turn)) + (d.Y * Math.Cos(turn)), d.Z);
            return room.IsBlocked(Vector3.Zero, turned * (10 * far)) ? 0 : 1;
        });
        Assert.Equal(expected, view.ViewFactor, expected * 0.005);
    }

    // A horizontal slab covering x ∈ [x, x + dx], y ∈ [y, y + dy], bottom at z (footprint axis east, width southward).
    private static Obstruction Slab(string id, double x, double y, double dx, double dy, double z, double thick) =>
        new(id, new Footprint(x, y + dy, Angle.RightAngle, dx, dy), z, z + thick);

    // A vertical slab in the plane y = y0 (thickness thick northward), x from x0 to x0 + dx, z from z0 to z1.
    private static Obstruction Wall(string id, double x0, double y0, double dx, double z0, double z1, double thick) =>
        new(id, new Footprint(x0, y0 + thick, Angle.RightAngle, dx, thick), z0, z1);
}
