/** What a payment is for: the deposit that turns a hold into a request, or a later top-up. */
export const PAYMENT_KINDS = ['deposit', 'top-up'] as const;
export type PaymentKind = (typeof PAYMENT_KINDS)[number];

/**
 * `open`: a checkout session waits for the customer; `paid`: the provider took the money;
 * `expired`: the session ran out unpaid; `failed`: the provider gave up on the payment.
 */
export const PAYMENT_STATUSES = ['open', 'paid', 'expired', 'failed'] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];
