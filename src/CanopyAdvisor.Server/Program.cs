using CanopyAdvisor.Server.Hosting;

WebApplicationBuilder builder = WebApplication.CreateBuilder(args);
builder.Configuration.AddCanopySources(args);
builder.AddCanopyService();

WebApplication app = builder.Build();
app.UseCanopyService();
app.Run();

/// <summary>The service's entry point (declared so the tests can host it with WebApplicationFactory).</summary>
public partial class Program;
