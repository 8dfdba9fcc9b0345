// A senior's field for one link's strength, inside that link's row: a word or a figure, saved or
// previewed by the page's action. A real form in the cell, so it works before the script loads.
import { type KeyboardEvent, useEffect, useRef } from "react";
import { Form } from "react-router";
import type { FormErrors } from "~/http/forms";
import { type LinkRow, strengthField, strengthInput } from "~/kb/link-rows";
import { describedBy, FieldError } from "../ui/form-errors";

/** The words a field suggests; one list per page, named by every field. */
export const STRENGTH_WORDS_LIST = "strength-words";

/**
 * Up and Down go to the strength field of the row above or below as the table now shows it, so a
 * senior can walk the links without leaving the keyboard's home row; Escape puts back what the field
 * held. With a modifier held the keys keep their own meaning (Alt+Down opens the word suggestions).
 */
function onFieldKey(e: KeyboardEvent<HTMLInputElement>) {
  if (e.altKey || e.ctrlKey || e.metaKey || e.shiftKey) return;
  const field = e.currentTarget;
  if (e.key === "ArrowDown" || e.key === "ArrowUp") {
    e.preventDefault();
    const table = field.closest("table");
    const fields = [...(table?.querySelectorAll<HTMLInputElement>("input[data-strength-field]") ?? [])];
    const next = fields[fields.indexOf(field) + (e.key === "ArrowDown" ? 1 : -1)];
    if (next) {
      next.focus();
      next.select();
    }
  } else if (e.key === "Escape" && field.value !== field.defaultValue) {
    e.preventDefault();
    field.value = field.defaultValue;
  }
}

export function StrengthEditor({
  row,
  errors,
  busy,
}: {
  row: LinkRow;
  errors: FormErrors | undefined;
  busy: boolean;
}) {
  const field = strengthField(row.link, row.id);
  const initial = strengthInput(row.p);
  const input = useRef<HTMLInputElement>(null);
  const shown = useRef(initial);
  // Once a new strength is saved the field shows it; what someone typed before the script loaded
  // is left alone, since the first value is the one the server sent.
  useEffect(() => {
    if (shown.current !== initial && input.current) input.current.value = initial;
    shown.current = initial;
  }, [initial]);
  return (
    <Form method="post" className="mt-1 grid gap-1">
      <input type="hidden" name="link" value={row.link} />
      <input type="hidden" name="otherId" value={row.id} />
      <label className="text-sm font-medium" htmlFor={field}>
        New strength<span className="sr-only">{` for ${row.name}`}</span>
      </label>
      <div className="flex flex-wrap items-center gap-2">
        <input
          ref={input}
          id={field}
          name="strength"
          defaultValue={initial}
          list={STRENGTH_WORDS_LIST}
          placeholder="a word, or 40%"
          autoComplete="off"
          className="field w-40 max-w-full"
          data-strength-field
          onKeyDown={onFieldKey}
          {...describedBy(errors, field)}
        />
        {/* Save comes first: it is the form's default button, so Enter in the field saves, with
            or without the script. */}
        <button type="submit" name="intent" value="strength" className="btn" disabled={busy}>
          Save strength
        </button>
        <button type="submit" name="intent" value="preview" className="btn" disabled={busy}>
          Preview the effect
        </button>
      </div>
      <FieldError errors={errors} name={field} />
    </Form>
  );
}
