namespace Decide.Web.Components.Pages.Inputs;

/// <summary>
/// Runs one save at a time: a change made while a save is on its way is saved right after it, once, with whatever
/// is current by then (the save reads the latest state itself). Quick changes in a row cost at most two saves.
/// </summary>
public sealed class SaveQueue
{
    private bool _running;
    private bool _again;

    /// <summary>True while a save is on its way.</summary>
    public bool Running => _running;

    public async Task RunAsync(Func<Task> save)
    {
        if (_running)
        {
            _again = true;
            return;
        }

        _running = true;
        try
        {
            do
            {
                _again = false;
                await save();
            }
            while (_again);
        }
        finally
        {
            _running = false;
        }
    }
}
