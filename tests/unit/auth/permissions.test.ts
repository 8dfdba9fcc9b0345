import { describe, expect, it } from "vitest";
import { can, PERMISSIONS, ROLE_HOME, ROLE_PERMISSIONS } from "~/domain/permissions";
import { ROLES } from "~/domain/people";

describe("role permissions", () => {
  it("gives every role only known permissions and a home", () => {
    for (const role of ROLES) {
      for (const p of ROLE_PERMISSIONS[role]) expect(PERMISSIONS).toContain(p);
      expect(ROLE_HOME[role]).toMatch(/^\//);
    }
  });

  it("keeps a senior a superset of a technician", () => {
    for (const p of ROLE_PERMISSIONS.technician) expect(can("senior", p)).toBe(true);
  });

  it("keeps the apprentice to assigned work and away from concluding or editing", () => {
    expect(can("apprentice", "case:work-assigned")).toBe(true);
    expect(can("apprentice", "case:work")).toBe(false);
    expect(can("apprentice", "case:conclude")).toBe(false);
    expect(can("apprentice", "kb:edit")).toBe(false);
  });

  it("lets only admins manage members and settings", () => {
    for (const role of ROLES) {
      expect(can(role, "member:manage")).toBe(role === "admin");
      expect(can(role, "settings:manage")).toBe(role === "admin");
    }
  });

  it("lets advisors handle owners and money but not findings", () => {
    expect(can("advisor", "estimate:manage")).toBe(true);
    expect(can("advisor", "payment:take")).toBe(true);
    expect(can("advisor", "case:work")).toBe(false);
  });
});
