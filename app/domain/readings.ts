// How far a measured reading falls from its rule's limit, in four bands (app/measure's
// gradeReading works the band out; docs/reasoning.md has the edges).
export const READING_BANDS = ["well_within", "near", "beyond", "far_beyond"] as const;
export type ReadingBand = (typeof READING_BANDS)[number];

/** P(band | …) for one check, by band; the four figures sum to 1. */
export type BandFigures = Record<ReadingBand, number>;

export const PASSING_BANDS: ReadonlySet<ReadingBand> = new Set(["well_within", "near"]);
