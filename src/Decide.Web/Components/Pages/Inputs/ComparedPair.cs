namespace Decide.Web.Components.Pages.Inputs;

/// <summary>Two items compared in one matrix (<paramref name="Group"/> null for the top level); <paramref name="First"/> comes first in the matrix.</summary>
public sealed record ComparedPair(string? Group, string First, string Second);
