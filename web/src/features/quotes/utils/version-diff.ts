import type { BayKind, PackagePrice, ProductKind, QuoteLine, QuoteVersion } from '@/types/api';

/** How one product line differs between two versions of a quote. */
export type LineChange = 'added' | 'removed' | 'changed' | 'unchanged';

/** What a line of one version holds, as compared. */
export interface LineFigures {
  quantity: number;
  unitPriceCents: number;
  /** Workshop minutes per unit. */
  labourMinutes: number;
  /** What the line costs in that version's price (its priced part or service line). */
  amountCents: number;
}

/** Which figures of a line changed. */
export type LineField = 'quantity' | 'unitPriceCents' | 'labourMinutes' | 'amountCents';

export interface LineDiff {
  /** The product's id, or its SKU when the product has been deleted since. */
  key: string;
  name: string;
  brand: string;
  kind: ProductKind;
  change: LineChange;
  before: LineFigures | null;
  after: LineFigures | null;
  /** For a changed line: which figures differ (empty otherwise). */
  changedFields: LineField[];
}

/** A total of the two versions: money in cents, time in minutes. */
export interface TotalDiff {
  key:
    | 'subtotal'
    | 'bundle-discount'
    | 'workshop-discount'
    | 'total'
    | 'deposit'
    | 'balance'
    | 'labour'
    | 'workshop-time';
  unit: 'cents' | 'minutes';
  before: number;
  after: number;
  /** after − before. */
  difference: number;
}

export interface VersionDiff {
  lines: LineDiff[];
  totals: TotalDiff[];
  /** Workshop minutes by bay kind in each version (the time the job books). */
  bayMinutes: { bayKind: BayKind | 'unassigned'; before: number; after: number }[];
  /** True when any line was added, removed or changed. */
  linesChanged: boolean;
}

function lineKey(line: QuoteLine): string {
  return line.productId ?? `sku:${line.sku}`;
}

/** The amount the version's price charges for a product line (its part or service line). */
function amountOf(price: PackagePrice, line: QuoteLine): number {
  if (line.productId !== null) {
    const priced = price.lines.find(
      (candidate) =>
        (candidate.kind === 'part' || candidate.kind === 'service') &&
        candidate.productId === line.productId,
    );
    if (priced) return priced.amountCents;
  }
  return line.unitPriceCents * line.quantity;
}

function figuresOf(version: QuoteVersion, line: QuoteLine): LineFigures {
  return {
    quantity: line.quantity,
    unitPriceCents: line.unitPriceCents,
    labourMinutes: line.labourMinutes,
    amountCents: amountOf(version.price, line),
  };
}

const lineFields: readonly LineField[] = [
  'quantity',
  'unitPriceCents',
  'labourMinutes',
  'amountCents',
];

/** Labour minutes the price charges (the fitting time of the parts). */
export function labourMinutesCharged(price: PackagePrice): number {
  return price.lines.reduce(
    (sum, line) => sum + (line.kind === 'labour' ? (line.labourMinutes ?? 0) : 0),
    0,
  );
}

/** Workshop minutes of a version: quantity × minutes per unit of every line, by bay kind. */
function minutesByBay(version: QuoteVersion): Map<BayKind | 'unassigned', number> {
  const minutes = new Map<BayKind | 'unassigned', number>();
  for (const line of version.lines) {
    const bay = line.bayKind ?? 'unassigned';
    const add = line.quantity * line.labourMinutes;
    if (add > 0) minutes.set(bay, (minutes.get(bay) ?? 0) + add);
  }
  return minutes;
}

function total(
  key: TotalDiff['key'],
  unit: TotalDiff['unit'],
  before: number,
  after: number,
): TotalDiff {
  return { key, unit, before, after, difference: after - before };
}

/**
 * What changed from one version of a quote to another: each product line added, removed or
 * changed (quantity, unit price, labour per unit, amount), the totals and deposit, the labour
 * charged and the workshop time by bay kind. Lines are listed in the newer version's order,
 * removed ones after them in the older version's order.
 */
export function diffVersions(before: QuoteVersion, after: QuoteVersion): VersionDiff {
  const beforeLines = [...before.lines].sort((a, b) => a.position - b.position);
  const afterLines = [...after.lines].sort((a, b) => a.position - b.position);
  const beforeByKey = new Map(beforeLines.map((line) => [lineKey(line), line]));
  const afterKeys = new Set(afterLines.map(lineKey));

  const lines: LineDiff[] = afterLines.map((line) => {
    const old = beforeByKey.get(lineKey(line));
    const now = figuresOf(after, line);
    if (!old) {
      return {
        key: lineKey(line),
        name: line.name,
        brand: line.brand,
        kind: line.kind,
        change: 'added',
        before: null,
        after: now,
        changedFields: [],
      };
    }
    const was = figuresOf(before, old);
    const changedFields = lineFields.filter((field) => was[field] !== now[field]);
    return {
      key: lineKey(line),
      name: line.name,
      brand: line.brand,
      kind: line.kind,
      change: changedFields.length > 0 ? 'changed' : 'unchanged',
      before: was,
      after: now,
      changedFields,
    };
  });
  for (const line of beforeLines) {
    if (afterKeys.has(lineKey(line))) continue;
    lines.push({
      key: lineKey(line),
      name: line.name,
      brand: line.brand,
      kind: line.kind,
      change: 'removed',
      before: figuresOf(before, line),
      after: null,
      changedFields: [],
    });
  }

  const workshopBefore = [...minutesByBay(before).values()].reduce((a, b) => a + b, 0);
  const workshopAfter = [...minutesByBay(after).values()].reduce((a, b) => a + b, 0);
  const totals: TotalDiff[] = [
    total('subtotal', 'cents', before.price.subtotalCents, after.price.subtotalCents),
    total(
      'bundle-discount',
      'cents',
      before.price.breakdown.bundleDiscountCents,
      after.price.breakdown.bundleDiscountCents,
    ),
    total(
      'workshop-discount',
      'cents',
      before.price.breakdown.workshopDiscountCents,
      after.price.breakdown.workshopDiscountCents,
    ),
    total('total', 'cents', before.price.totalCents, after.price.totalCents),
    total('deposit', 'cents', before.price.depositCents, after.price.depositCents),
    total('balance', 'cents', before.price.balanceDueCents, after.price.balanceDueCents),
    total(
      'labour',
      'minutes',
      labourMinutesCharged(before.price),
      labourMinutesCharged(after.price),
    ),
    total('workshop-time', 'minutes', workshopBefore, workshopAfter),
  ];

  const beforeBays = minutesByBay(before);
  const afterBays = minutesByBay(after);
  const bayKinds = [...new Set([...beforeBays.keys(), ...afterBays.keys()])].sort();
  const bayMinutes = bayKinds.map((bayKind) => ({
    bayKind,
    before: beforeBays.get(bayKind) ?? 0,
    after: afterBays.get(bayKind) ?? 0,
  }));

  return {
    lines,
    totals,
    bayMinutes,
    linesChanged: lines.some((line) => line.change !== 'unchanged'),
  };
}

/**
 * The version a revision replaced: the highest-numbered version below `versionNumber`, or null
 * for the first version.
 */
export function previousVersion(
  versions: readonly QuoteVersion[],
  versionNumber: number,
): QuoteVersion | null {
  return (
    [...versions]
      .filter((version) => version.number < versionNumber)
      .sort((a, b) => b.number - a.number)[0] ?? null
  );
}
