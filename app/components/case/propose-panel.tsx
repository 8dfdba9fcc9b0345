// "The knowledge base did not have this": a technician tells a senior, from the case where they met
// it, that a symptom should point to a cause, or that a cause or a symptom is missing. Sent without
// leaving the case (a fetcher); the answer's messages sit at their fields.
import { useState } from "react";
import { href, useFetcher } from "react-router";
import { STRENGTHS } from "~/domain/link-strength";
import type { FormAnswer } from "~/http/forms";
import { Fold } from "../fold";
import { describedBy, FieldError, FormMessages } from "../ui/form-errors";

type Item = { id: string; name: string };

export function ProposePanel({
  caseId,
  symptoms,
  causes,
}: {
  caseId: string;
  symptoms: Item[];
  causes: Item[];
}) {
  const fetcher = useFetcher<FormAnswer>();
  // With no symptom recorded yet, only a symptom the base lacks can be proposed.
  const [kind, setKind] = useState<"link" | "cause" | "symptom">(symptoms.length ? "link" : "symptom");
  const errors = fetcher.data?.errors;
  const busy = fetcher.state !== "idle";
  if (causes.length === 0) return null;
  return (
    <section aria-labelledby="propose" className="rounded-card border border-rule bg-card p-4">
      <Fold
        summaryClassName="min-h-tap cursor-pointer content-center font-semibold"
        summary={<span id="propose">The knowledge base did not have this</span>}
      >
        <fetcher.Form method="post" action={href("/kb/proposals")} className="mt-2 grid gap-3">
          <input type="hidden" name="intent" value="propose" />
          <input type="hidden" name="caseId" value={caseId} />
          <fieldset className="grid gap-1">
            <legend className="font-medium">What is missing</legend>
            <label className="flex min-h-tap items-center gap-2">
              <input
                type="radio"
                name="kind"
                value="link"
                checked={kind === "link"}
                disabled={symptoms.length === 0}
                onChange={() => setKind("link")}
              />
              A symptom points to a cause more than the ranking says
            </label>
            <label className="flex min-h-tap items-center gap-2">
              <input
                type="radio"
                name="kind"
                value="cause"
                checked={kind === "cause"}
                disabled={symptoms.length === 0}
                onChange={() => setKind("cause")}
              />
              A cause the knowledge base does not have
            </label>
            <label className="flex min-h-tap items-center gap-2">
              <input
                type="radio"
                name="kind"
                value="symptom"
                checked={kind === "symptom"}
                onChange={() => setKind("symptom")}
              />
              A symptom the knowledge base does not have
            </label>
          </fieldset>
          {kind === "symptom" ? (
            <label className="grid gap-1 text-sm font-medium" htmlFor="symptomName">
              The symptom, as you would say it
              <input
                id="symptomName"
                name="symptomName"
                className="field"
                {...describedBy(errors, "symptomName")}
              />
              <FieldError errors={errors} name="symptomName" />
            </label>
          ) : (
            <label className="grid gap-1 text-sm font-medium" htmlFor="symptomId">
              The case&apos;s symptom
              <select id="symptomId" name="symptomId" className="field" {...describedBy(errors, "symptomId")}>
                {symptoms.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.name}
                  </option>
                ))}
              </select>
              <FieldError errors={errors} name="symptomId" />
            </label>
          )}
          {kind === "cause" ? (
            <label className="grid gap-1 text-sm font-medium" htmlFor="causeName">
              The missing cause, as you would say it
              <input
                id="causeName"
                name="causeName"
                className="field"
                {...describedBy(errors, "causeName")}
              />
              <FieldError errors={errors} name="causeName" />
            </label>
          ) : null}
          <label className="grid gap-1 text-sm font-medium" htmlFor="causeId">
            {kind === "cause"
              ? "It belongs beside"
              : kind === "symptom"
                ? "The cause that shows it"
                : "The cause it points to"}
            <select id="causeId" name="causeId" className="field" {...describedBy(errors, "causeId")}>
              {causes.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                </option>
              ))}
            </select>
            <FieldError errors={errors} name="causeId" />
          </label>
          <label className="grid gap-1 text-sm font-medium" htmlFor="strength">
            How often that cause shows this symptom
            <input
              id="strength"
              name="strength"
              list="propose-strengths"
              placeholder="usually, often, sometimes… or 40%"
              className="field"
              {...describedBy(errors, "strength")}
            />
            <datalist id="propose-strengths">
              {STRENGTHS.map((s) => (
                <option key={s.word} value={s.word} />
              ))}
            </datalist>
            <FieldError errors={errors} name="strength" />
          </label>
          <label className="grid gap-1 text-sm font-medium" htmlFor="note">
            What you saw
            <textarea
              id="note"
              name="note"
              rows={3}
              className="field py-2"
              {...describedBy(errors, "note")}
            />
            <FieldError errors={errors} name="note" />
          </label>
          <FormMessages errors={errors} notice={fetcher.data?.notice} />
          <div>
            <button type="submit" className="btn" disabled={busy}>
              Send to a senior
            </button>
          </div>
        </fetcher.Form>
      </Fold>
    </section>
  );
}
