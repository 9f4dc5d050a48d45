import { BadRequestException } from '@nestjs/common';
import { describe, expect, it } from 'vitest';
import { CSV_COLUMNS, readCsvRow, readCsvRows } from './catalogue-csv';

const HEADER = CSV_COLUMNS.join(',');
const ALIGNMENT =
  'KW-SVC-ALIGN,service,Wheel alignment,Kestrelmere Workshop,149.00,60,alignment,0,0,true,"{""role"":""alignment"",""perWheel"":false}"';

function refusal(content: Buffer): string {
  try {
    readCsvRows(content);
  } catch (error) {
    expect(error).toBeInstanceOf(BadRequestException);
    return (error as BadRequestException).message;
  }
  throw new Error('expected the file to be refused');
}

describe('readCsvRows', () => {
  it('reads a spreadsheet export with a byte-order mark, CRLF line ends and header case', () => {
    const content = Buffer.from(`\uFEFF${HEADER.toUpperCase()}\r\n${ALIGNMENT}\r\n\r\n`);
    const rows = readCsvRows(content);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({
      line: 2,
      shapeProblem: null,
      values: { sku: 'KW-SVC-ALIGN', price: '149.00' },
    });
  });

  it('takes the columns in any order and ignores extra ones', () => {
    const reordered = ['note', ...[...CSV_COLUMNS].reverse()].join(',');
    const row =
      'from the rep,"{""role"":""alignment"",""perWheel"":false}",true,0,0,alignment,60,149.00,Kestrelmere Workshop,Wheel alignment,service,KW-SVC-ALIGN';
    const [read] = readCsvRows(Buffer.from(`${reordered}\n${row}\n`));
    expect(read.values).toMatchObject({
      sku: 'KW-SVC-ALIGN',
      kind: 'service',
      bay_kind: 'alignment',
    });
    expect(readCsvRow(read).ok).toBe(true);
  });

  it('refuses what is not a CSV price list', () => {
    expect(refusal(Buffer.from([0xff, 0xd8, 0xff, 0xe0]))).toMatch(/not UTF-8 text/);
    expect(refusal(Buffer.from(`${HEADER}\n\u0007bell\n`))).toMatch(/binary data/);
    expect(refusal(Buffer.from('sku;kind;name\n'))).toMatch(/missing the columns sku, kind/);
    expect(refusal(Buffer.from(`${HEADER},sku\n`))).toBe('The column "sku" appears twice.');
  });
});

describe('readCsvRow', () => {
  const [row] = readCsvRows(Buffer.from(`${HEADER}\n${ALIGNMENT}\n`));

  it('converts dollars to cents and text to values', () => {
    const read = readCsvRow({
      ...row,
      values: { ...row.values, price: '1249.5', active: 'FALSE', bay_kind: '' },
    });
    expect(read).toEqual({
      ok: true,
      fields: expect.objectContaining({
        priceCents: 124950,
        active: false,
        bayKind: null,
        labourMinutes: 60,
      }),
    });
  });

  it('names each bad column', () => {
    const read = readCsvRow({
      ...row,
      values: {
        ...row.values,
        labour_minutes: '1.5',
        stock_qty: '-1',
        bay_kind: 'paint',
        name: '',
      },
    });
    expect(read).toEqual({
      ok: false,
      reason:
        'labour_minutes must be a whole number of 0 or more; stock_qty must be a whole number of 0 or more; name must be 1 to 120 characters; bay_kind must be one of hoist, alignment, tyre',
    });
  });
});

describe('readCsvRow with hub-centric rings', () => {
  const rings = (attributes: string) =>
    `IW-HR-1101-1081,component,"Hub-centric rings 110.1 to 108.1 mm, set of four",Ironwattle,42.00,0,,8,0,true,"${attributes}"`;

  it('reads the ring sizes from the attributes JSON', () => {
    const [row] = readCsvRows(
      Buffer.from(
        `${HEADER}\n${rings('{""ringInnerMm"":108.1,""role"":""hub-rings"",""ringOuterMm"":110.1}')}\n`,
      ),
    );
    expect(readCsvRow(row)).toEqual({
      ok: true,
      fields: expect.objectContaining({
        priceCents: 4200,
        attributes: { role: 'hub-rings', ringOuterMm: 110.1, ringInnerMm: 108.1 },
      }),
    });
  });

  it('names the missing or wrong ring size in the row reason', () => {
    const [missing] = readCsvRows(
      Buffer.from(`${HEADER}\n${rings('{""role"":""hub-rings"",""ringOuterMm"":110.1}')}\n`),
    );
    expect(readCsvRow(missing)).toEqual({
      ok: false,
      reason: 'attributes.ringInnerMm is required for hub-centric rings',
    });
    const [reversed] = readCsvRows(
      Buffer.from(
        `${HEADER}\n${rings('{""role"":""hub-rings"",""ringOuterMm"":106.1,""ringInnerMm"":110.1}')}\n`,
      ),
    );
    expect(readCsvRow(reversed)).toEqual({
      ok: false,
      reason: 'attributes.ringInnerMm must be less than ringOuterMm',
    });
  });
});
