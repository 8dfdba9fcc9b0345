// Proposals to change the knowledge base, and their review. A technician proposes from a case
// ("the knowledge base did not have this"): a symptom should point to a cause, at a strength, or a
// cause is missing altogether. A senior accepts (the change is made with a new knowledge-base
// version) or rejects, with a comment; both are audited in words.
import { and, desc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { cases, causes, kbProposals, members, symptomLinks, symptoms, users } from "~/db/schema";
import type { Priority, SymptomKind } from "~/domain/knowledge";
import type { ProposalKind } from "~/domain/proposals";
import { refuse, requireId } from "~/http/errors.server";
import { previewChange } from "./impact.server";
import { keyFor } from "./keys";
import { nextKbVersion } from "./version.server";

type Member = Pick<CurrentMember, "workshopId" | "userId" | "memberId">;

// A cause accepted from a proposal starts rare (relative frequency 1, the low end of the starter
// base's failure modes) until a senior sets its base rate on its page.
const NEW_CAUSE_BASE_RATE = 1;
// A symptom accepted from a proposal shows without any listed cause 2 % of the time, the leak most
// of the starter base's symptoms carry (110 of 222), until a senior sets its own on its page.
const NEW_SYMPTOM_LEAK = 0.02;

export type ProposalInput = {
  caseId: string;
  kind: ProposalKind;
  // kinds "link" and "cause": one of the case's symptoms; kind "symptom": the new symptom's name.
  symptomId?: string;
  symptomName?: string;
  // kind "link": the failure mode the symptom should point to; kind "cause": a failure mode in the
  // same part of the car (or the component itself) the new one goes beside.
  causeId: string;
  causeName?: string;
  p: number;
  note: string;
};

export async function propose(db: Db, member: Member, input: ProposalInput) {
  requireId(input.caseId, "No such case in this workshop.");
  const newSymptom = input.kind === "symptom";
  if (!newSymptom) requireId(input.symptomId ?? "", "Choose one of the case's symptoms.");
  requireId(input.causeId, "Choose a cause of this knowledge base.");
  return db.transaction(async (tx) => {
    const [c] = await tx
      .select({ number: cases.number })
      .from(cases)
      .where(and(eq(cases.id, input.caseId), eq(cases.workshopId, member.workshopId)));
    if (!c) refuse(404, "No such case in this workshop.");
    const [s] = newSymptom
      ? [{ name: input.symptomName!.trim() }]
      : await tx
          .select({ name: symptoms.name })
          .from(symptoms)
          .where(and(eq(symptoms.id, input.symptomId!), eq(symptoms.workshopId, member.workshopId)));
    if (!s) refuse(400, "Choose one of the case's symptoms.");
    const [picked] = await tx
      .select({ id: causes.id, name: causes.name, level: causes.level, parentId: causes.parentId })
      .from(causes)
      .where(and(eq(causes.id, input.causeId), eq(causes.workshopId, member.workshopId)));
    if (!picked) refuse(400, "Choose a cause of this knowledge base.");
    // A new cause goes beside the one picked: under its component.
    const [cause] =
      input.kind === "cause" && picked.level === "failure_mode" && picked.parentId
        ? await tx
            .select({ id: causes.id, name: causes.name, level: causes.level, parentId: causes.parentId })
            .from(causes)
            .where(eq(causes.id, picked.parentId))
        : [picked];
    if (input.kind !== "cause" && cause.level !== "failure_mode")
      refuse(400, "A symptom points to a failure mode: choose one of the likely causes.");
    if (input.kind === "cause" && cause.level !== "component")
      refuse(400, "A new cause goes beside a likely cause: choose the one nearest to it.");
    const [row] = await tx
      .insert(kbProposals)
      .values({
        workshopId: member.workshopId,
        caseId: input.caseId,
        kind: input.kind,
        symptomId: newSymptom ? null : input.symptomId,
        symptomName: newSymptom ? s.name : null,
        causeId: cause.id,
        causeName: input.kind === "cause" ? input.causeName!.trim() : null,
        p: input.p,
        note: input.note.trim(),
        proposedById: member.memberId,
      })
      .returning({ id: kbProposals.id });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.propose",
      entity: "kb_proposal",
      entityId: row.id,
      after: {
        kind: input.kind,
        symptom: s.name,
        cause: input.kind === "cause" ? input.causeName!.trim() : cause.name,
        under: input.kind === "cause" ? cause.name : undefined,
        p: input.p,
        caseNumber: c.number,
        items: newSymptom ? [input.causeId] : [input.symptomId, input.causeId],
      },
    });
    return { id: row.id, caseNumber: c.number };
  });
}

