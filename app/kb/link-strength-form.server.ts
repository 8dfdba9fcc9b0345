// A senior's strength form from a links table, read the same way on a cause's page and on a
// symptom's: which link, the strength in a word or a figure, and whether to preview or save. Kept in
// one place so both pages refuse the same input with the same words beside the same field.
import { z } from "zod";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { describeStrength, readStrength } from "~/domain/link-strength";
import type { FormAnswer } from "~/http/forms";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { setLinkStrength } from "./cause-links.server";
import { previewChange } from "./impact.server";
import { type LinkPreview, strengthField } from "./link-rows";

const NOT_LINKED = "That link is not in this knowledge base.";

const StrengthForm = z.object({
  intent: z.enum(["strength", "preview"]),
  link: z.enum(["symptom", "check"], { message: "Say which kind of link this is." }),
  otherId: z.string().uuid(NOT_LINKED),
  strength: z.string().max(40, "Say it in a word or a figure."),
});

/** The form intents this module answers. */
export const isStrengthIntent = (intent: unknown) => intent === "strength" || intent === "preview";

/**
 * The page the form came from: a cause's (the row is one of its symptoms or checks) or a
 * symptom's (the row is a cause; `causeIds` are the causes it is linked to, so a posted id that
 * is not one of them is refused before anything is ranked).
 */
export type StrengthPage = { causeId: string } | { symptomId: string; causeIds: string[] };

/** A preview answers with the effect to show under its row; a save, with its notice. */
export type StrengthAnswer = FormAnswer & { preview?: LinkPreview };

export async function answerStrengthForm(
  db: Db,
  member: Pick<CurrentMember, "workshopId" | "userId" | "memberId">,
  form: Record<string, FormDataEntryValue>,
  page: StrengthPage,
): Promise<StrengthAnswer | ReturnType<typeof invalid>> {
  const parsed = StrengthForm.safeParse(form);
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const { intent, link, otherId, strength } = parsed.data;
  if ("symptomId" in page && (link !== "symptom" || !page.causeIds.includes(otherId)))
    return invalid({ form: [NOT_LINKED] });
  const read = readStrength(strength);
  if ("error" in read) return invalid({ [strengthField(link, otherId)]: [read.error] });
  const causeId = "causeId" in page ? page.causeId : otherId;
  if (intent === "preview") {
    const change =
      link === "check"
        ? { link, checkId: otherId, causeId, p: read.p }
        : { link, symptomId: "symptomId" in page ? page.symptomId : otherId, causeId, p: read.p };
    const impact = await previewChange(db, member.workshopId, change);
    return { errors: {}, notice: null, preview: { link, otherId, p: read.p, impact } };
  }
  return onForm(async () => {
    const done = await setLinkStrength(db, member, {
      link,
      causeId,
      otherId: "symptomId" in page ? page.symptomId : otherId,
      p: read.p,
    });
    // The row's own name: the symptom or check on a cause's page, the cause on a symptom's.
    const row = "symptomId" in page ? done.causeName : done.otherName;
    return `“${row}”: ${describeStrength(done.before)} → ${describeStrength(done.after)}. Knowledge base now at version ${done.kbVersion}.`;
  });
}
