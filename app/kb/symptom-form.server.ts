// The symptom form as a senior fills it in, on a symptom's page and on the new-symptom page: lists
// typed with commas, the leak as a percentage, a trouble code checked against SAE J2012.
import { z } from "zod";
import { SYMPTOM_KINDS, SYSTEMS, type System } from "~/domain/knowledge";
import { figureBetween, invalid, zodErrors } from "~/http/forms.server";
import { type SymptomEdit, symptomEditProblems } from "./symptom-edit.server";

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

const SymptomForm = z.object({
  name: z.string().trim().min(3, "Name it in at least 3 characters.").max(200),
  synonyms: list(80),
  kind: z.enum(SYMPTOM_KINDS, { message: "Choose the kind of symptom." }),
  code: z.string().trim().max(10).optional(),
  conditions: list(20),
  leakPercent: figureBetween("The leak is a percentage from 0 to 100.", 0, 100),
});
const SystemField = z.enum(SYSTEMS, { message: "Choose the system it belongs to." });

type Refused = { ok: false; answer: ReturnType<typeof invalid> };

/** The edit a symptom form says, or the refusal to answer with (messages by field, 400). */
export function readSymptomForm(
  form: Record<string, FormDataEntryValue>,
): { ok: true; edit: SymptomEdit } | Refused {
  const parsed = SymptomForm.safeParse(form);
  if (!parsed.success) return { ok: false, answer: invalid(zodErrors(parsed.error)) };
  const { leakPercent, code, ...rest } = parsed.data;
  const edit = { ...rest, code: code ? code.toUpperCase() : null, leak: Math.round(leakPercent * 10) / 1000 };
  const problems = symptomEditProblems(edit);
  if (Object.keys(problems).length) return { ok: false, answer: invalid(problems) };
  return { ok: true, edit };
}

/** A new symptom's form: the same fields and the system it belongs to. */
export function readNewSymptomForm(
  form: Record<string, FormDataEntryValue>,
): { ok: true; edit: SymptomEdit & { system: System } } | Refused {
  const system = SystemField.safeParse(form.system);
  const read = readSymptomForm(form);
  if (!system.success)
    return { ok: false, answer: invalid({ system: ["Choose the system it belongs to."] }) };
  return read.ok ? { ok: true, edit: { ...read.edit, system: system.data } } : read;
}
