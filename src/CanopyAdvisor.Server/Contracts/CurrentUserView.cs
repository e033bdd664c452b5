namespace CanopyAdvisor.Server.Contracts;

/// <summary>The signed-in user with the organisation and what the role may change.</summary>
/// <param name="User">The user.</param>
/// <param name="OrganisationName">The organisation's name.</param>
/// <param name="DemoData">Whether the organisation is the invented demo.</param>
/// <param name="SiteSectionsYouMayChange">The site file sections the role may change.</param>
public sealed record CurrentUserView(UserView User, string OrganisationName, bool DemoData, string SiteSectionsYouMayChange);
