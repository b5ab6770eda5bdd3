namespace Decide.Cli;

/// <summary>How <c>decide analyse</c> prints its results.</summary>
public enum AnalyseOutput
{
    /// <summary>The results document (decide-results/1).</summary>
    Json,

    /// <summary>A table for people to read.</summary>
    Table,
}
