import { EntityManager } from '@mikro-orm/postgresql';
import { BadRequestException, Injectable } from '@nestjs/common';
import { readCsvRow, readCsvRows, writeCatalogueCsv } from './catalogue-csv';
import type {
  FieldChangeResponse,
  ImportApplyResponse,
  ImportPreviewResponse,
  ImportRowResponse,
  ImportSummaryResponse,
} from './dto/catalogue-import.response';
import { Product, type ProductFields } from './entities/product.entity';
import { sameJson } from '../common/same-json';

interface ImportPlan extends ImportPreviewResponse {
  writes: Array<{ fields: ProductFields; existing: Product | null }>;
}

/** Fields a price-list row sets, in the order changes are listed. */
const COMPARED_FIELDS: Array<keyof ProductFields> = [
  'kind',
  'name',
  'brand',
  'priceCents',
  'labourMinutes',
  'bayKind',
  'stockQty',
  'leadDays',
  'active',
  'attributes',
];

/** How many row reasons a "no valid rows" refusal quotes. */
const QUOTED_REASONS = 5;

function changesBetween(
  existing: ProductFields,
  incoming: ProductFields,
): Record<string, FieldChangeResponse> {
  const changes: Record<string, FieldChangeResponse> = {};
  for (const field of COMPARED_FIELDS) {
    if (!sameJson(existing[field], incoming[field])) {
      changes[field] = { from: existing[field], to: incoming[field] };
    }
  }
  return changes;
}

@Injectable()
export class CatalogueImportService {
  constructor(private readonly em: EntityManager) {}

  /** What the file would change; writes nothing. */
  async preview(content: Buffer): Promise<ImportPreviewResponse> {
    const { summary, rows } = await this.plan(this.em, content);
    return { summary, rows };
  }

  /**
   * Writes every new and updated row in one transaction, planned inside it with the same checks
   * as the preview: all rows or none.
   */
  async apply(content: Buffer): Promise<ImportApplyResponse> {
    return this.em.transactional(async (em) => {
      const plan = await this.plan(em, content);
      for (const write of plan.writes) {
        if (write.existing) write.existing.assignFields(write.fields);
        else em.persist(new Product(write.fields));
      }
      await em.flush();
      return { summary: plan.summary, rows: plan.rows };
    });
  }

  async exportCsv(): Promise<string> {
    const products = await this.em.find(Product, {}, { orderBy: { sku: 'asc' } });
    return writeCatalogueCsv(products);
  }

  /** The one validation path of preview and apply. Throws 400 when the file cannot be used. */
  private async plan(em: EntityManager, content: Buffer): Promise<ImportPlan> {
    const csvRows = readCsvRows(content);
    const readings = csvRows.map((row) => ({ row, reading: readCsvRow(row) }));
    const skus = readings.flatMap(({ reading }) => (reading.ok ? [reading.fields.sku] : []));
    const existing = new Map(
      (skus.length > 0 ? await em.find(Product, { sku: { $in: skus } }) : []).map((product) => [
        product.sku,
        product,
      ]),
    );

    const summary: ImportSummaryResponse = { new: 0, updated: 0, unchanged: 0, rejected: 0 };
    const rows: ImportRowResponse[] = [];
    const writes: ImportPlan['writes'] = [];
    const firstLineOfSku = new Map<string, number>();
    for (const { row, reading } of readings) {
      const sku = row.values.sku;
      if (!reading.ok) {
        summary.rejected += 1;
        rows.push({ line: row.line, sku, status: 'rejected', reason: reading.reason });
        continue;
      }
      const earlierLine = firstLineOfSku.get(reading.fields.sku);
      if (earlierLine !== undefined) {
        summary.rejected += 1;
        rows.push({
          line: row.line,
          sku,
          status: 'rejected',
          reason: `sku ${reading.fields.sku} is already on line ${earlierLine}`,
        });
        continue;
      }
      firstLineOfSku.set(reading.fields.sku, row.line);
      const stored = existing.get(reading.fields.sku) ?? null;
      if (!stored) {
        summary.new += 1;
        rows.push({ line: row.line, sku, status: 'new' });
        writes.push({ fields: reading.fields, existing: null });
        continue;
      }
      const changes = changesBetween(stored.fields(), reading.fields);
      if (Object.keys(changes).length === 0) {
        summary.unchanged += 1;
        rows.push({ line: row.line, sku, status: 'unchanged' });
      } else {
        summary.updated += 1;
        rows.push({ line: row.line, sku, status: 'updated', changes });
        writes.push({ fields: reading.fields, existing: stored });
      }
    }

    if (summary.rejected === rows.length) {
      const quoted = rows
        .slice(0, QUOTED_REASONS)
        .map((row) => `line ${row.line}${row.sku ? ` (${row.sku})` : ''}: ${row.reason}`)
        .join('; ');
      const more = rows.length > QUOTED_REASONS ? `; and ${rows.length - QUOTED_REASONS} more` : '';
      throw new BadRequestException(
        `No row of the file can be imported, so nothing was changed. ${quoted}${more}`,
      );
    }
    return { summary, rows, writes };
  }
}
