import { Form } from "react-router";
import { clientAddressContext, dbContext } from "~/http/context";
import { withOwnerLinkLimit } from "~/estimates/owner-link-limit.server";
import { ownerPage, runOwnerAnswer, startOwnerPayment } from "~/estimates/owner-page.server";
import { FindingCard, OwnerHeader } from "~/components/estimate/owner-summary";
import { ItemCard, TotalsTable } from "~/components/estimate/money-lines";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { RouteErrorPage } from "~/components/error-page";
import { formatDate } from "~/domain/format";
import { formatMinor } from "~/money";
import type { Route } from "./+types/estimate";

// The owner has no account: the token in the address is the whole permission, so the page is
// never cached, never indexed and never passes its address on to another site.
export function headers() {
  return { "Cache-Control": "no-store", "Referrer-Policy": "no-referrer", "X-Robots-Tag": "noindex" };
}

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  const page = await withOwnerLinkLimit(db, request, context.get(clientAddressContext), () =>
    ownerPage(db, params.token),
  );
  const { ids: _ids, ...shown } = page;
  return shown;
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  const form = await request.formData();
  return withOwnerLinkLimit(db, request, context.get(clientAddressContext), () =>
    form.get("intent") === "pay"
      ? startOwnerPayment(db, params.token)
      : runOwnerAnswer(db, params.token, form),
  );
}

export function meta({ data }: Route.MetaArgs) {
  return [{ title: data ? `${data.doc.workshopName}: your ${data.doc.vehicle}` : "Ramplight" }];
}

export default function OwnerEstimate({ loaderData, actionData }: Route.ComponentProps) {
  const { doc, answered, decisions, totalAll, totalApproved, deposit, expiresAt, payment } = loaderData;
  const errors = actionData?.errors;
  const open = doc.items.filter((i) => !i.required);
  return (
    <main className="mx-auto grid max-w-2xl gap-5 p-4 print:max-w-none print:p-0">
      <OwnerHeader doc={doc} />
      <section aria-labelledby="found-h" className="grid gap-3">
        <h2 id="found-h" className="text-xl font-semibold">
          What we found
        </h2>
        {doc.findings.map((f) => (
          <FindingCard key={f.causeName} finding={f} />
        ))}
      </section>
      <FormMessages errors={errors} notice={actionData?.notice} />
      <section aria-labelledby="cost-h" className="grid gap-3">
        <h2 id="cost-h" className="text-xl font-semibold">
          What it costs
        </h2>
        {answered ? null : (
          <p className="print:hidden">Approve or decline each item; items marked Stop should not wait.</p>
        )}
        <Form method="post" className="grid gap-3" noValidate>
          <input type="hidden" name="intent" value="answer" />
          {doc.items.map((item) => (
            <ItemCard
              key={item.id}
              item={item}
              currency={doc.currency}
              actions={
                item.required ? null : answered ? (
                  <p className="mt-2 font-semibold">
                    {decisions[item.id] === "approved" ? "You approved this." : "You declined this."}
                  </p>
                ) : (
                  <fieldset className="mt-3 print:hidden" {...describedBy(errors, `item-${item.id}`)}>
                    <legend className="text-sm font-medium">Your answer for {item.title}</legend>
                    <div className="mt-1 flex flex-wrap gap-3">
                      {(["approved", "declined"] as const).map((d) => (
                        <label
                          key={d}
                          className="flex min-h-tap min-w-32 items-center gap-2 rounded-lg border border-rule px-3"
                        >
                          <input
                            type="radio"
                            name={`item-${item.id}`}
                            value={d}
                            className="size-5"
                            required
                          />
                          {d === "approved" ? "Approve" : "Decline"}
                        </label>
                      ))}
                    </div>
                    <FieldError errors={errors} name={`item-${item.id}`} />
                  </fieldset>
                )
              }
            />
          ))}
          <TotalsTable
            totals={totalAll}
            currency={doc.currency}
            pricesIncludeTax={doc.pricesIncludeTax}
            caption="If you approve everything"
          />
          {totalApproved ? (
            <TotalsTable
              totals={totalApproved}
              currency={doc.currency}
              pricesIncludeTax={doc.pricesIncludeTax}
              caption="What you approved, with what is owed"
            />
          ) : null}
          {answered ? (
            answered.note ? (
              <p>Your note: “{answered.note}”</p>
            ) : null
          ) : (
            <div className="grid gap-3 print:hidden">
              <label className="grid text-sm font-medium" htmlFor="owner-note">
                A note for the workshop (optional)
                <textarea
                  id="owner-note"
                  name="note"
                  rows={3}
                  className="field mt-1"
                  {...describedBy(errors, "note")}
                />
                <FieldError errors={errors} name="note" />
              </label>
              <button
                type="submit"
                className="min-h-tap rounded-lg bg-uv-600 px-5 text-lg font-semibold text-white hover:bg-uv-700"
              >
                Send my answer ({open.length} {open.length === 1 ? "item" : "items"})
              </button>
            </div>
          )}
        </Form>
        {payment ? (
          <p role="status" className="rounded-lg border border-sound bg-card p-3 font-medium">
            {payment.status === "refunded"
              ? `Refunded: ${formatMinor(payment.amountMinor, doc.currency)} went back to your card.`
              : `Paid, thank you: ${formatMinor(payment.amountMinor, doc.currency)} received for the diagnosis.`}
          </p>
        ) : deposit > 0 ? (
          <div className="grid gap-2 print:hidden">
            <p className="text-graphite-700">
              The diagnostic fee of {formatMinor(deposit, doc.currency)} is owed whatever you decide. You can
              pay it now, on the payment service&apos;s page, or at the workshop.
            </p>
            <Form method="post">
              <input type="hidden" name="intent" value="pay" />
              <button
                type="submit"
                className="min-h-tap rounded-lg border-2 border-uv-600 px-5 font-semibold text-uv-700 hover:bg-paper"
              >
                Pay the diagnostic fee ({formatMinor(deposit, doc.currency)})
              </button>
            </Form>
          </div>
        ) : null}
      </section>
      <footer className="text-sm text-graphite-700">
        This page is for {doc.ownerName} only and works until {formatDate(expiresAt)}. Prices and work are as
        the workshop sent them; the maker&apos;s procedures and local rules decide how a repair is done.
      </footer>
    </main>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
