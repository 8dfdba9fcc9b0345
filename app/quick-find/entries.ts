// Rows from the knowledge base, the vehicle list and the case book → Quick find entries. Accepts
// both database rows (with a uuid `id`) and seed rows (only a `key`), so tests and the demo use
// the same code as the app.
import type { Entry } from "./types";

type Identified = { id?: string; key?: string };
const idOf = (row: Identified): string => {
  const id = row.id ?? row.key;
  if (!id) throw new Error("A knowledge-base row needs an id or a key");
  return id;
};

export const SYSTEM_LABEL: Record<string, string> = {
  brakes: "Brakes",
  suspension_steering: "Suspension and steering",
  wheels_tyres: "Wheels and tyres",
  driveline: "Driveline",
  engine_fuel_emissions: "Engine, fuelling and emissions",
  cooling: "Cooling",
  electrical: "Electrical",
  exhaust: "Exhaust",
};
const systemLabel = (s: string | undefined) => (s ? (SYSTEM_LABEL[s] ?? s.replace(/_/g, " ")) : undefined);

export type SymptomRow = Identified & {
  name: string;
  synonyms?: readonly string[];
  conditions?: readonly string[];
  system?: string;
  kind?: string; // "trouble_code" with no code: the generic "trouble code stored" symptom
  code?: string | null; // a trouble-code symptom's code
};
export type CauseRow = Identified & { name: string; system?: string; level?: string; parentName?: string };
export type CheckRow = Identified & { name: string; tools?: readonly string[]; minutes?: number; instructions?: readonly string[] };
export type VehicleRow = { id: string; registration: string; vin?: string | null; make?: string; model?: string; year?: number; ownerName?: string };
export type CaseRow = { id: string; number: number; registration?: string; vehicle?: string; complaint?: string; ownerName?: string };

export function symptomEntry(s: SymptomRow): Entry {
  const conditions = s.conditions ?? [];
  return {
    kind: "symptom",
    id: idOf(s),
    title: s.name,
    subtitle: [systemLabel(s.system), conditions.join(", ")].filter(Boolean).join(" · ") || undefined,
    // Conditions are part of what the symptom means: "under braking" must find it from "brake".
    keywords: [...(s.synonyms ?? []), ...conditions],
    ...(s.code ? { dtc: s.code.toUpperCase() } : s.kind === "trouble_code" ? { anyDtc: true } : {}),
  };
}

const LEVEL_LABEL: Record<string, string> = { system: "System", component: "Component", failure_mode: "Failure mode" };

export function causeEntry(c: CauseRow): Entry {
  const where = [c.level ? LEVEL_LABEL[c.level] : undefined, c.parentName, systemLabel(c.system)].filter(Boolean);
  return { kind: "cause", id: idOf(c), title: c.name, subtitle: where.join(" · ") || undefined, keywords: c.parentName ? [c.parentName] : [] };
}

export function checkEntry(c: CheckRow): Entry {
  const minutes = c.minutes !== undefined ? `${c.minutes} min` : undefined;
  // The steps find the check by what is done in it ("rock at 12 and 6 o'clock").
  return { kind: "check", id: idOf(c), title: c.name, subtitle: minutes, keywords: [...(c.tools ?? [])], ...(c.instructions?.length ? { details: [...c.instructions] } : {}) };
}

export function vehicleEntry(v: VehicleRow): Entry {
  const name = [v.make, v.model, v.year].filter(Boolean).join(" ");
  return {
    kind: "vehicle",
    id: v.id,
    title: name ? `${v.registration} · ${name}` : v.registration,
    subtitle: [v.vin, v.ownerName].filter(Boolean).join(" · ") || undefined,
    keywords: [v.registration, ...(v.vin ? [v.vin] : []), ...(v.ownerName ? [v.ownerName] : [])],
  };
}

export function caseEntry(c: CaseRow): Entry {
  const head = [`#${c.number}`, c.registration, c.vehicle].filter(Boolean).join(" · ");
  return {
    kind: "case",
    id: c.id,
    title: head,
    subtitle: c.complaint,
    keywords: [String(c.number), ...(c.registration ? [c.registration] : []), ...(c.ownerName ? [c.ownerName] : [])],
  };
}

export type KnowledgeBaseRows = {
  symptoms: readonly SymptomRow[];
  causes: readonly (CauseRow & { parentKey?: string | null; parentId?: string | null })[];
  checks: readonly CheckRow[];
};

/** Every symptom, cause and check; a cause's parent name is filled in from the same rows. */
export function entriesFromKnowledgeBase(kb: KnowledgeBaseRows): Entry[] {
  const nameOf = new Map<string, string>();
  for (const c of kb.causes) {
    if (c.id) nameOf.set(c.id, c.name);
    if (c.key) nameOf.set(c.key, c.name);
  }
  return [
    ...kb.symptoms.map(symptomEntry),
    ...kb.causes.map((c) => {
      const parent = c.parentId ?? c.parentKey;
      return causeEntry({ ...c, parentName: c.parentName ?? (parent ? nameOf.get(parent) : undefined) });
    }),
    ...kb.checks.map(checkEntry),
  ];
}
