namespace Decide.Web.Components.Pages.Panel;

/// <summary>A term of the rating scale as offered for a moderated value: its code and label.</summary>
public sealed record TermChoice(string Code, string Label);
