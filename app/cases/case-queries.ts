import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { CaseFields } from "~/cases/case.server";
import type { Diagnosis } from "~/cases/present-diagnosis";

// The browser's own fetches for the workbench: the live re-rank after every piece of evidence.
// Over the wire dates arrive as strings; the screens only format them, so either is fine.
type Wire<T> = {
  [K in keyof T]: T[K] extends Date
    ? string | Date
    : T[K] extends Date | null
      ? string | Date | null
      : T[K] extends (infer U)[]
        ? Wire<U>[]
        : T[K];
};
export type CaseView = { case: Wire<CaseFields> & { findingCount: number }; diagnosis: Diagnosis };

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
  }
}

async function call<T>(url: string, init?: RequestInit): Promise<T> {
  const res = await fetch(url, {
    ...init,
    headers: { "content-type": "application/json", ...init?.headers },
  });
  if (res.status === 204) return undefined as T;
  const body = await res.json().catch(() => ({ error: `The server answered ${res.status}.` }));
  if (!res.ok) throw new ApiError(res.status, body.error ?? `The server answered ${res.status}.`);
  return body as T;
}

export const caseKeys = {
  all: ["case"] as const,
  one: (id: string) => ["case", id] as const,
  history: (id: string) => ["case", id, "history"] as const,
  findings: (id: string) => ["case", id, "findings"] as const,
};

export type HistoryEntry = {
  id: number;
  at: string;
  action: string;
  before: unknown;
  after: unknown;
  actor: string | null;
};

export type CheckDetails = {
  id: string;
  name: string;
  instructions: string[];
  tools: string[];
  cautions: string[];
  failMeans: string;
};

/** A check's steps, read when a folded check of the plan is opened (the plan sends the first few only). */
export const checkQuery = (checkId: string) =>
  queryOptions({
    queryKey: ["kb", "check", checkId] as const,
    queryFn: () => call<CheckDetails>(`/api/kb/checks/${checkId}`),
    staleTime: 5 * 60_000,
  });

/** Every finding of the case, read when its earlier findings are opened. */
export const findingsQuery = (caseId: string) =>
  queryOptions({
    queryKey: caseKeys.findings(caseId),
    queryFn: () => call<{ findings: CaseView["case"]["findings"] }>(`/api/cases/${caseId}/findings`),
    staleTime: 0,
  });

/** The case's history, read when its panel is opened and afresh each time (it grows with every change). */
export const historyQuery = (caseId: string) =>
  queryOptions({
    queryKey: caseKeys.history(caseId),
    queryFn: () => call<{ history: HistoryEntry[] }>(`/api/cases/${caseId}/history`),
    staleTime: 0,
  });

export const caseQuery = (caseId: string) =>
  queryOptions({
    queryKey: caseKeys.one(caseId),
    queryFn: () => call<CaseView>(`/api/cases/${caseId}`),
    staleTime: 5_000,
  });

export type Change =
  | { kind: "observe"; symptomId: string; name: string; present: boolean; source?: "owner" | "technician" }
  | { kind: "unobserve"; id: string }
  | { kind: "find"; checkId: string; name: string; result?: "pass" | "fail"; reading?: string }
  | { kind: "unfind"; id: string };

/** What the server answers to a change: the case and its new diagnosis, and the new row's id when one was added. */
export type ChangeAnswer = { id?: string; view: CaseView };

/**
 * The change that takes `change` back, given the case as it was before and the server's answer:
 * a new observation or finding is removed, a changed observation gets its old answer back, and a
 * removed one is recorded again as it was. With its words for the notice that offers it.
 */
