import { Form, href, Link, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { RouteErrorPage } from "~/components/error-page";
import { FormMessages } from "~/components/ui/form-errors";
import { formatDate } from "~/domain/format";
import { dbContext } from "~/http/context";
import { onForm, readForm } from "~/http/forms.server";
import { formatMinor } from "~/money";
import { refundPayment } from "~/payments/checkout.server";
import { keptEvents, listPayments } from "~/payments/overview.server";
import { PAYMENT_PURPOSE_LABEL, PAYMENT_STATUS_LABEL } from "~/domain/owner-side";
import type { Route } from "./+types/payments";

const ActionSchema = z.object({
  intent: z.literal("refund", { message: "Unknown action" }),
  paymentId: z.uuid({ message: "Unknown payment" }),
  confirm: z.literal("yes", { message: "Confirm the refund first" }),
});

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "payment:refund");
  const db = context.get(dbContext);
  const [list, kept] = await Promise.all([
    listPayments(db, member.workshopId),
    keptEvents(db, member.workshopId),
  ]);
  return { payments: list, kept };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "payment:refund");
  const form = await readForm(request, ActionSchema);
  if (!form.ok) return form.answer;
  return onForm(async () => {
    const done = await refundPayment(context.get(dbContext), member, form.value.paymentId);
    return `Refunded ${formatMinor(done.amountMinor, done.currency)}.`;
  });
}

export function meta() {
  return [{ title: "Payments — Ramplight" }];
}

export default function Payments({ loaderData, actionData }: Route.ComponentProps) {
  const busy = useNavigation().state !== "idle";
  return (
    <div className="grid gap-6">
      <div>
        <h1 className="text-2xl font-semibold">Payments</h1>
        <p className="text-graphite-700">Diagnostic fees and deposits paid online, newest first.</p>
        <FormMessages errors={actionData?.errors} notice={actionData?.notice} className="mt-3" />
      </div>
      {loaderData.payments.length === 0 ? <p>No payments yet.</p> : null}
      <ul className="grid gap-3" aria-label="Payments">
        {loaderData.payments.map((p) => {
          const amount = formatMinor(p.amountMinor, p.currency);
          return (
            <li
              key={p.id}
              aria-label={`Case #${p.caseNumber}, ${amount}`}
              className="grid gap-2 rounded-card border border-rule bg-card p-3"
            >
              <p className="flex flex-wrap items-baseline gap-x-3">
                <Link
                  to={href("/cases/:caseId", { caseId: p.caseId })}
                  className="font-medium text-uv-700 underline"
                >
                  Case #{p.caseNumber}
                </Link>
                <span className="tabular font-semibold">{amount}</span>
                <span>{PAYMENT_PURPOSE_LABEL[p.purpose]}</span>
                <span className="font-medium">{PAYMENT_STATUS_LABEL[p.status]}</span>
              </p>
              <p className="tabular text-sm text-graphite-600">
                Asked {formatDate(p.createdAt)}
                {p.paidAt ? ` · paid ${formatDate(p.paidAt)}` : ""}
                {p.refundedAt ? ` · refunded ${formatDate(p.refundedAt)}` : ""}
              </p>
              {p.flaggedReason ? <p className="break-words text-stop">{p.flaggedReason}</p> : null}
              {p.status === "paid" ? (
                <details>
                  <summary className="inline-flex min-h-tap cursor-pointer items-center font-medium text-uv-700 underline">
                    Refund…
                  </summary>
                  <Form method="post" className="mt-2 grid gap-2">
                    <input type="hidden" name="intent" value="refund" />
                    <input type="hidden" name="paymentId" value={p.id} />
                    <input type="hidden" name="confirm" value="yes" />
                    <p>
                      Give {amount} back to the owner of case #{p.caseNumber}? This cannot be undone.
                    </p>
                    <button
                      type="submit"
                      disabled={busy}
                      className="min-h-tap justify-self-start rounded-lg border-2 border-stop px-4 font-semibold hover:bg-paper"
                    >
                      Yes, refund {amount}
                    </button>
                  </Form>
                </details>
              ) : null}
            </li>
          );
        })}
      </ul>
      {loaderData.kept.length > 0 ? (
        <section aria-labelledby="kept">
          <h2 id="kept" className="text-xl font-semibold">
            Events waiting for their payment
          </h2>
          <p className="text-graphite-700">
            The payment service told us about these before we knew their checkout; they apply when it is
            known.
          </p>
          <ul className="mt-2 grid gap-2">
            {loaderData.kept.map((e) => (
              <li key={e.eventId} className="rounded-lg border border-rule bg-card p-3 text-sm break-all">
                {formatDate(e.receivedAt)} · {e.type} · {e.sessionId ?? e.eventId}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
