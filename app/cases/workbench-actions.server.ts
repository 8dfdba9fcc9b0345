import { z } from "zod";
import type { CurrentMember } from "~/auth/guards.server";
import { mayConclude, mayWorkOn } from "~/domain/case-access";
import { can } from "~/domain/permissions";
import { refuse } from "~/http/errors.server";
import type { Db } from "~/db/client.server";
import type { CaseFields } from "./case.server";
import { moveToNewestKnowledge } from "./knowledge-version.server";
import { keepTestCase } from "~/kb/test-cases.server";
import { askSenior, close, conclude, reopen, signOff, updateComplaint } from "./workflow.server";

// The forms of the case workbench, told apart by their intent.
export const WorkbenchForm = z.discriminatedUnion("intent", [
  z.object({
    intent: z.literal("conclude"),
    causeId: z.uuid({ message: "Choose the confirmed cause" }),
    notes: z.string().trim().min(3, "Say what you found and the repair").max(2000),
    version: z.coerce.number().int(),
  }),
  z.object({
    intent: z.enum(["signoff", "send-back"]),
    note: z.string().trim().max(2000).default(""),
    version: z.coerce.number().int(),
  }),
  z.object({
    intent: z.literal("ask-senior"),
    question: z.string().trim().max(500, "Keep the question under 500 characters").default(""),
  }),
  z.object({
    intent: z.literal("complaint"),
    complaint: z.string().trim().min(3, "The complaint needs a few words").max(2000),
    version: z.coerce.number().int(),
  }),
  z.object({
    intent: z.literal("reopen"),
    reason: z.string().trim().min(3, "Say why the case is reopened").max(1000),
    version: z.coerce.number().int(),
  }),
  z.object({ intent: z.literal("close"), version: z.coerce.number().int() }),
  z.object({ intent: z.literal("newest-knowledge") }),
  z.object({
    intent: z.literal("keep-test-case"),
    testName: z.string().trim().min(3, "Name the test case in a few words").max(200),
  }),
]);

/** The role check comes before the form is read, so a refused role learns nothing from validation. */
export function assertIntentAllowed(
  member: CurrentMember,
  c: Pick<CaseFields, "assignedMemberId">,
  intent: unknown,
) {
  const allowed =
    intent === "conclude"
      ? mayConclude(member, c)
      : intent === "signoff" || intent === "send-back"
        ? can(member.role, "case:signoff")
        : intent === "ask-senior"
          ? can(member.role, "case:ask-senior")
          : intent === "complaint"
            ? can(member.role, "case:open")
            : intent === "reopen"
              ? can(member.role, "case:reopen")
              : intent === "close"
                ? can(member.role, "case:close")
                : intent === "newest-knowledge"
                  ? mayWorkOn(member, c)
                  : intent === "keep-test-case"
                    ? can(member.role, "kb:edit")
                    : true; // unknown intents fail validation with a 400
  if (!allowed) refuse(403, `Your role (${member.role}) cannot do this on a case.`);
}

export async function runWorkbenchForm(
  db: Db,
  member: CurrentMember,
  c: CaseFields,
  form: z.infer<typeof WorkbenchForm>,
) {
  switch (form.intent) {
    case "conclude": {
      const state = await conclude(db, member, c, form);
      return state === "awaiting_signoff" ? "Sent for a senior's sign-off." : "Case concluded.";
    }
    case "signoff":
    case "send-back":
      await signOff(db, member, c, {
        accept: form.intent === "signoff",
        note: form.note,
        version: form.version,
      });
      return form.intent === "signoff" ? "Signed off." : "Sent back to diagnose.";
    case "ask-senior":
      await askSenior(db, member, c, form.question);
      return "A senior has been asked.";
    case "complaint":
      await updateComplaint(db, member, c, form.complaint, form.version);
      return "Complaint updated.";
    case "reopen":
      await reopen(db, member, c, form);
      return "Case reopened: the evidence can change again.";
    case "close":
      await close(db, member, c, form);
      return "Case closed.";
    case "keep-test-case": {
      const kept = await keepTestCase(db, member, c.id, form.testName);
      return `Kept as the test case “${kept.name}”: every preview of a change now ranks it too.`;
    }
    case "newest-knowledge": {
      const { from, to, moved } = await moveToNewestKnowledge(db, member, c);
      return moved
        ? `Ranked again with knowledge-base version ${to} (it was ranked with version ${from}).`
        : `Already ranked with the newest knowledge-base version, ${to}.`;
    }
  }
}
