namespace Decide.Web.Features.Inputs;

/// <summary>
/// The conflict-of-interest, confidentiality and independence declaration every assessor and price evaluator
/// accepts before anything of an evaluation is shown to them, and confirms again once the bidders are known.
/// Change <see cref="Version"/> whenever the wording changes: each signature records the version it accepted.
/// </summary>
public static class Declaration
{
    /// <summary>The version of the text below.</summary>
    public const string Version = "2026-1";

    public const string Title = "Declaration of impartiality, confidentiality and independent assessment";

    /// <summary>The declaration, one paragraph per commitment.</summary>
    public static IReadOnlyList<string> Paragraphs { get; } =
    [
        "Conflicts of interest. I have no financial, personal, family or professional interest in the outcome of this "
        + "procurement, or in any organisation that takes part in it, that could influence my assessment or could "
        + "reasonably be seen to do so. If I become aware of such an interest at any time, including when the bidders "
        + "become known to me, I will declare it at once in Decide and take no further part in assessing the bid concerned.",

        "Confidentiality. I will keep the bids, the panel's assessments and its discussions confidential and use them "
        + "only for this evaluation. I will not copy them outside Decide, I will respect information a bidder has marked "
        + "as commercially confidential, and I will not contact any bidder about this procurement: questions go through "
        + "the facilitator only.",

        "Independent assessment. I will score on my own, without conferring with other panel members before my scores "
        + "are submitted; only against the published criteria, scale and descriptors; and each bid on its own merits, "
        + "from its content and not by comparison with the other bids. For every score I will write a rationale that "
        + "cites the part of the bid it rests on.",

        "Records. I understand that this declaration, my scores, rationales and comments are kept, with my name and the "
        + "time, as part of the procurement record, and that they may be disclosed to auditors, review bodies and courts, "
        + "or to bidders under freedom-of-information or disclosure rules. I will write them accordingly.",

        "The role of Decide. Decide supports the panel's judgement and the decision-maker's own decision; it does not "
        + "replace them. The procurement law, funding rules and organisational policy that apply to this procurement "
        + "take precedence over anything Decide shows or suggests.",
    ];

    /// <summary>What an assessor confirms once the bidders' names are shown to them.</summary>
    public const string NamesConfirmation =
        "Now that I know who the bidders are, I confirm my declaration again, and I have declared below every interest "
        + "I have in any of them. I will not assess a bid with which I have declared a conflict of interest.";

    /// <summary>The reason stored on every cell an assessor is recused from.</summary>
    public const string RecusalReason = "recused: declared conflict of interest";
}
