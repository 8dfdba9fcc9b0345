import { Form, useNavigation } from "react-router";
import type { FormErrors } from "~/http/forms";
import { EditorFold, TextField } from "../kb/editor";

/** For seniors on a concluded case: keep it, with its evidence and answer, as a test case of the knowledge base. */
export function KeepTestCase({ number, errors }: { number: number; errors: FormErrors | undefined }) {
  const busy = useNavigation().state === "submitting";
  return (
    <EditorFold
      id="keep-test"
      title="Keep as a test case for the knowledge base"
      errors={errors}
      fields={["testName"]}
    >
      <Form method="post" className="mt-2 grid gap-3">
        <input type="hidden" name="intent" value="keep-test-case" />
        <p className="text-sm text-graphite-700">
          Its complaint, evidence, vehicle and confirmed cause are kept; every preview of a knowledge-base
          change then ranks it again, before and after.
        </p>
        <TextField
          prefix="keep"
          name="testName"
          label="Name of the test case"
          value={`Case #${number}`}
          errors={errors}
        />
        <div>
          <button type="submit" className="btn" disabled={busy}>
            Keep it
          </button>
        </div>
      </Form>
    </EditorFold>
  );
}
