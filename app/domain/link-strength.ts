// How strongly a cause produces a symptom (P(symptom | cause)) or makes a check fail
// (P(check fails | cause)), in words a senior can say, each standing for one stated probability.
// The words and figures are ours (docs/knowledge-format.md): a scale of six that a technician can
// tell apart, spaced so that each step changes a ranking visibly. Any figure in between may be
// typed as a number; it is then shown with the nearest word, marked "about".
import type { BandFigures } from "./readings";

export const STRENGTHS = [
  { word: "almost always", p: 0.95 },
  { word: "usually", p: 0.8 },
  { word: "often", p: 0.6 },
  { word: "sometimes", p: 0.35 },
  { word: "now and then", p: 0.15 },
  { word: "rarely", p: 0.05 },
] as const;
export type StrengthWord = (typeof STRENGTHS)[number]["word"];

const EXACT = 0.005;

/** The probability a word stands for, or null for a word not on the scale. */
export function strengthOf(word: string): number | null {
  const w = word.trim().toLowerCase();
  return STRENGTHS.find((s) => s.word === w)?.p ?? null;
}

/** The word nearest to a probability, and whether the figure is exactly the word's. */
export function wordFor(p: number): { word: StrengthWord; exact: boolean } {
  let best: (typeof STRENGTHS)[number] = STRENGTHS[0];
  for (const s of STRENGTHS) if (Math.abs(s.p - p) < Math.abs(best.p - p)) best = s;
  return { word: best.word, exact: Math.abs(best.p - p) < EXACT };
}

/** "usually (80%)", or "about often (57%)" for a figure between the words. */
export function describeStrength(p: number): string {
  const { word, exact } = wordFor(p);
  return `${exact ? "" : "about "}${word} (${Math.round(p * 100)}%)`;
}

/**
 * What a senior typed as a strength: one of the words, a percentage ("57%") or a probability
 * ("0.57"). Returns the probability, or a message for the field.
 */
export function readStrength(input: string): { p: number } | { error: string } {
  const text = input.trim().toLowerCase();
  const fromWord = strengthOf(text);
  if (fromWord !== null) return { p: fromWord };
  const m = /^(\d+(?:\.\d+)?)\s*(%?)$/.exec(text);
  if (!m)
    return {
      error: `Say how strongly in one of the words (${STRENGTHS.map((s) => s.word).join(", ")}), or as a figure such as 40% or 0.4.`,
    };
  const value = Number(m[1]) / (m[2] || Number(m[1]) > 1 ? 100 : 1);
  if (!(value > 0 && value < 1))
    return { error: "A strength lies between 0% and 100%: never certain, never impossible." };
  return { p: value };
}

/**
 * A graded check link given a new P(fail): the two failing bands scaled to add up to it and the
 * two passing bands to the rest, each keeping its share of its side (an even split where a side
 * had nothing), so the four still sum to 1 and the link's shape survives the edit.
 */
export function rescaleBands(bands: BandFigures, pFail: number): BandFigures {
  const side = (a: number, b: number, total: number): [number, number] =>
    a + b > 0 ? [(a / (a + b)) * total, (b / (a + b)) * total] : [total / 2, total / 2];
  const [wellWithin, near] = side(bands.well_within, bands.near, 1 - pFail);
  const [beyond, farBeyond] = side(bands.beyond, bands.far_beyond, pFail);
  return { well_within: wellWithin, near, beyond, far_beyond: farBeyond };
}
