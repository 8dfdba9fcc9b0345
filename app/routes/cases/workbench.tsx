import { useQuery } from "@tanstack/react-query";
import { data, Form, Link } from "react-router";
import { useEffect, useMemo } from "react";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { can } from "~/auth/permissions";
import { caseFields, loadCaseForChange, loadCaseWithHistory } from "~/cases/case.server";
import { CaseHistory } from "~/components/case/case-history";
import { diagnoseCase } from "~/cases/diagnosis.server";
import { assertIntentAllowed, runWorkbenchForm, WorkbenchForm } from "~/cases/workbench-actions.server";
import { ApprenticeMode } from "~/components/case/apprentice-mode";
import { caseQuery, type CaseView, useEvidence } from "~/components/case/case-queries";
import { CheckPlan, type RecordResult } from "~/components/case/check-plan";
import { ConclusionPanel } from "~/components/case/conclusion-panel";
import { EvidenceList } from "~/components/case/evidence-list";
import { LikelyCauses } from "~/components/case/likely-causes";
import { CaseQuickFind } from "~/components/case/case-quick-find";
import { RouteErrorPage } from "~/components/error-page";
import { STATE_LABEL } from "~/components/format";
import { fromPayload, toPayload } from "~/components/json-payload";
import { dbContext } from "~/context";
import { refusalMessage } from "~/http.server";
import { quickFindKey } from "~/quick-find";
import type { Route } from "./+types/workbench";

// This page's Quick find turns symptoms into evidence; the shell's general one steps aside.
export const handle = { quickFind: "own" };

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "case:read");
  const db = context.get(dbContext);
  const { history, ...bundle } = await loadCaseWithHistory(db, member, params.caseId);
  const { model: _m, evidence: _e, ...diagnosis } = await diagnoseCase(db, member, bundle);
  // The browser keeps one built index per knowledge-base version instead of rebuilding on every revalidation.
  const quickFindCacheKey = quickFindKey(member.workshopId, `${bundle.workshop.kbVersion}-${bundle.id}`, "case");
  const canWork = bundle.state === "open" && (can(member.role, "case:work") || (member.role === "apprentice" && bundle.assignedMemberId === member.memberId));
  const view: CaseView = { case: caseFields(bundle), diagnosis };
  return {
    // The same shape the browser later fetches from /api/cases/:id, so the live copy starts from it.
    page: toPayload({ view, history }),
    quickFindCacheKey,
    number: bundle.number,
    me: { role: member.role, canWork, mayConclude: can(member.role, "case:conclude") || (member.role === "apprentice" && bundle.assignedMemberId === member.memberId), maySignOff: can(member.role, "case:signoff"), mayEditComplaint: can(member.role, "case:open") && bundle.state !== "closed" },
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const member = context.get(memberContext);
  const db = context.get(dbContext);
  const bundle = await loadCaseForChange(db, member, params.caseId);
  const form = Object.fromEntries(await request.formData());
  assertIntentAllowed(member, bundle, form.intent);
  const parsed = WorkbenchForm.safeParse(form);
  if (!parsed.success) return data({ error: parsed.error.issues[0]?.message ?? "Check the form", notice: null }, { status: 400 });
  try {
    return { error: null, notice: await runWorkbenchForm(db, member, bundle, parsed.data) };
  } catch (error) {
    const refused = await refusalMessage(error);
    if (refused && refused.status !== 404) return data({ error: refused.message, notice: null }, { status: refused.status });
    throw error;
  }
}

export function meta({ loaderData }: Route.MetaArgs) {
  return [{ title: loaderData?.number ? `Case #${loaderData.number} — Ramplight` : "Case — Ramplight" }];
}

