import { Form } from "react-router";
import type { ShownCause } from "~/cases/present-diagnosis";
import { formatPercent } from "../format";

type Props = {
  state: string;
  version: number;
  causes: ShownCause[];
  conclusion: { cause: string | null; notes: string | null };
  mayConclude: boolean;
  maySignOff: boolean;
  isApprentice: boolean;
};

const field = "mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base";

/** Concluding, and a senior's sign-off of an apprentice's conclusion. */
export function ConclusionPanel({ state, version, causes, conclusion, mayConclude, maySignOff, isApprentice }: Props) {
  return (
    <section aria-labelledby="conclusion" className="rounded-card border border-rule bg-card p-4">
      <h2 id="conclusion" className="text-xl font-semibold">Conclusion</h2>
      {conclusion.cause ? (
        <p className="mt-2">
          Confirmed cause: <strong>{conclusion.cause}</strong>
          {conclusion.notes ? <span className="block text-graphite-700">{conclusion.notes}</span> : null}
        </p>
      ) : null}
      {state === "awaiting_signoff" ? <p className="mt-2 font-medium text-uv-700">Waiting for a senior's sign-off.</p> : null}
      {state === "open" && mayConclude ? (
        <Form method="post" className="mt-3 grid gap-3">
          <input type="hidden" name="intent" value="conclude" />
          <input type="hidden" name="version" value={version} />
          <label className="font-medium">
            Confirmed cause
            <select name="causeId" className={field} defaultValue={causes[0]?.id}>
              {causes.slice(0, 15).map((c) => (
                <option key={c.id} value={c.id}>{c.name} ({formatPercent(c.probability)})</option>
              ))}
            </select>
          </label>
          <label className="font-medium">
            What you found and the repair
            <textarea name="notes" required rows={3} className={`${field} py-2`} />
          </label>
          <button type="submit" className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700">
            {isApprentice ? "Send for a senior's sign-off" : "Conclude the case"}
          </button>
        </Form>
      ) : null}
      {state === "awaiting_signoff" && maySignOff ? (
        <Form method="post" className="mt-3 grid gap-3">
          <input type="hidden" name="version" value={version} />
          <label className="font-medium">
            Note for the apprentice
            <textarea name="note" rows={2} className={`${field} py-2`} />
          </label>
          <div className="flex flex-wrap gap-3">
            <button type="submit" name="intent" value="signoff" className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700">Sign off</button>
            <button type="submit" name="intent" value="send-back" className="min-h-tap rounded-lg border border-rule px-5 font-medium hover:bg-paper">Send back to diagnose</button>
          </div>
        </Form>
      ) : null}
    </section>
  );
}
