// The starter knowledge base as the server would hand it to the reasoning core: seed rows as
// knowledge rows (keys as ids), turned into a Model per vehicle by the app's own buildModel. The
// optional fields the engine reads (a link's conditions, a bearing's graded figures) are carried
// over from the seed (a symptom's P(s | not in the KB), a link's conditions, a bearing's graded
// figures); the server's loader will do the same once its tables hold them.
import { buildModel, type Knowledge } from "../../../app/kb/model";
import type { Model } from "../../../app/reasoning";
import { starterKnowledgeBase as kb } from "../../../seeds/kb";
import type { Vehicle } from "./case-types";

/** A mid-range labour rate (money per hour); only ratios between checks matter to the plan. */
export const LABOUR_RATE = 60;

export function knowledgeFromSeed(): Knowledge {
  return {
    kbVersion: 1,
    symptoms: kb.symptoms.map((s) => ({
      id: s.key,
      name: s.name,
      leak: s.leak,
      synonyms: s.synonyms,
      conditions: s.conditions,
      system: s.system,
    })),
    causes: kb.causes.map((c) => ({
      id: c.key,
      parentId: c.parentKey,
      level: c.level,
      name: c.name,
      baseRate: c.baseRate ?? null,
      applicability: c.applicability ?? {},
    })),
    checks: kb.checks.map((k) => ({
      id: k.key,
      name: k.name,
      minutes: k.minutes,
      consumablesCost: k.consumablesCost,
      access: k.access,
      skill: k.skill,
      falseAlarm: k.falseAlarm,
    })),
    symptomLinks: kb.symptomLinks.map((l) => ({ symptomId: l.symptom, causeId: l.cause, p: l.p })),
    checkLinks: kb.checkLinks.map((l) => ({ checkId: l.check, causeId: l.cause, pFail: l.pFail })),
  };
}

type Extra = Record<string, unknown>;
const symptomExtra = new Map<string, Extra>();
for (const s of kb.symptoms) if (s.unlisted !== undefined) symptomExtra.set(s.key, { unlisted: s.unlisted });
const linkExtra = new Map<string, Extra>();
const bearExtra = new Map<string, Extra>();
for (const l of kb.symptomLinks as ((typeof kb.symptomLinks)[number] & Extra)[]) {
  const { symptom, cause, p: _p, ...rest } = l;
  if (Object.keys(rest).length) linkExtra.set(`${symptom}|${cause}`, rest);
}
for (const l of kb.checkLinks as ((typeof kb.checkLinks)[number] & Extra)[]) {
  const { check, cause, pFail: _p, ...rest } = l;
  if (Object.keys(rest).length) bearExtra.set(`${check}|${cause}`, rest);
}

const knowledge = knowledgeFromSeed();

export function modelFor(vehicle: Vehicle): Model {
  const model = buildModel(
    knowledge,
    { fuel: vehicle.fuel, drivetrain: vehicle.drivetrain, ageYears: vehicle.ageYears, km: vehicle.km },
    LABOUR_RATE,
  );
  if (linkExtra.size === 0 && bearExtra.size === 0 && symptomExtra.size === 0) return model;
  return {
    ...model,
    symptoms: model.symptoms.map((s) => ({ ...s, ...symptomExtra.get(s.id) })),
    links: model.links.map((l) => ({ ...l, ...linkExtra.get(`${l.symptomId}|${l.causeId}`) })),
    checks: model.checks.map((k) => ({
      ...k,
      bears: k.bears.map((b) => ({ ...b, ...bearExtra.get(`${k.id}|${b.causeId}`) })),
    })),
  };
}
