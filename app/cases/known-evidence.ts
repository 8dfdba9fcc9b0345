// A case is ranked with the knowledge-base version it was opened under (or last moved on to). Its
// evidence may name a symptom or check that only a newer version has: that evidence is set aside,
// counted, and shown, rather than silently changing which version ranks the case.
import type { Knowledge } from "~/kb/model";

type Evidence = {
  observations: { symptomId: string; present: boolean; source?: string }[];
  findings: { checkId: string; result: string }[];
};

/** Which version ranked the case, and how much of its evidence that version does not know. */
export type KnowledgeUsed = { version: number; setAside: number };

const ids = new WeakMap<Knowledge, { symptoms: Set<string>; checks: Set<string> }>();

export function knownEvidence<E extends Evidence>(
  kb: Knowledge,
  evidence: E,
): { evidence: E; setAside: number } {
  let known = ids.get(kb);
  if (!known)
    ids.set(
      kb,
      (known = {
        symptoms: new Set(kb.symptoms.map((s) => s.id)),
        checks: new Set(kb.checks.map((k) => k.id)),
      }),
    );
  const observations = evidence.observations.filter((o) => known.symptoms.has(o.symptomId));
  const findings = evidence.findings.filter((f) => known.checks.has(f.checkId));
  const setAside =
    evidence.observations.length - observations.length + evidence.findings.length - findings.length;
  return { evidence: setAside ? { ...evidence, observations, findings } : evidence, setAside };
}
