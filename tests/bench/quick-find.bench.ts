// Benchmark of Quick find at 10,000 entries: the real starter knowledge base plus generated
// vehicles, cases and symptom variants. Types each query one key at a time, as a technician
// does, and times every keystroke for our search and for a plain fuse.js search over the whole
// list in the same run. Run: npx tsx tests/bench/quick-find.bench.ts
import Fuse from "fuse.js";
import {
  buildIndex,
  caseEntry,
  type Entry,
  entriesFromKnowledgeBase,
  search,
  vehicleEntry,
} from "../../app/quick-find";
import { DEMO_VEHICLES } from "../../seeds/demo/fleet";
import { starterKnowledgeBase as kb } from "../../seeds/kb";

const TOTAL = 10_000;
const QUERIES = ["judder braki", "clunk over b", "drinks fuel ", "9RL0R1BR4N41"]; // 12 characters each
const BUDGET_MS = 45_000; // whole run stays under a minute
const OURS_REPS = 200;
const PLAIN_REPS = 12;

// Small deterministic generator so every run measures the same entries.
let seed = 20240501;
const rand = () => (seed = (seed * 1103515245 + 12345) & 0x7fffffff) / 0x7fffffff;
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];
const VIN_CHARS = "ABCDEFGHJKLMNPRSTUVWXYZ0123456789";
const LETTERS = "ABCDEFGHJKLMNPRSTUVWXY";
const code = (alphabet: string, n: number) => Array.from({ length: n }, () => pick([...alphabet])).join("");

// Invented makes, models and names, in the spirit of the demo fleet.
const MAKES = ["Orlan", "Veskar", "Pellin", "Corvane", "Hestra", "Mirow"];
const MODELS = ["Brisk", "Fathom", "Tern", "Lark", "Quay", "Strand", "Ember", "Vale"];
const FIRST = ["Alex", "Sam", "Jo", "Robin", "Kit", "Morgan", "Rowan", "Ash", "Dana", "Lee"];
const LAST = ["Brannock", "Cullimore", "Dewhirst", "Fenwold", "Gallow", "Harrow", "Ingle", "Jessop"];
const QUALIFIERS = [
  "front left",
  "front right",
  "rear left",
  "rear right",
  "intermittent",
  "after rain",
  "towing",
  "on the estate",
  "on long trips",
];

function generate(): Entry[] {
  const real = entriesFromKnowledgeBase(kb);
  const out: Entry[] = [...real];
  const vehicles: { id: string; registration: string; name: string }[] = [];
  for (const v of DEMO_VEHICLES)
    out.push(
      vehicleEntry({
        id: v.key,
        registration: v.registration,
        vin: v.vin,
        make: v.make,
        model: v.model,
        year: v.year,
      }),
    );
  for (let i = 0; i < 3000; i++) {
    const registration = `${code(LETTERS, 2)}${10 + Math.floor(rand() * 90)} ${code(LETTERS, 3)}`;
    const v = {
      id: `v${i}`,
      registration,
      vin: `9RL${code(VIN_CHARS, 14)}`,
      make: pick(MAKES),
      model: pick(MODELS),
      year: 2005 + Math.floor(rand() * 20),
      ownerName: `${pick(FIRST)} ${pick(LAST)}`,
    };
    vehicles.push({ id: v.id, registration, name: `${v.make} ${v.model}` });
    out.push(vehicleEntry(v));
  }
  for (let i = 0; i < 4000; i++) {
    const v = pick(vehicles);
    const s = pick(kb.symptoms);
    out.push(
      caseEntry({
        id: `c${i}`,
        number: 2000 + i,
        registration: v.registration,
        vehicle: v.name,
        complaint: `Owner says: ${pick(s.synonyms)}.`,
      }),
    );
  }
  // A curated base grows by variants of the starter symptoms (a corner, a circumstance).
  for (let i = 0; out.length < TOTAL; i++) {
    const s = pick(kb.symptoms);
    const q = pick(QUALIFIERS);
    out.push({
      kind: "symptom",
      id: `sv${i}`,
      title: `${s.name}, ${q}`,
      keywords: [...s.synonyms.map((x) => `${x} ${q}`), ...s.conditions],
    });
  }
  return out;
}

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))];
};

