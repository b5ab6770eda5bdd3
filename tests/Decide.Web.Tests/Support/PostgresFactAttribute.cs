namespace Decide.Web.Tests.Support;

/// <summary>
/// A test that needs PostgreSQL (several instances sharing one database). It runs in the test script's PostgreSQL
/// pass, where <c>DECIDE_TEST_POSTGRES</c> is set, and is reported as skipped in the SQLite pass.
/// </summary>
public sealed class PostgresFactAttribute : FactAttribute
{
    public PostgresFactAttribute()
    {
        if (DecideWebFactory.PostgresServer is null)
        {
            Skip = "needs PostgreSQL: set DECIDE_TEST_POSTGRES (./test.sh starts a throwaway cluster and sets it)";
        }
    }
}
