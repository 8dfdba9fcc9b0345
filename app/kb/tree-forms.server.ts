// The cause page's forms that grow and prune the tree (add under, merge into, link to), read and
// answered in one place so the route stays thin: the choices each form offers, and each intent's
// answer in the one form-answer shape (messages by field, 4xx, nothing changed).
import { and, asc, eq, isNull, notInArray, sql } from "drizzle-orm";
import { href, redirect } from "react-router";
import { z } from "zod";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { causes, checkLinks, checks, symptomLinks, symptoms } from "~/db/schema";
import { PRIORITIES } from "~/domain/knowledge";
import { describeStrength, readStrength } from "~/domain/link-strength";
import { figureBetween, invalid, onForm, zodErrors } from "~/http/forms.server";
import { editOf, updateCause } from "./cause-edit.server";
import { addCause, addLink, mergeCause } from "./tree-edit.server";

type Cause = typeof causes.$inferSelect;

/** What the tree forms of one cause offer a senior: causes to merge into, items not yet linked. */
export async function treeChoices(db: Db, workshopId: string, cause: Cause) {
  const sameLevel =
    cause.level === "system"
      ? []
      : await db
          .select({ id: causes.id, name: causes.name, system: causes.system })
          .from(causes)
          .where(
            and(
              eq(causes.workshopId, workshopId),
              eq(causes.level, cause.level),
              isNull(causes.retiredAt),
              sql`${causes.id} <> ${cause.id}`,
            ),
          )
          .orderBy(causes.system, asc(causes.name));
  if (cause.level !== "failure_mode") return { mergeInto: sameLevel, symptoms: [], checks: [] };
  const [unlinkedSymptoms, unlinkedChecks] = await Promise.all([
    db
      .select({ id: symptoms.id, name: symptoms.name })
      .from(symptoms)
      .where(
        and(
          eq(symptoms.workshopId, workshopId),
          notInArray(
            symptoms.id,
            db
              .select({ id: symptomLinks.symptomId })
              .from(symptomLinks)
              .where(eq(symptomLinks.causeId, cause.id)),
          ),
        ),
      )
      .orderBy(asc(symptoms.name)),
    db
      .select({ id: checks.id, name: checks.name })
      .from(checks)
      .where(
        and(
          eq(checks.workshopId, workshopId),
          notInArray(
            checks.id,
            db.select({ id: checkLinks.checkId }).from(checkLinks).where(eq(checkLinks.causeId, cause.id)),
          ),
        ),
      )
      .orderBy(asc(checks.name)),
  ]);
  return { mergeInto: sameLevel, symptoms: unlinkedSymptoms, checks: unlinkedChecks };
}

export type TreeChoices = Awaited<ReturnType<typeof treeChoices>>;

const number = figureBetween;
// The add form's fields are named apart from the edit form's on the same page, so a message lands
// beside the field that caused it.
const AddForm = z.object({
  newName: z.string().trim().min(3, "Name it in at least 3 characters.").max(200),
  newDescription: z.string().trim().max(2000).default(""),
  newOwnerDescription: z.string().trim().max(1000).default(""),
  newBaseRate: number("A base rate is a number above 0, such as 2 or 0.5.", 0.0001, 1000).optional(),
  newRepairMinutes: number("Repair minutes are a whole number from 0 to 10,000.", 0, 10_000).optional(),
  newPartsCost: number("The parts cost is a number, such as 110 or 1,250.", 0, 1_000_000).optional(),
  newPriority: z.enum(PRIORITIES, { message: "Choose a priority." }).optional(),
});
const MergeForm = z.object({
  intoId: z.string().uuid("Choose the cause to merge it into."),
  confirm: z.literal("yes", { message: "Tick the box to say you mean to merge it." }),
});
const LinkForm = z.object({
  link: z.enum(["symptom", "check"], { message: "Say which kind of link this is." }),
  otherId: z.string().uuid("Choose what it links to."),
  strength: z.string().trim().min(1, "Say how strongly, in a word or a figure.").max(40),
});

const blankToUndefined = (form: Record<string, FormDataEntryValue>) =>
  Object.fromEntries(Object.entries(form).filter(([, v]) => v !== ""));

/** The answer to a tree intent, or null when the form is not one of them. */
export async function treeIntent(
  db: Db,
  member: CurrentMember,
  cause: Cause,
  form: Record<string, FormDataEntryValue>,
) {
  if (form.intent === "add-child") {
    const parsed = AddForm.safeParse(blankToUndefined(form));
    if (!parsed.success) return invalid(zodErrors(parsed.error));
    const v = parsed.data;
    return onForm(async () => {
      const made = await addCause(db, member, cause.id, {
        name: v.newName,
        description: v.newDescription,
        ownerDescription: v.newOwnerDescription,
        baseRate: v.newBaseRate,
        priority: v.newPriority,
        repairMinutes: v.newRepairMinutes === undefined ? undefined : Math.round(v.newRepairMinutes),
        partsCost: v.newPartsCost,
      });
      // The new cause's own page, where its links are added next.
      throw redirect(href("/kb/causes/:causeId", { causeId: made.id }));
    });
  }
  if (form.intent === "move") {
    // From the tree: only its place changes; its words and figures are saved as they are.
    const parentId = typeof form.parentId === "string" ? form.parentId : "";
    if (!parentId) return invalid({ parentId: ["Choose where it belongs."] });
    return onForm(async () => {
      const done = await updateCause(db, member, cause.id, { ...editOf(cause), parentId });
      return done.changed.length
        ? `Moved “${cause.name}” under “${done.movedUnder}”. Knowledge base now at version ${done.kbVersion}.`
        : `“${cause.name}” is there already.`;
    });
  }
  if (form.intent === "merge") {
    const parsed = MergeForm.safeParse(form);
    if (!parsed.success) {
      // Retiring has a "confirm" box of its own on the same page.
      const { confirm, ...errors } = zodErrors(parsed.error);
      return invalid({ ...errors, ...(confirm ? { "confirm-merge": confirm } : {}) });
    }
    return onForm(async () => {
      const done = await mergeCause(db, member, cause.id, parsed.data.intoId);
      return `“${done.from}” is merged into “${done.into}” (${done.level === "component" ? `${done.moved} failure modes moved` : `${done.moved} links moved, ${done.kept} kept as the other had them`}). Knowledge base now at version ${done.kbVersion}.`;
    });
  }
  if (form.intent === "add-link") {
    // One form per kind of link on the page: each message goes beside that form's own field.
    const kind = form.link === "check" ? "check" : "symptom";
    const parsed = LinkForm.safeParse(form);
    if (!parsed.success) {
      const errors = zodErrors(parsed.error);
      return invalid({
        ...(errors.otherId ? { [`${kind}Id`]: errors.otherId } : {}),
        ...(errors.strength ? { [`${kind}Strength`]: errors.strength } : {}),
        ...(errors.link ? { form: errors.link } : {}),
      });
    }
    const read = readStrength(parsed.data.strength);
    if ("error" in read) return invalid({ [`${kind}Strength`]: [read.error] });
    return onForm(async () => {
      const done = await addLink(db, member, { ...parsed.data, causeId: cause.id, p: read.p });
      return `Linked “${done.otherName}”: ${describeStrength(read.p)}. Knowledge base now at version ${done.kbVersion}.`;
    });
  }
  return null;
}
