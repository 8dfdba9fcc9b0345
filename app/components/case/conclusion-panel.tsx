import { Form, Link } from "react-router";
import type { ShownCause } from "~/cases/present-diagnosis";
import { SENT_CAUSES } from "~/cases/shown";
import { Fold } from "../fold";
import { formatPercent } from "~/domain/format";
import type { FormErrors } from "~/http/forms";
import { describedBy, FieldError } from "../ui/form-errors";

type Props = {
  state: string;
  version: number;
  causes: ShownCause[];
  conclusion: { cause: string | null; notes: string | null };
  mayConclude: boolean;
  maySignOff: boolean;
  mayReopen: boolean;
  mayClose: boolean;
  isApprentice: boolean;
  errors?: FormErrors;
};

const field = "mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base";

/**
 * A concluded case leads with what was confirmed; the ranking as it stood when it was concluded is
 * secondary (a confirmed "worn to the backing plate" must never sit under "worn near the limit 63 %").
 */
export function ConfirmedCause({
  state,
  cause,
  notes,
  estimate,
}: {
  state: string;
  cause: string;
  notes: string | null;
  /** The way to the owner side, once the cause is confirmed. */
  estimate?: string;
}) {
  const waiting = state === "awaiting_signoff";
  return (
    <section
      aria-labelledby="confirmed"
      className="rounded-card border-2 border-uv-500 bg-card p-4"
      data-testid="confirmed-cause"
    >
      <h2 id="confirmed" className="text-xl font-semibold">
        {waiting ? "Proposed cause, waiting for a senior's sign-off" : "Confirmed cause"}
      </h2>
      <p className="mt-2 text-lg font-semibold">{cause}</p>
      {notes ? <p className="mt-1 text-graphite-700">{notes}</p> : null}
      {estimate && !waiting ? (
        <p className="mt-2">
          <Link
            className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
            to={estimate}
          >
            Estimate for the owner
          </Link>
        </p>
      ) : null}
    </section>
  );
}

/** Concluding; a senior's sign-off of an apprentice's conclusion; reopening and closing. */
export function ConclusionPanel({
  state,
  version,
  causes,
  conclusion,
  mayConclude,
  maySignOff,
  mayReopen,
  mayClose,
  isApprentice,
  errors,
}: Props) {
  const open = state === "open";
  const anything =
    (open && mayConclude) ||
    (state === "awaiting_signoff" && maySignOff) ||
    (!open && mayReopen) ||
    (state === "concluded" && mayClose);
  if (!anything && open) return null;
  return (
    <section aria-labelledby="conclusion" className="rounded-card border border-rule bg-card p-4">
      <h2 id="conclusion" className="text-xl font-semibold">
        Conclusion
      </h2>
      {!open && conclusion.cause ? (
        <p className="mt-2">
          {state === "awaiting_signoff" ? "Proposed" : "Confirmed"}: <strong>{conclusion.cause}</strong>
        </p>
      ) : null}
      {state === "awaiting_signoff" ? (
        <p className="mt-2 font-medium text-uv-700">Waiting for a senior's sign-off.</p>
      ) : null}
      {state === "closed" ? (
        <p className="mt-2 text-graphite-700">
          The case is closed; its confirmed cause counts in the workshop's outcome statistics.
        </p>
      ) : null}
      {open && mayConclude ? (
        // Folded until wanted: a case is concluded once, at its end, and the form (with every likely
        // cause as a choice) stays out of the page until then. It opens by itself to show an error.
        <Fold
          open={Boolean(errors?.causeId || errors?.notes)}
          className="mt-2"
          summaryClassName="inline-flex min-h-tap cursor-pointer items-center font-semibold text-uv-700"
          summary={isApprentice ? "Send for a senior's sign-off…" : "Conclude the case…"}
        >
          <Form method="post" className="mt-3 grid gap-3">
            <input type="hidden" name="intent" value="conclude" />
            <input type="hidden" name="version" value={version} />
            <label className="font-medium">
              Confirmed cause
              <select
                name="causeId"
                className={field}
                defaultValue={causes[0]?.id}
                {...describedBy(errors, "causeId")}
              >
                {causes.slice(0, SENT_CAUSES).map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name} ({formatPercent(c.probability)})
                  </option>
                ))}
              </select>
              <FieldError errors={errors} name="causeId" />
            </label>
            <label className="font-medium">
              What you found and the repair
              <textarea
                name="notes"
                required
                rows={3}
                className={`${field} py-2`}
                {...describedBy(errors, "notes")}
              />
              <FieldError errors={errors} name="notes" />
            </label>
            <button
              type="submit"
              className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
            >
              {isApprentice ? "Send for a senior's sign-off" : "Conclude the case"}
            </button>
          </Form>
        </Fold>
      ) : null}
      {state === "awaiting_signoff" && maySignOff ? (
        <Form method="post" className="mt-3 grid gap-3">
          <input type="hidden" name="version" value={version} />
          <label className="font-medium">
            Note for the apprentice
            <textarea name="note" rows={2} className={`${field} py-2`} {...describedBy(errors, "note")} />
            <FieldError errors={errors} name="note" />
          </label>
          <div className="flex flex-wrap gap-3">
            <button
              type="submit"
              name="intent"
              value="signoff"
              className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
            >
              Sign off
            </button>
            <button
              type="submit"
              name="intent"
              value="send-back"
              className="min-h-tap rounded-lg border border-rule px-5 font-medium hover:bg-paper"
            >
              Send back to diagnose
            </button>
          </div>
        </Form>
      ) : null}
      {state === "concluded" && mayClose ? (
        <Form method="post" className="mt-3">
          <input type="hidden" name="intent" value="close" />
          <input type="hidden" name="version" value={version} />
          <button
            type="submit"
            className="min-h-tap rounded-lg border border-rule px-5 font-medium hover:bg-paper"
          >
            Close the case
          </button>
        </Form>
      ) : null}
      {!open && mayReopen ? (
        <details className="mt-3" open={Boolean(errors?.reason)}>
          <summary className="inline-flex min-h-tap cursor-pointer items-center font-medium">
            Reopen the case…
          </summary>
          <Form method="post" className="mt-2 grid gap-3">
            <input type="hidden" name="intent" value="reopen" />
            <input type="hidden" name="version" value={version} />
            <label className="font-medium">
              Why it is reopened
              <textarea
                name="reason"
                required
                rows={2}
                className={`${field} py-2`}
                {...describedBy(errors, "reason")}
              />
              <FieldError errors={errors} name="reason" />
            </label>
            <button
              type="submit"
              className="min-h-tap justify-self-start rounded-lg border-2 border-uv-600 px-5 font-semibold text-uv-700"
            >
              Reopen
            </button>
          </Form>
        </details>
      ) : null}
    </section>
  );
}