// Times every prefix of `query` as one keystroke, `reps` times or until `maxMs` is spent.
function keystrokes(fn: (prefix: string) => unknown, query: string, reps: number, maxMs: number): number[] {
  const times: number[] = [];
  const start = performance.now();
  for (let r = 0; r < reps && (r < 2 || performance.now() - start < maxMs); r++) {
    for (let i = 1; i <= query.length; i++) {
      const t0 = performance.now();
      fn(query.slice(0, i));
      times.push(performance.now() - t0);
    }
  }
  return times;
}

const began = performance.now();
const entries = generate();
let t0 = performance.now();
const index = buildIndex(entries);
const firstBuild = performance.now() - t0;
const rebuilds: number[] = [];
for (let i = 0; i < 5; i++) {
  t0 = performance.now();
  buildIndex(entries);
  rebuilds.push(performance.now() - t0);
}
t0 = performance.now();
const plain = new Fuse(entries, { keys: ["title", "keywords"] });
const plainBuild = performance.now() - t0;

let sink = 0; // keeps results alive so nothing is optimised away
for (const q of QUERIES) keystrokes((p) => (sink += search(index, p).length), q, 5, 1000); // warm-up
for (const q of QUERIES) keystrokes((p) => (sink += plain.search(p).length), q, 1, 1000);

const rows: string[][] = [];
for (const q of QUERIES) {
  const left = BUDGET_MS - (performance.now() - began);
  const ours = keystrokes((p) => (sink += search(index, p).length), q, OURS_REPS, Math.min(3000, left / 8));
  const fuse = keystrokes(
    (p) => (sink += plain.search(p).length),
    q,
    PLAIN_REPS,
    Math.max(1000, left / (2 * QUERIES.length)),
  );
  const top = search(index, q)[0]?.items[0]?.entry.id ?? "–";
  const [om, op, fm, fp] = [
    quantile(ours, 0.5),
    quantile(ours, 0.95),
    quantile(fuse, 0.5),
    quantile(fuse, 0.95),
  ];
  rows.push([
    JSON.stringify(q),
    om.toFixed(3),
    op.toFixed(3),
    fm.toFixed(2),
    fp.toFixed(2),
    (fm / om).toFixed(0),
    `${ours.length}/${fuse.length}`,
    top,
  ]);
}

const head = [
  "query",
  "ours median ms",
  "ours p95 ms",
  "plain fuse median ms",
  "plain fuse p95 ms",
  "plain/ours",
  "keystrokes ours/plain",
  "our first hit",
];
const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
const line = (cells: string[]) => cells.map((c, i) => c.padStart(widths[i])).join("  ");
const counts = ["symptom", "cause", "check", "vehicle", "case"]
  .map((k) => `${entries.filter((e) => e.kind === k).length} ${k}s`)
  .join(", ");
console.log(`Quick find per keystroke at ${entries.length} entries (${counts}); Node ${process.version}`);
console.log(line(head));
for (const r of rows) console.log(line(r));
console.log(
  `Index build: first ${firstBuild.toFixed(0)} ms, then median ${quantile(rebuilds, 0.5).toFixed(0)} ms (plain Fuse constructor ${plainBuild.toFixed(0)} ms)`,
);
const worst = Math.max(...rows.map((r) => Number(r[1])));
console.log(
  `Target median ≤ 5 ms per keystroke: ${worst <= 5 ? "met" : "NOT met"} (worst median ${worst.toFixed(3)} ms). Total ${((performance.now() - began) / 1000).toFixed(1)} s. [${sink % 10}]`,
);
