import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { totals } from "~/money";
import { sentItems, totalsOf } from "./document";
import { loadDraft } from "./draft.server";
import { loadEstimateCase } from "./estimate-case.server";
import { newestSent } from "./owner-answer.server";
import { ownerState } from "./owner-state";

/** Where the owner side of a case stands: the newest send, its link, the owner's answer. */
export async function ownerSide(db: Db, workshopId: string, caseId: string) {
  const newest = await newestSent(db, workshopId, caseId);
  if (!newest)
    return { state: ownerState({ sent: false, opened: false, decisions: null, payment: null }), sent: null };
  const { sent, links, decisions, paid } = newest;
  const payment = paid.find((p) => p.status === "paid") ?? paid[0] ?? null;
  const live = links.find((l) => !l.revokedAt && l.expiresAt.getTime() > Date.now());
  const opened = links.find((l) => l.firstOpenedAt);
  const approved = new Set(decisions.filter((d) => d.decision === "approved").map((d) => d.itemId));
  return {
    state: ownerState({
      sent: true,
      opened: Boolean(opened),
      decisions: sent.answeredAt ? decisions.map((d) => d.decision) : null,
      payment: payment?.status ?? null,
    }),
    sent: {
      version: sent.version,
      sentAt: sent.sentAt,
      toEmail: sent.toEmail,
      answeredAt: sent.answeredAt,
      ownerNote: sent.ownerNote,
      openedAt: opened?.firstOpenedAt ?? null,
      openCount: links.reduce((s, l) => s + l.openCount, 0),
      linkLive: Boolean(live),
      linkExpiresAt: live?.expiresAt ?? null,
      items: sent.document.items.map((i) => ({
        id: i.id,
        title: i.title,
        required: i.required,
        decision: decisions.find((d) => d.itemId === i.id)?.decision ?? null,
      })),
      currency: sent.document.currency,
      approvedTotal: sent.answeredAt ? totalsOf(sent.document, approved).gross : null,
      fullTotal: totalsOf(sent.document).gross,
      payment: payment
        ? { status: payment.status, amountMinor: payment.amountMinor, flaggedReason: payment.flaggedReason }
        : null,
    },
  };
}

export async function estimatePage(db: Db, member: CurrentMember, caseId: string) {
  const c = await loadEstimateCase(db, member.workshopId, caseId);
  const draft = await loadDraft(db, member.workshopId, caseId);
  const items = sentItems(draft).map((item, i) => ({ ...item, lineIds: draft[i].lines.map((l) => l.id) }));
  return {
    case: {
      id: c.id,
      number: c.number,
      state: c.state,
      complaint: c.complaint,
      vehicle: c.vehicleName,
      registration: c.registration,
      ownerName: c.ownerName,
      ownerEmail: c.ownerEmail,
      ownerPhone: c.ownerPhone,
      cause: c.cause ? { name: c.cause.name, priority: c.cause.priority } : null,
    },
    money: {
      currency: c.currency,
      taxRate: c.taxRate,
      pricesIncludeTax: c.pricesIncludeTax,
      labourRatePerHour: c.labourRatePerHour,
    },
    items,
    totals: totals(
      items.flatMap((i) => i.lines),
      c.pricesIncludeTax,
    ),
    owner: await ownerSide(db, member.workshopId, caseId),
  };
}
