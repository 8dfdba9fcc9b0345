// The links table of a cause or a symptom: a header sorts, the filter box narrows, Up and Down walk
// the strength fields in the order shown, Escape puts a field back, a message lands beside its own
// row's field, and readers get the same table without fields. Strengths are the scale's own words.
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { createRoutesStub } from "react-router";
import { describe, expect, it } from "vitest";
import { LinkTable } from "~/components/kb/link-table";
import { describeStrength, strengthOf } from "~/domain/link-strength";
import type { FormErrors } from "~/http/forms";
import { type LinkRow, strengthField } from "~/kb/link-rows";

const p = (word: string) => strengthOf(word)!;
// Made-up links of one cause, in the order a loader gives them: symptoms, then checks.
const ROWS: LinkRow[] = [
  { link: "symptom", id: "s1", name: "Squeal when braking", p: p("often") },
  { link: "symptom", id: "s2", name: "Grinding at low speed", p: p("almost always") },
  { link: "check", id: "k1", name: "Pad wear look", p: p("rarely") },
  { link: "check", id: "k2", name: "Brake road test", p: p("sometimes") },
];

function renderTable(options: { mayEdit?: boolean; errors?: FormErrors; showKind?: boolean } = {}) {
  const Stub = createRoutesStub([
    {
      path: "/",
      Component: () => (
        <>
          <h2 id="links">Its links</h2>
          <LinkTable
            rows={ROWS}
            labelledBy="links"
            showKind={options.showKind ?? true}
            mayEdit={options.mayEdit ?? true}
            errors={options.errors}
            preview={null}
            empty="Nothing is linked to it."
          />
        </>
      ),
    },
  ]);
  render(<Stub initialEntries={["/"]} />);
  return screen.getByRole("table", { name: "Its links" });
}

const names = (table: HTMLElement) =>
  within(table)
    .getAllByRole("rowheader")
    .map((th) => th.textContent);
const field = (name: string) => screen.getByLabelText(`New strength for ${name}`);

describe("the links table", () => {
  it("sorts by strength, strongest first, then the other way; the header says which", async () => {
    const user = userEvent.setup();
    const table = renderTable();
    expect(names(table)).toEqual(ROWS.map((r) => r.name));
    await user.click(within(table).getByRole("button", { name: "Strength" }));
    const strongestFirst = [...ROWS].sort((a, b) => b.p - a.p).map((r) => r.name);
    expect(names(table)).toEqual(strongestFirst);
    expect(
      within(table)
        .getByRole("columnheader", { name: /Strength/ })
        .getAttribute("aria-sort"),
    ).toBe("descending");
    await user.click(within(table).getByRole("button", { name: "Strength" }));
    expect(names(table)).toEqual([...strongestFirst].reverse());
    expect(
      within(table)
        .getByRole("columnheader", { name: /Strength/ })
        .getAttribute("aria-sort"),
    ).toBe("ascending");
    // Each row still shows its own strength in words.
    const first = within(table).getAllByRole("row")[1];
    expect(within(first).getByText(describeStrength(p("rarely")))).toBeTruthy();
  });

  it("sorts by name and by kind", async () => {
    const user = userEvent.setup();
    const table = renderTable();
    await user.click(within(table).getByRole("button", { name: "Name" }));
    expect(names(table)).toEqual(ROWS.map((r) => r.name).sort((a, b) => a.localeCompare(b)));
    await user.click(within(table).getByRole("button", { name: "Kind" }));
    expect(
      within(table)
        .getAllByRole("row")
        .slice(1)
        .map((r) => within(r).getAllByRole("cell")[0].textContent),
    ).toEqual(["Check", "Check", "Symptom", "Symptom"]);
  });

  it("hides the rows the filter does not match, by name or by kind", async () => {
    const user = userEvent.setup();
    const table = renderTable();
    const filter = screen.getByRole("searchbox", { name: "Filter links" });
    await user.type(filter, "BRAK");
    expect(names(table)).toEqual(["Squeal when braking", "Brake road test"]);
    expect(screen.getByText("2 of 4 links shown")).toBeTruthy();
    await user.clear(filter);
    await user.type(filter, "check");
    expect(names(table)).toEqual(["Pad wear look", "Brake road test"]);
    await user.clear(filter);
    await user.type(filter, "no such link");
    expect(within(table).queryAllByRole("rowheader")).toEqual([]);
    expect(within(table).getByText("No link matches “no such link”.")).toBeTruthy();
  });

  it("ArrowDown and ArrowUp move between the rows' strength fields in the order shown", async () => {
    const user = userEvent.setup();
    const table = renderTable();
    field("Squeal when braking").focus();
    await user.keyboard("{ArrowDown}");
    expect(document.activeElement).toBe(field("Grinding at low speed"));
    await user.keyboard("{ArrowDown}");
    expect(document.activeElement).toBe(field("Pad wear look"));
    await user.keyboard("{ArrowUp}");
    expect(document.activeElement).toBe(field("Grinding at low speed"));
    // After sorting by strength the next row down is the next weaker link.
    await user.click(within(table).getByRole("button", { name: "Strength" }));
    field("Grinding at low speed").focus();
    await user.keyboard("{ArrowDown}");
    expect(document.activeElement).toBe(field("Squeal when braking"));
  });

  it("Escape puts back the field's strength after typing", async () => {
    const user = userEvent.setup();
    renderTable();
    const squeal = field("Squeal when braking") as HTMLInputElement;
    expect(squeal.value).toBe("often");
    await user.clear(squeal);
    await user.type(squeal, "very much");
    await user.keyboard("{Escape}");
    expect(squeal.value).toBe("often");
  });

  it("puts a message beside the field of its own row only", () => {
    const message = "Say how strongly in one of the words.";
    renderTable({ errors: { [strengthField("check", "k2")]: [message] } });
    const road = field("Brake road test");
    expect(road.getAttribute("aria-invalid")).toBe("true");
    expect(document.getElementById(road.getAttribute("aria-describedby")!)?.textContent).toBe(message);
    expect(field("Pad wear look").getAttribute("aria-invalid")).toBeNull();
  });

  it("Save comes first in each row's form, so Enter in the field saves", () => {
    renderTable();
    const form = field("Squeal when braking").closest("form")!;
    const first = form.querySelector<HTMLButtonElement>('button[type="submit"]')!;
    expect([first.name, first.value, first.textContent]).toEqual(["intent", "strength", "Save strength"]);
  });

  it("for a reader: the same table, sorted and filtered, with no fields or buttons to save", async () => {
    const user = userEvent.setup();
    const table = renderTable({ mayEdit: false, showKind: false });
    expect(screen.queryAllByLabelText(/^New strength for/)).toEqual([]);
    expect(screen.queryByRole("button", { name: "Save strength" })).toBeNull();
    expect(within(table).queryByRole("button", { name: "Kind" })).toBeNull();
    await user.click(within(table).getByRole("button", { name: "Strength" }));
    expect(names(table)[0]).toBe("Grinding at low speed");
    await user.type(screen.getByRole("searchbox", { name: "Filter links" }), "squeal");
    expect(names(table)).toEqual(["Squeal when braking"]);
  });
});
