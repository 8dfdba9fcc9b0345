// Where the case stands with its owner: sent, opened, the answer item by item, paid.
import { OWNER_STATE_LABEL, type OwnerState } from "~/domain/owner-side";
import { formatDate as formatDateTime } from "~/domain/format";
import { formatMinor } from "~/money";

type Sent = {
  version: number;
  sentAt: Date | string;
  toEmail: string;
  answeredAt: Date | string | null;
  ownerNote: string | null;
  openedAt: Date | string | null;
  openCount: number;
  linkLive: boolean;
  items: { id: string; title: string; required: boolean; decision: string | null }[];
  currency: string;
  approvedTotal: number | null;
  fullTotal: number;
  payment: { status: string; amountMinor: number; flaggedReason: string | null } | null;
};

export function OwnerStatus({ state, sent }: { state: OwnerState; sent: Sent | null }) {
  return (
    <div>
      <p className="font-semibold" data-owner-state={state}>
        {OWNER_STATE_LABEL[state]}
      </p>
      {sent ? (
        <ul className="mt-2 grid gap-1 text-sm">
          <li>
            Version {sent.version} sent {formatDateTime(new Date(sent.sentAt))} to {sent.toEmail},{" "}
            {formatMinor(sent.fullTotal, sent.currency)} for all of it.
          </li>
          <li>
            {sent.openedAt
              ? `Opened ${formatDateTime(new Date(sent.openedAt))} (${sent.openCount} ${sent.openCount === 1 ? "time" : "times"}).`
              : "Not opened yet."}{" "}
            {sent.linkLive ? "The link works." : "The link no longer works."}
          </li>
          {sent.answeredAt ? (
            <li>
              Answered {formatDateTime(new Date(sent.answeredAt))}:{" "}
              {sent.items
                .filter((i) => !i.required)
                .map((i) => `${i.title} ${i.decision === "approved" ? "approved" : "declined"}`)
                .join("; ")}
              . Approved work with what is owed: {formatMinor(sent.approvedTotal ?? 0, sent.currency)}.
            </li>
          ) : null}
          {sent.ownerNote ? <li>Their note: “{sent.ownerNote}”</li> : null}
          {sent.payment ? (
            <li>
              Diagnostic fee {formatMinor(sent.payment.amountMinor, sent.currency)}:{" "}
              {sent.payment.status === "paid"
                ? "paid online."
                : sent.payment.status === "refunded"
                  ? "refunded."
                  : sent.payment.status === "flagged"
                    ? `held for a check (${sent.payment.flaggedReason ?? "the payment service disagreed with our record"}).`
                    : "payment started, not completed."}
            </li>
          ) : null}
        </ul>
      ) : null}
    </div>
  );
}
