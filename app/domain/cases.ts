// A case's life and its evidence, as the screens and the database name them.

export const CASE_STATES = ["open", "awaiting_signoff", "concluded", "closed"] as const;
export type CaseState = (typeof CASE_STATES)[number];

export const CASE_STATE_LABEL: Record<CaseState, string> = {
  open: "Being diagnosed",
  awaiting_signoff: "Waiting for a senior",
  concluded: "Cause confirmed",
  closed: "Closed",
};

/** Who reported an observation: an owner's report weighs less than a technician's (docs/reasoning.md). */
export const OBSERVATION_SOURCES = ["owner", "technician"] as const;
export type ObservationSource = (typeof OBSERVATION_SOURCES)[number];

export const FINDING_RESULTS = ["pass", "fail"] as const;
export type FindingResult = (typeof FINDING_RESULTS)[number];