const proposer = alias(members, "proposer");
const proposerUser = alias(users, "proposer_user");

/** The workshop's proposals, open ones first, each with the names it concerns and the link as it stands. */
export async function listProposals(db: Db, workshopId: string) {
  return db
    .select({
      id: kbProposals.id,
      kind: kbProposals.kind,
      state: kbProposals.state,
      p: kbProposals.p,
      note: kbProposals.note,
      causeName: kbProposals.causeName,
      reviewComment: kbProposals.reviewComment,
      createdAt: kbProposals.createdAt,
      symptomName: sql<string>`coalesce(${symptoms.name}, ${kbProposals.symptomName})`,
      newSymptom: sql<boolean>`${kbProposals.symptomId} is null`,
      targetName: causes.name,
      targetId: causes.id,
      currentP: symptomLinks.p,
      caseId: cases.id,
      caseNumber: cases.number,
      proposedBy: proposerUser.name,
    })
    .from(kbProposals)
    .leftJoin(symptoms, eq(symptoms.id, kbProposals.symptomId))
    .innerJoin(causes, eq(causes.id, kbProposals.causeId))
    .leftJoin(
      symptomLinks,
      and(eq(symptomLinks.symptomId, kbProposals.symptomId), eq(symptomLinks.causeId, kbProposals.causeId)),
    )
    .leftJoin(cases, eq(cases.id, kbProposals.caseId))
    .leftJoin(proposer, eq(proposer.id, kbProposals.proposedById))
    .leftJoin(proposerUser, eq(proposerUser.id, proposer.userId))
    .where(eq(kbProposals.workshopId, workshopId))
    .orderBy(sql`${kbProposals.state} = 'open' desc`, desc(kbProposals.createdAt))
    .limit(200);
}

/**
 * What accepting an open proposal would do to the workshop's concluded cases and test cases,
 * before anyone accepts it: the same impact preview a senior's own link change gets. A proposed
 * new cause is previewed at the base rate accepting would give it.
 */
export async function previewProposal(db: Db, workshopId: string, proposalId: string) {
  requireId(proposalId, "No such proposal in this workshop.");
  const [p] = await db
    .select()
    .from(kbProposals)
    .where(and(eq(kbProposals.id, proposalId), eq(kbProposals.workshopId, workshopId)));
  if (!p) refuse(404, "No such proposal in this workshop.");
  if (p.state !== "open") refuse(409, `This proposal was ${p.state} already.`);
  return previewChange(
    db,
    workshopId,
    p.kind === "symptom"
      ? { link: "new-symptom", name: p.symptomName!, leak: NEW_SYMPTOM_LEAK, causeId: p.causeId, p: p.p }
      : p.kind === "cause"
        ? {
            link: "new-cause",
            parentId: p.causeId,
            name: p.causeName!,
            baseRate: NEW_CAUSE_BASE_RATE,
            symptomId: p.symptomId!,
            p: p.p,
          }
        : { link: "symptom", symptomId: p.symptomId!, causeId: p.causeId, p: p.p },
  );
}

export type Review =
  | { decision: "accept"; comment: string; baseRate?: number; priority?: Priority; symptomKind?: SymptomKind }
  | { decision: "reject"; comment: string };

