// The payments fake's refunds: `POST /v1/refunds` by payment_intent or charge, in the public wire
// format (a `refund` object), followed by a `charge.refunded` event carrying the charge with its
// refunds, as the real service sends it.
import { randomBytes } from "node:crypto";
import { asRecord, asString } from "./payments-wire";
import type { FormObject } from "./payments-wire";

export type Charge = {
  id: string;
  object: "charge";
  amount: number;
  amount_refunded: number;
  currency: string;
  payment_intent: string;
  refunded: boolean;
  paid: true;
  status: "succeeded";
  metadata: Record<string, string>;
  refunds: { object: "list"; data: Refund[]; has_more: false; url: string };
  created: number;
  livemode: false;
};

export type Refund = {
  id: string;
  object: "refund";
  amount: number;
  currency: string;
  charge: string;
  payment_intent: string;
  status: "succeeded";
  reason: string | null;
  metadata: Record<string, string>;
  created: number;
};

export function newCharge(paymentIntent: string, amount: number, currency: string, now: number): Charge {
  const id = `ch_test_${randomBytes(12).toString("hex")}`;
  return {
    id,
    object: "charge",
    amount,
    amount_refunded: 0,
    currency,
    payment_intent: paymentIntent,
    refunded: false,
    paid: true,
    status: "succeeded",
    metadata: {},
    refunds: { object: "list", data: [], has_more: false, url: `/v1/charges/${id}/refunds` },
    created: Math.floor(now / 1000),
    livemode: false,
  };
}

/** A refund of a charge found by payment intent or charge id; a message when it cannot be made. */
export function createRefund(
  form: FormObject,
  charges: Charge[],
  now: number,
): { refund: Refund; charge: Charge } | { error: string; status: number; code?: string } {
  const pi = asString(form.payment_intent);
  const chargeId = asString(form.charge);
  if (!pi && !chargeId) return { error: "Provide a payment_intent or a charge to refund.", status: 400 };
  const charge = charges.find((c) => (pi ? c.payment_intent === pi : c.id === chargeId));
  if (!charge)
    return {
      error: pi ? `No such payment_intent: '${pi}'` : `No such charge: '${chargeId}'`,
      status: 400,
      code: "resource_missing",
    };
  const left = charge.amount - charge.amount_refunded;
  if (left <= 0)
    return {
      error: `Charge ${charge.id} has already been refunded.`,
      status: 400,
      code: "charge_already_refunded",
    };
  const raw = asString(form.amount);
  const amount = raw === undefined ? left : Number(raw);
  if (!Number.isInteger(amount) || amount <= 0 || amount > left)
    return { error: `amount must be a whole number from 1 to ${left}.`, status: 400 };
  const refund: Refund = {
    id: `re_test_${randomBytes(12).toString("hex")}`,
    object: "refund",
    amount,
    currency: charge.currency,
    charge: charge.id,
    payment_intent: charge.payment_intent,
    status: "succeeded",
    reason: asString(form.reason) ?? null,
    metadata: Object.fromEntries(
      Object.entries(asRecord(form.metadata)).map(([k, v]) => [k, asString(v) ?? ""]),
    ),
    created: Math.floor(now / 1000),
  };
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  charge.refunds.data.unshift(refund);
  return { refund, charge };
}
