// Who works in a workshop: roles, skill levels, and what a new member of each role starts with.

export const ROLES = ["apprentice", "technician", "senior", "advisor", "admin"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABEL: Record<Role, string> = {
  apprentice: "Apprentice",
  technician: "Technician",
  senior: "Senior technician",
  advisor: "Service advisor",
  admin: "Workshop admin",
};

/** Skill levels, lowest first: a check's level is the least skill that may do it. */
export const SKILLS = ["apprentice", "technician", "senior"] as const;
export type Skill = (typeof SKILLS)[number];

/** The skill level a new member of a role starts with; an admin or advisor counts as a technician. */
export function skillForRole(role: Role): Skill {
  return role === "apprentice" ? "apprentice" : role === "senior" ? "senior" : "technician";
}

/** True when someone of skill `who` may do work that needs `needs`. */
export const hasSkill = (who: Skill, needs: Skill) => SKILLS.indexOf(who) >= SKILLS.indexOf(needs);
