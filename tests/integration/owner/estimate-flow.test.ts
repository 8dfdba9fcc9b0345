// The owner side end to end in the server modules, against the real PostgreSQL: the draft from the
// confirmed cause, the frozen send with its link and e-mail, the owner's page and answer, and every
// way a link stops working. Figures are the demo workshop's (invented): labour £84.00 an hour, VAT 20 %.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import type { CurrentMember } from "~/auth/guards.server";
import { auditLog, estimateItems, mailOutbox, ownerDecisions, ownerLinks, sentEstimates } from "~/db/schema";
import { addLine, draftFromCause, loadDraft } from "~/estimates/draft.server";
import { loadEstimateCase } from "~/estimates/estimate-case.server";
import { ownerSide } from "~/estimates/estimate-page.server";
import { answerEstimate, findOwnerLink, NOT_VALID } from "~/estimates/owner-answer.server";
import { ownerPage } from "~/estimates/owner-page.server";
import { hashOwnerToken } from "~/estimates/owner-token.server";
import { revokeOpenLinks, sendEstimate } from "~/estimates/send.server";
import { testDb } from "../../setup/integration-worker";
import { BRAMBLEGATE, caseId, memberFor } from "../api/helpers";

const CASE = caseId("b4"); // concluded: brake pads worn to the backing plate, pad thickness read 0.8 mm
let dana: CurrentMember;

async function refusal(p: Promise<unknown>) {
  try {
    await p;
  } catch (e) {
    if (e instanceof Response)
      return {
        status: e.status,
        body: (await e.json()) as { error: string; errors?: Record<string, string[]> },
      };
    throw e;
  }
  throw new Error("expected a refusal");
}

beforeAll(async () => {
  dana = await memberFor(testDb(), "dana-reyes");
});

