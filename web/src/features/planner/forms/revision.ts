import * as yup from 'yup';
import { DOLLARS_PATTERN, dollarsTextToCents } from '@/lib/money';
import { numberInRange } from '@/lib/number-fields';
import type { RevisionItem, RevisionPreviewRequest } from '@/types/api';
import { MAX_LABOUR_MINUTES, type BuildItem, type PlannerBuild } from './build';

/** Limits of the revision's reason, as the API's ReviseQuoteDto. */
export const REASON_MIN_LENGTH = 5;
export const REASON_MAX_LENGTH = 500;
/** Most units of one product (the API's MAX_ITEM_QUANTITY). */
export const MAX_LINE_QUANTITY = 24;

/** One line of the revision as the review's form edits it (the text of its fields). */
export interface RevisionLineValues {
  productId: string;
  quantity: string;
  /** Workshop minutes per unit. */
  labourMinutes: string;
}

/** The review's form in a revision: per-line quantity and labour, the discount, the reason. */
export interface RevisionFormValues {
  lines: RevisionLineValues[];
  /** Dollars, as typed; empty for no discount. */
  discount: string;
  reason: string;
}

/** The schema mirrors ReviseQuoteDto; the server still decides (e.g. a discount above the subtotal). */
export const revisionFormSchema = yup.object({
  lines: yup
    .array(
      yup.object({
        productId: yup.string().required(),
        quantity: numberInRange({ min: 1, max: MAX_LINE_QUANTITY, whole: true }).required(
          'Enter how many.',
        ),
        labourMinutes: numberInRange({
          min: 0,
          max: MAX_LABOUR_MINUTES,
          unit: 'min',
          whole: true,
        }).required('Enter the minutes per unit (0 for none).'),
      }),
    )
    .min(1, 'A quote needs at least one product.')
    .required(),
  discount: yup.string().trim().matches(DOLLARS_PATTERN, {
    message: 'Enter dollars and cents, like 50 or 49.95.',
    excludeEmptyString: true,
  }),
  reason: yup
    .string()
    .trim()
    .required('Say why the quote is revised; the customer reads it.')
    .min(REASON_MIN_LENGTH, `Use at least ${REASON_MIN_LENGTH} characters.`)
    .max(REASON_MAX_LENGTH, `Use at most ${REASON_MAX_LENGTH} characters.`),
});

/** The product lines in the order the form (and the request) lists them: by product id. */
export function revisionLines(items: readonly BuildItem[]): BuildItem[] {
  return [...items].sort((a, b) => a.productId.localeCompare(b.productId));
}

/** Per-unit minutes a line starts from: the desk's override, else the saved (or catalogue) value. */
export function labourMinutesOf(build: PlannerBuild, item: BuildItem): number {
  return build.revision?.labourOverrides[item.productId] ?? item.labourMinutes ?? 0;
}

export function revisionFormValues(build: PlannerBuild): RevisionFormValues {
  return {
    lines: revisionLines(build.items).map((item) => ({
      productId: item.productId,
      quantity: String(item.quantity),
      labourMinutes: String(labourMinutesOf(build, item)),
    })),
    discount: build.revision?.discountText ?? '',
    reason: build.revision?.reason ?? '',
  };
}

function wholeNumber(text: string): number | null {
  const trimmed = text.trim();
  return /^\d+$/.test(trimmed) ? Number(trimmed) : null;
}

/**
 * The request for the preview and for saving, from the build and the form. Lines keep the form's
 * order, so a server error on "items[2].quantity" belongs to the form's "lines[2].quantity".
 * A labour figure is sent only where the desk changed it from the saved value; a line whose
 * text is not a number yet keeps the value it had. `reason` is left out when empty (the preview
 * does not need one).
 */
export function toRevisionRequest(
  build: PlannerBuild,
  values: RevisionFormValues,
): RevisionPreviewRequest | null {
  if (!build.vehicleModelId) return null;
  const byId = new Map(build.items.map((item) => [item.productId, item]));
  const items: RevisionItem[] = [];
  for (const line of values.lines) {
    const item = byId.get(line.productId);
    if (!item) continue;
    const quantity = wholeNumber(line.quantity) ?? item.quantity;
    const minutes = wholeNumber(line.labourMinutes);
    const saved = item.labourMinutes ?? null;
    items.push({
      productId: item.productId,
      quantity,
      ...(minutes !== null && minutes !== saved ? { labourMinutes: minutes } : {}),
    });
  }
  const discountCents = dollarsTextToCents(values.discount);
  const reason = values.reason.trim();
  return {
    vehicleModelId: build.vehicleModelId,
    ...(build.customerVehicleId ? { customerVehicleId: build.customerVehicleId } : {}),
    ...(build.year !== null ? { vehicleYear: build.year } : {}),
    uses: build.uses,
    constantLoadKg: build.constantLoadKg,
    items,
    ...(discountCents !== null && discountCents > 0 ? { discountCents } : {}),
    ...(reason ? { reason } : {}),
  };
}

/**
 * Where the server's field error lands on the form: "items[2].labourMinutes" on
 * "lines[2].labourMinutes", "discountCents" on the discount; other fields stay where they are.
 */
export function revisionFieldName(property: string): string | null {
  const item = /^items\[(\d+)\]\.(quantity|labourMinutes)$/.exec(property);
  if (item) return `lines[${item[1]}].${item[2]}`;
  if (property === 'discountCents') return 'discount';
  if (property === 'reason') return 'reason';
  return null;
}

/** Form field names the server's errors may land on (for applyApiErrorToForm). */
export function revisionFieldNames(values: RevisionFormValues): string[] {
  return [
    ...values.lines.flatMap((_line, index) => [
      `lines[${index}].quantity`,
      `lines[${index}].labourMinutes`,
    ]),
    'discount',
    'reason',
  ];
}

/**
 * The desk's terms as the build keeps them between steps and reloads: labour only where it
 * differs from the saved value, texts as typed.
 */
export function revisionTermsFrom(
  build: PlannerBuild,
  values: RevisionFormValues,
): { labourOverrides: Record<string, number>; discountText: string; reason: string } {
  const labourOverrides: Record<string, number> = {};
  for (const line of values.lines) {
    const item = build.items.find((candidate) => candidate.productId === line.productId);
    const minutes = wholeNumber(line.labourMinutes);
    if (
      item &&
      minutes !== null &&
      minutes <= MAX_LABOUR_MINUTES &&
      minutes !== item.labourMinutes
    ) {
      labourOverrides[line.productId] = minutes;
    }
  }
  return { labourOverrides, discountText: values.discount, reason: values.reason };
}
