using Decide.Web.Infrastructure;

var builder = WebApplication.CreateBuilder(args);

builder.AddDecideOperations();
builder.AddDecideStorage();
builder.AddDecideIdentity();
builder.AddDecideSecurity();
builder.AddDecideApi();
builder.AddDecideScreens();
builder.Services.AddDecideFeatures();

var app = builder.Build();

await app.PrepareDatabaseAsync();
app.UseDecideForwardedHeaders();
app.UseDecideSecurity();
app.UseDecidePipeline();
app.MapDecideOperations();
app.MapDecideApi();
app.MapDecideScreens();

app.Run();

/// <summary>Entry point; public so that integration tests can host the app.</summary>
public partial class Program;
