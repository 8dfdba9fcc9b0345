// No single keystroke records evidence unless the person has aimed at that check: P or F on a
// focused step asks for Enter, any other key lets go, and typing anywhere else does nothing.
// The why says what was recorded and which way it pushes.
import { fireEvent, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { describe, expect, it, vi } from "vitest";
import type { Diagnosis } from "~/cases/present-diagnosis";
import { vehicleLine } from "~/components/case/case-header";
import { undoOf, type CaseView } from "~/cases/case-queries";
import { CheckPlan, needsLine } from "~/components/case/check-plan";
import { LikelyCauses } from "~/components/case/likely-causes";

/** Components that read through React Query need its client, as the app's root gives them. */
const renderWithQuery = (ui: React.ReactElement) =>
  render(<QueryClientProvider client={new QueryClient()}>{ui}</QueryClientProvider>);

type Step = Diagnosis["plan"]["steps"][number];
const step = (n: number, extra: Partial<Step> = {}): Step => ({
  checkId: `k${n}`,
  name: `Check ${n}`,
  pFind: 0.5 / n,
  cost: 10 * n,
  skill: "technician",
  minutes: 10,
  tools: [],
  access: [],
  cautions: [],
  instructions: [],
  resultKind: "pass_fail",
  unit: null,
  limit: null,
  detailed: true,
  failMeans: "",
  ...extra,
});
const plan = (steps: Step[]): Diagnosis["plan"] => ({
  steps,
  moreSteps: 0,
  aboveSkill: [],
  expectedCost: 20,
  cheapestFirstExpectedCost: 25,
  saving: 5,
  whatIf: null,
});

function renderPlan(steps: Step[], errorFor: (id: string) => string | null = () => null) {
  const record = vi.fn();
  renderWithQuery(
    <div>
      <p tabIndex={-1}>page</p>
      <CheckPlan
        plan={plan(steps)}
        currency="GBP"
        record={record}
        busy={false}
        error={null}
        errorFor={errorFor}
      />
    </div>,
  );
  const items = screen.getAllByRole("listitem").filter((li) => li.hasAttribute("data-step"));
  return { record, items };
}

describe("keys on the check plan", () => {
  it("typing sentences on the page records nothing, whatever has the focus", async () => {
    const user = userEvent.setup();
    const { record, items } = renderPlan([step(1), step(2)]);
    await user.keyboard("clunk over bumps, pulls left, needs a pass please");
    items[0].focus();
    await user.keyboard("clunk over bumps, pulls left when braking from speed");
    await user.keyboard("nnnppp fff pf fp");
    // Someone who thinks the palette is open ends each phrase with Enter.
    await user.keyboard("clunk over bumps{Enter}squeal when braking{Enter}grinding pads{Enter} pass{Enter}");
    expect(record).not.toHaveBeenCalled();
  });

  it("P then Enter on a focused step records it passed; F then Enter a fault; Escape or another key lets go", async () => {
    const user = userEvent.setup();
    const { record, items } = renderPlan([step(1), step(2)]);
    items[0].focus();
    await user.keyboard("p");
    expect(within(items[0]).getByRole("status").textContent).toMatch(
      /Press Enter to record “Check 1” as passed/,
    );
    await user.keyboard("x{Enter}");
    expect(record).not.toHaveBeenCalled();
    await user.keyboard("{ArrowDown}f{Enter}");
    expect(record).toHaveBeenCalledTimes(1);
    expect(record.mock.calls[0][0].checkId).toBe("k2");
    expect(record.mock.calls[0][1]).toEqual({ result: "fail" });
  });

  it("folds the offered checks after the third to one line; one opens before it can be recorded, cautions first", async () => {
    const user = userEvent.setup();
    const steps = [1, 2, 3, 4].map((n) => step(n, n === 4 ? { cautions: ["lifting"] } : {}));
    const { record, items } = renderPlan(steps);
    expect(within(items[3]).queryByRole("button", { name: "Passed" })).toBeNull();
    expect(within(items[3]).queryByRole("note", { name: "Cautions" })).toBeNull();
    expect(items[3].textContent).toMatch(/needs care/);
    items[3].focus();
    await user.keyboard("p");
    expect(record).not.toHaveBeenCalled();
    // Opened in place, with the focus still on it.
    expect(document.activeElement).toBe(items[3]);
    expect(within(items[3]).getByRole("note", { name: "Cautions" }).textContent).toMatch(
      /never work under a car held only by a jack/,
    );
    await user.keyboard("p{Enter}");
    expect(record).toHaveBeenCalledTimes(1);
    expect(record.mock.calls[0][0].checkId).toBe("k4");
  });

  it("Alt+N moves to the next check but records nothing", async () => {
    const user = userEvent.setup();
    const { record, items } = renderPlan([step(1)]);
    fireEvent.keyDown(window, { key: "n", code: "KeyN", altKey: true });
    expect(document.activeElement).toBe(items[0]);
    await user.keyboard("{Enter}");
    expect(record).not.toHaveBeenCalled();
  });

  it("shows a reading's error at its own field, and the limit in the workshop's units", () => {
    const measured = step(1, {
      resultKind: "measurement",
      limit: "at most 0.00197 in (0.05 mm)",
      unit: "mm",
    }); // as the server words "value <= 0.05 mm" for imperial
    const { items } = renderPlan([measured, step(2)], (id) =>
      id === "k1" ? "That reading is in kPa; this check needs a length, such as 0.05 mm." : null,
    );
    const field = within(items[0]).getByRole("textbox");
    expect(field.getAttribute("placeholder")).toBe("limit: at most 0.00197 in (0.05 mm)");
    expect(field.getAttribute("aria-invalid")).toBe("true");
    const alert = within(items[0]).getByRole("alert");
    expect(field.getAttribute("aria-describedby")).toBe(alert.id);
    expect(within(items[1]).queryByRole("alert")).toBeNull();
  });

  it("names each need once", () => {
    expect(
      needsLine({ skill: "technician", access: ["scan_tool", "ramp"], tools: ["scan tool", "torch"] }),
    ).toBe("technician · scan tool · ramp · torch");
  });
});

describe("the why", () => {
  it("says what was recorded and which way it pushes", () => {
    const why = [
      { label: "Squeal when braking", recorded: "absent", weight: -0.9 },
      { label: "Measure pad thickness", recorded: "read 0.8 mm, outside the limit", weight: 2.1 },
    ];
    render(
      <LikelyCauses
        causes={[
          { id: "c1", name: "Pads worn to the backing plate", probability: 0.7, priority: "stop", why },
        ]}
        unlisted={0.05}
      />,
    );
    const lines = screen.getAllByRole("listitem").filter((li) => li.hasAttribute("data-why"));
    expect(lines[0].textContent).toBe("Squeal when braking: absent▼ makes it less likely");
    expect(lines[1].textContent).toBe(
      "Measure pad thickness: read 0.8 mm, outside the limit▲ makes it more likely",
    );
  });
});

describe("undo and the vehicle line", () => {
  const base = {
    observations: [
      {
        id: "o1",
        symptomId: "s1",
        name: "Squeal",
        present: true,
        source: "technician" as const,
        note: null,
        by: null,
        recordedAt: "",
      },
    ],
    findings: [],
  } as unknown as CaseView["case"];

  it("undoes a new observation by removing it and a changed one by restoring its answer", () => {
    expect(
      undoOf(base, { kind: "observe", symptomId: "s2", name: "Judder", present: true }, { id: "o2" }).undo,
    ).toEqual({ kind: "unobserve", id: "o2" });
    expect(
      undoOf(base, { kind: "observe", symptomId: "s1", name: "Squeal", present: false }, { id: "o1" }).undo,
    ).toEqual({ kind: "observe", symptomId: "s1", name: "Squeal", present: true, source: "technician" });
    expect(
      undoOf(base, { kind: "find", checkId: "k1", name: "Road test", result: "pass" }, { id: "f1" }),
    ).toEqual({ said: "Recorded “Road test”: passed.", undo: { kind: "unfind", id: "f1" } });
  });

  it("leaves out a blank engine instead of printing two dots", () => {
    expect(vehicleLine({ make: "Orlan", model: "Brisk", year: 2019, engine: "", fuelType: "petrol" })).toBe(
      "Orlan Brisk (2019) · petrol",
    );
    expect(
      vehicleLine({ make: "Orlan", model: "Brisk", year: 2019, engine: "1.4 turbo", fuelType: "petrol" }),
    ).toBe("Orlan Brisk (2019) · 1.4 turbo · petrol");
  });
});
