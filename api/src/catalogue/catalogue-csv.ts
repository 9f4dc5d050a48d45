/**
 * The catalogue price list as CSV: reading an uploaded file (content checks, header, rows) and
 * writing the export. Pure functions; the import service adds the database.
 */
import { BadRequestException } from '@nestjs/common';
import { CsvError } from 'csv-parse';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import type { FieldErrors } from '../common/errors/field-errors.exception';
import type { Product, ProductFields } from './entities/product.entity';
import { formatCentsAsDollars, parseDollarsToCents } from './money';
import { validateProductAttributes } from './product-attributes';
import { isProductKind } from './product-kinds';
import { validateProductFields } from './product-validation';

/** The columns, in export order. Every one must be present in an imported file. */
export const CSV_COLUMNS = [
  'sku',
  'kind',
  'name',
  'brand',
  'price',
  'labour_minutes',
  'bay_kind',
  'stock_qty',
  'lead_days',
  'active',
  'attributes',
] as const;
export type CsvColumn = (typeof CSV_COLUMNS)[number];

/** Largest upload, bytes (1 MB). */
export const CSV_MAX_BYTES = 1024 * 1024;

/** Product field → the CSV column it comes from (for row reasons). */
const COLUMN_OF_FIELD: Record<string, CsvColumn> = {
  sku: 'sku',
  kind: 'kind',
  name: 'name',
  brand: 'brand',
  priceCents: 'price',
  labourMinutes: 'labour_minutes',
  bayKind: 'bay_kind',
  stockQty: 'stock_qty',
  leadDays: 'lead_days',
  active: 'active',
  attributes: 'attributes',
};

export interface CsvRow {
  /** Line of the file on which the row ends (1 is the header). */
  line: number;
  values: Record<CsvColumn, string>;
  /** Set when the row has more or fewer fields than the header. */
  shapeProblem: string | null;
}

export type CsvRowReading = { ok: true; fields: ProductFields } | { ok: false; reason: string };

/** Tab, line feed and carriage return are text; other C0 controls and DEL mean binary data. */
function holdsBinaryControls(text: string): boolean {
  for (let index = 0; index < text.length; index += 1) {
    const code = text.charCodeAt(index);
    if ((code < 0x20 && code !== 0x09 && code !== 0x0a && code !== 0x0d) || code === 0x7f) {
      return true;
    }
  }
  return false;
}

function refused(message: string): BadRequestException {
  return new BadRequestException(message);
}

/**
 * The rows of an uploaded price list. Checks the content, not the declared type or name: UTF-8
 * text without binary control characters, that parses as CSV, whose first row names every
 * column. Throws 400 with the reason otherwise.
 */
export function readCsvRows(content: Buffer): CsvRow[] {
  if (content.length === 0) throw refused('The file is empty.');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(content);
  } catch {
    throw refused('The file is not a CSV price list: it is not UTF-8 text.');
  }
  if (holdsBinaryControls(text)) {
    throw refused('The file is not a CSV price list: it holds binary data.');
  }
  let records: Array<{ info: { lines: number }; record: string[] }>;
  try {
    records = parse(text, {
      bom: true,
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
      trim: true,
    }) as unknown as Array<{ info: { lines: number }; record: string[] }>;
  } catch (error) {
    const detail = error instanceof CsvError ? error.message : 'it could not be read';
    throw refused(`The file is not a valid CSV: ${detail}`);
  }
  if (records.length === 0) throw refused('The file is empty.');

  const header = records[0].record.map((name) => name.trim().toLowerCase());
  const seen = new Set<string>();
  for (const name of header) {
    if (name !== '' && seen.has(name)) throw refused(`The column "${name}" appears twice.`);
    seen.add(name);
  }
  const missing = CSV_COLUMNS.filter((column) => !seen.has(column));
  if (missing.length > 0) {
    throw refused(
      `The file is missing the column${missing.length === 1 ? '' : 's'} ${missing.join(', ')}. The first row must name the columns ${CSV_COLUMNS.join(',')}.`,
    );
  }
  const rows = records.slice(1);
  if (rows.length === 0) throw refused('The file has no product rows under the header.');
  return rows.map(({ info, record }) => {
    const values = {} as Record<CsvColumn, string>;
    for (const column of CSV_COLUMNS) values[column] = record[header.indexOf(column)] ?? '';
    return {
      line: info.lines,
      values,
      shapeProblem:
        record.length === header.length
          ? null
          : `has ${record.length} fields but the header names ${header.length}`,
    };
  });
}

