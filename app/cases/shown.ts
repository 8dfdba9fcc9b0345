// How much of a diagnosis the case screen shows, shared by the server that shapes it
// (present-diagnosis.ts) and the components that draw it. Browser-safe and tiny on purpose.

/** Causes the screen shows with their "why"; the evidence is listed for these only. */
export const WHY_CAUSES = 5;
/** Causes sent at all: the conclusion offers these; past fifteen the shares round to 0%. */
export const SENT_CAUSES = 15;
/** Checks the plan offers at once. */
export const PLAN_SHOWN = 8;
/** Of those, the first few are open in full, with their instructions; the rest are one line until opened. */
export const PLAN_OPEN = 3;
/** Findings a case view carries, the latest; the rest are read when asked for (GET …/findings). */
export const SHOWN_FINDINGS = 10;
/** Checks sent at all: the offered ones and a few more for the folded "unlikely" list. */
export const SENT_STEPS = 10;
