using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Files.Sites;
using CanopyAdvisor.Server.Accounts;
using CanopyAdvisor.Server.Forecasting;
using CanopyAdvisor.Storage;
using NodaTime;

namespace CanopyAdvisor.Server.Hosting;

/// <summary>Seeds a new, empty store with the invented demo organisation (demo data, not a real business): one user
/// of each role and the two demo sites.</summary>
internal sealed class DemoSeeder(ICanopyStore store, Passwords passwords, IClock clock)
{
    /// <summary>The demo organisation's name.</summary>
    public const string OrganisationName = "Demo nursery (demo data)";

    /// <summary>The demo users' e-mails by role (the .invalid top-level domain is reserved for invented names, RFC 2606 §2).</summary>
    public static IReadOnlyList<(string Email, string Name, UserRole Role)> Users { get; } =
    [
        ("admin@demo.invalid", "Demo admin", UserRole.Admin),
        ("grower@demo.invalid", "Demo grower", UserRole.Grower),
        ("designer@demo.invalid", "Demo lighting designer", UserRole.LightingDesigner),
        ("manager@demo.invalid", "Demo manager", UserRole.Manager),
    ];

    /// <summary>Seeds when the store has no organisation yet; false when it already had one (nothing written).</summary>
    public async Task<bool> SeedIfEmptyAsync(string password, CancellationToken cancellationToken)
    {
        if (await store.Organisations.CountAsync(cancellationToken) > 0)
        {
            return false;
        }

        Instant now = clock.GetCurrentInstant();
        string organisationId = ApiTokens.NewId("org");
        string hash = passwords.Hash(password);
        var users = Users.Select(u => new UserRecord(ApiTokens.NewId("usr"), organisationId, u.Email, u.Name, u.Role, hash, AccountRules.NewSecurityStamp(), now)).ToList();
        var reader = new SiteFileReader(ServerBeamFactory.Instance);
        var sites = new List<SiteRecord>();
        foreach (string name in DemoSites.Names)
        {
            string json = DemoSites.ReadText(name);
            Site site = reader.Parse(json, name + ".json", baseDirectory: null);
            sites.Add(new SiteRecord(ApiTokens.NewId("site"), organisationId, site.Id, site.Name, json, 1, now, now, users[0].Id));
        }

        WriteOutcome outcome = await store.AddOrganisationAsync(new OrganisationRecord(organisationId, OrganisationName, true, now), users, sites, cancellationToken);
        return outcome == WriteOutcome.Written;
    }
}
