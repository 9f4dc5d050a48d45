import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { productsSnapshot, uniqueSku } from './support/catalogue';
import { signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

const HEADER =
  'sku,kind,name,brand,price,labour_minutes,bay_kind,stock_qty,lead_days,active,attributes';

interface ImportAnswer {
  summary: { new: number; updated: number; unchanged: number; rejected: number };
  rows: Array<{
    line: number;
    sku: string;
    status: string;
    reason?: string;
    changes?: Record<string, { from: unknown; to: unknown }>;
  }>;
}

/** One CSV field, quoted when it holds a comma, quote or line break. */
function field(value: string): string {
  return /[",\n\r]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

function csv(rows: string[][]): Buffer {
  return Buffer.from([HEADER, ...rows.map((row) => row.map(field).join(','))].join('\n') + '\n');
}

const SERVICE_ATTRIBUTES = JSON.stringify({ role: 'fitting-balancing', perWheel: true });

describe('catalogue CSV import and export (HTTP, manager)', () => {
  let testApp: TestApp;
  let manager: Session;

  beforeAll(async () => {
    testApp = await startTestApp();
    manager = await signInAs(testApp, 'manager');
  });

  afterAll(async () => {
    await testApp.close();
  });

  const upload = (
    step: 'preview' | 'apply',
    content: Buffer,
    filename = 'prices.csv',
    contentType = 'text/csv',
  ) =>
    manager.agent
      .post(`/api/catalogue/import/${step}`)
      .set('x-csrf-token', manager.csrfToken)
      .attach('file', content, { filename, contentType });

  const exported = async (): Promise<string> => {
    const response = await manager.agent.get('/api/catalogue/export.csv').expect(200);
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(response.headers['content-disposition']).toMatch(/attachment; filename=".+\.csv"/);
    return response.text;
  };

  /** A seeded row as the export writes it, to edit into an import file. */
  const exportedRow = async (sku: string): Promise<string[]> => {
    const records = parse(await exported()) as string[][];
    const row = records.find((record) => record[0] === sku);
    if (!row) throw new Error(`${sku} is not in the export`);
    return row;
  };

  describe('export', () => {
    it('writes every product in the import columns, prices in dollars', async () => {
      const records = parse(await exported()) as string[][];
      expect(records[0].join(',')).toBe(HEADER);
      const count = Number((await testApp.db.query('select count(*) from product')).rows[0].count);
      expect(records.length - 1).toBe(count);
      const kit = records.find((record) => record[0] === 'BR-STR-50-M');
      expect(kit).toEqual([
        'BR-STR-50-M',
        'suspension-kit',
        'Strata 50 mm lift kit, medium load (150–300 kg)',
        'Bramblerock',
        '1745.00',
        '270',
        'hoist',
        '2',
        '0',
        'true',
        '{"frontLiftMm":50,"rearLiftMm":50,"constantLoadMinKg":150,"constantLoadMaxKg":300,"keepsTwoThirdsTravel":true,"includesGreasableShackles":false,"includesExtendedBrakeLines":false}',
      ]);
      expect(records.find((record) => record[0] === 'KW-SVC-DISPOSAL')?.slice(4, 7)).toEqual([
        '6.50',
        '0',
        '',
      ]);
    });

    it('imports back as all unchanged, and applying it writes nothing', async () => {
      const file = Buffer.from(await exported());
      const preview = await upload('preview', file).expect(200);
      const body = preview.body as ImportAnswer;
      expect(body.summary).toEqual({
        new: 0,
        updated: 0,
        unchanged: body.rows.length,
        rejected: 0,
      });
      expect(body.rows.every((row) => row.status === 'unchanged')).toBe(true);
      const before = await productsSnapshot(testApp.db);
      await upload('apply', file).expect(200);
      expect(await productsSnapshot(testApp.db)).toBe(before);
    });
  });

  describe('preview and apply', () => {
    it('previews new, updated, unchanged and rejected rows with reasons, and changes nothing', async () => {
      const newSku = uniqueSku('T-CSV');
      const changed = await exportedRow('KW-SVC-FITBAL');
      changed[4] = '37.5';
      changed[7] = '3';
      const file = csv([
        changed,
        await exportedRow('KW-SVC-ALIGN'),
        [
          newSku,
          'service',
          'Valve stem, per wheel',
          'Kestrelmere Workshop',
          '1249.5',
          '5',
          'tyre',
          '0',
          '0',
          'true',
          SERVICE_ATTRIBUTES,
        ],
        [
          uniqueSku(),
          'service',
          'Too precise',
          'Kestrelmere Workshop',
          '12.345',
          '5',
          'tyre',
          '0',
          '0',
          'true',
          SERVICE_ATTRIBUTES,
        ],
        [uniqueSku(), 'gizmo', 'Whatsit', 'Nobody', '10.00', '0', '', '0', '0', 'true', '{}'],
        [
          uniqueSku(),
          'wheel',
          'Odd wheel',
          'Ironwattle',
          '389.00',
          '0',
          '',
          '4',
          '0',
          'true',
          JSON.stringify({
            diameterIn: 17,
            widthIn: 8,
            offsetMm: 'x',
            boltPattern: '6x139.7',
            centreBoreMm: 106.1,
            studThread: 'M12x1.5',
            loadRatingKg: 1250,
          }),
        ],
        [
          uniqueSku(),
          'service',
          'Refund',
          'Kestrelmere Workshop',
          '-5.00',
          '0',
          '',
          '0',
          '0',
          'true',
          SERVICE_ATTRIBUTES,
        ],
        [
          uniqueSku(),
          'service',
          'Free',
          'Kestrelmere Workshop',
          'free',
          '0',
          '',
          '0',
          '0',
          'maybe',
          '{not json',
        ],
        [
          newSku,
          'service',
          'Valve stem again',
          'Kestrelmere Workshop',
          '1.00',
          '5',
          'tyre',
          '0',
          '0',
          'true',
          SERVICE_ATTRIBUTES,
        ],
        ['SHORT-ROW', 'service'],
      ]);
      const before = await productsSnapshot(testApp.db);
      const response = await upload('preview', file).expect(200);
      expect(await productsSnapshot(testApp.db)).toBe(before);

      const body = response.body as ImportAnswer;
      expect(body.summary).toEqual({ new: 1, updated: 1, unchanged: 1, rejected: 7 });
      expect(body.rows.map((row) => [row.line, row.status])).toEqual([
        [2, 'updated'],
        [3, 'unchanged'],
        [4, 'new'],
        [5, 'rejected'],
        [6, 'rejected'],
        [7, 'rejected'],
        [8, 'rejected'],
        [9, 'rejected'],
        [10, 'rejected'],
        [11, 'rejected'],
      ]);
      expect(body.rows[0].changes).toEqual({
        priceCents: { from: 3500, to: 3750 },
        stockQty: { from: 0, to: 3 },
      });
      expect(body.rows.slice(3).map((row) => row.reason)).toEqual([
        'price has more than 2 decimals',
        "unknown kind 'gizmo'",
        'attributes.offsetMm must be a whole number',
        'price must not be negative',
        'price \'free\' is not an amount in dollars (e.g. 1249.00); active must be true or false; attributes is not valid JSON (e.g. {"role":"alignment","perWheel":false})',
        `sku ${newSku} is already on line 4`,
        'has 2 fields but the header names 11',
      ]);
    });

    it('applies new and updated rows in one transaction and skips the rejected ones', async () => {
      const newSku = uniqueSku('T-CSV');
      const rejectedSku = uniqueSku('T-CSV');
      const changed = await exportedRow('KW-SVC-HEADLIGHT');
      const originalPrice = changed[4];
      changed[4] = '52.00';
      const file = csv([
        changed,
        [
          newSku,
          'service',
          'Valve stem, per wheel',
          'Kestrelmere Workshop',
          '1249.5',
          '5',
          'tyre',
          '40',
          '0',
          'true',
          SERVICE_ATTRIBUTES,
        ],
        [
          rejectedSku,
          'service',
          'Bad',
          'Kestrelmere Workshop',
          '1.001',
          '5',
          'tyre',
          '0',
          '0',
          'true',
          SERVICE_ATTRIBUTES,
        ],
      ]);
      try {
        const response = await upload('apply', file).expect(200);
        expect((response.body as ImportAnswer).summary).toEqual({
          new: 1,
          updated: 1,
          unchanged: 0,
          rejected: 1,
        });
        const rows = await testApp.db.query<{
          sku: string;
          price_cents: number;
          stock_qty: number;
          attributes: unknown;
          xmin: string;
        }>(
          'select sku, price_cents, stock_qty, attributes, xmin::text from product where sku = any($1) order by sku',
          [[newSku, 'KW-SVC-HEADLIGHT', rejectedSku]],
        );
        const bySku = new Map(rows.rows.map((row) => [row.sku, row]));
        // "1249.5" dollars is 124950 cents exactly.
        expect(bySku.get(newSku)).toMatchObject({
          price_cents: 124950,
          stock_qty: 40,
          attributes: { role: 'fitting-balancing', perWheel: true },
        });
        expect(bySku.get('KW-SVC-HEADLIGHT')?.price_cents).toBe(5200);
        expect(bySku.has(rejectedSku)).toBe(false);
        // Both rows were written by the same transaction.
        expect(bySku.get(newSku)?.xmin).toBe(bySku.get('KW-SVC-HEADLIGHT')?.xmin);
      } finally {
        changed[4] = originalPrice;
        await upload('apply', csv([changed])).expect(200);
        await testApp.db.query('delete from product where sku = $1', [newSku]);
      }
    });

    it('writes nothing at all when a write fails part-way', async () => {
      const failingSku = uniqueSku('T-FAIL');
      const changed = await exportedRow('KW-SVC-SPEEDO');
      changed[4] = '299.00';
      await testApp.db.query(`
        create function liftwright_test_refuse_insert() returns trigger language plpgsql as $$
        begin
          if new.sku like 'T-FAIL-%' then raise exception 'simulated failure'; end if;
          return new;
        end $$;
        create trigger liftwright_test_refuse_insert before insert on product
          for each row execute function liftwright_test_refuse_insert();
      `);
      try {
        const before = await productsSnapshot(testApp.db);
        await upload(
          'apply',
          csv([
            changed,
            [
              uniqueSku('T-CSV'),
              'service',
              'Fine row',
              'Kestrelmere Workshop',
              '1.00',
              '0',
              '',
              '0',
              '0',
              'true',
              SERVICE_ATTRIBUTES,
            ],
            [
              failingSku,
              'service',
              'Failing row',
              'Kestrelmere Workshop',
              '1.00',
              '0',
              '',
              '0',
              '0',
              'true',
              SERVICE_ATTRIBUTES,
            ],
          ]),
        ).expect(500);
        expect(await productsSnapshot(testApp.db)).toBe(before);
      } finally {
        await testApp.db.query(`
          drop trigger liftwright_test_refuse_insert on product;
          drop function liftwright_test_refuse_insert();
        `);
      }
    });
  });

  describe('refusals (nothing changes)', () => {
    const PNG_BYTES = Buffer.from(
      '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201e2213bc20000000049454e44ae426082',
      'hex',
    );

    async function expectRefused(
      step: 'preview' | 'apply',
      content: Buffer,
      status: number,
      message: RegExp,
      filename = 'prices.csv',
    ): Promise<void> {
      const before = await productsSnapshot(testApp.db);
      const response = await upload(step, content, filename).expect(status);
      expect(response.body.message).toMatch(message);
      expect(await productsSnapshot(testApp.db)).toBe(before);
    }

    it('refuses PNG bytes named .csv and sent as text/csv', async () => {
      await expectRefused(
        'apply',
        PNG_BYTES,
        400,
        /^The file is not a CSV price list: it is not UTF-8 text\.$/,
      );
      await expectRefused('preview', PNG_BYTES, 400, /not a CSV price list/);
    });

    it('refuses text with binary control characters', async () => {
      await expectRefused(
        'apply',
        Buffer.concat([csv([]), Buffer.from([0, 1, 2])]),
        400,
        /holds binary data/,
      );
    });

    it('refuses a file over 1 MB with 413', async () => {
      const row = `X-${'A'.repeat(30)},service,Filler,Kestrelmere Workshop,1.00,0,,0,0,true,"${SERVICE_ATTRIBUTES.replace(/"/g, '""')}"\n`;
      const big = Buffer.from(
        HEADER + '\n' + row.repeat(Math.ceil((1024 * 1024) / row.length) + 10),
      );
      expect(big.length).toBeGreaterThan(1024 * 1024);
      await expectRefused('apply', big, 413, /^The file is larger than the 1 MB limit\.$/);
    });

    it('refuses a file without the required columns, naming them', async () => {
      await expectRefused(
        'apply',
        Buffer.from(
          'sku,kind,name,brand,price\nKW-SVC-ALIGN,service,Alignment,Kestrelmere Workshop,1.00\n',
        ),
        400,
        /missing the columns labour_minutes, bay_kind, stock_qty, lead_days, active, attributes/,
      );
      await expectRefused(
        'apply',
        Buffer.from('Dear manager, here are the new prices.\n'),
        400,
        /missing the columns/,
      );
    });

    it('refuses a file that does not parse as CSV', async () => {
      await expectRefused(
        'apply',
        Buffer.from(`${HEADER}\n"KW-SVC-ALIGN,service\n`),
        400,
        /^The file is not a valid CSV: /,
      );
    });

    it('refuses a file with no valid rows, quoting the reasons', async () => {
      await expectRefused(
        'apply',
        csv([
          [uniqueSku(), 'gizmo', 'Whatsit', 'Nobody', '10.00', '0', '', '0', '0', 'true', '{}'],
          [
            uniqueSku(),
            'service',
            'Bad price',
            'Kestrelmere Workshop',
            '9.999',
            '0',
            '',
            '0',
            '0',
            'true',
            SERVICE_ATTRIBUTES,
          ],
        ]),
        400,
        /^No row of the file can be imported, so nothing was changed\. line 2 \(.+\): unknown kind 'gizmo'; line 3 \(.+\): price has more than 2 decimals$/,
      );
      await expectRefused('preview', Buffer.from(`${HEADER}\n`), 400, /no product rows/);
      await expectRefused('apply', Buffer.alloc(0), 400, /empty/);
    });

    it('refuses a request without the file', async () => {
      const before = await productsSnapshot(testApp.db);
      const response = await manager.agent
        .post('/api/catalogue/import/apply')
        .set('x-csrf-token', manager.csrfToken)
        .field('note', 'no file')
        .expect(400);
      expect(response.body.message).toBe(
        'Attach the price list as the multipart form field "file".',
      );
      const twoFiles = await manager.agent
        .post('/api/catalogue/import/apply')
        .set('x-csrf-token', manager.csrfToken)
        .attach('file', csv([]), 'a.csv')
        .attach('file', csv([]), 'b.csv')
        .expect(400);
      expect(twoFiles.body.message).toBe('Send one file, in the form field "file".');
      expect(await productsSnapshot(testApp.db)).toBe(before);
    });
  });
});
