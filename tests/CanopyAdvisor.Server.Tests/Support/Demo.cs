namespace CanopyAdvisor.Server.Tests.Support;

/// <summary>The demo organisation's sign-ins (seeded by the service; demo data).</summary>
public static class Demo
{
    public const string Admin = "admin@demo.invalid";
    public const string Grower = "grower@demo.invalid";
    public const string Designer = "designer@demo.invalid";
    public const string Manager = "manager@demo.invalid";
}
