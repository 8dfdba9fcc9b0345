// The Quick find palette in a browser-like DOM: the shortcut, typing, the two symptom actions
// from the keyboard and by tap, jumping to other kinds, and closing.
import { act, fireEvent, render, screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { QuickFind } from "~/components/quick-find/quick-find";
import type { Entry } from "~/quick-find";
import { allEntries } from "./fixtures";

const pressCtrlK = () => fireEvent.keyDown(window, { key: "k", ctrlKey: true });
/** Ctrl+K, then the palette's code loads (it is split off: nothing of it ships with the page). */
const openWithCtrlK = async () => {
  pressCtrlK();
  await screen.findByRole("dialog");
};
const input = () => screen.getByRole("combobox", { name: "Quick find" });
const type = (text: string) => fireEvent.change(input(), { target: { value: text } });
const options = () => screen.getAllByRole("option");
const selected = () => options().find((o) => o.getAttribute("aria-selected") === "true");

function setup(extra: Partial<React.ComponentProps<typeof QuickFind>> = {}) {
  const onPick =
    vi.fn<(entry: Entry, pick: { present?: boolean; code?: string; conditions?: string[] }) => void>();
  render(<QuickFind entries={allEntries} onPick={onPick} {...extra} />);
  return onPick;
}

describe("Quick find palette", () => {
  it("keeps what is typed straight after Ctrl+K, while its code loads, and lets none of it reach the page", async () => {
    setup();
    const reachedPage = vi.fn();
    document.body.addEventListener("keydown", reachedPage);
    // The first test of the file: the palette's code has not been loaded yet.
    pressCtrlK();
    for (const key of "judderx") fireEvent.keyDown(document.body, { key });
    fireEvent.keyDown(document.body, { key: "Backspace" });
    await screen.findByRole("dialog");
    expect((input() as HTMLInputElement).value).toBe("judder");
    expect(reachedPage).not.toHaveBeenCalled();
    document.body.removeEventListener("keydown", reachedPage);
  });

  it("opens with Ctrl+K as a dialog labelled “Quick find” with a labelled input", async () => {
    setup();
    expect(screen.queryByRole("dialog")).toBeNull();
    await openWithCtrlK();
    expect(screen.getByRole("dialog", { name: "Quick find" })).toBeTruthy();
    expect(document.activeElement).toBe(input());
  });

  it("also opens from its visible button, which shows the shortcut", async () => {
    setup();
    const button = screen.getByRole("button", { name: /quick find/i });
    expect(button.textContent).toMatch(/K/);
    fireEvent.click(button);
    expect(await screen.findByRole("dialog", { name: "Quick find" })).toBeTruthy();
  });

  it("puts the braking vibration first, under the Symptoms heading, and Enter adds it as present", async () => {
    const onPick = setup();
    await openWithCtrlK();
    type("judder when braking");
    expect(options()[0].textContent).toContain("Vibration through the steering wheel under braking");
    expect(selected()).toBe(options()[0]);
    expect(screen.getByText("Symptoms")).toBeTruthy();
    fireEvent.keyDown(input(), { key: "Enter" });
    expect(onPick).toHaveBeenCalledTimes(1);
    expect(onPick.mock.calls[0][0].id).toBe("vibration_braking");
    // the condition the words name comes with it, for the ranking
    expect(onPick.mock.calls[0][1]).toEqual({ present: true, conditions: ["braking"] });
    // stays open for the next symptom, with the box cleared and the addition announced
    expect(input()).toHaveProperty("value", "");
    expect(screen.getByRole("status").textContent).toMatch(/as present/);
  });

  it("adds the highlighted symptom as absent with Shift+Enter, following the arrow keys", async () => {
    const onPick = setup();
    await openWithCtrlK();
    type("pulls left");
    const second = options()[1];
    fireEvent.keyDown(input(), { key: "ArrowDown" });
    expect(selected()).toBe(second);
    fireEvent.keyDown(input(), { key: "Enter", shiftKey: true });
    expect(onPick).toHaveBeenCalledTimes(1);
    expect(onPick.mock.calls[0][0].title).toBe(second.querySelector(".font-medium")?.textContent);
    expect(onPick.mock.calls[0][1]).toEqual({ present: false });
  });

  it("adds as absent from the row's Absent chip, for a tap with no keyboard", async () => {
    const onPick = setup();
    await openWithCtrlK();
    type("squeal brake");
    fireEvent.click(within(options()[0]).getByText("Absent"));
    expect(onPick).toHaveBeenCalledTimes(1);
    expect(onPick.mock.calls[0]).toEqual([
      expect.objectContaining({ id: "squeal_braking" }),
      { present: false, conditions: ["braking"] },
    ]);
  });

  it("offers a negated complaint as absent, and Enter records it so", () => {
    const onPick = setup();
    openWithCtrlK();
    type("no grinding");
    expect(options()[0].textContent).toContain("Grinding when braking");
    expect(options()[0].textContent).toContain("Enter adds it as absent");
    fireEvent.keyDown(input(), { key: "Enter" });
    expect(onPick.mock.calls[0]).toEqual([
      expect.objectContaining({ id: "grinding_braking" }),
      { present: false },
    ]);
    expect(screen.getByRole("status").textContent).toMatch(/as absent/);
  });

  it("keeps a trouble code the base does not list, on the generic trouble-code symptom", () => {
    const onPick = setup();
    openWithCtrlK();
    type("P0325"); // a valid generic code (SAE J2012 format) with no symptom of its own here
    expect(options()[0].textContent).toContain("Trouble code stored");
    fireEvent.keyDown(input(), { key: "Enter" });
    expect(onPick.mock.calls[0]).toEqual([
      expect.objectContaining({ id: "trouble_code_stored" }),
      { present: true, code: "P0325" },
    ]);
  });

  it("says “no good match” for words nothing fits, and Enter records nothing", () => {
    const onPick = setup({ kinds: ["symptom"] });
    openWithCtrlK();
    type("I clipped a kerb last month");
    expect(screen.getByText(/No good match: note it, or propose a new symptom/)).toBeTruthy();
    expect(options().every((o) => /Weak match/.test(o.textContent ?? ""))).toBe(true);
    fireEvent.keyDown(input(), { key: "Enter" });
    expect(onPick).not.toHaveBeenCalled();
    // chosen on purpose with the arrows, a weak match can still be added
    fireEvent.keyDown(input(), { key: "ArrowDown" });
    fireEvent.keyDown(input(), { key: "Enter" });
    expect(onPick).toHaveBeenCalledTimes(1);
  });

  it("jumps to a vehicle with Enter and closes", async () => {
    const onPick = setup();
    await openWithCtrlK();
    type("DEMO 101");
    expect(screen.getByText("Vehicles")).toBeTruthy();
    fireEvent.keyDown(input(), { key: "Enter" });
    expect(onPick.mock.calls[0]).toEqual([
      expect.objectContaining({ kind: "vehicle", id: "orlan-brisk" }),
      {},
    ]);
    expect(screen.queryByRole("dialog")).toBeNull();
  });

  it("shows recent items first when the box is empty", async () => {
    setup({ recentIds: ["clunk_front_bumps", "b1"] });
    await openWithCtrlK();
    expect(screen.getByText("Recent")).toBeTruthy();
    expect(options()[0].textContent).toContain("Clunk from the front over bumps");
    expect(options()[1].textContent).toContain("#1041");
  });

  it("closes with Escape; Ctrl+K pressed again keeps it open, with the typing in its box", async () => {
    setup();
    await openWithCtrlK();
    fireEvent.keyDown(input(), { key: "Escape" });
    expect(screen.queryByRole("dialog")).toBeNull();
    await openWithCtrlK();
    expect(screen.getByRole("dialog")).toBeTruthy();
    fireEvent.change(input(), { target: { value: "clunk" } });
    (document.activeElement as HTMLElement | null)?.blur();
    pressCtrlK();
    expect(screen.getByRole("dialog")).toBeTruthy();
    expect(document.activeElement).toBe(input());
    expect((input() as HTMLInputElement).value).toBe("clunk");
  });

  it("loads its entries from a loader on first open", async () => {
    const loader = vi.fn(async () => allEntries);
    setup({ entries: loader });
    expect(loader).not.toHaveBeenCalled();
    await openWithCtrlK();
    await act(async () => {});
    await screen.findAllByRole("option");
    expect(loader).toHaveBeenCalledTimes(1);
    type("drinks fuel");
    expect(options()[0].textContent).toContain("High fuel consumption");
  });
});
