// Who may work on a case: one rule, used by the server's guards and mirrored by the screens.
// Technicians and seniors may work on any case; an apprentice only on a case assigned to them,
// and then only on checks within their skill; evidence changes only while the case is open.
import type { CaseState } from "./cases";
import { can } from "./permissions";
import type { Role, Skill } from "./people";
import { hasSkill } from "./people";

export type CaseActor = { role: Role; memberId: string; skill?: Skill };
export type CaseForAccess = { assignedMemberId: string | null; state: CaseState };

/** The apprentice's own case: assigned to them, so the narrower rights apply to it. */
export const isOwnCase = (actor: CaseActor, c: Pick<CaseForAccess, "assignedMemberId">) =>
  can(actor.role, "case:work-assigned") && c.assignedMemberId === actor.memberId;

/** May record and remove evidence on this case, whatever its state. */
export const mayWorkOn = (actor: CaseActor, c: Pick<CaseForAccess, "assignedMemberId">) =>
  can(actor.role, "case:work") || isOwnCase(actor, c);

/** May conclude it: an apprentice's conclusion on their own case then waits for a senior. */
export const mayConclude = (actor: CaseActor, c: Pick<CaseForAccess, "assignedMemberId">) =>
  can(actor.role, "case:conclude") || isOwnCase(actor, c);

/** May do a check that needs `skill` on this case: an apprentice only within their own level. */
export const mayDoCheck = (actor: CaseActor, skill: Skill) =>
  actor.role !== "apprentice" || hasSkill(actor.skill ?? "apprentice", skill);
