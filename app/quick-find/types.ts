// Shapes shared by the Quick find index, its search and the palette. Pure data: no React, no DB.

export const ENTRY_KINDS = ["symptom", "cause", "check", "vehicle", "case"] as const;
export type EntryKind = (typeof ENTRY_KINDS)[number];

/** One thing Quick find can find. `id` must be unique within an index (a row id or a seed key). */
export type Entry = {
  kind: EntryKind;
  id: string;
  title: string;
  subtitle?: string;
  /** Other words that should find it: synonyms, conditions, registration, VIN, owner name… */
  keywords: string[];
  /** Longer text that finds it too, weighted below the rest: a check's steps. */
  details?: string[];
  /** A trouble-code symptom's code, upper case ("P0420"): typing the code lands here. */
  dtc?: string;
  /** The generic "trouble code stored" symptom: any other valid code lands here, the code kept. */
  anyDtc?: boolean;
};

export type SearchOptions = {
  /** Most items per group (default 6). */
  limit?: number;
  /** Only these kinds (default all). */
  kinds?: readonly EntryKind[];
  /** Recently used entry ids, most recent first: listed first on an empty query, a nudge otherwise. */
  recentIds?: readonly string[];
};

export type ScoredEntry = {
  entry: Entry;
  score: number; // higher is better
  /**
   * How much of the query the entry matched, 0–1: the mean over the query's words of the best
   * match (1 = the word itself in the name). At or below WEAK_QUALITY the match is weak: the
   * palette says "no good match: note it, or propose a new symptom" instead of recording it.
   */
  quality?: number;
  weak?: boolean;
  /** Symptoms only: false when the query says the opposite of the symptom ("no grinding"), so it is offered as absent. */
  present?: boolean;
  /** The trouble code typed, kept with the observation (for the generic "trouble code stored" symptom above all). */
  code?: string;
};
export type GroupKind = EntryKind | "recent";
export type ResultGroup = { kind: GroupKind; items: ScoredEntry[] };

export const GROUP_HEADING: Record<GroupKind, string> = {
  recent: "Recent",
  symptom: "Symptoms",
  cause: "Causes",
  check: "Checks",
  vehicle: "Vehicles",
  case: "Cases",
};
