import { useState } from "react";
import { Form, href, Link, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { Cautions } from "~/components/case/cautions";
import { BackToKb, EditorFold, TextField } from "~/components/kb/editor";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { CAUTION_LABEL, CAUTIONS, CHECK_ACCESS, CHECK_ACCESS_LABEL } from "~/domain/knowledge";
import { describeStrength } from "~/domain/link-strength";
import { SKILLS } from "~/domain/people";
import { can } from "~/domain/permissions";
import type { FormErrors } from "~/http/forms";
import { dbContext } from "~/http/context";
import { figureBetween, invalid, onForm, zodErrors } from "~/http/forms.server";
import { checkEditProblems, checkWithLinks, updateCheck } from "~/kb/check-edit.server";
import { compileRule } from "~/measure";
import { itemHistory } from "~/audit/item-history.server";
import { ItemHistory } from "~/components/kb/item-history";
import type { Route } from "./+types/check";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const db = context.get(dbContext);
  const found = await checkWithLinks(db, member.workshopId, params.checkId);
  return {
    ...found,
    history: await itemHistory(db, member.workshopId, found.check.id),
    mayEdit: can(member.role, "kb:edit"),
  };
}

const lines = (v: string) =>
  v
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter(Boolean);
const figure = figureBetween;
const EditForm = z.object({
  name: z.string().trim().min(3, "Name it in at least 3 characters.").max(200),
  instructions: z
    .string()
    .max(20_000)
    .transform(lines)
    .pipe(z.array(z.string().max(1000)).min(1, "Write at least one step, one per line.").max(40)),
  tools: z
    .string()
    .max(2000)
    .transform((v) =>
      v
        .split(",")
        .map((t) => t.trim())
        .filter(Boolean),
    ),
  minutes: figure("Minutes are a number from 1 to 10,000.", 1, 10_000),
  consumablesCost: figure("Consumables cost is a number, such as 0 or 12.50.", 0, 100_000),
  skill: z.enum(SKILLS, { message: "Choose who may do it." }),
  quantity: z.string().trim().max(120).optional(),
  unit: z.string().trim().max(20).optional(),
  rule: z.string().trim().max(200).optional(),
  failMeans: z.string().trim().max(1000),
  falseAlarmPercent: figure("A false-alarm rate is a percentage from 0 to 100.", 0, 100),
});

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  // Another workshop's check does not exist for this member, whatever their role.
  const { check } = await checkWithLinks(db, context.get(memberContext).workshopId, params.checkId);
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const data = await request.formData();
  const parsed = EditForm.safeParse(Object.fromEntries(data));
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const { falseAlarmPercent, ...rest } = parsed.data;
  const edit = {
    ...rest,
    minutes: Math.round(rest.minutes),
    access: CHECK_ACCESS.filter((a) => data.getAll("access").includes(a)),
    cautions: CAUTIONS.filter((c) => data.getAll("cautions").includes(c)),
    falseAlarm: Math.round(falseAlarmPercent * 10) / 1000,
  };
  const problems = checkEditProblems(edit, check.resultKind === "measurement");
  if (Object.keys(problems).length) return invalid(problems);
  return onForm(async () => {
    const done = await updateCheck(db, member, params.checkId, edit);
    return done.changed.length
      ? `Saved. Knowledge base now at version ${done.kbVersion}.`
      : "Nothing had changed.";
  });
}

export function meta({ loaderData }: Route.MetaArgs) {
  return [
    {
      title: loaderData
        ? `${loaderData.check.name} — Knowledge base — Ramplight`
        : "Knowledge base — Ramplight",
    },
  ];
}

export default function CheckPage({ loaderData, actionData }: Route.ComponentProps) {
  const { check, finds, mayEdit } = loaderData;
  const errors = actionData?.errors;
  return (
    <div className="grid max-w-3xl gap-5">
      <BackToKb />
      <div>
        <p className="meta">Check</p>
        <h1 className="text-2xl font-semibold">{check.name}</h1>
        <p className="meta tabular">{`${check.minutes} min · ${check.skill} · ${check.access.map((a) => CHECK_ACCESS_LABEL[a as keyof typeof CHECK_ACCESS_LABEL] ?? a).join(", ") || "no special access"}`}</p>
      </div>
      <Cautions cautions={check.cautions} />
      <section aria-labelledby="steps" className="card">
        <h2 id="steps" className="text-xl font-semibold">
          How to do it
        </h2>
        <ol className="mt-2 list-decimal pl-6">
          {check.instructions.map((l, i) => (
            <li key={i}>{l}</li>
          ))}
        </ol>
        {check.rule ? <p className="mt-2 font-mono text-sm">{`Passes when: ${check.rule}`}</p> : null}
        {check.failMeans ? <p className="meta mt-1">{`A fail means: ${check.failMeans}`}</p> : null}
      </section>
      <section aria-labelledby="finds" className="card">
        <h2 id="finds" className="text-xl font-semibold">
          Causes it finds
        </h2>
        <ul className="mt-2 grid gap-1">
          {finds.map((f) => (
            <li key={f.id} className="flex flex-wrap justify-between gap-2">
              <Link className="underline" to={href("/kb/causes/:causeId", { causeId: f.id })}>
                {f.name}
              </Link>
              <span className="tabular">{`fails ${describeStrength(f.pFail)}`}</span>
            </li>
          ))}
        </ul>
      </section>
      <FormMessages errors={errors} notice={actionData?.notice} />
      {mayEdit ? <CheckEditor check={check} errors={errors} /> : null}
      <ItemHistory lines={loaderData.history} />
    </div>
  );
}

