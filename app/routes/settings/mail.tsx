import { Form, href, Link, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { RouteErrorPage } from "~/components/error-page";
import { FormMessages } from "~/components/ui/form-errors";
import { formatDate } from "~/domain/format";
import { dbContext } from "~/http/context";
import { invalid, onForm, readForm } from "~/http/forms.server";
import { listOutbox, resendMail } from "~/mail/outbox.server";
import type { Route } from "./+types/mail";

const ActionSchema = z.object({
  intent: z.literal("resend", { message: "Unknown action" }),
  outboxId: z.uuid({ message: "Unknown message" }),
});

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "mail:read");
  return { messages: await listOutbox(context.get(dbContext), member.workshopId) };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "mail:read");
  const form = await readForm(request, ActionSchema);
  // The form's only fields are hidden: say so above the list instead of beside a field nobody sees.
  if (!form.ok)
    return invalid({ form: ["Choose a message from the list to send it again. Nothing was changed."] });
  return onForm(() => resendMail(context.get(dbContext), member, form.value.outboxId));
}

export function meta() {
  return [{ title: "Mail — Ramplight" }];
}

const STATE_WORDS = { queued: "Queued", sent: "Sent", failed: "Not delivered" } as const;
const STATE_STYLE = {
  queued: "border-rule text-graphite-700",
  sent: "border-sound text-graphite-700",
  failed: "border-stop text-stop",
} as const;

export default function Mail({ loaderData, actionData }: Route.ComponentProps) {
  const busy = useNavigation().state !== "idle";
  const { messages } = loaderData;
  return (
    <div className="min-w-0">
      <h1 className="text-2xl font-semibold">Mail</h1>
      <p className="text-graphite-700">
        The e-mails Ramplight has queued and sent for this workshop, newest first. A message that is not
        delivered is tried again for about half an hour; after that it waits for “Send again”.
      </p>
      <p className="mt-1">
        <Link
          className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
          to={href("/settings")}
        >
          Back to settings
        </Link>
      </p>
      <FormMessages errors={actionData?.errors} notice={actionData?.notice} className="mt-3" />
      {messages.length === 0 ? <p className="mt-4">No e-mail yet.</p> : null}
      <ol className="mt-4 grid gap-3" aria-label="Messages">
        {messages.map((m) => (
          <li key={m.id} className="min-w-0 rounded-lg border border-rule bg-card p-3" aria-label={m.subject}>
            <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
              <span className={`rounded border px-2 text-sm font-semibold ${STATE_STYLE[m.state]}`}>
                {STATE_WORDS[m.state]}
              </span>
              <span className="tabular text-sm text-graphite-600">{formatDate(m.createdAt)}</span>
            </div>
            <p className="mt-1 font-semibold break-words">{m.subject}</p>
            <p className="text-sm break-all">To {m.to}</p>
            <p className="text-sm text-graphite-700">
              {attemptsInWords(m.attempts)}
              {m.sentAt ? ` · sent ${formatDate(m.sentAt)}` : ""}
            </p>
            {m.lastError ? (
              <p className="text-sm break-words text-graphite-700">
                {m.state === "sent" ? "Earlier error" : "Last error"}: {m.lastError}
              </p>
            ) : null}
            <details className="mt-2">
              <summary className="inline-flex min-h-tap cursor-pointer items-center font-medium">
                The text
              </summary>
              <pre className="mt-1 font-sans text-sm break-words whitespace-pre-wrap">{m.text}</pre>
            </details>
            {m.state === "failed" ? (
              <Form method="post" className="mt-2">
                <input type="hidden" name="intent" value="resend" />
                <input type="hidden" name="outboxId" value={m.id} />
                <button
                  type="submit"
                  disabled={busy}
                  className="min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper"
                >
                  Send again
                </button>
              </Form>
            ) : null}
          </li>
        ))}
      </ol>
    </div>
  );
}

function attemptsInWords(n: number) {
  return n === 0 ? "Not tried yet" : n === 1 ? "1 attempt" : `${n} attempts`;
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
