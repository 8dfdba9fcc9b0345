import { useMemo } from "react";
import { Form, href, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { BackToKb, EditorFold, TextField } from "~/components/kb/editor";
import { LinkTable } from "~/components/kb/link-table";
import { StrengthWords } from "~/components/kb/strength-words";
import { FormMessages } from "~/components/ui/form-errors";
import { SYMPTOM_KIND_LABEL, SYMPTOM_KINDS } from "~/domain/knowledge";
import { can } from "~/domain/permissions";
import type { FormErrors } from "~/http/forms";
import { dbContext } from "~/http/context";
import { figureBetween, invalid, onForm, zodErrors } from "~/http/forms.server";
import { type LinkRow, previewIn } from "~/kb/link-rows";
import { answerStrengthForm, isStrengthIntent } from "~/kb/link-strength-form.server";
import { symptomEditProblems, symptomWithLinks, updateSymptom } from "~/kb/symptom-edit.server";
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

const list = (max: number) =>
  z
    .string()
    .max(10_000)
    .transform((v) => [
      ...new Set(
        v
          .split(/[,\n]/)
          .map((t) => t.trim())
          .filter(Boolean),
      ),
    ])
    .pipe(
      z
        .array(z.string().max(120, "Each entry is at most 120 characters."))
        .max(max, `At most ${max} entries.`),
    );
const EditForm = z.object({
  intent: z.literal("edit"),
  name: z.string().trim().min(3, "Name it in at least 3 characters.").max(200),
  synonyms: list(80),
  kind: z.enum(SYMPTOM_KINDS, { message: "Choose the kind of symptom." }),
  code: z.string().trim().max(10).optional(),
  conditions: list(20),
  leakPercent: figureBetween("The leak is a percentage from 0 to 100.", 0, 100),
});

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
  const parsed = EditForm.safeParse(form);
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const { leakPercent, code, intent: _i, ...rest } = parsed.data;
  const edit = { ...rest, code: code ? code.toUpperCase() : null, leak: Math.round(leakPercent * 10) / 1000 };
  const problems = symptomEditProblems(edit);
  if (Object.keys(problems).length) return invalid(problems);
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
  const field = (name: string, label: string, value: string, rows = 0) => (
    <TextField prefix="symptom" name={name} label={label} value={value} errors={errors} rows={rows} />
  );
  return (
    <EditorFold id="edit-symptom" title="Edit this symptom" errors={errors}>
      <Form method="post" className="mt-2 grid gap-3">
        <input type="hidden" name="intent" value="edit" />
        {field("name", "Name, as a technician says it", symptom.name)}
        {field("synonyms", "Other words people use, separated by commas", symptom.synonyms.join(", "), 3)}
        <label className="grid gap-1 text-sm font-medium" htmlFor="symptom-kind">
          Kind
          <select id="symptom-kind" name="kind" defaultValue={symptom.kind} className="field">
            {SYMPTOM_KINDS.map((k) => (
              <option key={k} value={k}>
                {SYMPTOM_KIND_LABEL[k]}
              </option>
            ))}
          </select>
        </label>
        {field("code", "Trouble code (trouble-code symptoms only), such as P0420", symptom.code ?? "")}
        {field("conditions", "When it shows, separated by commas", symptom.conditions.join(", "))}
        {field(
          "leakPercent",
          "Shows without any listed cause, %",
          String(Math.round(symptom.leak * 1000) / 10),
        )}
        <div>
          <button type="submit" className="btn-primary" disabled={busy}>
            Save the symptom
          </button>
        </div>
      </Form>
    </EditorFold>
  );
}
