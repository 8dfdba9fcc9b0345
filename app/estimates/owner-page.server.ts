import { redirect } from "react-router";
import { z } from "zod";
import { env } from "~/config/env.server";
import { paymentsFor, startCheckout } from "~/payments/checkout.server";
import type { Db } from "~/db/client.server";
import { DECISIONS } from "~/domain/owner-side";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { depositOf, totalsOf } from "./document";
import { answerEstimate, findOwnerLink, recordOpen } from "./owner-answer.server";

/** What the owner's page shows; opening it is recorded. */
export async function ownerPage(db: Db, token: string) {
  const found = await findOwnerLink(db, token);
  await recordOpen(db, found);
  const doc = found.sent.document;
  const paid = (await paymentsFor(db, found.sent.workshopId, found.sent.caseId)).find(
    (p) => p.sentEstimateId === found.sent.id && (p.status === "paid" || p.status === "refunded"),
  );
  const approved = new Set([...found.decisions].filter(([, d]) => d === "approved").map(([id]) => id));
  return {
    doc,
    answered: found.sent.answeredAt ? { at: found.sent.answeredAt, note: found.sent.ownerNote } : null,
    decisions: Object.fromEntries(found.decisions),
    expiresAt: found.link.expiresAt,
    totalAll: totalsOf(doc),
    totalApproved: found.sent.answeredAt ? totalsOf(doc, approved) : null,
    deposit: depositOf(doc),
    payment: paid ? { status: paid.status, amountMinor: paid.amountMinor, paidAt: paid.paidAt } : null,
    ids: { workshopId: found.sent.workshopId, caseId: found.sent.caseId, sentEstimateId: found.sent.id },
  };
}

/**
 * Pay: a checkout session for the diagnostic fee with our own amount and currency, and the owner
 * sent to the payment service's page; they come back to this page, which shows what its webhook said.
 */
export async function startOwnerPayment(db: Db, token: string) {
  const found = await findOwnerLink(db, token);
  const doc = found.sent.document;
  const amount = depositOf(doc);
  if (amount <= 0) return invalid({ form: ["Nothing is to be paid online for this estimate."] }, 409);
  const here = new URL(`/o/${token}`, env().APP_URL).toString();
  const { url } = await startCheckout(db, {
    workshopId: found.sent.workshopId,
    caseId: found.sent.caseId,
    sentEstimateId: found.sent.id,
    purpose: "diagnostic_fee",
    amountMinor: amount,
    currency: doc.currency,
    description: `Diagnosis, case ${doc.caseNumber} (${doc.registration})`,
    successUrl: `${here}?paid=1`,
    cancelUrl: here,
  });
  throw redirect(url);
}

const Answer = z.object({
  intent: z.literal("answer"),
  note: z.string().trim().max(1000, "Your note is at most 1,000 characters.").default(""),
});

/** The owner's answer form: a choice per item named item-<id>, and a note. */
export async function runOwnerAnswer(db: Db, token: string, form: FormData) {
  // A dead link answers as it does for a GET, whatever was posted.
  await findOwnerLink(db, token);
  const parsed = Answer.safeParse(Object.fromEntries(form));
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const decisions: Record<string, (typeof DECISIONS)[number]> = {};
  for (const [k, v] of form)
    if (k.startsWith("item-") && (DECISIONS as readonly string[]).includes(String(v)))
      decisions[k.slice(5)] = v as (typeof DECISIONS)[number];
  return onForm(async () => {
    const r = await answerEstimate(db, token, { decisions, note: parsed.data.note });
    return r.approved === 0
      ? "Thank you: you declined the work. The workshop has been told."
      : `Thank you: you approved ${r.approved} of ${r.of} items. The workshop has been told.`;
  });
}