/** Accepts or rejects an open proposal; accepting makes its change with a new version. */
export async function reviewProposal(db: Db, member: Member, proposalId: string, review: Review) {
  requireId(proposalId, "No such proposal in this workshop.");
  return db.transaction(async (tx) => {
    const [p] = await tx
      .select()
      .from(kbProposals)
      .where(and(eq(kbProposals.id, proposalId), eq(kbProposals.workshopId, member.workshopId)))
      .for("update");
    if (!p) refuse(404, "No such proposal in this workshop.");
    if (p.state !== "open") refuse(409, `This proposal was ${p.state} already; nothing changed.`);
    const [{ symptomName }] = p.symptomId
      ? await tx.select({ symptomName: symptoms.name }).from(symptoms).where(eq(symptoms.id, p.symptomId))
      : [{ symptomName: p.symptomName! }];
    const [target] = await tx
      .select({ name: causes.name, system: causes.system })
      .from(causes)
      .where(eq(causes.id, p.causeId));
    let made: { cause: string; before: number | null; causeId: string } | null = null;
    if (review.decision === "accept") {
      let causeId = p.causeId;
      let causeName = target.name;
      if (p.kind === "cause") {
        causeName = p.causeName!;
        const [fm] = await tx
          .insert(causes)
          .values({
            workshopId: member.workshopId,
            key: keyFor(causeName),
            parentId: p.causeId,
            level: "failure_mode",
            name: causeName,
            system: target.system,
            description: p.note,
            baseRate: review.baseRate ?? NEW_CAUSE_BASE_RATE,
            priority: review.priority ?? "soon",
          })
          .returning({ id: causes.id });
        causeId = fm.id;
      }
      // A proposed new symptom is made now, in the part of the car of the cause it points to.
      const symptomId =
        p.symptomId ??
        (
          await tx
            .insert(symptoms)
            .values({
              workshopId: member.workshopId,
              key: keyFor(symptomName),
              name: symptomName,
              system: target.system,
              kind: review.symptomKind ?? "noise",
              leak: NEW_SYMPTOM_LEAK,
            })
            .returning({ id: symptoms.id })
        )[0].id;
      const [existing] = await tx
        .select({ p: symptomLinks.p })
        .from(symptomLinks)
        .where(and(eq(symptomLinks.symptomId, symptomId), eq(symptomLinks.causeId, causeId)));
      await tx
        .insert(symptomLinks)
        .values({ workshopId: member.workshopId, symptomId, causeId, p: p.p })
        .onConflictDoUpdate({ target: [symptomLinks.symptomId, symptomLinks.causeId], set: { p: p.p } });
      await nextKbVersion(
        tx,
        member.workshopId,
        `Proposal accepted: “${symptomName}” → “${causeName}”`,
        member.memberId,
      );
      made = { cause: causeName, before: existing?.p ?? null, causeId };
    }
    await tx
      .update(kbProposals)
      .set({
        state: review.decision === "accept" ? "accepted" : "rejected",
        reviewedById: member.memberId,
        reviewComment: review.comment.trim() || null,
        reviewedAt: new Date(),
      })
      .where(eq(kbProposals.id, p.id));
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: review.decision === "accept" ? "kb.proposal.accept" : "kb.proposal.reject",
      entity: "kb_proposal",
      entityId: p.id,
      before: made ? { p: made.before } : null,
      after: {
        kind: p.kind,
        symptom: symptomName,
        cause: p.kind === "cause" ? p.causeName : target.name,
        p: p.p,
        comment: review.comment.trim(),
        items: [p.symptomId, p.causeId, ...(made && made.causeId !== p.causeId ? [made.causeId] : [])],
      },
    });
    return {
      decision: review.decision,
      symptom: symptomName,
      cause: made?.cause ?? target.name,
      causeId: made?.causeId,
    };
  });
}
