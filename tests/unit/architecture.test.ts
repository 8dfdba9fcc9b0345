// The house's import rules (scripts/architecture-rules.cjs), checked with dependency-cruiser:
// the real tree keeps them, and a small tree built to break each one is caught, so a rule that
// silently matches nothing cannot pass for a kept one.
import { execFile } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { promisify } from "node:util";
import { afterAll, describe, expect, it } from "vitest";

const run = promisify(execFile);
const ROOT = resolve(import.meta.dirname, "../..");
const CLI = join(ROOT, "node_modules/dependency-cruiser/bin/dependency-cruise.mjs");
const RULES = join(ROOT, "scripts/architecture-rules.cjs");

type Violation = { rule: { name: string }; from: string; to: string };

async function cruise(cwd: string, paths: string[]) {
  const { stdout } = await run(
    process.execPath,
    [CLI, ...paths, "--config", RULES, "--output-type", "json", "--no-progress"],
    { cwd, maxBuffer: 64 * 1024 * 1024 },
  ).catch((e: { stdout?: string; stderr?: string }) => {
    // dependency-cruiser exits non-zero when it finds violations; the report is still on stdout.
    if (e.stdout) return { stdout: e.stdout };
    throw new Error(`dependency-cruiser failed: ${e.stderr}`);
  });
  const report = JSON.parse(stdout) as {
    summary: { violations: Violation[]; totalCruised: number };
  };
  return report.summary;
}

// A package is named from node_modules/ on, wherever the folder is (the fixture links to ours).
const say = (v: Violation) =>
  `${v.rule.name}: ${v.from} → ${v.to.replace(/^.*?node_modules\//, "node_modules/")}`;

describe("the import rules hold on the real tree", () => {
  it("app/ stands alone, the pure cores stay pure, no component imports server code, no cycles", async () => {
    const summary = await cruise(ROOT, ["app", "seeds", "scripts", "tests"]);
    expect(summary.violations.map(say)).toEqual([]);
    // It really cruised the tree (a wrong path would find nothing and pass).
    expect(summary.totalCruised).toBeGreaterThan(300);
  }, 60_000);
});

describe("each rule catches what it is for", () => {
  const dir = mkdtempSync(join(tmpdir(), "rl-arch-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const file = (path: string, text: string) => {
    mkdirSync(dirname(join(dir, path)), { recursive: true });
    writeFileSync(join(dir, path), text);
  };

  it("names every break in a tree built to break them all, and passes the allowed imports", async () => {
    symlinkSync(join(ROOT, "node_modules"), join(dir, "node_modules"));
    file(
      "tsconfig.json",
      JSON.stringify({ compilerOptions: { module: "ES2022", moduleResolution: "bundler" } }),
    );
    file("seeds/demo.ts", "export const demo = 1;\n");
    file("app/db/client.server.ts", "export const db = {};\n");
    file("app/cases/list.server.ts", "export type Row = { id: string };\nexport const rows = () => [];\n");
    // Broken on purpose, one per rule:
    file("app/workshop/uses-demo.ts", 'import { demo } from "../../seeds/demo";\nexport const x = demo;\n');
    file("app/reasoning/uses-react.ts", 'import { useState } from "react";\nexport const y = useState;\n');
    file("app/domain/uses-db.ts", 'import { db } from "../db/client.server";\nexport const z = db;\n');
    file(
      "app/measure/uses-fs.ts",
      'import { readFileSync } from "node:fs";\nexport const r = readFileSync;\n',
    );
    file("app/components/card.tsx", 'import { rows } from "../cases/list.server";\nexport const c = rows;\n');
    file("app/cases/a.ts", 'import { b } from "./b";\nexport const a = () => b;\n');
    file("app/cases/b.ts", 'import { a } from "./a";\nexport const b = () => a;\n');
    // Allowed: a component may take a server module's type (erased before bundling), seeds import app.
    file(
      "app/components/typed.tsx",
      'import type { Row } from "../cases/list.server";\nexport type T = Row;\n',
    );
    file("seeds/uses-app.ts", 'import { a } from "../app/cases/a";\nexport const s = a;\n');

    const summary = await cruise(dir, ["app", "seeds"]);
    const found = summary.violations.map(say).sort();
    expect(found).toEqual(
      [
        "app-stands-alone: app/workshop/uses-demo.ts → seeds/demo.ts",
        "browser-safe-not-server: app/components/card.tsx → app/cases/list.server.ts",
        "browser-safe-not-server: app/domain/uses-db.ts → app/db/client.server.ts",
        "components-not-server: app/components/card.tsx → app/cases/list.server.ts",
        "no-cycles: app/cases/a.ts → app/cases/b.ts",
        "pure-cores-no-node-builtins: app/measure/uses-fs.ts → fs",
        "pure-cores-stay-pure: app/domain/uses-db.ts → app/db/client.server.ts",
        "pure-cores-stay-pure: app/reasoning/uses-react.ts → node_modules/react/index.js",
      ].sort(),
    );
  }, 60_000);
});
