// One check of the plan, folded to a line or open with its steps, cautions and the ways to record it.
import { useQuery } from "@tanstack/react-query";
import { useId, useState } from "react";
import { checkQuery } from "~/cases/case-queries";
import type { Diagnosis } from "~/cases/present-diagnosis";
import { formatMoney, formatPercent } from "~/domain/format";
import { Fold } from "../fold";
import { Cautions } from "./cautions";

export type Step = Diagnosis["plan"]["steps"][number];
export type Result = "pass" | "fail";
export type RecordResult = (step: Step, result: { result?: Result; reading?: string }) => void;

const ACCESS_LABEL: Record<string, string> = {
  ramp: "ramp",
  road_test: "road test",
  scan_tool: "scan tool",
  wheels_off: "wheels off",
  bonnet_open: "bonnet open",
  cold_engine: "cold engine",
};
const RESULT_WORDS: Record<Result, string> = { pass: "passed", fail: "found a fault" };

/** Skill, access and tools in one line, each named once ("scan tool" is both an access and a tool). */
export function needsLine(step: Pick<Step, "skill" | "access" | "tools">): string {
  const seen = new Set<string>();
  return [step.skill, ...step.access.map((a) => ACCESS_LABEL[a] ?? a), ...step.tools]
    .filter((w) => {
      const k = w.toLowerCase();
      return !seen.has(k) && (seen.add(k), true);
    })
    .join(" · ");
}

type StepProps = {
  step: Step;
  first: boolean;
  folded: boolean;
  onOpen: () => void;
  currency: string;
  record: RecordResult;
  busy: boolean;
  error: string | null;
  armed: Result | null;
};

export function PlanStep({ step, first, folded, onOpen, currency, record, busy, error, armed }: StepProps) {
  const [reading, setReading] = useState("");
  // One <li> folded or open, so opening it from the keyboard keeps the focus where it was.
  return (
    <li
      data-step={step.checkId}
      // A step takes the focus so that P or F then Enter is aimed at it and at nothing else.
      // eslint-disable-next-line jsx-a11y/no-noninteractive-tabindex
      tabIndex={0}
      aria-label={step.name}
      className={
        folded
          ? "flex flex-wrap items-center justify-between gap-2 rounded-lg border border-rule p-3 outline-offset-2"
          : `rounded-lg border p-3 outline-offset-2 ${first ? "border-uv-500 bg-uv-50" : "border-rule"}`
      }
    >
      {folded ? (
        <>
          <span>
            <span className="font-semibold">{step.name}</span>
            <span className="meta tabular block">{`${formatPercent(step.pFind)} to find it · ${step.minutes} min · ${formatMoney(step.cost, currency)}${step.cautions.length ? " · needs care" : ""}`}</span>
          </span>
          <button type="button" className="btn" onClick={onOpen} aria-label={`Open ${step.name}`}>
            Open
          </button>
        </>
      ) : (
        <OpenStep {...{ step, first, currency, record, busy, error, armed, reading, setReading }} />
      )}
    </li>
  );
}

/**
 * An open step's body. Only open steps read the check's details (a folded one shows a line), so a
 * page of folded steps costs no query observers while rendering.
 */
function OpenStep({
  step,
  first,
  currency,
  record,
  busy,
  error,
  armed,
  reading,
  setReading,
}: Omit<StepProps, "folded" | "onOpen"> & { reading: string; setReading: (r: string) => void }) {
  const errorId = useId();
  const limit = step.limit;
  // A check opened from the folded part of the plan came without its steps: read them now.
  const details = useQuery({ ...checkQuery(step.checkId), enabled: !step.detailed });
  const instructions = step.detailed ? step.instructions : (details.data?.instructions ?? []);
  const failMeans = step.detailed ? step.failMeans : (details.data?.failMeans ?? "");
  return (
    <>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-semibold">
          {first ? "Next: " : ""}
          {step.name}
        </h3>
        <span className="tabular text-sm">
          <strong>{formatPercent(step.pFind)}</strong>
          {` to find it · ${step.minutes} min · ${formatMoney(step.cost, currency)}`}
        </span>
      </div>
      <p className="meta">{needsLine(step)}</p>
      {/* Every check on offer can be recorded straight away, so its cautions are always shown in
          full; only the instructions fold. */}
      <Cautions cautions={step.cautions} />
      {instructions.length ? (
        <Fold
          className="mt-1"
          open={first}
          summaryClassName="inline-flex min-h-tap cursor-pointer items-center font-medium"
          summary="How to do it"
        >
          <ol className="mt-1 list-decimal pl-6 text-sm">
            {instructions.map((line, i) => (
              <li key={i}>{line}</li>
            ))}
          </ol>
        </Fold>
      ) : null}
      {armed ? (
        <p role="status" className="mt-2 rounded-lg border-2 border-uv-500 bg-card p-2 font-medium">
          Press <kbd>Enter</kbd> to record “{step.name}” as {RESULT_WORDS[armed]}, or any other key to let go.
        </p>
      ) : null}
      {step.resultKind === "measurement" ? (
        <form
          className="mt-2 flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            record(step, { reading });
          }}
        >
          <label className="flex flex-col text-sm font-medium">
            {`Reading for ${step.name.toLowerCase()}`}
            <input
              value={reading}
              onChange={(e) => setReading(e.target.value)}
              placeholder={limit ? `limit: ${limit}` : (step.unit ?? "")}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? errorId : undefined}
              className="field mt-1 w-64 max-w-full"
            />
          </label>
          <button type="submit" disabled={busy} className="btn-primary">
            Record reading
          </button>
          {limit ? <p className="meta w-full">{`Passes when the reading is ${limit}.`}</p> : null}
        </form>
      ) : (
        <div className="mt-2 flex flex-wrap gap-2">
          <button
            type="button"
            disabled={busy}
            onClick={() => record(step, { result: "pass" })}
            className="btn"
          >
            Passed
          </button>
          <button
            type="button"
            disabled={busy}
            onClick={() => record(step, { result: "fail" })}
            className="btn"
          >
            Found a fault
          </button>
        </div>
      )}
      {error ? (
        <p id={errorId} role="alert" className="mt-2 rounded-lg border-2 border-stop p-2">
          {error}
        </p>
      ) : null}
      {failMeans ? <p className="meta mt-1">{`A fail means: ${failMeans}`}</p> : null}
    </>
  );
}
