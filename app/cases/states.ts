export const CASE_STATES = ["open", "awaiting_signoff", "concluded", "closed"] as const;
export type CaseState = (typeof CASE_STATES)[number];
