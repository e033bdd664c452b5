using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Advice.Rotation;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Server.Advice;

/// <summary>A site's rotation plan and labour schedule, with the model they were made from.</summary>
/// <param name="Model">The site with its rotations done applied.</param>
/// <param name="Plan">The rotation plan.</param>
/// <param name="Schedule">Its tasks on the crews.</param>
/// <param name="RotationsDone">How many stored rotations done the plan started from.</param>
internal sealed record PlannedSite(Site Model, RotationPlan Plan, LabourSchedule Schedule, int RotationsDone);
