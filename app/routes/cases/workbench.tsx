import { href } from "react-router";
import { useQuery } from "@tanstack/react-query";
import { useCallback, useEffect, useState } from "react";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { mayConclude, mayWorkOn } from "~/domain/case-access";
import { can } from "~/domain/permissions";
import { loadCase, loadCaseForChange } from "~/cases/case.server";
import { CaseHistory } from "~/components/case/case-history";
import { caseView } from "~/cases/diagnosis.server";
import { assertIntentAllowed, runWorkbenchForm, WorkbenchForm } from "~/cases/workbench-actions.server";
import { ApprenticeMode } from "~/components/case/apprentice-mode";
import { CaseHeader, SeniorNotes } from "~/components/case/case-header";
import { caseQuery, type CaseView, type Change, undoOf, useEvidence } from "~/cases/case-queries";
import { CheckPlan, type RecordResult } from "~/components/case/check-plan";
import { ConclusionPanel, ConfirmedCause } from "~/components/case/conclusion-panel";
import { UndoNotice } from "~/components/case/undo-notice";
import { Fold } from "~/components/fold";
import { FormMessages } from "~/components/ui/form-errors";
import { EvidenceList } from "~/components/case/evidence-list";
import { KnowledgeVersion } from "~/components/case/knowledge-version";
import { KeepTestCase } from "~/components/case/keep-test-case";
import { ProposePanel } from "~/components/case/propose-panel";
import { LikelyCauses } from "~/components/case/likely-causes";
import { CaseQuickFind } from "~/components/case/case-quick-find";
import { RouteErrorPage } from "~/components/error-page";
import { dbContext } from "~/http/context";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { quickFindKey } from "~/quick-find";
import type { Route } from "./+types/workbench";

// This page's Quick find turns symptoms into evidence; the shell's general one steps aside.
export const handle = { quickFind: "own" };

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "case:read");
  const db = context.get(dbContext);
  const bundle = await loadCase(db, member, params.caseId);
  const view: CaseView = await caseView(db, member, bundle);
  // The browser keeps one built index per knowledge-base version instead of rebuilding on every revalidation.
  const quickFindCacheKey = quickFindKey(
    member.workshopId,
    `${bundle.workshop.kbVersion}-${bundle.id}`,
    "case",
  );
  const canWork = bundle.state === "open" && mayWorkOn(member, bundle);
  return {
    // The shape the browser later fetches from /api/cases/:id, so the live copy starts from it.
    view,
    quickFindCacheKey,
    number: bundle.number,
    me: {
      role: member.role,
      canWork,
      mayConclude: mayConclude(member, bundle),
      maySignOff: can(member.role, "case:signoff"),
      mayReopen: can(member.role, "case:reopen"),
      mayClose: can(member.role, "case:close"),
      mayEditComplaint: can(member.role, "case:open") && bundle.state !== "closed",
      mayPropose: canWork && can(member.role, "kb:propose"),
      mayKeepTest: can(member.role, "kb:edit") && (bundle.state === "concluded" || bundle.state === "closed"),
    },
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = context.get(memberContext);
  const db = context.get(dbContext);
  const bundle = await loadCaseForChange(db, member, params.caseId);
  const form = Object.fromEntries(await request.formData());
  assertIntentAllowed(member, bundle, form.intent);
  const parsed = WorkbenchForm.safeParse(form);
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  return onForm(() => runWorkbenchForm(db, member, bundle, parsed.data));
}

export function meta({ loaderData }: Route.MetaArgs) {
  return [{ title: loaderData?.number ? `Case #${loaderData.number} — Ramplight` : "Case — Ramplight" }];
}

