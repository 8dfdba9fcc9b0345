import { Form } from "react-router";
import type { Diagnosis } from "~/cases/present-diagnosis";
import type { FormErrors } from "~/http/forms";
import { describedBy, FieldError } from "../ui/form-errors";
import { CheckPlan, type RecordResult } from "./check-plan";

type Props = {
  errors?: FormErrors;
  plan: Diagnosis["plan"];
  currency: string;
  record: RecordResult;
  busy: boolean;
  error: string | null;
  errorFor: (checkId: string) => string | null;
  needsSenior: boolean;
};

/**
 * The apprentice sees one check at a time — the best next one within their level — with its
 * instructions, tools and cautions, and can ask a senior at any point. Checks above their level
 * fold into one line: never offered, only named.
 */
export function ApprenticeMode(props: Props) {
  return (
    <div className="grid gap-4">
      <CheckPlan
        plan={props.plan}
        currency={props.currency}
        record={props.record}
        busy={props.busy}
        error={props.error}
        errorFor={props.errorFor}
        single
      />
      <section aria-labelledby="ask" className="rounded-card border border-rule bg-card p-4">
        <h2 id="ask" className="text-lg font-semibold">
          Not sure?
        </h2>
        {props.needsSenior ? (
          <p className="mt-1 font-medium text-uv-700">A senior has been asked to look at this case.</p>
        ) : (
          <Form method="post" className="mt-2 flex flex-wrap items-end gap-2">
            <input type="hidden" name="intent" value="ask-senior" />
            <label className="flex w-full max-w-md flex-col text-sm font-medium">
              What do you need help with?
              <input
                name="question"
                className="mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base"
                {...describedBy(props.errors, "question")}
              />
              <FieldError errors={props.errors} name="question" />
            </label>
            <button
              type="submit"
              className="min-h-tap rounded-lg border-2 border-uv-600 px-4 font-semibold text-uv-700"
            >
              Ask a senior
            </button>
          </Form>
        )}
      </section>
    </div>
  );
}