export default function Workbench({ loaderData, actionData }: Route.ComponentProps) {
  const { me, quickFindCacheKey } = loaderData;
  const { view: initial, history } = useMemo(() => fromPayload(loaderData.page), [loaderData.page]);
  const id = initial.case.id;
  const query = useQuery({ ...caseQuery(id), initialData: initial });
  const view = query.data ?? initial;
  const evidence = useEvidence(id);
  // A form post (conclude, sign-off) changes the case: refresh the live copy from the new loader data.
  useEffect(() => {
    if (actionData?.notice) void query.refetch();
  }, [actionData]);
  const c = view.case;
  const d = view.diagnosis;
  const record: RecordResult = (step, r) => evidence.mutate({ kind: "find", checkId: step.checkId, name: step.name, ...r });
  const error = evidence.error ? evidence.error.message : null;
  return (
    <div className="grid gap-4">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <p className="text-sm text-graphite-600"><Link to="/cases" className="underline">Cases</Link> · {STATE_LABEL[c.state]}{c.assignedName ? ` · with ${c.assignedName}` : ""}</p>
          <h1 className="text-2xl font-semibold"><span className="tabular">#{c.number}</span> · {c.vehicle.registration}</h1>
          <p className="text-graphite-700">
            {c.vehicle.make} {c.vehicle.model} ({c.vehicle.year}) · {c.vehicle.engine} · {c.vehicle.fuelType}
            {c.mileageKm != null ? <span className="tabular"> · {c.mileageKm.toLocaleString("en-GB")} km</span> : null} · owner {c.owner.name}
          </p>
          <blockquote className="mt-2 border-l-4 border-uv-500 pl-3 text-lg">“{c.complaint}”</blockquote>
          {me.mayEditComplaint ? (
            <details className="mt-1">
              <summary className="cursor-pointer text-sm text-graphite-600">Edit the complaint</summary>
              <Form method="post" className="mt-1 flex flex-wrap items-end gap-2">
                <input type="hidden" name="intent" value="complaint" />
                <input type="hidden" name="version" value={c.version} />
                <label className="flex flex-col text-sm font-medium">
                  In the owner's words
                  <textarea name="complaint" defaultValue={c.complaint} rows={2} className="mt-1 w-96 max-w-full rounded-lg border border-rule bg-card p-2 text-base" />
                </label>
                <button type="submit" className="min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper">Save complaint</button>
              </Form>
            </details>
          ) : null}
        </div>
        {me.canWork ? <CaseQuickFind cacheKey={quickFindCacheKey} recent={c.observations.map((o) => o.symptomId)} onAdd={(e, present) => evidence.mutate({ kind: "observe", symptomId: e.id, name: e.title, present })} /> : null}
      </header>
      {actionData?.error ? <p role="alert" className="rounded-lg border-2 border-stop bg-card p-3">{actionData.error}</p> : null}
      {actionData?.notice ? <p role="status" className="rounded-lg border border-sound bg-card p-3">{actionData.notice}</p> : null}
      <div className="grid gap-4 lg:grid-cols-[1fr_1.1fr]">
        <div className="grid content-start gap-4">
          <LikelyCauses causes={d.causes} unlisted={d.unlisted} />
          <EvidenceList c={c} canWork={me.canWork} remove={(kind, itemId) => evidence.mutate({ kind, id: itemId })} />
        </div>
        {/* Under a car on a phone, the apprentice needs the next check before the statistics. */}
        <div className={`grid content-start gap-4 ${me.role === "apprentice" ? "order-first lg:order-none" : ""}`}>
          {me.canWork && me.role === "apprentice" ? (
            <ApprenticeMode plan={d.plan} currency={c.workshop.currency} record={record} busy={evidence.isPending} error={error} needsSenior={c.needsSenior} />
          ) : me.canWork ? (
            <CheckPlan plan={d.plan} currency={c.workshop.currency} record={record} busy={evidence.isPending} error={error} />
          ) : null}
          <ConclusionPanel
            state={c.state}
            version={c.version}
            causes={d.causes}
            conclusion={{ cause: c.conclusionCause, notes: c.conclusionNotes }}
            mayConclude={me.mayConclude}
            maySignOff={me.maySignOff}
            isApprentice={me.role === "apprentice"}
          />
          <CaseHistory entries={history} />
        </div>
      </div>
    </div>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
