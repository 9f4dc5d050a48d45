import { randomInt } from 'node:crypto';

const ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

function randomChars(length: number): string {
  let out = '';
  for (let i = 0; i < length; i += 1) out += ALPHABET[randomInt(ALPHABET.length)];
  return out;
}

/** The provider's id prefixes; test-mode checkout sessions carry the longer cs_test_ form. */
export const newId = {
  checkoutSession: () => `cs_test_${randomChars(58)}`,
  paymentIntent: () => `pi_${randomChars(24)}`,
  charge: () => `ch_${randomChars(24)}`,
  refund: () => `re_${randomChars(24)}`,
  event: () => `evt_${randomChars(24)}`,
  paymentMethod: () => `pm_${randomChars(24)}`,
  lineItem: () => `li_${randomChars(24)}`,
  price: () => `price_${randomChars(24)}`,
  product: () => `prod_${randomChars(14)}`,
  request: () => `req_${randomChars(14)}`,
  secret: () => randomChars(24),
};
