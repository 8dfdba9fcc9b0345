// A small sent estimate for the payments tests to pay against: what sent_estimates keeps. Invented.
import type { SentEstimateDocument } from "~/domain/estimate-document";

export const SAMPLE_SENT_DOCUMENT: SentEstimateDocument = {
  workshopName: "Bramblegate Motor Works",
  caseNumber: 1041,
  vehicle: "Test vehicle",
  registration: "TEST 01",
  ownerName: "Test Owner",
  complaint: "Test complaint.",
  currency: "GBP",
  pricesIncludeTax: true,
  findings: [],
  items: [],
  depositMinor: 4500,
  message: "",
};