export default function Workbench({ loaderData, actionData }: Route.ComponentProps) {
  const { me, quickFindCacheKey } = loaderData;
  const initial = loaderData.view as CaseView;
  const id = initial.case.id;
  const query = useQuery({ ...caseQuery(id), initialData: initial });
  const view = query.data ?? initial;
  const evidence = useEvidence(id);
  const [notice, setNotice] = useState<{ said: string; undo: Change | null } | null>(null);
  const dismiss = useCallback(() => setNotice(null), []);
  // A form post (conclude, sign-off) changes the case: refresh the live copy from the new loader data.
  const { refetch } = query;
  useEffect(() => {
    if (actionData?.notice) void refetch();
  }, [actionData, refetch]);
  const c = view.case;
  const d = view.diagnosis;
  /** Every recording and removal says what it did and offers to take it back. */
  const change = (next: Change) => {
    const before = c;
    evidence.mutate(next, { onSuccess: (answer) => setNotice(undoOf(before, next, answer)) });
  };
  const undo = (back: Change) => {
    setNotice(null);
    evidence.mutate(back);
  };
  const record: RecordResult = (step, r) =>
    change({ kind: "find", checkId: step.checkId, name: step.name, ...r });
  const failed = evidence.isError ? evidence.variables : undefined;
  const errorFor = (checkId: string) =>
    failed?.kind === "find" && failed.checkId === checkId ? evidence.error!.message : null;
  const planError = evidence.isError && failed?.kind !== "find" ? evidence.error!.message : null;
  const concluded = c.state !== "open" && c.conclusionCause;
  const apprentice = me.role === "apprentice" && me.canWork;
  const causes = <LikelyCauses causes={d.causes} unlisted={d.unlisted} />;
  const ranking = concluded ? (
    <>
      <ConfirmedCause
        state={c.state}
        cause={c.conclusionCause!}
        notes={c.conclusionNotes}
        estimate={href("/cases/:caseId/estimate", { caseId: c.id })}
      />
      {me.mayKeepTest ? <KeepTestCase number={c.number} errors={actionData?.errors} /> : null}
      <section className="rounded-card border border-rule bg-card p-4">
        <Fold
          summaryClassName="min-h-tap cursor-pointer content-center font-semibold"
          summary="How the likely causes stood"
        >
          <div className="mt-2">{causes}</div>
        </Fold>
      </section>
    </>
  ) : (
    causes
  );
  const evidenceList = (
    <>
      <EvidenceList c={c} canWork={me.canWork} remove={(kind, itemId) => change({ kind, id: itemId })} />
      {me.mayPropose ? (
        <ProposePanel
          caseId={c.id}
          symptoms={c.observations.filter((o) => o.present).map((o) => ({ id: o.symptomId, name: o.name }))}
          causes={d.causes}
        />
      ) : null}
    </>
  );
  const conclusion = (
    <ConclusionPanel
      state={c.state}
      version={c.version}
      causes={d.causes}
      conclusion={{ cause: c.conclusionCause, notes: c.conclusionNotes }}
      mayConclude={me.mayConclude}
      maySignOff={me.maySignOff}
      mayReopen={me.mayReopen}
      mayClose={me.mayClose}
      isApprentice={me.role === "apprentice"}
      errors={actionData?.errors}
    />
  );
  return (
    <div className="grid gap-4">
      <CaseHeader
        c={c}
        mayEditComplaint={me.mayEditComplaint}
        errors={actionData?.errors}
        quickFind={
          me.canWork ? (
            <CaseQuickFind
              cacheKey={quickFindCacheKey}
              recent={c.observations.map((o) => o.symptomId)}
              onAdd={(e, present) => change({ kind: "observe", symptomId: e.id, name: e.title, present })}
            />
          ) : null
        }
      />
      <SeniorNotes question={c.question} seniorNote={c.seniorNote} needsSenior={c.needsSenior} />
      <KnowledgeVersion
        rankedWith={d.knowledge.version}
        pinned={c.kbVersion}
        newest={c.workshop.kbVersion}
        setAside={d.knowledge.setAside}
        canWork={me.canWork}
      />
      <FormMessages errors={actionData?.errors} notice={actionData?.notice} />
      {apprentice ? (
        // Under a car on a phone: the next check, Ask a senior and the evidence come before the statistics.
        <div className="grid gap-4 lg:grid-cols-[1.1fr_1fr]">
          <div className="grid content-start gap-4">
            <ApprenticeMode
              plan={d.plan}
              currency={c.workshop.currency}
              record={record}
              busy={evidence.isPending}
              error={planError}
              errorFor={errorFor}
              needsSenior={c.needsSenior}
              errors={actionData?.errors}
            />
            {evidenceList}
          </div>
          <div className="grid content-start gap-4">
            {ranking}
            {conclusion}
            <CaseHistory caseId={c.id} />
          </div>
        </div>
      ) : (
        <div className="grid gap-4 lg:grid-cols-[1fr_1.1fr]">
          <div className="grid content-start gap-4">
            {ranking}
            {evidenceList}
          </div>
          <div className="grid content-start gap-4">
            {me.canWork ? (
              <CheckPlan
                plan={d.plan}
                currency={c.workshop.currency}
                record={record}
                busy={evidence.isPending}
                error={planError}
                errorFor={errorFor}
              />
            ) : null}
            {conclusion}
            <CaseHistory caseId={c.id} />
          </div>
        </div>
      )}
      {notice ? (
        <UndoNotice
          said={notice.said}
          busy={evidence.isPending}
          onDone={dismiss}
          onUndo={notice.undo ? () => undo(notice.undo!) : null}
        />
      ) : null}
    </div>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
