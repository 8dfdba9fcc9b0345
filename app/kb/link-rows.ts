// The links of one knowledge-base item as its page's table shows them, and the small pure rules the
// table and the actions share: the name of a row's strength field, the kinds in words, what the
// field holds to begin with, and what the filter box matches. Plain data, no React: the browser
// and the server both read it.
import { STRENGTHS } from "~/domain/link-strength";
import type { ImpactWithTests } from "./impact";

export type LinkKind = "symptom" | "check";

/**
 * One row: `id` is the item at the other end of the link from the page's own item (a symptom or
 * check on a cause's page, a cause on a symptom's page); `to` is that item's page.
 */
export type LinkRow = { link: LinkKind; id: string; name: string; p: number; note?: string; to?: string };

/** The effect of a strength not yet saved, shown under the row it was asked for. */
export type LinkPreview = { link: LinkKind; otherId: string; p: number; impact: ImpactWithTests };

/** The field of one link's strength: its own name, so the message lands beside that link. */
export const strengthField = (link: string, otherId: string) => `strength-${link}-${otherId}`;

export const LINK_KIND_LABEL: Record<LinkKind, string> = { symptom: "Symptom", check: "Check" };

/**
 * What a row's field holds before anyone types: the word when the strength is exactly one, else
 * the figure, written so that saving it unchanged stores the same number (a rounded percentage
 * would quietly move a figure such as 0.5725).
 */
export function strengthInput(p: number): string {
  const word = STRENGTHS.find((s) => Math.abs(s.p - p) < 1e-9);
  if (word) return word.word;
  const percent = Math.round(p * 10_000) / 100;
  return Math.abs(percent / 100 - p) < 1e-12 ? `${percent}%` : String(p);
}

/** Whether a row's words (its name, or its kind) hold what was typed in the filter box. */
export const matchesFilter = (text: unknown, typed: string) =>
  String(text ?? "")
    .toLowerCase()
    .includes(typed.trim().toLowerCase());

/**
 * The preview an action answered with, if it did. Its type does not survive the action's other
 * answers (a plain notice is the wider type), so it is read back here, in one place.
 */
export const previewIn = (answer: object | undefined): LinkPreview | null =>
  answer && "preview" in answer ? ((answer.preview as LinkPreview | undefined) ?? null) : null;
