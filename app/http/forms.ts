// The one shape in which a form action answers: field messages to show beside their fields
// (`form` for what concerns the whole form), and a notice when it worked.
export type FormErrors = Partial<Record<string, string[]>>;
export type FormAnswer = { errors: FormErrors; notice: string | null };

/** The first message for a field, if any. */
export const firstError = (errors: FormErrors | undefined, field: string) => errors?.[field]?.[0];