export function undoOf(
  before: CaseView["case"],
  change: Change,
  answer: Pick<ChangeAnswer, "id"> | undefined,
): { said: string; undo: Change | null } {
  switch (change.kind) {
    case "observe": {
      const was = before.observations.find((o) => o.symptomId === change.symptomId);
      const said = `Recorded “${change.name}” as ${change.present ? "present" : "absent"}.`;
      if (was)
        return {
          said,
          undo: {
            kind: "observe",
            symptomId: was.symptomId,
            name: was.name,
            present: was.present,
            source: was.source,
          },
        };
      return { said, undo: answer?.id ? { kind: "unobserve", id: answer.id } : null };
    }
    case "find":
      return {
        said: `Recorded “${change.name}”: ${change.reading ? change.reading : change.result === "fail" ? "found a fault" : "passed"}.`,
        undo: answer?.id ? { kind: "unfind", id: answer.id } : null,
      };
    case "unobserve": {
      const o = before.observations.find((x) => x.id === change.id);
      return {
        said: `Removed “${o?.name ?? "the observation"}”.`,
        undo: o
          ? { kind: "observe", symptomId: o.symptomId, name: o.name, present: o.present, source: o.source }
          : null,
      };
    }
    case "unfind": {
      const f = before.findings.find((x) => x.id === change.id);
      const undo: Change | null = f
        ? f.reading
          ? { kind: "find", checkId: f.checkId, name: f.name, reading: f.reading }
          : { kind: "find", checkId: f.checkId, name: f.name, result: f.result }
        : null;
      return { said: `Removed the finding “${f?.name ?? ""}”.`, undo };
    }
  }
}

function send(caseId: string, c: Change): Promise<ChangeAnswer> {
  switch (c.kind) {
    case "observe":
      return call<ChangeAnswer>(`/api/cases/${caseId}/observations`, {
        method: "POST",
        body: JSON.stringify({
          symptomId: c.symptomId,
          present: c.present,
          source: c.source ?? "technician",
        }),
      });
    case "unobserve":
      return call<ChangeAnswer>(`/api/cases/${caseId}/observations/${c.id}`, { method: "DELETE" });
    case "find":
      return call<ChangeAnswer>(`/api/cases/${caseId}/findings`, {
        method: "POST",
        body: JSON.stringify({ checkId: c.checkId, result: c.result, reading: c.reading }),
      });
    case "unfind":
      return call<ChangeAnswer>(`/api/cases/${caseId}/findings/${c.id}`, { method: "DELETE" });
  }
}

/**
 * Evidence changes with an optimistic list update, rolled back if the server refuses. The answer
 * carries the re-ranked case, which goes straight into the cache: one round trip per change.
 */
export function useEvidence(caseId: string) {
  const qc = useQueryClient();
  const key = caseKeys.one(caseId);
  return useMutation({
    mutationFn: (c: Change) => send(caseId, c),
    onMutate: async (c) => {
      await qc.cancelQueries({ queryKey: key });
      const before = qc.getQueryData<CaseView>(key);
      if (before) qc.setQueryData<CaseView>(key, { ...before, case: optimistic(before.case, c) });
      return { before };
    },
    onSuccess: (answer) => qc.setQueryData<CaseView>(key, answer.view),
    onError: (_e, _c, ctx) => {
      if (ctx?.before) qc.setQueryData(key, ctx.before);
      // Someone else's change may be why it was refused: fetch the case as it is now.
      void qc.invalidateQueries({ queryKey: key });
    },
  });
}

function optimistic(c: CaseView["case"], change: Change): CaseView["case"] {
  const now = new Date().toISOString();
  switch (change.kind) {
    case "observe":
      return {
        ...c,
        observations: [
          ...c.observations.filter((o) => o.symptomId !== change.symptomId),
          {
            id: `pending-${change.symptomId}`,
            symptomId: change.symptomId,
            name: change.name,
            present: change.present,
            source: change.source ?? "technician",
            note: null,
            by: null,
            recordedAt: now,
          },
        ],
      };
    case "unobserve":
      return { ...c, observations: c.observations.filter((o) => o.id !== change.id) };
    case "find":
      return {
        ...c,
        findingCount: c.findingCount + 1,
        findings: [
          ...c.findings,
          {
            id: `pending-${change.checkId}`,
            checkId: change.checkId,
            name: change.name,
            result: change.result ?? "pass",
            reading: change.reading ?? "…",
            note: null,
            by: null,
            recordedAt: now,
          },
        ],
      };
    case "unfind":
      return {
        ...c,
        findingCount: c.findingCount - 1,
        findings: c.findings.filter((f) => f.id !== change.id),
      };
  }
}
