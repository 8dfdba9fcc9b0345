// Where a case stands with its owner, from the newest sent estimate, its link and its payment. Pure.
import type { Decision, OwnerState, PaymentStatus } from "~/domain/owner-side";

export type OwnerFacts = {
  sent: boolean;
  opened: boolean;
  // The owner's word per item they could decide on (items owed in any case are left out).
  decisions: readonly Decision[] | null;
  payment: PaymentStatus | null;
};

export function ownerState(f: OwnerFacts): OwnerState {
  if (!f.sent) return "not_sent";
  if (f.payment === "paid") return "paid";
  if (f.decisions) {
    const approved = f.decisions.filter((d) => d === "approved").length;
    if (approved === 0) return "declined";
    return approved === f.decisions.length ? "approved_all" : "approved_some";
  }
  return f.opened ? "opened" : "sent";
}

/** The newest send in counts, as one SQL read gives it for a list of cases; null when none was sent. */
export type OwnerCounts = {
  opened: boolean;
  answered: boolean;
  decided: number;
  approved: number;
  paid: boolean;
};

export function ownerStateOf(c: OwnerCounts | null): OwnerState {
  if (!c) return "not_sent";
  const decisions: Decision[] | null = c.answered
    ? [
        ...Array(Number(c.approved)).fill("approved"),
        ...Array(Number(c.decided) - Number(c.approved)).fill("declined"),
      ]
    : null;
  return ownerState({ sent: true, opened: c.opened, decisions, payment: c.paid ? "paid" : null });
}
