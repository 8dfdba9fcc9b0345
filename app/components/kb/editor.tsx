// The parts every knowledge-base page and editor shares: the way back to the base, a folded editor
// section that opens by itself when its form came back with messages, and a labelled field with its
// message under it.
import type { ReactNode } from "react";
import { href, Link } from "react-router";
import { PRIORITIES, PRIORITY_COPY, type Priority } from "~/domain/knowledge";
import type { FormErrors } from "~/http/forms";
import { Fold } from "../fold";
import { describedBy, FieldError } from "../ui/form-errors";

export function BackToKb() {
  return (
    <p>
      <Link className="inline-flex min-h-tap items-center text-sm text-uv-700 underline" to={href("/kb")}>
        Knowledge base
      </Link>
    </p>
  );
}

export function EditorFold({
  id,
  title,
  errors,
  fields,
  children,
}: {
  id: string;
  title: string;
  errors: FormErrors | undefined;
  /** The fields of this fold's forms: it opens by itself only for their messages (all, if not given). */
  fields?: string[];
  children: ReactNode;
}) {
  const mine = Object.keys(errors ?? {}).filter((k) => !fields || fields.includes(k));
  return (
    <section aria-labelledby={id} className="rounded-card border border-rule bg-card p-4">
      <Fold
        open={mine.length > 0}
        summaryClassName="min-h-tap cursor-pointer content-center font-semibold"
        summary={<span id={id}>{title}</span>}
      >
        {children}
      </Fold>
    </section>
  );
}

/** A text field (or, with rows, a text area) named `name`, its id prefixed, its message under it. */
export function TextField({
  prefix,
  name,
  label,
  value,
  errors,
  rows = 0,
  inputMode,
}: {
  prefix: string;
  name: string;
  label: string;
  value: string | number;
  errors: FormErrors | undefined;
  rows?: number;
  inputMode?: "numeric" | "decimal";
}) {
  const id = `${prefix}-${name}`;
  return (
    <label className="grid gap-1 text-sm font-medium" htmlFor={id}>
      {label}
      {rows ? (
        <textarea
          id={id}
          name={name}
          rows={rows}
          defaultValue={value}
          className="field py-2"
          {...describedBy(errors, name)}
        />
      ) : (
        <input
          id={id}
          name={name}
          defaultValue={value}
          inputMode={inputMode}
          className="field"
          {...describedBy(errors, name)}
        />
      )}
      <FieldError errors={errors} name={name} />
    </label>
  );
}

/** The tick that says a senior means an action that cannot be undone from the form (retire, merge). */
export function ConfirmBox({
  id,
  field,
  label,
  errors,
}: {
  id: string;
  field: string;
  label: string;
  errors: FormErrors | undefined;
}) {
  return (
    <>
      <label className="mt-2 flex min-h-tap items-center gap-2 text-sm font-medium" htmlFor={id}>
        <input id={id} type="checkbox" name="confirm" value="yes" {...describedBy(errors, field)} />
        {label}
      </label>
      <FieldError errors={errors} name={field} />
    </>
  );
}

/** The owner-facing priority of a failure mode, as every knowledge-base form asks for it. */
export function PrioritySelect({ id, name, value }: { id: string; name: string; value: Priority }) {
  return (
    <label className="grid gap-1 text-sm font-medium" htmlFor={id}>
      Priority for the owner
      <select id={id} name={name} defaultValue={value} className="field">
        {PRIORITIES.map((x) => (
          <option key={x} value={x}>
            {PRIORITY_COPY[x].label}
          </option>
        ))}
      </select>
    </label>
  );
}
