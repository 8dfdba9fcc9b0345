import { href, redirect } from "react-router";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { CheckEditor, NEW_CHECK } from "~/components/kb/check-editor";
import { BackToKb } from "~/components/kb/editor";
import { FormMessages } from "~/components/ui/form-errors";
import { dbContext } from "~/http/context";
import { onForm } from "~/http/forms.server";
import { addCheck } from "~/kb/check-edit.server";
import { readCheckForm } from "~/kb/check-form.server";
import type { Route } from "./+types/check-new";

export function loader({ context }: Route.LoaderArgs) {
  requirePermission(context.get(memberContext), "kb:edit");
  return null;
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const data = await request.formData();
  const resultKind = data.get("resultKind") === "measurement" ? "measurement" : "pass_fail";
  const read = readCheckForm(data, resultKind === "measurement");
  if (!read.ok) return read.answer;
  return onForm(async () => {
    const made = await addCheck(context.get(dbContext), member, { ...read.edit, resultKind });
    // Its own page next: link it to the causes it finds from their pages.
    throw redirect(href("/kb/checks/:checkId", { checkId: made.id }));
  });
}

export function meta() {
  return [{ title: "New check — Knowledge base — Ramplight" }];
}

export default function NewCheck({ actionData }: Route.ComponentProps) {
  return (
    <div className="grid max-w-3xl gap-5">
      <BackToKb />
      <h1 className="text-2xl font-semibold">A new check</h1>
      <p className="text-graphite-700">
        Write its steps as a technician follows them. A check whose steps involve lifting, brake hydraulics,
        fuel, hot parts, airbags or high voltage is saved only with its caution; always defer to the
        maker&apos;s procedure for the vehicle. Link it to the causes it finds from their pages.
      </p>
      <FormMessages errors={actionData?.errors} notice={actionData?.notice} />
      <section className="card" aria-label="The check">
        <CheckEditor check={NEW_CHECK} errors={actionData?.errors} isNew />
      </section>
    </div>
  );
}
