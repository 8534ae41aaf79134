import { z } from "zod";

/**
 * The parts of a provider event Hubface reads, checked after the signature verifies: a signed
 * event is genuine, but a malformed one (a provider API change, a test tool) must be a 400 with
 * a message and nothing written, not a crash. Other fields pass through unread.
 */
const eventBase = z.object({
  id: z.string().min(1).max(255),
  type: z.string().min(1).max(255),
  data: z.object({ object: z.looseObject({}) }),
});

const checkoutSession = z.looseObject({
  id: z.string().min(1).max(255),
  amount_total: z.number().int().nullable(),
  currency: z.string().nullable(),
  payment_status: z.string(),
  client_reference_id: z.string().nullable(),
  metadata: z.record(z.string(), z.string()).nullable().optional(),
  payment_intent: z.string().nullable().optional(),
});

/** A refund as the provider reports it; `metadata.refund_id` names the app's own refund row. */
const refund = z.looseObject({
  id: z.string().min(1).max(255),
  amount: z.number().int(),
  currency: z.string(),
  status: z.string(),
  payment_intent: z.string().nullable(),
  metadata: z.record(z.string(), z.string()).nullable().optional(),
});

/** `refund.failed` carries the same refund object as `refund.updated`; both are read by its status. */
const REFUND_TYPES = ["refund.updated", "refund.failed"] as const;
const READ_TYPES: readonly string[] = ["checkout.session.completed", ...REFUND_TYPES];

export const paymentEventSchema = z.union([
  eventBase.extend({ type: z.literal("checkout.session.completed"), data: z.object({ object: checkoutSession }) }),
  eventBase.extend({ type: z.enum(REFUND_TYPES), data: z.object({ object: refund }) }),
  eventBase.extend({ type: z.string().refine((t) => !READ_TYPES.includes(t)) }),
]);
export type PaymentEvent = z.infer<typeof paymentEventSchema>;
