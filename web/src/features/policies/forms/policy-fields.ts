import * as yup from 'yup';
import { DOLLARS_PATTERN, centsToDollarsText, dollarsTextToCents } from '@/lib/money';
import { numberInRange } from '@/lib/number-fields';
import type { Policy, ProductKind, TaxRoundingMethod, UpdatePolicyRequest } from '@/types/api';

/** Mirrors the API's limits (the pricing engine's validatePricingInput). */
export const MAX_LABOUR_RATE_CENTS_PER_HOUR = 1_000_000;
export const MAX_FEE_CENTS = 1_000_000_000;
export const MAX_QUOTE_VALID_DAYS = 365;

export const productKindOptions: readonly { value: ProductKind; label: string }[] = [
  { value: 'suspension-kit', label: 'Suspension kit' },
  { value: 'wheel', label: 'Wheels' },
  { value: 'tyre', label: 'Tyres' },
  { value: 'component', label: 'A component' },
  { value: 'service', label: 'A service' },
];

export const roundingOptions: readonly { value: TaxRoundingMethod; label: string }[] = [
  { value: 'per-invoice', label: 'Once on the invoice total' },
  { value: 'per-line', label: 'On each line, then added' },
];

/** The policy as the form edits it: money as dollars typed, numbers as text. */
export interface PolicyFormValues {
  labourRate: string;
  pricesIncludeTax: boolean;
  taxRatePercent: string;
  taxRoundingMethod: TaxRoundingMethod;
  fittingBalancing: string;
  tyreDisposal: string;
  bundleDiscount: { enabled: boolean; percent: string; requiresKinds: ProductKind[] };
  deposit: { percent: string; floor: string; cap: string; specialOrderPercent: string };
  quoteValidDays: string;
}

/** Every field the form shows, for placing the server's errors. */
export const policyFormFields = [
  'labourRate',
  'pricesIncludeTax',
  'taxRatePercent',
  'taxRoundingMethod',
  'fittingBalancing',
  'tyreDisposal',
  'bundleDiscount.enabled',
  'bundleDiscount.percent',
  'bundleDiscount.requiresKinds',
  'deposit.percent',
  'deposit.floor',
  'deposit.cap',
  'deposit.specialOrderPercent',
  'quoteValidDays',
] as const;

/** The API's property names (money in cents) → the form's fields (money in dollars). */
const serverToForm: Record<string, string> = {
  labourRateCentsPerHour: 'labourRate',
  fittingBalancingCentsPerWheel: 'fittingBalancing',
  tyreDisposalCentsPerTyre: 'tyreDisposal',
  'deposit.floorCents': 'deposit.floor',
  'deposit.capCents': 'deposit.cap',
};

export function policyFieldFor(property: string): string {
  if (serverToForm[property]) return serverToForm[property];
  // "bundleDiscount.requiresKinds[1]" belongs to the checkbox group as a whole.
  if (property.startsWith('bundleDiscount.requiresKinds')) return 'bundleDiscount.requiresKinds';
  return property;
}

export function policyValues(policy: Policy): PolicyFormValues {
  return {
    labourRate: centsToDollarsText(policy.labourRateCentsPerHour),
    pricesIncludeTax: policy.pricesIncludeTax,
    taxRatePercent: String(policy.taxRatePercent),
    taxRoundingMethod: policy.taxRoundingMethod,
    fittingBalancing: centsToDollarsText(policy.fittingBalancingCentsPerWheel),
    tyreDisposal: centsToDollarsText(policy.tyreDisposalCentsPerTyre),
    bundleDiscount: {
      enabled: policy.bundleDiscount.enabled,
      percent: String(policy.bundleDiscount.percent),
      requiresKinds: [...policy.bundleDiscount.requiresKinds],
    },
    deposit: {
      percent: String(policy.deposit.percent),
      floor: centsToDollarsText(policy.deposit.floorCents),
      cap: centsToDollarsText(policy.deposit.capCents),
      specialOrderPercent: String(policy.deposit.specialOrderPercent),
    },
    quoteValidDays: String(policy.quoteValidDays),
  };
}

