import { useState } from "react";
import { Form, useNavigation } from "react-router";
import { CAUTION_LABEL, CAUTIONS, CHECK_ACCESS, CHECK_ACCESS_LABEL } from "~/domain/knowledge";
import { SKILLS } from "~/domain/people";
import type { FormErrors } from "~/http/forms";
import { compileRule } from "~/measure";
import { describedBy, FieldError } from "../ui/form-errors";
import { EditorFold, TextField } from "./editor";

export type CheckFields = {
  name: string;
  instructions: string[];
  tools: string[];
  minutes: number;
  consumablesCost: number;
  falseAlarm: number;
  skill: string;
  access: string[];
  cautions: string[];
  resultKind: "pass_fail" | "measurement";
  quantity: string | null;
  unit: string | null;
  rule: string | null;
  failMeans: string;
};

/** A blank check for the new-check page: the fields a senior fills in. */
export const NEW_CHECK: CheckFields = {
  name: "",
  instructions: [],
  tools: [],
  minutes: 10,
  consumablesCost: 0,
  falseAlarm: 0.05,
  skill: "technician",
  access: [],
  cautions: [],
  resultKind: "pass_fail",
  quantity: null,
  unit: null,
  rule: null,
  failMeans: "",
};

/**
 * A senior's editor of a check, folded on the check's page, open on the new-check page (where the
 * kind of result is chosen too); a measurement's rule is compiled as it is typed.
 */
export function CheckEditor({
  check,
  errors,
  isNew = false,
}: {
  check: CheckFields;
  errors: FormErrors | undefined;
  isNew?: boolean;
}) {
  const busy = useNavigation().state === "submitting";
  const [rule, setRule] = useState(check.rule ?? "");
  const [kind, setKind] = useState(check.resultKind);
  let ruleProblem: string | null = null;
  if (kind === "measurement" && rule.trim())
    try {
      compileRule(rule);
    } catch (e) {
      ruleProblem = (e as Error).message;
    }
  const input = (name: string, label: string, value: string | number, inputMode?: "numeric" | "decimal") => (
    <TextField prefix="check" name={name} label={label} value={value} errors={errors} inputMode={inputMode} />
  );
  const form = (
    <Form method="post" className="mt-2 grid gap-3">
      {input("name", "Name", check.name)}
      {isNew ? (
        <fieldset className="grid gap-1">
          <legend className="text-sm font-medium">Its result</legend>
          <div className="flex flex-wrap gap-x-4">
            {(
              [
                ["pass_fail", "Pass or fail"],
                ["measurement", "A measurement against a limit"],
              ] as const
            ).map(([value, label]) => (
              <label key={value} className="flex min-h-tap items-center gap-2">
                <input
                  type="radio"
                  name="resultKind"
                  value={value}
                  checked={kind === value}
                  onChange={() => setKind(value)}
                />
                {label}
              </label>
            ))}
          </div>
        </fieldset>
      ) : null}
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
              <input type="checkbox" name="cautions" value={c} defaultChecked={check.cautions.includes(c)} />
              {CAUTION_LABEL[c]}
            </label>
          ))}
        </div>
        <FieldError errors={errors} name="cautions" />
      </fieldset>
      {kind === "measurement" ? (
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
          {isNew ? "Add the check" : "Save the check"}
        </button>
      </div>
    </Form>
  );
  return isNew ? (
    form
  ) : (
    <EditorFold id="edit-check" title="Edit this check" errors={errors}>
      {form}
    </EditorFold>
  );
}
