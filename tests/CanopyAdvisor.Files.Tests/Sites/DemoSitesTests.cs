using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Sites;

namespace CanopyAdvisor.Files.Tests.Sites;

public class DemoSitesTests
{
    public static TheoryData<string> Names() => new(DemoSites.Names);

    [Theory]
    [MemberData(nameof(Names))]
    public void Demo_site_loads_and_validates_clean(string name)
    {
        Site site;
        try
        {
            site = DemoSites.Load(name, new TestBeams());
        }
        catch (InvalidInputException e)
        {
            Assert.Fail(e.Message);
            return;
        }

        Assert.Empty(SiteValidator.Validate(site));
        Assert.Contains("demo data", site.Name, StringComparison.Ordinal);
    }
}
