// One check of the knowledge base as its page shows it (with the causes it finds), and a senior's
// edit of it. The edit is refused, at the field concerned, when the check's work calls for a
// caution it does not carry (app/domain/hazards.ts) or when a measurement's rule does not compile.
import { and, asc, eq, sql } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { causes, checkLinks, checks } from "~/db/schema";
import { missingCautions } from "~/domain/hazards";
import { CAUTION_LABEL, type Caution, type CheckAccess } from "~/domain/knowledge";
import type { Skill } from "~/domain/people";
import { refuse, requireId } from "~/http/errors.server";
import { compileRule } from "~/measure";
import { keyFor } from "./keys";
import { nextKbVersion } from "./version.server";

const NOT_FOUND = "No such check in this workshop's knowledge base.";

export async function checkWithLinks(db: Db, workshopId: string, checkId: string) {
  requireId(checkId, NOT_FOUND);
  const [check] = await db
    .select()
    .from(checks)
    .where(and(eq(checks.id, checkId), eq(checks.workshopId, workshopId)));
  if (!check) refuse(404, NOT_FOUND);
  const finds = await db
    .select({ id: causes.id, name: causes.name, pFail: checkLinks.pFail })
    .from(checkLinks)
    .innerJoin(causes, eq(causes.id, checkLinks.causeId))
    .where(eq(checkLinks.checkId, checkId))
    .orderBy(sql`${checkLinks.pFail} desc`, asc(causes.name));
  return { check, finds };
}

export type CheckEdit = {
  name: string;
  instructions: string[];
  tools: string[];
  minutes: number;
  consumablesCost: number;
  access: CheckAccess[];
  skill: Skill;
  cautions: Caution[];
  quantity?: string;
  unit?: string;
  rule?: string;
  failMeans: string;
  falseAlarm: number;
};

/** The columns every check has, whatever its result: a measurement's quantity, unit and rule aside. */
const plainColumns = ({ quantity: _q, unit: _u, rule: _r, ...plain }: CheckEdit) => plain;

/** The problems of an edit, by field: what the editor shows before anything is saved. */
export function checkEditProblems(edit: CheckEdit, measurement: boolean): Record<string, string[]> {
  const problems: Record<string, string[]> = {};
  const missing = missingCautions(edit);
  if (missing.length)
    problems.cautions = [
      `Its steps call for a caution it does not carry: ${missing.map((m) => CAUTION_LABEL[m]).join(", ")}. Tick it, or change the steps.`,
    ];
  if (measurement) {
    if (!edit.rule?.trim()) problems.rule = ["A measurement needs its rule, such as value <= 0.05 mm."];
    else
      try {
        compileRule(edit.rule);
      } catch (e) {
        problems.rule = [(e as Error).message];
      }
    if (!edit.unit?.trim()) problems.unit = ["Say the unit the reading is taken in, such as mm."];
  }
  return problems;
}

export async function updateCheck(
  db: Db,
  member: Pick<CurrentMember, "workshopId" | "userId" | "memberId">,
  checkId: string,
  edit: CheckEdit,
) {
  requireId(checkId, NOT_FOUND);
  return db.transaction(async (tx) => {
    const [was] = await tx
      .select()
      .from(checks)
      .where(and(eq(checks.id, checkId), eq(checks.workshopId, member.workshopId)))
      .for("update");
    if (!was) refuse(404, NOT_FOUND);
    const measurement = was.resultKind === "measurement";
    const problems = checkEditProblems(edit, measurement);
    const first = Object.values(problems)[0];
    if (first) refuse(400, first[0], { errors: problems });
    const set = {
      ...plainColumns(edit),
      ...(measurement ? { quantity: edit.quantity ?? was.quantity, unit: edit.unit!, rule: edit.rule! } : {}),
    };
    const changed = (Object.keys(set) as (keyof typeof set)[]).filter(
      (k) => JSON.stringify(was[k]) !== JSON.stringify(set[k]),
    );
    await tx
      .update(checks)
      .set({ ...set, updatedAt: new Date() })
      .where(eq(checks.id, checkId));
    const kbVersion = changed.length
      ? await nextKbVersion(tx, member.workshopId, `Check “${edit.name}” edited`, member.memberId)
      : null;
    if (changed.length)
      await audit(tx, {
        workshopId: member.workshopId,
        actorUserId: member.userId,
        action: "kb.check.update",
        entity: "check",
        entityId: checkId,
        before: Object.fromEntries(changed.map((k) => [k, was[k]])),
        after: {
          ...Object.fromEntries(changed.map((k) => [k, set[k]])),
          name: edit.name,
          changed,
          kbVersion,
          items: [checkId],
        },
      });
    return { changed, kbVersion };
  });
}

/** A new check, refused at its fields like an edit; returns its id. It finds nothing until linked. */
export async function addCheck(
  db: Db,
  member: Pick<CurrentMember, "workshopId" | "userId" | "memberId">,
  edit: CheckEdit & { resultKind: "pass_fail" | "measurement" },
) {
  const measurement = edit.resultKind === "measurement";
  const problems = checkEditProblems(edit, measurement);
  const first = Object.values(problems)[0];
  if (first) refuse(400, first[0], { errors: problems });
  return db.transaction(async (tx) => {
    const [clash] = await tx
      .select({ id: checks.id })
      .from(checks)
      .where(and(eq(checks.workshopId, member.workshopId), sql`lower(${checks.name}) = lower(${edit.name})`));
    if (clash)
      refuse(400, "Another check has that name.", { errors: { name: ["Another check has that name."] } });
    const [made] = await tx
      .insert(checks)
      .values({
        workshopId: member.workshopId,
        key: keyFor(edit.name),
        ...plainColumns(edit),
        resultKind: edit.resultKind,
        quantity: measurement ? (edit.quantity ?? null) : null,
        unit: measurement ? edit.unit! : null,
        rule: measurement ? edit.rule! : null,
      })
      .returning({ id: checks.id });
    const kbVersion = await nextKbVersion(
      tx,
      member.workshopId,
      `Check “${edit.name}” added`,
      member.memberId,
    );
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.check.add",
      entity: "check",
      entityId: made.id,
      after: { name: edit.name, resultKind: edit.resultKind, kbVersion, items: [made.id] },
    });
    return { id: made.id, kbVersion };
  });
}
