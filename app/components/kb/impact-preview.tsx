// A cause's links as its page lists them: each with its strength in words and figures, and for
// seniors a field to change it, with a preview of the change's effect on the workshop's cases.
import { Form, href, Link, useNavigation } from "react-router";
import { describeStrength } from "~/domain/link-strength";
import type { FormErrors } from "~/http/forms";
import type { Impact } from "~/kb/impact";
import { describedBy, FieldError } from "../ui/form-errors";

/** The field of one link's strength: its own name, so the message lands beside that link. */
export const strengthField = (link: string, otherId: string) => `strength-${link}-${otherId}`;

export type LinkRow = { id: string; name: string; p: number; note?: string };
export type Preview = { link: "symptom" | "check"; otherId: string; p: number; impact: Impact };

const ordinal = (n: number | null) =>
  n === null
    ? "not ranked"
    : `${n}${n % 10 === 1 && n % 100 !== 11 ? "st" : n % 10 === 2 && n % 100 !== 12 ? "nd" : n % 10 === 3 && n % 100 !== 13 ? "rd" : "th"}`;

/** The change's effect on the workshop's cases with a confirmed cause, before it is saved. */
function ImpactPreview({ impact, p }: { impact: Impact; p: number }) {
  return (
    <div
      role="status"
      aria-label="Effect on cases with a confirmed cause"
      className="mt-2 rounded-lg border-2 border-uv-500 p-3 text-sm"
    >
      <p className="font-medium">{`At ${describeStrength(p)}, of ${impact.cases} cases with a confirmed cause:`}</p>
      <ul className="tabular mt-1 list-disc pl-6">
        <li>{`confirmed cause ranked first: ${impact.first.before} → ${impact.first.after}`}</li>
        <li>{`in the top three: ${impact.topThree.before} → ${impact.topThree.after}`}</li>
      </ul>
      {impact.moved.length ? (
        <ul className="mt-1 grid gap-1" aria-label="Cases that moved">
          {impact.moved.map((m) => (
            <li key={m.id}>
              <Link className="underline" to={href("/cases/:caseId", { caseId: m.id })}>
                {`case #${m.number}`}
              </Link>
              {` (${m.answerName}): ${ordinal(m.before)} → ${ordinal(m.after)}`}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-1">No case would move. Nothing is saved until you press Save strength.</p>
      )}
    </div>
  );
}

export function LinkList({
  label,
  link,
  rows,
  mayEdit,
  errors,
  empty,
  preview,
}: {
  label: string;
  link: "symptom" | "check";
  rows: LinkRow[];
  mayEdit: boolean;
  errors: FormErrors | undefined;
  empty: string;
  preview: Preview | null;
}) {
  const busy = useNavigation().state === "submitting";
  if (rows.length === 0) return <p className="mt-2 text-graphite-700">{empty}</p>;
  return (
    <ul className="mt-2 grid gap-2" aria-label={label}>
      {rows.map((r) => {
        const field = strengthField(link, r.id);
        return (
          <li key={r.id} aria-label={r.name} className="rounded-lg border border-rule p-3">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              {link === "check" ? (
                <Link className="font-medium underline" to={href("/kb/checks/:checkId", { checkId: r.id })}>
                  {r.name}
                </Link>
              ) : (
                <span className="font-medium">{r.name}</span>
              )}
              <span className="tabular" data-strength>
                {describeStrength(r.p)}
              </span>
            </div>
            {r.note ? <p className="meta">{r.note}</p> : null}
            {mayEdit ? (
              <Form method="post" className="mt-2 grid gap-1">
                <input type="hidden" name="link" value={link} />
                <input type="hidden" name="otherId" value={r.id} />
                <label className="text-sm font-medium" htmlFor={field}>
                  {`New strength for ${r.name}`}
                </label>
                <div className="flex flex-wrap items-center gap-2">
                  <input
                    id={field}
                    name="strength"
                    list="strength-words"
                    placeholder="a word, or 40%"
                    className="field w-44 max-w-full"
                    {...describedBy(errors, field)}
                  />
                  <button type="submit" name="intent" value="preview" className="btn" disabled={busy}>
                    Preview the effect
                  </button>
                  <button type="submit" name="intent" value="strength" className="btn" disabled={busy}>
                    Save strength
                  </button>
                </div>
                <FieldError errors={errors} name={field} />
              </Form>
            ) : null}
            {preview && preview.link === link && preview.otherId === r.id ? (
              <ImpactPreview impact={preview.impact} p={preview.p} />
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
