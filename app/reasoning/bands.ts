// What each reading band (app/domain/readings.ts) is worth as evidence when a knowledge-base link
// gives no figures of its own.
export { PASSING_BANDS, READING_BANDS, type BandFigures, type ReadingBand } from "~/domain/readings";
import { PASSING_BANDS, type BandFigures, type ReadingBand } from "~/domain/readings";

/**
 * Default split of a check's pass/fail figures over the bands (a modelling choice, not measured):
 * a fault the check bears on that makes it fail fails by a lot as often as by a little, and when it
 * lets the check pass, the reading is more often near the limit than well inside it; a false alarm
 * is mostly just past the limit, and a sound part mostly reads well inside. So for a check with
 * P(fail | cause) = q and false-alarm rate f:
 *   cause:      well q̄·0.4, near q̄·0.6, beyond q·0.5, far q·0.5       (q̄ = 1 − q)
 *   background: well f̄·0.7, near f̄·0.3, beyond f·0.8, far f·0.2       (f̄ = 1 − f)
 */
export const FAULT_BAND_SHARE: BandFigures = { well_within: 0.4, near: 0.6, beyond: 0.5, far_beyond: 0.5 };
export const SOUND_BAND_SHARE: BandFigures = { well_within: 0.7, near: 0.3, beyond: 0.8, far_beyond: 0.2 };

/** P(band | h) from the check's plain figure P(fail | h) and a share table. */
export function bandLikelihood(pFail: number, band: ReadingBand, share: BandFigures): number {
  return (PASSING_BANDS.has(band) ? 1 - pFail : pFail) * share[band];
}
