import { Form, href, Link } from "react-router";
import { formatMileage, type UnitSystem } from "~/measure/mileage";
import { STATE_LABEL } from "~/domain/format";
import type { FormErrors } from "~/http/forms";
import { describedBy, FieldError } from "../ui/form-errors";
import type { CaseView } from "~/cases/case-queries";

type Props = {
  c: CaseView["case"];
  mayEditComplaint: boolean;
  quickFind: React.ReactNode;
  errors?: FormErrors;
};

/** The vehicle in one line, leaving out what is not known: never "(2019) · · petrol". */
export function vehicleLine(
  v: Pick<CaseView["case"]["vehicle"], "make" | "model" | "year" | "engine" | "fuelType">,
): string {
  const name = [v.make, v.model].filter((x) => x && String(x).trim()).join(" ");
  return [v.year ? `${name} (${v.year})` : name, v.engine?.trim(), v.fuelType].filter(Boolean).join(" · ");
}

export function CaseHeader({ c, mayEditComplaint, quickFind, errors }: Props) {
  const units = c.workshop.units as UnitSystem;
  return (
    <header className="flex flex-wrap items-start justify-between gap-3">
      <div className="min-w-0">
        <p className="text-sm text-graphite-600">
          <Link to={href("/cases")} className="underline">
            Cases
          </Link>{" "}
          · {STATE_LABEL[c.state]}
          {c.assignedName ? ` · with ${c.assignedName}` : ""}
        </p>
        <h1 className="text-2xl font-semibold">
          <span className="tabular">#{c.number}</span> · {c.vehicle.registration}
        </h1>
        <p className="text-graphite-700">
          {vehicleLine(c.vehicle)}
          {c.mileageKm != null ? (
            <span className="tabular"> · {formatMileage(c.mileageKm, units)}</span>
          ) : null}{" "}
          · owner {c.owner.name}
        </p>
        <blockquote className="mt-2 border-l-4 border-uv-500 pl-3 text-lg">“{c.complaint}”</blockquote>
        {mayEditComplaint ? (
          <details className="mt-1" open={Boolean(errors?.complaint)}>
            <summary className="inline-flex min-h-tap cursor-pointer items-center text-graphite-600">
              Edit the complaint
            </summary>
            <Form method="post" className="mt-1 flex flex-wrap items-end gap-2">
              <input type="hidden" name="intent" value="complaint" />
              <input type="hidden" name="version" value={c.version} />
              <label className="flex w-full max-w-xl flex-col text-sm font-medium">
                In the owner's words
                <textarea
                  name="complaint"
                  defaultValue={c.complaint}
                  rows={2}
                  className="mt-1 w-full rounded-lg border border-rule bg-card p-2 text-base"
                  {...describedBy(errors, "complaint")}
                />
                <FieldError errors={errors} name="complaint" />
              </label>
              <button
                type="submit"
                className="min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper"
              >
                Save complaint
              </button>
            </Form>
          </details>
        ) : null}
      </div>
      {quickFind}
    </header>
  );
}

type Note = { note: string; by: string | null; at: string } | null;

/**
 * The word between an apprentice and a senior, where the other person looks: the question while
 * the case waits for a senior, and the senior's note to the apprentice after a sign-off or send-back.
 */
export function SeniorNotes({
  question,
  seniorNote,
  needsSenior,
}: {
  question: Note;
  seniorNote: Note;
  needsSenior: boolean;
}) {
  const showQuestion = needsSenior && question && (!seniorNote || seniorNote.at < question.at);
  if (!showQuestion && !seniorNote) return null;
  return (
    <div className="grid gap-2">
      {showQuestion ? (
        <p className="rounded-lg border-2 border-uv-500 bg-card p-3" data-testid="question">
          <strong>{question.by ?? "The apprentice"} asked a senior:</strong> “{question.note}”
        </p>
      ) : null}
      {seniorNote ? (
        <p className="rounded-lg border border-rule bg-card p-3" data-testid="senior-note">
          <strong>Note from {seniorNote.by ?? "the senior"}:</strong> “{seniorNote.note}”
        </p>
      ) : null}
    </div>
  );
}
