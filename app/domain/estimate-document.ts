// What an owner is sent, frozen: every figure and word as it was shown, so the page and the paper
// read the same whatever is edited later. Stored as JSON beside the send (sent_estimates.document).
import type { Priority } from "./knowledge";
import type { EstimateLineKind } from "./owner-side";

export type SentLine = {
  kind: EstimateLineKind;
  description: string;
  partNumber: string | null;
  quantityMilli: number;
  unitMinor: number;
  taxRateBp: number;
  amountMinor: number;
};

export type SentItem = {
  id: string;
  title: string;
  priority: Priority;
  required: boolean;
  lines: SentLine[];
  amountMinor: number; // the item's lines added, as entered (net or tax-inclusive)
};

/** The plain-words part: what was found, what the case measured, and what happens if it is left. */
export type SentFinding = {
  causeName: string;
  priority: Priority;
  ownerWords: string;
  ifLeft: string;
  evidence: string[];
  photos: { url: string; caption: string }[]; // findings' photos, once photos exist
};

export type SentEstimateDocument = {
  workshopName: string;
  caseNumber: number;
  vehicle: string;
  registration: string;
  ownerName: string;
  complaint: string;
  currency: string;
  pricesIncludeTax: boolean;
  findings: SentFinding[];
  items: SentItem[];
  depositMinor: number; // what the owner is asked to pay online now (the diagnostic fee), 0 for none
  message: string; // the advisor's own words
};
