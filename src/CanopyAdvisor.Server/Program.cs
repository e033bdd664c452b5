using CanopyAdvisor.Server.Hosting;
using CanopyAdvisor.Storage;

WebApplicationBuilder builder = WebApplication.CreateBuilder(args);
builder.Configuration.AddCanopySources(args);
builder.AddCanopyService();

WebApplication app = builder.Build();
app.UseCanopyService();
try
{
    app.Run();
    return 0;
}
catch (StoreInUseException e)
{
    // One service per data folder: say so plainly instead of a stack trace.
    Console.Error.WriteLine($"canopy server: {e.Message}");
    return 2;
}

/// <summary>The service's entry point (declared so the tests can host it with WebApplicationFactory).</summary>
public partial class Program;
