// Conclusion and sign-off (docs/permissions.md): an apprentice's conclusion waits for a senior,
// a technician's stands, only a senior signs off; every change writes one audit row.
import { and, count, desc, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadCase } from "~/cases/case.server";
import { conclude, signOff } from "~/cases/workflow.server";
import { auditLog, cases } from "~/db/schema";
import { seedId } from "../../../seeds/ids";
import { testDb } from "../../setup/integration-worker";
import { caseId, causeId, freshCase, memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const state = async (id: string) => (await db().select().from(cases).where(eq(cases.id, id)))[0];
const auditCount = async () => (await db().select({ n: count() }).from(auditLog))[0].n;
const lastAudit = async (id: string) =>
  (
    await db().select().from(auditLog).where(eq(auditLog.entityId, id)).orderBy(desc(auditLog.id)).limit(1)
  )[0];

async function bundle(login: string, id: string) {
  const member = await memberFor(db(), login);
  return { member, c: await loadCase(db(), member, id) };
}

/** A refusal that leaves the case row and the audit log exactly as they were. */
async function refusedWithoutChange(id: string, work: () => Promise<unknown>, status: number) {
  const [before, audits] = [await state(id), await auditCount()];
  const r = await refusal(work());
  expect(r.status, JSON.stringify(r.body)).toBe(status);
  expect(typeof r.body.error).toBe("string");
  expect(await state(id)).toEqual(before);
  expect(await auditCount()).toBe(audits);
}

describe("an apprentice's conclusion and a senior's sign-off (demo case b2, assigned to Ollie)", () => {
  const b2 = caseId("b2");
  const noise = {
    causeId: causeId("brake_pad_noise"),
    notes: "Anti-squeal shims missing on the front pads.",
  };

  it("the apprentice's conclusion waits for a senior: awaiting_signoff, needs a senior, one audit row", async () => {
    const { member, c } = await bundle("ollie-mbeki", b2);
    const audits = await auditCount();
    expect(await conclude(db(), member, c, { ...noise, version: c.version })).toBe("awaiting_signoff");
    const row = await state(b2);
    expect(row).toMatchObject({
      state: "awaiting_signoff",
      needsSenior: true,
      conclusionCauseId: noise.causeId,
      concludedById: seedId("member:ollie-mbeki"),
      version: c.version + 1,
    });
    expect(await auditCount()).toBe(audits + 1);
    expect(await lastAudit(b2)).toMatchObject({
      action: "case.conclude",
      actorUserId: seedId("user:ollie-mbeki"),
      before: { state: "open" },
      after: { state: "awaiting_signoff" },
    });
  });

  it("a technician cannot sign it off (403), and nothing changes", async () => {
    const { member, c } = await bundle("priya-hale", b2);
    await refusedWithoutChange(
      b2,
      () => signOff(db(), member, c, { accept: true, note: "Looks right.", version: c.version }),
      403,
    );
  });

  it("an apprentice cannot sign off his own conclusion (403)", async () => {
    const { member, c } = await bundle("ollie-mbeki", b2);
    await refusedWithoutChange(
      b2,
      () => signOff(db(), member, c, { accept: true, note: "", version: c.version }),
      403,
    );
  });

  it("a senior's sign-off concludes it, records who signed, and writes an audit row", async () => {
    const { member, c } = await bundle("tomas-varga", b2);
    const audits = await auditCount();
    await signOff(db(), member, c, { accept: true, note: "Agreed: shims missing.", version: c.version });
    expect(await state(b2)).toMatchObject({
      state: "concluded",
      needsSenior: false,
      signedOffById: seedId("member:tomas-varga"),
      conclusionCauseId: noise.causeId,
    });
    expect(await auditCount()).toBe(audits + 1);
    expect(await lastAudit(b2)).toMatchObject({
      action: "case.signoff",
      actorUserId: seedId("user:tomas-varga"),
      before: { state: "awaiting_signoff" },
      after: { state: "concluded" },
    });
  });

  it("signing off again answers 409: it is no longer waiting", async () => {
    const { member, c } = await bundle("tomas-varga", b2);
    await refusedWithoutChange(
      b2,
      () => signOff(db(), member, c, { accept: true, note: "", version: c.version }),
      409,
    );
  });
});

describe("sending a conclusion back (demo case b3 is awaiting sign-off)", () => {
  it("reopens the case, clears the conclusion and writes case.send_back", async () => {
    const b3 = caseId("b3");
    const { member, c } = await bundle("tomas-varga", b3);
    expect(c.state).toBe("awaiting_signoff");
    await signOff(db(), member, c, {
      accept: false,
      note: "Check the other side first.",
      version: c.version,
    });
    expect(await state(b3)).toMatchObject({
      state: "open",
      conclusionCauseId: null,
      concludedById: null,
      needsSenior: false,
    });
    expect(await lastAudit(b3)).toMatchObject({
      action: "case.send_back",
      after: { state: "open", note: "Check the other side first." },
    });
  });
});

describe("who may conclude", () => {
  const dtv = { causeId: causeId("brake_disc_runout_dtv"), notes: "Run-out 0.09 mm at the front left." };

  it("a technician's conclusion stands without a sign-off", async () => {
    const id = await freshCase(db());
    const { member, c } = await bundle("priya-hale", id);
    expect(await conclude(db(), member, c, { ...dtv, version: c.version })).toBe("concluded");
    expect(await state(id)).toMatchObject({ state: "concluded", needsSenior: false, signedOffById: null });
    expect(
      (
        await db()
          .select({ n: count() })
          .from(auditLog)
          .where(and(eq(auditLog.entityId, id), eq(auditLog.action, "case.conclude")))
      )[0].n,
    ).toBe(1);
  });

  it("an apprentice cannot conclude a case that is not his (b1 is Priya's): 403", async () => {
    const { member, c } = await bundle("ollie-mbeki", caseId("b1"));
    await refusedWithoutChange(
      caseId("b1"),
      () => conclude(db(), member, c, { ...dtv, version: c.version }),
      403,
    );
  });

  it("an advisor cannot conclude: 403", async () => {
    const { member, c } = await bundle("dana-reyes", caseId("b1"));
    await refusedWithoutChange(
      caseId("b1"),
      () => conclude(db(), member, c, { ...dtv, version: c.version }),
      403,
    );
  });

  it("a conclusion must name a failure mode, not a component: 400", async () => {
    const { member, c } = await bundle("priya-hale", caseId("b1"));
    await refusedWithoutChange(
      caseId("b1"),
      () => conclude(db(), member, c, { causeId: causeId("brakes_friction"), notes: "", version: c.version }),
      400,
    );
  });

  it("a conclusion from a stale version answers 409 with the case as it is now", async () => {
    const { member, c } = await bundle("priya-hale", caseId("b1"));
    const r = await refusal(conclude(db(), member, c, { ...dtv, version: c.version - 1 }));
    expect(r.status).toBe(409);
    expect(r.body.current).toMatchObject({ state: "open", version: c.version });
  });

  it("a closed case cannot be concluded again: 409", async () => {
    const { member, c } = await bundle("tomas-varga", caseId("b5"));
    await refusedWithoutChange(
      caseId("b5"),
      () => conclude(db(), member, c, { ...dtv, version: c.version }),
      409,
    );
  });
});
