import { href, Link } from "react-router";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { can } from "~/domain/permissions";
import { CASE_STATE_LABEL } from "~/domain/cases";
import { estimatePage } from "~/estimates/estimate-page.server";
import { runEstimateForm } from "~/estimates/estimate-actions.server";
import { loadEstimateCase } from "~/estimates/estimate-case.server";
import { dbContext } from "~/http/context";
import { FormMessages } from "~/components/ui/form-errors";
import { ItemCard, TotalsTable } from "~/components/estimate/money-lines";
import {
  AddItemForm,
  AddLineForm,
  RemoveButton,
  RevokeForm,
  SendForm,
} from "~/components/estimate/estimate-forms";
import { OwnerStatus } from "~/components/estimate/owner-status";
import { PriorityMark } from "~/components/priority";
import { RouteErrorPage } from "~/components/error-page";
import { Form } from "react-router";
import type { Route } from "./+types/estimate";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "case:read");
  const page = await estimatePage(context.get(dbContext), member, params.caseId);
  return { ...page, mayEdit: can(member.role, "estimate:manage") };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  // Another workshop's case does not exist for this member, whatever their role: 404 before 403.
  await loadEstimateCase(db, context.get(memberContext).workshopId, params.caseId);
  const member = requirePermission(context.get(memberContext), "estimate:manage");
  return runEstimateForm(db, member, params.caseId, await request.formData());
}

export function meta({ data }: Route.MetaArgs) {
  return [{ title: data ? `Estimate, case ${data.case.number} — Ramplight` : "Estimate — Ramplight" }];
}

export default function Estimate({ loaderData, actionData }: Route.ComponentProps) {
  const { case: c, money, items, totals, owner, mayEdit } = loaderData;
  const errors = actionData?.errors;
  const concluded = c.state === "concluded";
  return (
    <div className="grid max-w-3xl gap-5">
      <div>
        <p>
          <Link
            className="inline-flex min-h-tap items-center text-sm text-uv-700 underline"
            to={href("/cases/:caseId", { caseId: c.id })}
          >
            Case {c.number}
          </Link>
        </p>
        <h1 className="text-2xl font-semibold">Estimate for the owner</h1>
        <p className="text-graphite-700">
          {c.vehicle} · {c.registration} · {c.ownerName}
          {c.ownerEmail ? ` · ${c.ownerEmail}` : ""}
          {c.ownerPhone ? ` · ${c.ownerPhone}` : ""}
        </p>
        <p className="mt-1">“{c.complaint}”</p>
      </div>
      <section aria-labelledby="cause-h" className="rounded-card border border-rule bg-card p-4">
        <h2 id="cause-h" className="font-semibold">
          Confirmed cause
        </h2>
        {c.cause ? (
          <p className="mt-1 flex flex-wrap items-center gap-3">
            <span className="text-lg">{c.cause.name}</span>
            {c.cause.priority ? <PriorityMark priority={c.cause.priority} /> : null}
          </p>
        ) : (
          <p className="mt-1">None yet: the case is {CASE_STATE_LABEL[c.state].toLowerCase()}.</p>
        )}
      </section>
      <section aria-labelledby="owner-h" className="rounded-card border border-rule bg-card p-4">
        <h2 id="owner-h" className="font-semibold">
          With the owner
        </h2>
        <OwnerStatus state={owner.state} sent={owner.sent} />
        {mayEdit && owner.sent?.linkLive ? (
          <div className="mt-3">
            <RevokeForm />
          </div>
        ) : null}
      </section>
      <FormMessages errors={errors} notice={actionData?.notice} />
      <section aria-labelledby="items-h" className="grid gap-3">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 id="items-h" className="text-xl font-semibold">
            Items
          </h2>
          {mayEdit && c.cause ? (
            <Form method="post">
              <input type="hidden" name="intent" value="draft" />
              <button
                type="submit"
                className="min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper"
              >
                Draft from the confirmed cause
              </button>
            </Form>
          ) : null}
        </div>
        {items.length === 0 ? <p>No items yet.</p> : null}
        {items.map((item) => (
          <ItemCard
            key={item.id}
            item={item}
            currency={money.currency}
            lineAction={
              mayEdit
                ? (i) => (
                    <RemoveButton
                      intent="remove-line"
                      name="lineId"
                      value={item.lineIds[i]}
                      label={`Remove line ${item.lines[i].description}`}
                    />
                  )
                : undefined
            }
            actions={
              mayEdit ? (
                <div className="mt-2">
                  <RemoveButton
                    intent="remove-item"
                    name="itemId"
                    value={item.id}
                    label={`Remove the item ${item.title}`}
                    text="Remove the item"
                  />
                </div>
              ) : null
            }
          />
        ))}
        {items.length ? (
          <TotalsTable
            totals={totals}
            currency={money.currency}
            pricesIncludeTax={money.pricesIncludeTax}
            caption="If the owner approves everything"
          />
        ) : null}
      </section>
      {mayEdit ? (
        <>
          <section aria-labelledby="add-h" className="grid gap-4 rounded-card border border-rule bg-card p-4">
            <h2 id="add-h" className="font-semibold">
              Add to the estimate
            </h2>
            <AddItemForm errors={errors} />
            {items.length ? <AddLineForm items={items} errors={errors} currency={money.currency} /> : null}
          </section>
          {concluded ? (
            <section aria-labelledby="send-h" className="rounded-card border border-rule bg-card p-4">
              <h2 id="send-h" className="font-semibold">
                Send to the owner
              </h2>
              <SendForm errors={errors} to={c.ownerEmail} again={Boolean(owner.sent)} />
            </section>
          ) : null}
        </>
      ) : null}
    </div>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