describe("the estimate for a concluded case", () => {
  let token: string;

  it("drafts the diagnostic time and the cause's typical repair", async () => {
    const db = testDb();
    expect(await draftFromCause(db, dana, await loadEstimateCase(db, BRAMBLEGATE, CASE))).toBe(2);
    const draft = await loadDraft(db, BRAMBLEGATE, CASE);
    expect(draft.map((i) => [i.title, i.required, i.priority])).toEqual([
      ["Diagnosis", true, "soon"],
      ["Brake pads worn to the backing plate", false, "stop"],
    ]);
    // 15 min of checks → a quarter hour at £84.00; the cause's £140.00 parts and 90 min → 1.5 h.
    expect(draft[0].lines.map((l) => [l.quantityMilli, l.unitMinor, l.taxRateBp])).toEqual([
      [250, 8400, 2000],
    ]);
    expect(draft[1].lines.map((l) => [l.kind, l.quantityMilli, l.unitMinor])).toEqual([
      ["part", 1000, 14_000],
      ["labour", 1500, 8400],
    ]);
    // Drafting again adds nothing.
    expect(await draftFromCause(db, dana, await loadEstimateCase(db, BRAMBLEGATE, CASE))).toBe(0);
  });

  it("sends a frozen version, a hashed link and the owner's e-mail in one go", async () => {
    const db = testDb();
    const [, repair] = await loadDraft(db, BRAMBLEGATE, CASE);
    const [rotors] = await db
      .insert(estimateItems)
      .values({ workshopId: BRAMBLEGATE, caseId: CASE, title: "Front discs", priority: "soon", position: 5 })
      .returning();
    await addLine(db, dana, CASE, {
      itemId: rotors.id,
      kind: "part",
      description: "Front discs, pair",
      partNumber: null,
      quantityMilli: 1000,
      unitMinor: 9000,
      taxRateBp: 2000,
    });
    expect(repair.lines).toHaveLength(2);
    const sent = await sendEstimate(db, dana, CASE, { message: "Ring us with any question." });
    token = sent.token;
    expect(sent.version).toBe(1);
    const [row] = await db.select().from(sentEstimates).where(eq(sentEstimates.caseId, CASE));
    // By hand: 21.00 + 140.00 + 126.00 + 90.00 = 377.00 net; VAT 75.40; 452.40.
    expect(row.document.items.map((i) => i.amountMinor)).toEqual([2100, 26_600, 9000]);
    expect(row.document.depositMinor).toBe(2520); // the diagnosis with its VAT: 21.00 + 4.20
    // The case's own evidence in the owner's words: the reading and the limit it missed.
    expect(row.document.findings[0].evidence[0]).toBe("You told us: grinding when braking.");
    // The limit in the workshop's units (this demo workshop reads imperial first) from the starter
    // base's 3 mm pad minimum (common practice, no published source; makers give their own).
    expect(row.document.findings[0].evidence.at(-1)).toBe(
      "We measured brake pad friction material thickness: 0.8 mm; it should be at least 0.118 in (3 mm).",
    );
    const [link] = await db.select().from(ownerLinks).where(eq(ownerLinks.sentEstimateId, row.id));
    expect(link.tokenHash).toBe(hashOwnerToken(token));
    expect(link.tokenHash).not.toContain(token);
    const mail = await db
      .select()
      .from(mailOutbox)
      .where(and(eq(mailOutbox.caseId, CASE), eq(mailOutbox.kind, "owner-estimate")));
    expect(mail).toHaveLength(1);
    expect(mail[0].toAddress).toMatch(/@mail\.example$/);
    expect(mail[0].text).toContain(`/o/${token}`);
    expect(mail[0].text).toContain("£452.40");
    expect((await ownerSide(db, BRAMBLEGATE, CASE)).state).toBe("sent");
  });

  it("keeps what was sent exactly, whatever is edited afterwards", async () => {
    const db = testDb();
    const before = (await db.select().from(sentEstimates).where(eq(sentEstimates.caseId, CASE)))[0].document;
    const [first] = await loadDraft(db, BRAMBLEGATE, CASE);
    await addLine(db, dana, CASE, {
      itemId: first.id,
      kind: "consumable",
      description: "Brake cleaner",
      partNumber: null,
      quantityMilli: 1000,
      unitMinor: 500,
      taxRateBp: 2000,
    });
    const after = (await db.select().from(sentEstimates).where(eq(sentEstimates.caseId, CASE)))[0].document;
    expect(after).toEqual(before);
  });

  it("records the owner opening the page, and audits the first opening once", async () => {
    const db = testDb();
    await ownerPage(db, token);
    const page = await ownerPage(db, token);
    expect(page.doc.items).toHaveLength(3);
    const [link] = await db
      .select()
      .from(ownerLinks)
      .where(eq(ownerLinks.tokenHash, hashOwnerToken(token)));
    expect(link.openCount).toBe(2);
    const opened = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, CASE), eq(auditLog.action, "owner.opened")));
    expect(opened).toHaveLength(1);
    expect((await ownerSide(db, BRAMBLEGATE, CASE)).state).toBe("opened");
  });

  it("refuses an answer that leaves an item out, beside that item, and changes nothing", async () => {
    const db = testDb();
    const { doc } = await ownerPage(db, token);
    const [, pads] = doc.items;
    const r = await refusal(answerEstimate(db, token, { decisions: { [pads.id]: "approved" }, note: "" }));
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.errors ?? {})).toEqual([`item-${doc.items[2].id}`]);
    expect(await db.select().from(ownerDecisions)).toHaveLength(0);
  });

  it("takes the owner's answer item by item and tells the technician and the advisor", async () => {
    const db = testDb();
    const { doc } = await ownerPage(db, token);
    const [, pads, discs] = doc.items;
    const r = await answerEstimate(db, token, {
      decisions: { [pads.id]: "approved", [discs.id]: "declined" },
      note: "Discs next month.",
    });
    // Approved: the diagnosis 21.00 + pads 266.00 = 287.00 net, VAT 57.40 → 344.40 (by hand).
    expect(r).toEqual({ approved: 1, of: 2, total: 34_440 });
    const side = await ownerSide(db, BRAMBLEGATE, CASE);
    expect(side.state).toBe("approved_some");
    expect(side.sent?.ownerNote).toBe("Discs next month.");
    const notices = await db
      .select()
      .from(mailOutbox)
      .where(and(eq(mailOutbox.caseId, CASE), eq(mailOutbox.kind, "owner-answered")));
    expect(notices.map((m) => m.toAddress).sort()).toEqual([
      "dana@bramblegate.example",
      "priya@bramblegate.example",
    ]);
    expect(notices[0].text).toContain("approved 1 of 2 items");
    const again = await refusal(
      answerEstimate(db, token, { decisions: { [pads.id]: "declined", [discs.id]: "declined" }, note: "" }),
    );
    expect(again.status).toBe(409);
  });
});

describe("a link that does not work says nothing about why", () => {
  it("refuses tampered, malformed, expired, revoked and superseded tokens with the same 404", async () => {
    const db = testDb();
    const first = await sendEstimate(db, dana, CASE, { message: "" });
    const tampered = first.token.slice(0, -1) + (first.token.endsWith("A") ? "B" : "A");
    const answers = [await refusal(findOwnerLink(db, tampered)), await refusal(findOwnerLink(db, "short"))];
    await db
      .update(ownerLinks)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(ownerLinks.tokenHash, hashOwnerToken(first.token)));
    answers.push(await refusal(findOwnerLink(db, first.token)));
    const second = await sendEstimate(db, dana, CASE, { message: "" });
    expect(await revokeOpenLinks(db, dana, CASE, true)).toBe(1);
    answers.push(await refusal(findOwnerLink(db, second.token)));
    const third = await sendEstimate(db, dana, CASE, { message: "" });
    await sendEstimate(db, dana, CASE, { message: "" });
    answers.push(await refusal(findOwnerLink(db, third.token)));
    expect(answers.map((a) => [a.status, a.body.error])).toEqual(Array(5).fill([404, NOT_VALID]));
  });
});
