// The check form as a senior fills it in, on a check's page and on the new-check page: the typed
// fields read and checked, the hazard and rule problems found, before anything is saved.
import { z } from "zod";
import { CAUTIONS, CHECK_ACCESS } from "~/domain/knowledge";
import { SKILLS } from "~/domain/people";
import { figureBetween, invalid, zodErrors } from "~/http/forms.server";
import { type CheckEdit, checkEditProblems } from "./check-edit.server";

const lines = (v: string) =>
  v
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter(Boolean);
const figure = figureBetween;
const CheckForm = z.object({
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

/** The edit a check form says, or the refusal to answer with (messages by field, 400). */
export function readCheckForm(
  data: FormData,
  measurement: boolean,
): { ok: true; edit: CheckEdit } | { ok: false; answer: ReturnType<typeof invalid> } {
  const parsed = CheckForm.safeParse(Object.fromEntries(data));
  if (!parsed.success) return { ok: false, answer: invalid(zodErrors(parsed.error)) };
  const { falseAlarmPercent, ...rest } = parsed.data;
  const edit = {
    ...rest,
    minutes: Math.round(rest.minutes),
    access: CHECK_ACCESS.filter((a) => data.getAll("access").includes(a)),
    cautions: CAUTIONS.filter((c) => data.getAll("cautions").includes(c)),
    falseAlarm: Math.round(falseAlarmPercent * 10) / 1000,
  };
  const problems = checkEditProblems(edit, measurement);
  if (Object.keys(problems).length) return { ok: false, answer: invalid(problems) };
  return { ok: true, edit };
}
