namespace Decide.Data.Storage;

/// <summary>The database engines Decide stores its data in.</summary>
public enum DatabaseProvider
{
    /// <summary>SQLite: one file on one machine, the embedded default.</summary>
    Sqlite,

    /// <summary>PostgreSQL: one database shared by several instances of the service.</summary>
    Postgres,

    /// <summary>Another spelling of <see cref="Postgres"/>, accepted in settings.</summary>
    PostgreSQL = Postgres,
}

/// <summary>Database settings (section <c>Database</c>), read and checked once at start by <see cref="DataSetup.AddDecideData"/>.</summary>
public sealed class DatabaseOptions
{
    /// <summary>The configuration section.</summary>
    public const string Section = "Database";

    /// <summary><c>Sqlite</c> (default) or <c>Postgres</c>.</summary>
    public DatabaseProvider Provider { get; set; } = DatabaseProvider.Sqlite;

    /// <summary>Folder for the SQLite file (and the service's own files) when no connection string is given; relative to the content root.</summary>
    public string DataFolder { get; set; } = "data";

    /// <summary>Seed the demo evaluation and demo accounts into an empty database.</summary>
    public bool SeedDemo { get; set; } = true;

    /// <summary>Every setting that cannot be used, each a sentence naming its key.</summary>
    public IEnumerable<string> Problems()
    {
        if (!Enum.IsDefined(Provider))
        {
            yield return $"Database:Provider '{Provider}' is not supported; use Sqlite or Postgres.";
        }

        if (string.IsNullOrWhiteSpace(DataFolder))
        {
            yield return "Database:DataFolder is empty; give a folder for the service's files (default: data).";
        }
    }
}
