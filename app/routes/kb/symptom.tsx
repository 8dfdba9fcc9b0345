import { Form, href, Link, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { Fold } from "~/components/fold";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { SYMPTOM_KIND_LABEL, SYMPTOM_KINDS } from "~/domain/knowledge";
import { describeStrength } from "~/domain/link-strength";
import { can } from "~/domain/permissions";
import type { FormErrors } from "~/http/forms";
import { dbContext } from "~/http/context";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { symptomEditProblems, symptomWithLinks, updateSymptom } from "~/kb/symptom-edit.server";
import { parseDecimal } from "~/measure";
import type { Route } from "./+types/symptom";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  return {
    ...(await symptomWithLinks(context.get(dbContext), member.workshopId, params.symptomId)),
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
  name: z.string().trim().min(3, "Name it in at least 3 characters.").max(200),
  synonyms: list(80),
  kind: z.enum(SYMPTOM_KINDS, { message: "Choose the kind of symptom." }),
  code: z.string().trim().max(10).optional(),
  conditions: list(20),
  leakPercent: z.string().transform((v, ctx) => {
    const n = parseDecimal(v.replace(/%$/, "").trim());
    if (n === null || n < 0 || n > 100) {
      ctx.addIssue({ code: "custom", message: "The leak is a percentage from 0 to 100." });
      return z.NEVER;
    }
    return n;
  }),
});

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  // Another workshop's symptom does not exist for this member, whatever their role.
  await symptomWithLinks(db, context.get(memberContext).workshopId, params.symptomId);
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const parsed = EditForm.safeParse(Object.fromEntries(await request.formData()));
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const { leakPercent, code, ...rest } = parsed.data;
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
  return (
    <div className="grid max-w-3xl gap-5">
      <p>
        <Link className="inline-flex min-h-tap items-center text-sm text-uv-700 underline" to={href("/kb")}>
          Knowledge base
        </Link>
      </p>
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
        <ul className="mt-2 grid gap-1">
          {pointsTo.map((c) => (
            <li key={c.id} className="flex flex-wrap justify-between gap-2">
              <Link className="underline" to={href("/kb/causes/:causeId", { causeId: c.id })}>
                {c.name}
              </Link>
              <span className="tabular">{describeStrength(c.p)}</span>
            </li>
          ))}
        </ul>
      </section>
      <FormMessages errors={errors} notice={actionData?.notice} />
      {mayEdit ? <SymptomEditor symptom={symptom} errors={errors} /> : null}
    </div>
  );
}

type SymptomRow = Route.ComponentProps["loaderData"]["symptom"];

function SymptomEditor({ symptom, errors }: { symptom: SymptomRow; errors: FormErrors | undefined }) {
  const busy = useNavigation().state === "submitting";
  const field = (name: string, label: string, value: string, rows = 0) => (
    <label className="grid gap-1 text-sm font-medium" htmlFor={`symptom-${name}`}>
      {label}
      {rows ? (
        <textarea
          id={`symptom-${name}`}
          name={name}
          rows={rows}
          defaultValue={value}
          className="field py-2"
          {...describedBy(errors, name)}
        />
      ) : (
        <input
          id={`symptom-${name}`}
          name={name}
          defaultValue={value}
          className="field"
          {...describedBy(errors, name)}
        />
      )}
      <FieldError errors={errors} name={name} />
    </label>
  );
  return (
    <section aria-labelledby="edit-symptom" className="rounded-card border border-rule bg-card p-4">
      <Fold
        open={Boolean(errors && Object.keys(errors).length)}
        summaryClassName="min-h-tap cursor-pointer content-center font-semibold"
        summary={<span id="edit-symptom">Edit this symptom</span>}
      >
        <Form method="post" className="mt-2 grid gap-3">
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
      </Fold>
    </section>
  );
}
