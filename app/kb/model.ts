// Turns a workshop's knowledge base and one vehicle into the reasoning core's Model. Pure: the
// server loads the rows, this decides priors and costs, the core does the arithmetic.
import { checkCost, resolvePriors, type Model, type VehicleFacts } from "~/reasoning";
import type { Applicability } from "~/domain/knowledge";
import type { Skill } from "~/domain/people";

export type KbSymptom = {
  id: string;
  name: string;
  leak: number;
  synonyms?: string[];
  conditions?: string[];
  system?: string;
};
export type KbCause = {
  id: string;
  parentId: string | null;
  level: string;
  name: string;
  baseRate: number | null;
  applicability: Applicability;
  priority?: string | null;
  repairMinutes?: number | null;
  partsCost?: number | null;
};
export type KbCheck = {
  id: string;
  name: string;
  minutes: number;
  consumablesCost: number;
  access: string[];
  skill: Skill;
  falseAlarm: number;
  // What the screens show beside a plan step; not used by the arithmetic.
  instructions?: string[];
  tools?: string[];
  cautions?: string[];
  resultKind?: "pass_fail" | "measurement";
  unit?: string | null;
  rule?: string | null;
  failMeans?: string;
};
export type KbLinks = {
  symptomLinks: { symptomId: string; causeId: string; p: number }[];
  checkLinks: { checkId: string; causeId: string; pFail: number }[];
};
export type Knowledge = {
  kbVersion: number;
  symptoms: KbSymptom[];
  causes: KbCause[];
  checks: KbCheck[];
} & KbLinks;

/**
 * Extra minutes a check's access adds before the work starts: getting the car on the ramp, wheels
 * off, the scan tool connected. Demo estimates (common practice, no published source); a workshop
 * would tune them to its own bays.
 */
export const ACCESS_MINUTES: Record<string, number> = {
  ramp: 8,
  wheels_off: 10,
  scan_tool: 3,
  bonnet_open: 1,
  road_test: 0,
  cold_engine: 0,
};

export function vehicleFacts(
  v: { fuelType: string; drivetrain: string; year: number; mileageKm: number | null },
  today = new Date(),
): VehicleFacts {
  return {
    fuel: v.fuelType,
    drivetrain: v.drivetrain,
    ageYears: Math.max(0, today.getUTCFullYear() - v.year),
    km: v.mileageKm ?? undefined,
  };
}

export function buildModel(
  kb: Knowledge,
  vehicle: VehicleFacts,
  labourRatePerHour: number,
  outcomes: Record<string, number> = {},
): Model {
  const leaves = kb.causes.filter((c) => c.level === "failure_mode");
  const leafIds = new Set(leaves.map((l) => l.id));
  const bears = new Map<string, { causeId: string; pFail: number }[]>();
  for (const l of kb.checkLinks) {
    const list = bears.get(l.checkId) ?? [];
    list.push({ causeId: l.causeId, pFail: l.pFail });
    bears.set(l.checkId, list);
  }
  const priors = new Map(
    resolvePriors(
      leaves.map((c) => ({ id: c.id, baseRate: c.baseRate ?? 0, applicability: c.applicability })),
      vehicle,
      { outcomes: Object.fromEntries(Object.entries(outcomes).filter(([id]) => leafIds.has(id))) },
    ).map((p) => [p.id, p.prior]),
  );
  return {
    causes: kb.causes.map((c) => ({
      id: c.id,
      parentId: c.parentId,
      prior: priors.get(c.id) ?? 0,
      name: c.name,
    })),
    symptoms: kb.symptoms.map((s) => ({ id: s.id, leak: s.leak, name: s.name })),
    links: kb.symptomLinks,
    checks: kb.checks.map((k) => ({
      id: k.id,
      name: k.name,
      skill: k.skill,
      falseAlarm: k.falseAlarm,
      cost: checkCost({
        minutes: k.minutes,
        labourRatePerHour,
        consumables: k.consumablesCost,
        access: Object.fromEntries(k.access.map((a) => [a, ACCESS_MINUTES[a] ?? 0])),
      }),
      bears: bears.get(k.id) ?? [],
    })),
  };
}
