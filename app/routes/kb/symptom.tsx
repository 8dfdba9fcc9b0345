import { useMemo } from "react";
import { Form, href, useNavigation } from "react-router";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { BackToKb, EditorFold } from "~/components/kb/editor";
import { LinkTable } from "~/components/kb/link-table";
import { StrengthWords } from "~/components/kb/strength-words";
import { FormMessages } from "~/components/ui/form-errors";
import { SYMPTOM_KIND_LABEL } from "~/domain/knowledge";
import { can } from "~/domain/permissions";
import type { FormErrors } from "~/http/forms";
import { dbContext } from "~/http/context";
import { invalid, onForm } from "~/http/forms.server";
import { type LinkRow, previewIn } from "~/kb/link-rows";
import { answerStrengthForm, isStrengthIntent } from "~/kb/link-strength-form.server";
import { symptomWithLinks, updateSymptom } from "~/kb/symptom-edit.server";
import { readSymptomForm } from "~/kb/symptom-form.server";
import { SymptomFields } from "~/components/kb/symptom-fields";
import { itemHistory } from "~/audit/item-history.server";
import { ItemHistory } from "~/components/kb/item-history";
import type { Route } from "./+types/symptom";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const db = context.get(dbContext);
  const found = await symptomWithLinks(db, member.workshopId, params.symptomId);
  return {
    ...found,
    history: await itemHistory(db, member.workshopId, found.symptom.id),
    mayEdit: can(member.role, "kb:edit"),
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  // Another workshop's symptom does not exist for this member, whatever their role.
  const { pointsTo } = await symptomWithLinks(db, context.get(memberContext).workshopId, params.symptomId);
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const form = Object.fromEntries(await request.formData());
  // A cause's strength from the table: the same reading and the same change as on the cause's page.
  if (isStrengthIntent(form.intent))
    return answerStrengthForm(db, member, form, {
      symptomId: params.symptomId,
      causeIds: pointsTo.map((c) => c.id),
    });
  if (form.intent !== "edit") return invalid({ form: ["Say what to change."] });
  const read = readSymptomForm(form);
  if (!read.ok) return read.answer;
  const edit = read.edit;
  return onForm(async () => {
    const done = await updateSymptom(db, member, params.symptomId, edit);
    return done.changed.length
      ? `Saved. Knowledge base now at version ${done.kbVersion}; Quick find reads the new words at once.`
      : "Nothing had changed.";
  }, "name");
}

export function meta({ loaderData }: Route.MetaArgs) {
  return [
    {
      title: loaderData
        ? `${loaderData.symptom.name} — Knowledge base — Ramplight`
        : "Knowledge base — Ramplight",
    },
  ];
}

export default function SymptomPage({ loaderData, actionData }: Route.ComponentProps) {
  const { symptom, pointsTo, mayEdit } = loaderData;
  const errors = actionData?.errors;
  const rows = useMemo<LinkRow[]>(
    () =>
      pointsTo.map((c) => ({
        link: "symptom",
        id: c.id,
        name: c.name,
        p: c.p,
        to: href("/kb/causes/:causeId", { causeId: c.id }),
      })),
    [pointsTo],
  );
  return (
    <div className="grid max-w-3xl gap-5">
      <BackToKb />
      <div>
        <p className="meta">{`Symptom · ${SYMPTOM_KIND_LABEL[symptom.kind]}${symptom.code ? ` · ${symptom.code}` : ""}`}</p>
        <h1 className="text-2xl font-semibold">{symptom.name}</h1>
        {symptom.synonyms.length ? (
          <p className="text-graphite-700">{`Also: ${symptom.synonyms.join(", ")}`}</p>
        ) : null}
      </div>
      <section aria-labelledby="points" className="card">
        <h2 id="points" className="text-xl font-semibold">
          Causes that show it
        </h2>
        <p className="meta">How often each cause shows this symptom, when it is the cause.</p>
        <LinkTable
          rows={rows}
          labelledBy="points"
          nameHeader="Cause"
          showKind={false}
          mayEdit={mayEdit}
          errors={errors}
          preview={previewIn(actionData)}
          empty="No cause is linked to it."
        />
      </section>
      <FormMessages errors={errors} notice={actionData?.notice} />
      {mayEdit ? <SymptomEditor symptom={symptom} errors={errors} /> : null}
      <ItemHistory lines={loaderData.history} />
      <StrengthWords />
    </div>
  );
}

type SymptomRow = Route.ComponentProps["loaderData"]["symptom"];

function SymptomEditor({ symptom, errors }: { symptom: SymptomRow; errors: FormErrors | undefined }) {
  const busy = useNavigation().state === "submitting";
  return (
    <EditorFold id="edit-symptom" title="Edit this symptom" errors={errors}>
      <Form method="post" className="mt-2 grid gap-3">
        <input type="hidden" name="intent" value="edit" />
        <SymptomFields symptom={symptom} errors={errors} />
        <div>
          <button type="submit" className="btn-primary" disabled={busy}>
            Save the symptom
          </button>
        </div>
      </Form>
    </EditorFold>
  );
}
