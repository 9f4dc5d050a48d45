/** States of a quote version (see docs/quotes.md). */
export const QUOTE_VERSION_STATES = [
  'draft',
  'sent',
  'accepted',
  'superseded',
  'expired',
  'declined',
] as const;
export type QuoteVersionState = (typeof QUOTE_VERSION_STATES)[number];

/** How the customer uses the vehicle (the planner's second step). */
export const VEHICLE_USES = ['daily', 'touring', 'towing', 'off-road'] as const;
export type VehicleUse = (typeof VEHICLE_USES)[number];
