import { data } from "react-router";
import { z, type ZodError } from "zod";
import { parseDecimal } from "~/measure";
import { refusalMessage } from "./errors.server";
import type { FormAnswer, FormErrors } from "./forms";

/** A refused form: the messages by field, 400 unless told, nothing changed. */
export const invalid = (errors: FormErrors, status = 400) =>
  data<FormAnswer>({ errors, notice: null }, { status });

/** Done: the notice to show. */
export const done = (notice: string): FormAnswer => ({ errors: {}, notice });

/** zod's issues as field messages; issues of the whole form go under `form`. */
export function zodErrors(error: ZodError): FormErrors {
  const flat = z.flattenError(error);
  return {
    ...(flat.fieldErrors as FormErrors),
    ...(flat.formErrors.length ? { form: flat.formErrors } : {}),
  };
}

/**
 * A number typed in a form field, as people type it ("1,250.50", "12 %"), within [min, max]; the
 * message says what is wanted. Thousands separators are allowed (app/measure's parseDecimal).
 */
export const figureBetween = (message: string, min: number, max: number) =>
  z.string().transform((v, ctx) => {
    const n = parseDecimal(v.replace(/%$/, "").trim());
    if (n === null || n < min || n > max) {
      ctx.addIssue({ code: "custom", message });
      return z.NEVER;
    }
    return n;
  });

/** Parses a form with a schema: the values, or the refusal to return. */
export async function readForm<S extends z.ZodType>(
  request: Request,
  schema: S,
): Promise<{ ok: true; value: z.infer<S> } | { ok: false; answer: ReturnType<typeof invalid> }> {
  const parsed = schema.safeParse(Object.fromEntries(await request.formData()));
  return parsed.success
    ? { ok: true, value: parsed.data }
    : { ok: false, answer: invalid(zodErrors(parsed.error)) };
}

/**
 * Runs a form's work; a refusal from a server module (a 4xx Response with a message) is shown on the
 * form under `field` instead of as an error page. Anything else is thrown on.
 */
export async function onForm(work: () => Promise<string>, field = "form") {
  try {
    return done(await work());
  } catch (error) {
    return refusedOnForm(error, field);
  }
}

/** A server module's refusal as the form's answer; anything else (a redirect, a fault) is thrown on. */
export async function refusedOnForm(error: unknown, field = "form") {
  const refused = await refusalMessage(error);
  // A refusal that names its fields (refuse(…, { errors })) puts each message beside its field.
  if (refused && refused.status !== 404)
    return invalid(refused.errors ?? { [field]: [refused.message] }, refused.status);
  throw error;
}
