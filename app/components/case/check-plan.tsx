import { useEffect, useRef, useState } from "react";
import type { Diagnosis } from "~/cases/present-diagnosis";
import { PLAN_OPEN, PLAN_SHOWN } from "~/cases/shown";
import { formatMoney, formatPercent } from "~/domain/format";
import { Fold } from "../fold";

import { needsLine, PlanStep, type RecordResult, type Result, type Step } from "./plan-step";

export { needsLine, type RecordResult };

const SHOWN = PLAN_SHOWN;
// The first few offered checks are open in full; the rest are one line each until opened, and only
// an opened check can be recorded, so its cautions are always on screen before it is.
const OPEN_FULL = PLAN_OPEN;
const WORTH = 0.02; // below a 2% chance of finding the fault a check waits in the folded list

type Armed = { checkId: string; result: Result } | null;

/**
 * The plan's keys act only on a step the person has moved to (arrows, Tab or a click): P or F then
 * asks for Enter before anything is recorded, and any other key lets go. Stray typing on the page
 * can therefore never record a result; the buttons record at once, and every recording can be undone.
 */
function onPlanKey(
  e: React.KeyboardEvent<HTMLOListElement>,
  steps: Step[],
  armed: Armed,
  setArmed: (a: Armed) => void,
  record: RecordResult,
  isOpen: (checkId: string) => boolean,
  open: (checkId: string) => void,
) {
  if (e.ctrlKey || e.metaKey || e.altKey || e.key === "Shift") return;
  const items = [...e.currentTarget.querySelectorAll<HTMLElement>("[data-step]")];
  const at = items.indexOf(document.activeElement as HTMLElement);
  const step = at >= 0 ? steps[at] : undefined;
  if (e.key === "ArrowDown" || e.key === "ArrowUp") {
    e.preventDefault();
    setArmed(null);
    const next = at < 0 ? 0 : Math.min(items.length - 1, Math.max(0, at + (e.key === "ArrowDown" ? 1 : -1)));
    items[next]?.focus();
    return;
  }
  if (!step || e.target !== items[at]) return; // typing in a reading field is not a command
  const key = e.key.toLowerCase();
  if (!isOpen(step.checkId)) {
    // A folded check opens first (Enter, P or F), so its cautions are read before anything is recorded.
    if (e.key === "Enter" || key === "p" || key === "f") {
      e.preventDefault();
      open(step.checkId);
    }
    return;
  }
  if ((key === "p" || key === "f") && step.resultKind === "pass_fail") {
    e.preventDefault();
    setArmed({ checkId: step.checkId, result: key === "p" ? "pass" : "fail" });
  } else if (e.key === "Enter" && armed?.checkId === step.checkId) {
    e.preventDefault();
    setArmed(null);
    record(step, { result: armed.result });
  } else if (e.key === "Enter") {
    // Into the reading field only: on a pass/fail step, focusing a button would let the next
    // space of someone's typing press it.
    e.preventDefault();
    if (step.resultKind === "measurement") items[at].querySelector<HTMLElement>("input")?.focus();
  } else {
    setArmed(null);
  }
}

type PlanProps = {
  plan: Diagnosis["plan"];
  currency: string;
  record: RecordResult;
  busy: boolean;
  /** The message of a refused recording, shown at the step it concerns. */
  errorFor: (checkId: string) => string | null;
  /** A refusal that concerns no step in particular. */
  error: string | null;
  /** The apprentice's view: one step, no plan statistics. */
  single?: boolean;
};