function wholeNumber(text: string): number | null {
  return /^\d{1,9}$/.test(text.trim()) ? Number(text.trim()) : null;
}

/** A row's text converted and validated exactly as POST /api/products validates a product. */
export function readCsvRow(row: CsvRow): CsvRowReading {
  if (row.shapeProblem !== null) return { ok: false, reason: row.shapeProblem };
  const { values } = row;
  if (values.kind !== '' && !isProductKind(values.kind)) {
    return { ok: false, reason: `unknown kind '${values.kind}'` };
  }
  const problems: string[] = [];
  const candidate: Record<string, unknown> = {
    sku: values.sku,
    kind: values.kind,
    name: values.name,
    brand: values.brand,
    bayKind: values.bay_kind === '' ? null : values.bay_kind,
  };

  const price = parseDollarsToCents(values.price);
  if (price.ok) candidate.priceCents = price.cents;
  else problems.push(`price ${price.reason}`);

  for (const [column, field] of [
    ['labour_minutes', 'labourMinutes'],
    ['stock_qty', 'stockQty'],
    ['lead_days', 'leadDays'],
  ] as const) {
    const number = wholeNumber(values[column]);
    if (number === null) problems.push(`${column} must be a whole number of 0 or more`);
    else candidate[field] = number;
  }

  const active = values.active.toLowerCase();
  if (active === 'true' || active === 'false') candidate.active = active === 'true';
  else problems.push('active must be true or false');

  try {
    candidate.attributes = JSON.parse(values.attributes) as unknown;
  } catch {
    problems.push('attributes is not valid JSON (e.g. {"role":"alignment","perWheel":false})');
  }

  const validation = validateProductFields(candidate);
  if (!validation.ok) problems.push(...reasonsOf(validation.fieldErrors, candidate));
  if (problems.length > 0 || !validation.ok) return { ok: false, reason: problems.join('; ') };
  return { ok: true, fields: validation.fields };
}

/** Field errors as row reasons named by column ("price ...", "attributes.offsetMm ..."). */
function reasonsOf(fieldErrors: FieldErrors, candidate: Record<string, unknown>): string[] {
  const reasons: string[] = [];
  for (const [field, messages] of Object.entries(fieldErrors)) {
    const [head, ...rest] = field.split('.');
    // A value that could not be converted is already reported by its column.
    if (!(head in candidate)) continue;
    const column = [COLUMN_OF_FIELD[head] ?? head, ...rest].join('.');
    for (const message of messages) reasons.push(`${column} ${message}`);
  }
  return reasons;
}

/** The attributes as written to the export: the canonical key order of their kind. */
function exportedAttributes(product: Product): string {
  const canonical = validateProductAttributes(product.kind, product.attributes);
  return JSON.stringify(canonical.ok ? canonical.attributes : product.attributes);
}

/** The price list as CSV text, in the import's columns (it imports back as all "unchanged"). */
export function writeCatalogueCsv(products: Product[]): string {
  return stringify(
    products.map((product) => ({
      sku: product.sku,
      kind: product.kind,
      name: product.name,
      brand: product.brand,
      price: formatCentsAsDollars(product.priceCents),
      labour_minutes: String(product.labourMinutes),
      bay_kind: product.bayKind ?? '',
      stock_qty: String(product.stockQty),
      lead_days: String(product.leadDays),
      active: product.active ? 'true' : 'false',
      attributes: exportedAttributes(product),
    })),
    { header: true, columns: [...CSV_COLUMNS] },
  );
}
