import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { PERMISSIONS, ROLE_PERMISSIONS } from "~/domain/permissions";

// docs/permissions.md is what people read; this keeps it equal to what the server enforces.
const ROLE_COLUMNS = ["apprentice", "technician", "senior", "advisor", "admin"] as const;

function docMatrix() {
  const doc = readFileSync(new URL("../../../docs/permissions.md", import.meta.url), "utf8");
  const granted = new Map<string, Set<string>>(ROLE_COLUMNS.map((r) => [r, new Set()]));
  const mentioned = new Set<string>();
  for (const line of doc.split("\n")) {
    if (!line.startsWith("| `")) continue;
    const cells = line
      .split("|")
      .slice(1, -1)
      .map((c) => c.trim());
    if (cells.length !== 6) continue;
    const perms = [...cells[0].matchAll(/`([a-z-]+:[a-z-]+)`/g)].map((m) => m[1]);
    perms.forEach((p) => mentioned.add(p));
    ROLE_COLUMNS.forEach((role, i) => {
      if (cells[i + 1] === "✓") perms.forEach((p) => granted.get(role)!.add(p));
    });
  }
  return { granted, mentioned };
}

describe("docs/permissions.md", () => {
  it("lists every permission", () => {
    expect([...docMatrix().mentioned].sort()).toEqual([...PERMISSIONS].sort());
  });

  it("grants each role exactly what the server grants", () => {
    const { granted } = docMatrix();
    for (const role of ROLE_COLUMNS)
      expect([...granted.get(role)!].sort(), role).toEqual([...ROLE_PERMISSIONS[role]].sort());
  });
});
