import { z } from "zod";
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
  const approved = new Set([...found.decisions].filter(([, d]) => d === "approved").map(([id]) => id));
  return {
    doc,
    answered: found.sent.answeredAt ? { at: found.sent.answeredAt, note: found.sent.ownerNote } : null,
    decisions: Object.fromEntries(found.decisions),
    expiresAt: found.link.expiresAt,
    totalAll: totalsOf(doc),
    totalApproved: found.sent.answeredAt ? totalsOf(doc, approved) : null,
    deposit: depositOf(doc),
    ids: { workshopId: found.sent.workshopId, caseId: found.sent.caseId, sentEstimateId: found.sent.id },
  };
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
