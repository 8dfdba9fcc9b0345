// Proposals to change the knowledge base: what a technician may ask for from a case, and the
// states a senior's review moves them through. Browser-safe.
export const PROPOSAL_KINDS = ["link", "cause", "symptom"] as const;
export type ProposalKind = (typeof PROPOSAL_KINDS)[number];
export const PROPOSAL_STATES = ["open", "accepted", "rejected"] as const;
export type ProposalState = (typeof PROPOSAL_STATES)[number];

export const PROPOSAL_KIND_LABEL: Record<ProposalKind, string> = {
  link: "This symptom points to a cause the ranking undervalues",
  cause: "A cause the knowledge base does not have",
  symptom: "A symptom the knowledge base does not have",
};
export const PROPOSAL_STATE_LABEL: Record<ProposalState, string> = {
  open: "waiting for a senior",
  accepted: "accepted",
  rejected: "rejected",
};
