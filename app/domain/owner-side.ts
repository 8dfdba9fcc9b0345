// The owner side of a case, as the screens and the database name it: the estimate's lines, the
// owner's answer, the payment, and the state the advisor's list shows.

/** What an estimate line is for; a discount is a line of its own with a negative amount. */
export const ESTIMATE_LINE_KINDS = ["part", "labour", "consumable", "diagnostic_fee", "discount"] as const;
export type EstimateLineKind = (typeof ESTIMATE_LINE_KINDS)[number];

export const ESTIMATE_LINE_LABEL: Record<EstimateLineKind, string> = {
  part: "Part",
  labour: "Labour",
  consumable: "Consumables",
  diagnostic_fee: "Diagnostic fee",
  discount: "Discount",
};

/** The owner's word on one item of a sent estimate. */
export const DECISIONS = ["approved", "declined"] as const;
export type Decision = (typeof DECISIONS)[number];

/**
 * Where a case stands with its owner, in order: nothing sent, the estimate sent, the link opened,
 * the owner's answer (all, some or none of the items approved), paid. Derived from the newest
 * sent estimate and its payment; every step is audited when it happens.
 */
export const OWNER_STATES = [
  "not_sent",
  "sent",
  "opened",
  "approved_all",
  "approved_some",
  "declined",
  "paid",
] as const;
export type OwnerState = (typeof OWNER_STATES)[number];

export const OWNER_STATE_LABEL: Record<OwnerState, string> = {
  not_sent: "Estimate not sent",
  sent: "Sent to the owner",
  opened: "Opened by the owner",
  approved_all: "Owner approved all",
  approved_some: "Owner approved some",
  declined: "Owner declined",
  paid: "Paid",
};

export const PAYMENT_STATUSES = ["open", "paid", "refunded", "flagged"] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];

export const PAYMENT_STATUS_LABEL: Record<PaymentStatus, string> = {
  open: "Waiting for the owner",
  paid: "Paid",
  refunded: "Refunded",
  flagged: "Flagged: amounts disagree",
};

export const PAYMENT_PURPOSES = ["diagnostic_fee", "deposit"] as const;
export type PaymentPurpose = (typeof PAYMENT_PURPOSES)[number];

export const PAYMENT_PURPOSE_LABEL: Record<PaymentPurpose, string> = {
  diagnostic_fee: "Diagnostic fee",
  deposit: "Deposit",
};

export const MAIL_STATES = ["queued", "sent", "failed"] as const;
export type MailState = (typeof MAIL_STATES)[number];