function dollars(label: string, maxCents: number) {
  const max = centsToDollarsText(maxCents);
  return yup
    .string()
    .trim()
    .required(`Enter the ${label}.`)
    .matches(DOLLARS_PATTERN, 'Enter dollars and cents, like 165 or 165.50.')
    .test('max', `Use at most $${max}.`, (value) => {
      const cents = value ? dollarsTextToCents(value) : null;
      return cents === null || cents <= maxCents;
    });
}

const percent = (label: string) =>
  numberInRange({ min: 0, max: 100, unit: '%', decimals: 2 }).required(`Enter the ${label}.`);

export const policySchema = yup.object({
  labourRate: dollars('labour rate', MAX_LABOUR_RATE_CENTS_PER_HOUR),
  pricesIncludeTax: yup.boolean().required(),
  taxRatePercent: percent('tax rate'),
  taxRoundingMethod: yup
    .string()
    .oneOf(roundingOptions.map((option) => option.value))
    .required(),
  fittingBalancing: dollars('fitting and balancing price', MAX_FEE_CENTS),
  tyreDisposal: dollars('tyre disposal levy', MAX_FEE_CENTS),
  bundleDiscount: yup.object({
    enabled: yup.boolean().required(),
    percent: percent('discount'),
    requiresKinds: yup.array(yup.string().required()).when('enabled', {
      is: true,
      then: (schema) => schema.min(1, 'Choose at least one kind while the discount is on.'),
    }),
  }),
  deposit: yup.object({
    percent: percent('deposit percentage'),
    floor: dollars('smallest deposit', Number.MAX_SAFE_INTEGER),
    cap: dollars('largest deposit', Number.MAX_SAFE_INTEGER).test(
      'not-below-floor',
      'Use at least the smallest deposit.',
      function notBelowFloor(value) {
        const floor = dollarsTextToCents(String(this.parent.floor ?? ''));
        const cap = value ? dollarsTextToCents(value) : null;
        return floor === null || cap === null || cap >= floor;
      },
    ),
    specialOrderPercent: percent('special-order deposit percentage').test(
      'not-below-percent',
      'Use at least the usual deposit percentage.',
      function notBelowPercent(value) {
        const usual = Number(this.parent.percent);
        return value === undefined || Number.isNaN(usual) || value >= usual;
      },
    ),
  }),
  quoteValidDays: numberInRange({
    min: 1,
    max: MAX_QUOTE_VALID_DAYS,
    unit: 'days',
    whole: true,
  }).required('Enter how many days a quote holds its prices.'),
});

/** The whole policy as the API takes it (the values have passed the schema). */
export function policyRequest(values: PolicyFormValues): UpdatePolicyRequest {
  const cents = (text: string) => dollarsTextToCents(text) ?? 0;
  return {
    labourRateCentsPerHour: cents(values.labourRate),
    pricesIncludeTax: values.pricesIncludeTax,
    taxRatePercent: Number(values.taxRatePercent.trim()),
    taxRoundingMethod: values.taxRoundingMethod,
    fittingBalancingCentsPerWheel: cents(values.fittingBalancing),
    tyreDisposalCentsPerTyre: cents(values.tyreDisposal),
    bundleDiscount: {
      enabled: values.bundleDiscount.enabled,
      percent: Number(values.bundleDiscount.percent.trim()),
      requiresKinds: values.bundleDiscount.requiresKinds,
    },
    deposit: {
      percent: Number(values.deposit.percent.trim()),
      floorCents: cents(values.deposit.floor),
      capCents: cents(values.deposit.cap),
      specialOrderPercent: Number(values.deposit.specialOrderPercent.trim()),
    },
    quoteValidDays: Number(values.quoteValidDays.trim()),
  };
}
