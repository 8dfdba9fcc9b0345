import { SYMPTOM_KIND_LABEL, SYMPTOM_KINDS, SYSTEM_LABEL, SYSTEMS } from "~/domain/knowledge";
import type { FormErrors } from "~/http/forms";
import { describedBy, FieldError } from "../ui/form-errors";
import { TextField } from "./editor";

export type SymptomValues = {
  name: string;
  synonyms: string[];
  kind: string;
  code: string | null;
  conditions: string[];
  leak: number;
};

/** The fields of a symptom's form; a new symptom also says which system it belongs to. */
export function SymptomFields({
  symptom,
  errors,
  withSystem = false,
}: {
  symptom: SymptomValues;
  errors: FormErrors | undefined;
  withSystem?: boolean;
}) {
  const field = (name: string, label: string, value: string, rows = 0) => (
    <TextField prefix="symptom" name={name} label={label} value={value} errors={errors} rows={rows} />
  );
  return (
    <>
      {field("name", "Name, as a technician says it", symptom.name)}
      {field("synonyms", "Other words people use, separated by commas", symptom.synonyms.join(", "), 3)}
      {withSystem ? (
        <label className="grid gap-1 text-sm font-medium" htmlFor="symptom-system">
          System
          <select
            id="symptom-system"
            name="system"
            defaultValue=""
            className="field"
            {...describedBy(errors, "system")}
          >
            <option value="" disabled>
              Choose…
            </option>
            {SYSTEMS.map((s) => (
              <option key={s} value={s}>
                {SYSTEM_LABEL[s]}
              </option>
            ))}
          </select>
          <FieldError errors={errors} name="system" />
        </label>
      ) : null}
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
    </>
  );
}
