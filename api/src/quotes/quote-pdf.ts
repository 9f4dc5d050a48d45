/**
 * The printable quote (pdfkit): the workshop's card, the quote and its dates, the customer and
 * vehicle, every priced line, the totals with GST, deposit and balance, the rounding note, the
 * fit report's verdict and findings, and the cautions. Everything comes from the version's
 * snapshot, so a later catalogue or policy change does not alter it. Roboto (from
 * @fontsource/roboto, SIL Open Font License) is embedded so −, ×, – and ° print as written.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type { FitReport, FitVerdict } from '../fitment/fitment.types';
import { formatCents } from '../pricing/cents';
import type { PackagePrice, PricedLine } from '../pricing/pricing.types';
import { longDate } from '../workshop/workshop-time';
import type { QuoteVersionState } from './quote-states';

export interface QuotePdfInput {
  card: { name: string; addressLine: string; town: string; phone: string; email: string };
  reference: string;
  versionNumber: number;
  /** The effective state (expired, superseded ... are printed; sent and accepted are not). */
  state: QuoteVersionState;
  /** Workshop-local issue date, YYYY-MM-DD. */
  issuedOn: string;
  validUntilDate: string;
  customer: { name: string; email: string };
  vehicle: { name: string; year: number | null; rego: string | null; nickname: string | null };
  revisionReason: string | null;
  price: PackagePrice;
  fitReport: FitReport;
  /** The version's creation instant (the document's metadata). */
  createdAt: Date;
}

/** Our own closing caution, printed under the fit report's. */
export const LOCAL_RULES_CAUTION =
  'Check the rules that apply where you drive, and have a lifted vehicle inspected by a licensed professional before it goes back on the road. This quote is a price and a guide, not a certificate of compliance.';

const VERDICT_WORDS: Record<FitVerdict, string> = {
  ok: 'Fits',
  advisory: 'Fits, with advice',
  'needs-certification': "Needs an engineer's certificate",
  'does-not-fit': 'Does not fit',
};

const STATE_NOTES: Partial<Record<QuoteVersionState, string>> = {
  draft: 'DRAFT: not yet sent by the workshop',
  expired: 'EXPIRED: these prices no longer hold',
  superseded: 'SUPERSEDED: a newer version of this quote replaces it',
  declined: 'DECLINED',
  accepted: 'ACCEPTED',
};

const requireFromHere = createRequire(__filename);
let fonts: { regular: Buffer; bold: Buffer } | null = null;

/** The two Roboto faces, read once (immutable files: safe to keep in memory). */
function robotoFonts(): { regular: Buffer; bold: Buffer } {
  fonts ??= {
    regular: readFileSync(
      requireFromHere.resolve('@fontsource/roboto/files/roboto-latin-400-normal.woff'),
    ),
    bold: readFileSync(
      requireFromHere.resolve('@fontsource/roboto/files/roboto-latin-700-normal.woff'),
    ),
  };
  return fonts;
}

/**
 * The shipped Roboto faces are the Latin subset: characters outside it would print as empty
 * boxes. The report's messages use a few of them; they are written out in words here.
 */
const OUTSIDE_LATIN_SUBSET: ReadonlyArray<[RegExp, string]> = [
  [/\s*→\s*/g, ' to '],
  [/≤\s*/g, 'at most '],
  [/≥\s*/g, 'at least '],
  [/≈\s*/g, 'about '],
];

export function printable(text: string): string {
  return OUTSIDE_LATIN_SUBSET.reduce(
    (result, [pattern, words]) => result.replace(pattern, words),
    text,
  );
}

const MARGIN = 50;
const FOOTER_SPACE = 30;
const COLUMNS = { description: 290, quantity: 60, unit: 70, amount: 75 };
const GAP = 5;

function quantityText(line: PricedLine): string {
  switch (line.kind) {
    case 'labour':
      return `${line.labourMinutes} min`;
    case 'bundle-discount':
    case 'workshop-discount':
      return '';
    default:
      return String(line.quantity);
  }
}

function unitText(line: PricedLine): string {
  switch (line.kind) {
    case 'labour':
      return `${formatCents(line.labourRateCentsPerHour)}/h`;
    case 'bundle-discount':
      return `${line.percent} %`;
    case 'workshop-discount':
      return '';
    default:
      return formatCents(line.unitPriceCents);
  }
}

