import { type FormErrors, firstError } from "~/http/forms";

/** The message of one field, placed right under it; the field names it with aria-describedby. */
export function FieldError({ errors, name }: { errors: FormErrors | undefined; name: string }) {
  const message = firstError(errors, name);
  return message ? (
    <span id={`${name}-error`} className="mt-1 block text-sm font-medium text-stop">
      {message}
    </span>
  ) : null;
}

/** aria-invalid and aria-describedby for a field that has a message. */
export const describedBy = (errors: FormErrors | undefined, name: string) =>
  firstError(errors, name) ? { "aria-invalid": true as const, "aria-describedby": `${name}-error` } : {};

/** What concerns the whole form, and the notice when it worked. */
export function FormMessages({
  errors,
  notice,
  className = "",
}: {
  errors?: FormErrors;
  notice?: string | null;
  className?: string;
}) {
  const form = firstError(errors, "form");
  return (
    <>
      {form ? (
        <p role="alert" className={`rounded-lg border-2 border-stop bg-card p-3 ${className}`}>
          {form}
        </p>
      ) : null}
      {notice ? (
        <p role="status" className={`rounded-lg border border-sound bg-card p-3 ${className}`}>
          {notice}
        </p>
      ) : null}
    </>
  );
}
