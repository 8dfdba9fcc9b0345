// The advisor's estimate forms: each intent's fields checked with zod, then the work in its module.
import { z } from "zod";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { PRIORITIES } from "~/domain/knowledge";
import { ESTIMATE_LINE_KINDS } from "~/domain/owner-side";
import { refuse } from "~/http/errors.server";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { parseMoney, parseQuantity, toBasisPoints } from "~/money";
import { addItem, addLine, draftFromCause, removeItem, removeLine } from "./draft.server";
import { loadEstimateCase } from "./estimate-case.server";
import { revokeOpenLinks, sendEstimate } from "./send.server";

const text = (label: string, max: number) =>
  z.string().trim().min(1, `${label} is needed.`).max(max, `${label} is at most ${max} characters.`);

const Intent = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("draft") }),
  z.object({
    intent: z.literal("add-item"),
    title: text("A title", 120),
    priority: z.enum(PRIORITIES, { message: "Choose a priority." }),
  }),
  z.object({
    intent: z.literal("add-line"),
    itemId: z.uuid({ message: "Choose the item this line belongs to." }),
    kind: z.enum(ESTIMATE_LINE_KINDS, { message: "Choose what the line is for." }),
    description: text("A description", 200),
    partNumber: z.string().trim().max(60, "A part number is at most 60 characters.").optional(),
    quantity: z.string(),
    unitPrice: z.string(),
    zeroRated: z.literal("on").optional(),
  }),
  z.object({ intent: z.literal("remove-line"), lineId: z.uuid({ message: "No such line." }) }),
  z.object({ intent: z.literal("remove-item"), itemId: z.uuid({ message: "No such item." }) }),
  z.object({
    intent: z.literal("send"),
    message: z.string().trim().max(2000, "The message is at most 2,000 characters.").default(""),
  }),
  z.object({ intent: z.literal("revoke") }),
]);

export const ESTIMATE_INTENTS = [
  "draft",
  "add-item",
  "add-line",
  "remove-line",
  "remove-item",
  "send",
  "revoke",
] as const;

export async function runEstimateForm(db: Db, member: CurrentMember, caseId: string, form: FormData) {
  const parsed = Intent.safeParse(Object.fromEntries(form));
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const f = parsed.data;
  return onForm(async () => {
    switch (f.intent) {
      case "draft": {
        const made = await draftFromCause(db, member, await loadEstimateCase(db, member.workshopId, caseId));
        return made
          ? `Drafted ${made === 1 ? "one item" : `${made} items`} from the confirmed cause: check every figure.`
          : "The draft already has those items.";
      }
      case "add-item":
        await addItem(db, member, caseId, { title: f.title, priority: f.priority });
        return `Item "${f.title}" added.`;
      case "add-line": {
        const c = await loadEstimateCase(db, member.workshopId, caseId);
        const qty = parseQuantity(f.quantity);
        const price = parseMoney(f.unitPrice, c.currency);
        const errors: Record<string, string[]> = {};
        if ("error" in qty) errors.quantity = [qty.error];
        if ("error" in price) errors.unitPrice = [price.error];
        else if ((f.kind === "discount") !== price.minor < 0 && price.minor !== 0)
          errors.unitPrice = [
            f.kind === "discount"
              ? "A discount is a negative amount, for example -20."
              : "Only a discount is negative.",
          ];
        if (Object.keys(errors).length) refuse(400, "Check the figures of the line.", { errors });
        await addLine(db, member, caseId, {
          itemId: f.itemId,
          kind: f.kind,
          description: f.description,
          partNumber: f.partNumber || null,
          quantityMilli: (qty as { milli: number }).milli,
          unitMinor: (price as { minor: number }).minor,
          taxRateBp: f.zeroRated ? 0 : toBasisPoints(c.taxRate),
        });
        return "Line added.";
      }
      case "remove-line":
        await removeLine(db, member, caseId, f.lineId);
        return "Line removed.";
      case "remove-item":
        await removeItem(db, member, caseId, f.itemId);
        return "Item removed.";
      case "send": {
        const { version } = await sendEstimate(db, member, caseId, { message: f.message });
        return `Estimate version ${version} sent to the owner. Earlier links no longer work.`;
      }
      case "revoke": {
        const n = await revokeOpenLinks(db, member, caseId, true);
        return n
          ? "The owner's link no longer works. Send the estimate again to give them a new one."
          : "No link was open.";
      }
    }
  });
}
