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
};

export type SearchOptions = {
  /** Most items per group (default 6). */
  limit?: number;
  /** Only these kinds (default all). */
  kinds?: readonly EntryKind[];
  /** Recently used entry ids, most recent first: listed first on an empty query, a nudge otherwise. */
  recentIds?: readonly string[];
};

export type ScoredEntry = { entry: Entry; score: number }; // higher is better
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
