import { Form, href, redirect, useNavigation } from "react-router";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { BackToKb } from "~/components/kb/editor";
import { SymptomFields } from "~/components/kb/symptom-fields";
import { FormMessages } from "~/components/ui/form-errors";
import { dbContext } from "~/http/context";
import { onForm } from "~/http/forms.server";
import { addSymptom } from "~/kb/symptom-edit.server";
import { readNewSymptomForm } from "~/kb/symptom-form.server";
import type { Route } from "./+types/symptom-new";

export function loader({ context }: Route.LoaderArgs) {
  requirePermission(context.get(memberContext), "kb:edit");
  return null;
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const read = readNewSymptomForm(Object.fromEntries(await request.formData()));
  if (!read.ok) return read.answer;
  return onForm(async () => {
    const made = await addSymptom(context.get(dbContext), member, read.edit);
    // Its own page next: link it to the causes that show it from their pages.
    throw redirect(href("/kb/symptoms/:symptomId", { symptomId: made.id }));
  });
}

export function meta() {
  return [{ title: "New symptom — Knowledge base — Ramplight" }];
}

const BLANK = { name: "", synonyms: [], kind: "noise", code: null, conditions: [], leak: 0.01 };

export default function NewSymptom({ actionData }: Route.ComponentProps) {
  const busy = useNavigation().state === "submitting";
  return (
    <div className="grid max-w-3xl gap-5">
      <BackToKb />
      <h1 className="text-2xl font-semibold">A new symptom</h1>
      <p className="text-graphite-700">
        Name it as a technician says it, and add the words owners use: Quick find offers it from the new
        version on. Link it to the causes that show it from their pages.
      </p>
      <FormMessages errors={actionData?.errors} notice={actionData?.notice} />
      <Form method="post" className="card grid gap-3" aria-label="The symptom">
        <SymptomFields symptom={BLANK} errors={actionData?.errors} withSystem />
        <div>
          <button type="submit" className="btn-primary" disabled={busy}>
            Add the symptom
          </button>
        </div>
      </Form>
    </div>
  );
}
