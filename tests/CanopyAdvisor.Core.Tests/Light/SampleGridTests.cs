using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Light;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Tests.Light;

public class SampleGridTests
{
    // Cell centres of a regular grid (Bench doc: n × m cell centres at the sensing height); hand-computed positions.
    [Fact]
    public void Points_are_cell_centres_at_sensing_height_with_edge_distances()
    {
        var bench = new Bench("b", new Footprint(10, 20, Angle.Zero, 4, 2), 0.8, new Canopy(0.3, 0.1, 2), 2, 4);
        var points = SampleGrid.ForBench(bench, 3);

        Assert.Equal(8, points.Length);
        SamplePoint first = points[0];
        Assert.Equal(3, first.BenchIndex);
        // Axis north, width to the right (east): first cell centre 1 m north and 0.25 m east of the corner.
        Assert.Equal(10.25, first.Position.X, 12);
        Assert.Equal(21.0, first.Position.Y, 12);
        Assert.Equal(1.0, first.Position.Z, 12); // 0.8 + 0.3 − 0.1
        Assert.Equal(1.0, first.ToFrontEdgeM, 12);
        Assert.Equal(3.0, first.ToBackEdgeM, 12);
        Assert.Equal(0.25, first.ToLeftEdgeM, 12);
        Assert.Equal(1.75, first.ToRightEdgeM, 12);

        SamplePoint last = points[7];
        Assert.Equal((1, 3), (last.AlongIndex, last.AcrossIndex));
        Assert.Equal(11.75, last.Position.X, 12);
        Assert.Equal(23.0, last.Position.Y, 12);
    }

    // Footprint convention: width lies to the right (clockwise) of the axis azimuth; an east axis puts width to the south.
    [Fact]
    public void Width_lies_to_the_right_of_the_axis()
    {
        var bench = new Bench("b", new Footprint(0, 0, Angle.FromDegrees(90), 2, 1), 0, new Canopy(0, 0, 0), 1, 1);
        SamplePoint p = Assert.Single(SampleGrid.ForBench(bench, 0));
        Assert.Equal(1.0, p.Position.X, 12);
        Assert.Equal(-0.5, p.Position.Y, 12);
    }
}
