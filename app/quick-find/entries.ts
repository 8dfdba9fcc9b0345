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

import { SYSTEM_LABEL } from "~/domain/knowledge";

export { SYSTEM_LABEL };
const systemLabel = (s: string | undefined) =>
  s ? ((SYSTEM_LABEL as Record<string, string>)[s] ?? s.replace(/_/g, " ")) : undefined;

export type SymptomInput = Identified & {
  name: string;
  synonyms?: readonly string[];
  conditions?: readonly string[];
  system?: string;
  kind?: string; // "trouble_code" with no code: the generic "trouble code stored" symptom
  code?: string | null; // a trouble-code symptom's code
};
export type CauseInput = Identified & { name: string; system?: string; level?: string; parentName?: string };
export type CheckInput = Identified & {
  name: string;
  tools?: readonly string[];
  minutes?: number;
  instructions?: readonly string[];
};
export type VehicleInput = {
  id: string;
  registration: string;
  vin?: string | null;
  make?: string;
  model?: string;
  year?: number;
  ownerName?: string;
};
export type CaseInput = {
  id: string;
  number: number;
  registration?: string;
  vehicle?: string;
  complaint?: string;
  ownerName?: string;
};

export function symptomEntry(s: SymptomInput): Entry {
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

const LEVEL_LABEL: Record<string, string> = {
  system: "System",
  component: "Component",
  failure_mode: "Failure mode",
};

export function causeEntry(c: CauseInput): Entry {
  const where = [c.level ? LEVEL_LABEL[c.level] : undefined, c.parentName, systemLabel(c.system)].filter(
    Boolean,
  );
  return {
    kind: "cause",
    id: idOf(c),
    title: c.name,
    subtitle: where.join(" · ") || undefined,
    keywords: c.parentName ? [c.parentName] : [],
  };
}

export function checkEntry(c: CheckInput): Entry {
  const minutes = c.minutes !== undefined ? `${c.minutes} min` : undefined;
  // The steps find the check by what is done in it ("rock at 12 and 6 o'clock").
  return {
    kind: "check",
    id: idOf(c),
    title: c.name,
    subtitle: minutes,
    keywords: [...(c.tools ?? [])],
    ...(c.instructions?.length ? { details: [...c.instructions] } : {}),
  };
}

export function vehicleEntry(v: VehicleInput): Entry {
  const name = [v.make, v.model, v.year].filter(Boolean).join(" ");
  return {
    kind: "vehicle",
    id: v.id,
    title: name ? `${v.registration} · ${name}` : v.registration,
    subtitle: [v.vin, v.ownerName].filter(Boolean).join(" · ") || undefined,
    keywords: [v.registration, ...(v.vin ? [v.vin] : []), ...(v.ownerName ? [v.ownerName] : [])],
  };
}

export function caseEntry(c: CaseInput): Entry {
  const head = [`#${c.number}`, c.registration, c.vehicle].filter(Boolean).join(" · ");
  return {
    kind: "case",
    id: c.id,
    title: head,
    subtitle: c.complaint,
    keywords: [
      String(c.number),
      ...(c.registration ? [c.registration] : []),
      ...(c.ownerName ? [c.ownerName] : []),
    ],
  };
}

export type KnowledgeBaseInputs = {
  symptoms: readonly SymptomInput[];
  causes: readonly (CauseInput & { parentKey?: string | null; parentId?: string | null })[];
  checks: readonly CheckInput[];
};

/** Every symptom, cause and check; a cause's parent name is filled in from the same rows. */
export function entriesFromKnowledgeBase(kb: KnowledgeBaseInputs): Entry[] {
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
