namespace CanopyAdvisor.Browser.Tests.Support;

/// <summary>The browser tests share one service and one browser.</summary>
[CollectionDefinition(Name)]
public sealed class BrowserGroup : ICollectionFixture<BrowserFixture>
{
    /// <summary>The collection's name.</summary>
    public const string Name = "browser";
}