type CheckRow = Route.ComponentProps["loaderData"]["check"];

/** A senior's editor of the check; a measurement's rule is compiled as it is typed. */
function CheckEditor({ check, errors }: { check: CheckRow; errors: FormErrors | undefined }) {
  const busy = useNavigation().state === "submitting";
  const [rule, setRule] = useState(check.rule ?? "");
  let ruleProblem: string | null = null;
  if (check.resultKind === "measurement" && rule.trim())
    try {
      compileRule(rule);
    } catch (e) {
      ruleProblem = (e as Error).message;
    }
  const input = (name: string, label: string, value: string | number, inputMode?: "numeric" | "decimal") => (
    <TextField prefix="check" name={name} label={label} value={value} errors={errors} inputMode={inputMode} />
  );
  return (
    <EditorFold id="edit-check" title="Edit this check" errors={errors}>
      <Form method="post" className="mt-2 grid gap-3">
        {input("name", "Name", check.name)}
        <label className="grid gap-1 text-sm font-medium" htmlFor="check-instructions">
          Steps, one per line
          <textarea
            id="check-instructions"
            name="instructions"
            rows={Math.min(12, check.instructions.length + 2)}
            defaultValue={check.instructions.join("\n")}
            className="field py-2"
            {...describedBy(errors, "instructions")}
          />
          <FieldError errors={errors} name="instructions" />
        </label>
        {input("tools", "Tools, separated by commas", check.tools.join(", "))}
        <div className="grid gap-3 sm:grid-cols-3">
          {input("minutes", "Minutes", check.minutes, "numeric")}
          {input("consumablesCost", "Consumables cost", check.consumablesCost, "decimal")}
          {input("falseAlarmPercent", "False alarms, %", Math.round(check.falseAlarm * 1000) / 10, "decimal")}
        </div>
        <label className="grid gap-1 text-sm font-medium" htmlFor="check-skill">
          Who may do it
          <select id="check-skill" name="skill" defaultValue={check.skill} className="field">
            {SKILLS.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        </label>
        <fieldset className="grid gap-1">
          <legend className="text-sm font-medium">Access it needs</legend>
          <div className="flex flex-wrap gap-x-4">
            {CHECK_ACCESS.map((a) => (
              <label key={a} className="flex min-h-tap items-center gap-2">
                <input type="checkbox" name="access" value={a} defaultChecked={check.access.includes(a)} />
                {CHECK_ACCESS_LABEL[a]}
              </label>
            ))}
          </div>
        </fieldset>
        <fieldset className="grid gap-1" aria-describedby={errors?.cautions ? "cautions-error" : undefined}>
          <legend className="text-sm font-medium">Cautions shown with it</legend>
          <div className="flex flex-wrap gap-x-4">
            {CAUTIONS.map((c) => (
              <label key={c} className="flex min-h-tap items-center gap-2">
                <input
                  type="checkbox"
                  name="cautions"
                  value={c}
                  defaultChecked={check.cautions.includes(c)}
                />
                {CAUTION_LABEL[c]}
              </label>
            ))}
          </div>
          <FieldError errors={errors} name="cautions" />
        </fieldset>
        {check.resultKind === "measurement" ? (
          <div className="grid gap-3 sm:grid-cols-3">
            {input("quantity", "Quantity measured", check.quantity ?? "")}
            {input("unit", "Unit", check.unit ?? "")}
            <label className="grid gap-1 text-sm font-medium" htmlFor="check-rule">
              Passes when
              <input
                id="check-rule"
                name="rule"
                value={rule}
                onChange={(e) => setRule(e.target.value)}
                className="field font-mono"
                aria-invalid={ruleProblem || errors?.rule ? true : undefined}
                aria-describedby={ruleProblem || errors?.rule ? "rule-error" : undefined}
              />
              {ruleProblem ? (
                <span id="rule-error" className="mt-1 block text-sm font-medium text-stop">
                  {ruleProblem}
                </span>
              ) : (
                <FieldError errors={errors} name="rule" />
              )}
            </label>
          </div>
        ) : null}
        {input("failMeans", "A fail means", check.failMeans)}
        <div>
          <button type="submit" className="btn-primary" disabled={busy}>
            Save the check
          </button>
        </div>
      </Form>
    </EditorFold>
  );
}
