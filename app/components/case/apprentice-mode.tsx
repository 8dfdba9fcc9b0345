import { Form } from "react-router";
import type { Diagnosis } from "~/cases/present-diagnosis";
import { CheckPlan, type RecordResult } from "./check-plan";

/**
 * The apprentice sees one check at a time — the best next one within their level — with its
 * instructions, tools and cautions, and can ask a senior at any point. Checks above their level
 * are listed as waiting for a senior, never offered.
 */
export function ApprenticeMode(props: { plan: Diagnosis["plan"]; currency: string; record: RecordResult; busy: boolean; error: string | null; needsSenior: boolean }) {
  const one = { ...props.plan, steps: props.plan.steps.slice(0, 1) };
  return (
    <div className="grid gap-4">
      <CheckPlan plan={one} currency={props.currency} record={props.record} busy={props.busy} error={props.error} />
      <section aria-labelledby="ask" className="rounded-card border border-rule bg-card p-4">
        <h2 id="ask" className="text-lg font-semibold">Not sure?</h2>
        {props.needsSenior ? (
          <p className="mt-1 font-medium text-uv-700">A senior has been asked to look at this case.</p>
        ) : (
          <Form method="post" className="mt-2 flex flex-wrap items-end gap-2">
            <input type="hidden" name="intent" value="ask-senior" />
            <label className="flex flex-col text-sm font-medium">
              What do you need help with?
              <input name="note" className="mt-1 min-h-tap w-72 rounded-lg border border-rule bg-card px-3 text-base" />
            </label>
            <button type="submit" className="min-h-tap rounded-lg border-2 border-uv-600 px-4 font-semibold text-uv-700">Ask a senior</button>
          </Form>
        )}
      </section>
    </div>
  );
}
