namespace CanopyAdvisor.Server.Problems;

/// <summary>Marks a request body type whose every member is optional, so the body may be left out.</summary>
internal interface IOptionalBody;
