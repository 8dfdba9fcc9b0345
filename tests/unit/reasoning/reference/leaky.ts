import type { Model } from "~/reasoning";

// A hand case with a leak, an unlisted share and a check (arithmetic by hand, no published source):
//   causes A (base 2), B (base 1); unlistedPrior .1 → P(A) = .9 × 2/3 = .6, P(B) = .3, P(U) = .1
//   symptom s, leak .1, linked to A with .8 (B and U use the leak .1)
//   check k: P(fail | A) = .9, false alarm .2 (B and U)
export const leaky: Model = {
  causes: [
    { id: "A", prior: 2 },
    { id: "B", prior: 1 },
  ],
  symptoms: [{ id: "s", leak: 0.1 }],
  links: [{ symptomId: "s", causeId: "A", p: 0.8 }],
  checks: [{ id: "k", cost: 10, falseAlarm: 0.2, bears: [{ causeId: "A", pFail: 0.9 }] }],
};
