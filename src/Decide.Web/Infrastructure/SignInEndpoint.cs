namespace Decide.Web.Infrastructure;

/// <summary>
/// Marks an endpoint where people or scripts sign in, and says how it answers an attempt over the limits: the API
/// with 429 and a problem document, the sign-in form by going back to the form, which says when to try again.
/// </summary>
/// <param name="ReturnsToForm">True for the sign-in form's post.</param>
public sealed record SignInEndpoint(bool ReturnsToForm);
