using System.Text.Json;

namespace Decide.Web.Features.Exchange;

/// <summary>
/// Import a portable evaluation file as a new evaluation (administrator).
/// </summary>
/// <param name="File">The <c>decide-evaluation/1</c> object.</param>
/// <param name="FacilitatorEmail">The account that will run the evaluation.</param>
/// <param name="Accounts">For each assessor code of the file, the e-mail address of the account that holds the seat.</param>
public sealed record ImportRequest(JsonElement File, string? FacilitatorEmail, IReadOnlyDictionary<string, string>? Accounts);

/// <summary>A file to download.</summary>
/// <param name="FileName">Suggested file name (with the evaluation's reference).</param>
/// <param name="ContentType">Media type.</param>
/// <param name="Content">The bytes.</param>
public sealed record DownloadFile(string FileName, string ContentType, byte[] Content);