/** Renders the quote version; resolves with the PDF bytes. */
export function renderQuotePdf(input: QuotePdfInput): Promise<Buffer> {
  const { regular, bold } = robotoFonts();
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    bufferPages: true,
    info: {
      Title: `Quote ${input.reference}, version ${input.versionNumber}`,
      Author: input.card.name,
      Subject: `Quote for ${input.customer.name}`,
      CreationDate: input.createdAt,
    },
  });
  doc.registerFont('body', regular);
  doc.registerFont('bold', bold);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const width = doc.page.width - 2 * MARGIN;
  const bottom = () => doc.page.height - MARGIN - FOOTER_SPACE;
  const ensureSpace = (height: number) => {
    if (doc.y + height > bottom()) doc.addPage();
  };
  const heading = (text: string) => {
    ensureSpace(40);
    doc.moveDown(0.8).font('bold').fontSize(12).text(text, MARGIN, doc.y, { width });
    doc.moveDown(0.2).font('body').fontSize(10);
  };
  const paragraph = (raw: string, size = 10) => {
    const text = printable(raw);
    doc.font('body').fontSize(size);
    ensureSpace(doc.heightOfString(text, { width }) + 2);
    doc.text(text, MARGIN, doc.y, { width });
  };

  // The workshop's card.
  doc.font('bold').fontSize(18).text(input.card.name, MARGIN, MARGIN, { width });
  doc.font('body').fontSize(10);
  doc.text(`${input.card.addressLine}, ${input.card.town}`, { width });
  doc.text(`Phone ${input.card.phone} · ${input.card.email}`, { width });

  // The quote.
  doc.moveDown(1).font('bold').fontSize(15);
  doc.text(`Quote ${input.reference}, version ${input.versionNumber}`, { width });
  doc.font('body').fontSize(10);
  doc.text(
    `Issued ${longDate(input.issuedOn)} · Prices valid until ${longDate(input.validUntilDate)}`,
    { width },
  );
  const stateNote = STATE_NOTES[input.state];
  if (stateNote) doc.font('bold').text(stateNote, { width }).font('body');
  if (input.revisionReason) doc.text(`Revised: ${input.revisionReason}`, { width });

  doc.moveDown(0.6);
  doc.text(`Customer: ${input.customer.name} (${input.customer.email})`, { width });
  const vehicleParts = [
    input.vehicle.name,
    input.vehicle.year !== null ? String(input.vehicle.year) : null,
    input.vehicle.rego ? `rego ${input.vehicle.rego}` : null,
    input.vehicle.nickname ? `“${input.vehicle.nickname}”` : null,
  ].filter((part): part is string => part !== null);
  doc.text(`Vehicle: ${vehicleParts.join(', ')}`, { width });

  // The priced lines.
  heading('Parts, labour and charges');
  const x = {
    description: MARGIN,
    quantity: MARGIN + COLUMNS.description + GAP,
    unit: MARGIN + COLUMNS.description + COLUMNS.quantity + 2 * GAP,
    amount: MARGIN + COLUMNS.description + COLUMNS.quantity + COLUMNS.unit + 3 * GAP,
  };
  const row = (
    cells: { description: string; quantity: string; unit: string; amount: string },
    font: 'body' | 'bold' = 'body',
  ) => {
    doc.font(font).fontSize(10);
    const height = Math.max(
      doc.heightOfString(printable(cells.description), { width: COLUMNS.description }),
      doc.heightOfString(cells.unit, { width: COLUMNS.unit }),
    );
    ensureSpace(height + 4);
    const y = doc.y;
    doc.text(printable(cells.description), x.description, y, { width: COLUMNS.description });
    doc.text(cells.quantity, x.quantity, y, { width: COLUMNS.quantity, align: 'right' });
    doc.text(cells.unit, x.unit, y, { width: COLUMNS.unit, align: 'right' });
    doc.text(cells.amount, x.amount, y, { width: COLUMNS.amount, align: 'right' });
    doc.x = MARGIN;
    doc.y = y + height + 4;
  };
  row({ description: 'Description', quantity: 'Qty', unit: 'Unit', amount: 'Amount' }, 'bold');
  for (const line of input.price.lines) {
    row({
      description: line.description,
      quantity: quantityText(line),
      unit: unitText(line),
      amount: formatCents(line.amountCents),
    });
  }

  // The totals.
  const price = input.price;
  doc.moveDown(0.5);
  const total = (label: string, amountCents: number, font: 'body' | 'bold' = 'body') =>
    row({ description: label, quantity: '', unit: '', amount: formatCents(amountCents) }, font);
  if (price.pricesIncludeTax) {
    total('Subtotal', price.subtotalCents);
    total('Total', price.totalCents, 'bold');
    paragraph(`Includes GST of ${formatCents(price.taxCents)}.`);
    doc.moveDown(0.3);
  } else {
    total('Subtotal (excluding GST)', price.subtotalCents);
    total(`GST at ${price.taxRatePercent} %`, price.taxCents);
    total('Total', price.totalCents, 'bold');
  }
  total(
    `Deposit to book${price.deposit.specialOrder ? ' (special-order parts)' : ''}`,
    price.depositCents,
    'bold',
  );
  total('Balance due on completion', price.balanceDueCents);
  doc.moveDown(0.4);
  paragraph(price.roundingNote, 8.5);

  // The fit report.
  const report = input.fitReport;
  heading(`Fit report: ${VERDICT_WORDS[report.verdict]}`);
  paragraph(`Checked against the rule set "${report.ruleSetName}".`);
  const findings = report.checks.filter((check) => check.verdict !== 'ok');
  if (findings.length === 0) {
    paragraph('Every check passed.');
  } else {
    for (const check of findings) paragraph(`• ${VERDICT_WORDS[check.verdict]}: ${check.message}`);
  }
  const required = report.suggestedAdditions.filter((addition) => addition.required);
  if (required.length > 0) {
    doc.moveDown(0.3);
    paragraph('The package needs:');
    for (const addition of required) paragraph(`• ${addition.reason}`);
  }

  // The cautions.
  heading('Cautions');
  for (const caution of report.cautions) paragraph(`• ${caution.message}`);
  paragraph(`• ${LOCAL_RULES_CAUTION}`);

  // Page numbers, once every page exists (the bottom margin is lifted so pdfkit adds no page).
  const range = doc.bufferedPageRange();
  for (let index = range.start; index < range.start + range.count; index += 1) {
    doc.switchToPage(index);
    const savedBottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc
      .font('body')
      .fontSize(8)
      .text(
        `${input.reference} v${input.versionNumber} · Page ${index - range.start + 1} of ${range.count}`,
        MARGIN,
        doc.page.height - MARGIN,
        { width, align: 'right', lineBreak: false },
      );
    doc.page.margins.bottom = savedBottom;
  }
  doc.end();
  return finished;
}
