// The advisor's forms on an estimate: a new item, a new line, sending it, stopping its link.
import { Form } from "react-router";
import { PRIORITIES, PRIORITY_COPY } from "~/domain/knowledge";
import { ESTIMATE_LINE_KINDS, ESTIMATE_LINE_LABEL } from "~/domain/owner-side";
import type { FormErrors } from "~/http/forms";
import { describedBy, FieldError } from "../ui/form-errors";

const field = "field mt-1 w-full";
const primary = "min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700";
const plain = "min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper";

function Input({
  name,
  label,
  errors,
  ...rest
}: { name: string; label: string; errors?: FormErrors } & React.InputHTMLAttributes<HTMLInputElement>) {
  return (
    <label className="grid text-sm font-medium" htmlFor={`est-${name}`}>
      {label}
      <input id={`est-${name}`} name={name} className={field} {...describedBy(errors, name)} {...rest} />
      <FieldError errors={errors} name={name} />
    </label>
  );
}

export function AddLineForm({
  items,
  errors,
  currency,
}: {
  items: { id: string; title: string }[];
  errors?: FormErrors;
  currency: string;
}) {
  return (
    <Form method="post" className="grid gap-3 sm:grid-cols-2" noValidate>
      <input type="hidden" name="intent" value="add-line" />
      <div className="grid">
        <label className="text-sm font-medium" htmlFor="est-itemId">
          Item
        </label>
        <select id="est-itemId" name="itemId" className={field} {...describedBy(errors, "itemId")}>
          {items.map((i) => (
            <option key={i.id} value={i.id}>
              {i.title}
            </option>
          ))}
        </select>
        <FieldError errors={errors} name="itemId" />
      </div>
      <div className="grid">
        <label className="text-sm font-medium" htmlFor="est-kind">
          What the line is for
        </label>
        <select id="est-kind" name="kind" className={field} defaultValue="part">
          {ESTIMATE_LINE_KINDS.map((k) => (
            <option key={k} value={k}>
              {ESTIMATE_LINE_LABEL[k]}
            </option>
          ))}
        </select>
        <FieldError errors={errors} name="kind" />
      </div>
      <Input name="description" label="Description" errors={errors} />
      <Input name="partNumber" label="Part number (optional)" errors={errors} />
      <Input
        name="quantity"
        label="Quantity (hours for labour)"
        inputMode="decimal"
        defaultValue="1"
        errors={errors}
      />
      <Input
        name="unitPrice"
        label={`Unit price (${currency}; a discount is negative)`}
        inputMode="decimal"
        errors={errors}
      />
      <label className="flex min-h-tap items-center gap-3 text-sm font-medium sm:col-span-2">
        <input type="checkbox" name="zeroRated" className="size-5" />
        Zero-rated (no VAT on this line)
      </label>
      <div className="sm:col-span-2">
        <button type="submit" className={primary}>
          Add the line
        </button>
      </div>
    </Form>
  );
}

export function AddItemForm({ errors }: { errors?: FormErrors }) {
  return (
    <Form method="post" className="grid gap-3 sm:grid-cols-[1fr_auto_auto] sm:items-end" noValidate>
      <input type="hidden" name="intent" value="add-item" />
      <Input name="title" label="New item, as the owner will read it" errors={errors} />
      <div className="grid">
        <label className="text-sm font-medium" htmlFor="est-priority">
          Priority
        </label>
        <select id="est-priority" name="priority" className={field} defaultValue="soon">
          {PRIORITIES.map((p) => (
            <option key={p} value={p}>
              {PRIORITY_COPY[p].label}
            </option>
          ))}
        </select>
      </div>
      <button type="submit" className={plain}>
        Add the item
      </button>
    </Form>
  );
}

export function SendForm({ errors, to, again }: { errors?: FormErrors; to: string | null; again: boolean }) {
  return (
    <Form method="post" className="grid gap-3" noValidate>
      <input type="hidden" name="intent" value="send" />
      <label className="grid text-sm font-medium" htmlFor="est-message">
        A message to the owner (optional)
        <textarea
          id="est-message"
          name="message"
          rows={3}
          className={field}
          {...describedBy(errors, "message")}
        />
        <FieldError errors={errors} name="message" />
      </label>
      <p className="text-sm text-graphite-700">
        {to
          ? `Goes to ${to} as a link that works for 14 days.`
          : "The owner has no e-mail address on record."}
        {again ? " Sending again makes a new version; the link of the earlier one stops working." : ""}
      </p>
      <div>
        <button type="submit" className={primary}>
          {again ? "Send a new version" : "Send to the owner"}
        </button>
      </div>
    </Form>
  );
}

export function RevokeForm() {
  return (
    <Form method="post">
      <input type="hidden" name="intent" value="revoke" />
      <button type="submit" className={plain}>
        Stop the owner's link
      </button>
    </Form>
  );
}

export function RemoveButton({
  intent,
  name,
  value,
  label,
  text = "Remove",
}: {
  intent: string;
  name: string;
  value: string;
  label: string;
  text?: string;
}) {
  return (
    <Form method="post">
      <input type="hidden" name="intent" value={intent} />
      <input type="hidden" name={name} value={value} />
      <button
        type="submit"
        className="min-h-tap rounded-lg px-3 text-sm text-stop underline"
        aria-label={label}
      >
        {text}
      </button>
    </Form>
  );
}