export function CheckPlan({ plan, currency, record, busy, errorFor, error, single = false }: PlanProps) {
  const steps = plan.steps;
  // The plan orders every remaining check; the screen offers the few worth doing now.
  const worth = steps.filter((s, i) => i === 0 || s.pFind >= WORTH);
  const shown = single ? steps.slice(0, 1) : worth.slice(0, SHOWN);
  const later = single ? [] : steps.filter((s) => !shown.includes(s));
  const list = useRef<HTMLOListElement>(null);
  const [armed, setArmed] = useState<Armed>(null);
  const [opened, setOpened] = useState<ReadonlySet<string>>(new Set());
  const isOpen = (checkId: string) =>
    shown.findIndex((s) => s.checkId === checkId) < OPEN_FULL || opened.has(checkId);
  const open = (checkId: string) => setOpened((o) => new Set(o).add(checkId));
  // Alt+N moves to the next check from anywhere on the page. It only moves the focus; a single
  // letter would be reached by ordinary typing.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!e.altKey || e.ctrlKey || e.metaKey || e.code !== "KeyN") return;
      const first = list.current?.querySelector<HTMLElement>("[data-step]");
      if (!first) return;
      e.preventDefault();
      first.focus();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);
  return (
    <section aria-labelledby="plan" className="card">
      <h2 id="plan" className="text-xl font-semibold">
        {single ? "Your next check" : "Check plan"}
      </h2>
      {!single && steps.length ? (
        <p className="mt-1 text-sm text-graphite-700" data-testid="plan-saving">
          Expected cost in this order{" "}
          <strong className="tabular">{formatMoney(plan.expectedCost, currency)}</strong>; cheapest-first
          would expect{" "}
          <span className="tabular">{formatMoney(plan.cheapestFirstExpectedCost, currency)}</span>
          {plan.saving > 0.005 ? (
            <>
              {" "}
              — this order saves <strong className="tabular">{formatMoney(plan.saving, currency)}</strong> on
              average.
            </>
          ) : (
            "."
          )}
        </p>
      ) : null}
      {steps.length === 0 ? (
        <p className="mt-1 text-graphite-700">
          No checks left that bear on these causes{single ? " within your level" : ""}.
        </p>
      ) : null}
      {error ? (
        <p role="alert" className="mt-2 rounded-lg border-2 border-stop p-3">
          {error}
        </p>
      ) : null}
      {!single && plan.whatIf && steps[0] ? (
        <p className="mt-2 text-sm" data-testid="what-if">
          Why {steps[0].name.toLowerCase()} first: if it fails, the top cause becomes{" "}
          <strong>{plan.whatIf.ifFail?.topCause ?? "—"}</strong>
          {plan.whatIf.ifFail ? ` (${formatPercent(plan.whatIf.ifFail.probability)})` : ""}; if it passes,{" "}
          <strong>{plan.whatIf.ifPass?.topCause ?? "—"}</strong>
          {plan.whatIf.ifPass ? ` (${formatPercent(plan.whatIf.ifPass.probability)})` : ""}.
        </p>
      ) : null}
      {/* Keyboard hints are for the desk; a phone or tablet has no keys to press. */}
      <p className="mt-2 hidden text-sm text-graphite-600 sm:pointer-fine:block">
        <kbd>Alt</kbd>+<kbd>N</kbd> next check · <kbd>↑</kbd>/<kbd>↓</kbd> move · <kbd>P</kbd> or <kbd>F</kbd>{" "}
        then <kbd>Enter</kbd> records passed or a fault · <kbd>Enter</kbd> type a reading
      </p>
      {/* The plan's keys (arrows, P, F, Enter) act on the focused step; every step is focusable. */}
      {/* eslint-disable-next-line jsx-a11y/no-noninteractive-element-interactions */}
      <ol
        ref={list}
        className="mt-3 grid gap-3"
        aria-label="Checks, best value first"
        onKeyDown={(e) => onPlanKey(e, shown, armed, setArmed, record, isOpen, open)}
        onBlur={() => setArmed(null)}
      >
        {shown.map((s, i) => (
          <PlanStep
            key={s.checkId}
            step={s}
            first={i === 0}
            folded={!isOpen(s.checkId) && !errorFor(s.checkId)}
            onOpen={() => open(s.checkId)}
            currency={currency}
            record={record}
            busy={busy}
            error={errorFor(s.checkId)}
            armed={armed?.checkId === s.checkId ? armed.result : null}
          />
        ))}
      </ol>
      {later.length ? (
        <Fold
          className="mt-3"
          summaryClassName="min-h-tap cursor-pointer content-center text-graphite-700"
          summary={`${later.length + plan.moreSteps} more checks, unlikely to find it now`}
        >
          <ul className="mt-1 grid gap-1 text-sm text-graphite-700">
            {later.map((s) => (
              <li key={s.checkId} className="flex justify-between gap-2">
                <span>{s.name}</span>
                <span className="tabular">
                  {formatPercent(s.pFind, 1)} · {formatMoney(s.cost, currency)}
                </span>
              </li>
            ))}
            {plan.moreSteps ? (
              <li>… and {plan.moreSteps} more with almost no chance of finding it.</li>
            ) : null}
          </ul>
        </Fold>
      ) : null}
      {plan.aboveSkill.length ? (
        <Fold
          className="mt-3 border-t border-rule pt-2"
          summaryClassName="min-h-tap cursor-pointer content-center font-medium text-graphite-700"
          summary={`${plan.aboveSkill.length} more checks need a technician or a senior: ask a senior`}
        >
          <ul className="mt-1 grid gap-1 text-sm text-graphite-700" aria-label="Checks beyond your level">
            {plan.aboveSkill.map((s) => (
              <li key={s.checkId}>
                {s.name} — needs a {s.skill} ({formatPercent(s.pFind)} chance of finding it)
              </li>
            ))}
          </ul>
        </Fold>
      ) : null}
    </section>
  );
}
