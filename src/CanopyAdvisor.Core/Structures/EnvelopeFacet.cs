using System.Collections.Immutable;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Structures;

/// <summary>One planar piece of a glasshouse envelope: a roof plane, a wall, or a gable triangle, with its cover.</summary>
/// <param name="Name">
/// What the piece is: <c>roof[i].left</c> / <c>roof[i].right</c> (bay i from the left wall; the left plane is the one
/// nearer the left wall), <c>wall.left</c>, <c>wall.right</c>, <c>wall.front</c>, <c>wall.back</c>,
/// <c>gable.front[i]</c>, <c>gable.back[i]</c>.
/// </param>
/// <param name="Cover">The cover of the piece.</param>
/// <param name="Corners">Corners in the site frame, metres, in order around the edge (3 or 4).</param>
/// <param name="OutwardNormal">Unit normal pointing out of the glasshouse.</param>
public sealed record EnvelopeFacet(string Name, Cover Cover, ImmutableArray<Vector3> Corners, Vector3 OutwardNormal);
