import { MikroORM, RequestContext } from '@mikro-orm/postgresql';
import { ConflictException, NotFoundException } from '@nestjs/common';
import { PDFParse } from 'pdf-parse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatCents } from '../src/pricing/cents';
import { QuotesService } from '../src/quotes/quotes.service';
import { User } from '../src/users/entities/user.entity';
import { productId, productIds, uniqueSku, vehicleModelId } from './support/catalogue';
import {
  anonymousSession,
  demoUser,
  registerCustomer,
  signInAs,
  type Session,
} from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface PricedLine {
  kind: string;
  description: string;
  amountCents: number;
  taxCents: number | null;
  quantity?: number;
  sku?: string;
}
interface Price {
  lines: PricedLine[];
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
  balanceDueCents: number;
  bundleDiscountApplied: boolean;
  breakdown: Record<string, number>;
  deposit: {
    basis: string;
    specialOrder: boolean;
    specialOrderSkus: string[];
    percentApplied: number;
  };
}
interface Preview {
  price: Price;
  fitReport: { verdict: string; checks: Array<{ code: string; verdict: string; message: string }> };
  wheelsFitted: number;
  tyresReplaced: number;
  validUntilDate: string;
  vehicle: { vehicleModelId: string; name: string };
}
interface Version {
  id: string;
  number: number;
  state: string;
  createdBy: { name: string; role: string };
  validUntilDate: string;
  validUntil: string;
  lines: Array<Record<string, unknown>>;
  price: Price;
  fitReport: Record<string, unknown>;
  bookable: boolean;
  pdfUrl: string;
  wheelsFitted: number;
  tyresReplaced: number;
}
interface Quote {
  id: string;
  number: number;
  reference: string;
  customer: { id: string; name: string; email: string };
  vehicle: {
    vehicleModelId: string;
    name: string;
    year: number | null;
    customerVehicle: { id: string; nickname: string | null; rego: string | null } | null;
  };
  photos: Array<{ id: string; url: string; thumbnailUrl: string; kind: string }>;
  versions: Version[];
}
interface Item {
  productId: string;
  quantity: number;
}

const DEMO_POLICY = {
  labourRateCentsPerHour: 14000,
  pricesIncludeTax: true,
  taxRatePercent: 10,
  taxRoundingMethod: 'per-invoice',
  fittingBalancingCentsPerWheel: 3500,
  tyreDisposalCentsPerTyre: 650,
  bundleDiscount: { enabled: true, percent: 5, requiresKinds: ['suspension-kit', 'wheel', 'tyre'] },
  deposit: { percent: 20, floorCents: 10000, capCents: 100000, specialOrderPercent: 50 },
  quoteValidDays: 30,
};

const QUOTE_TABLES = ['quote', 'quote_version', 'quote_line'];

/** Extracted with a general-purpose PDF text reader; runs of white space made one space. */
async function pdfText(bytes: Buffer): Promise<string> {
  const parser = new PDFParse({ data: bytes });
  const result = await parser.getText();
  await parser.destroy();
  return result.text.replace(/\s+/g, ' ');
}

function binary(response: request.Response, callback: (error: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => callback(null, Buffer.concat(chunks)));
}

describe('quotes: preview, save, versions, PDF', () => {
  let testApp: TestApp;
  let visitor: Session;
  let customer: Session;
  let customerId: string;
  let other: Session & { id: string; email: string };
  let desk: Session;
  let tech: Session;
  let manager: Session;
  let strata: string;
  let originalPolicy: Record<string, unknown>;
  const madeSkus: string[] = [];
  const madeQuotes: string[] = [];
  const madeUploads: string[] = [];

  async function setPolicy(overrides: Record<string, unknown>): Promise<void> {
    await manager.agent
      .put('/api/policies')
      .set('x-csrf-token', manager.csrfToken)
      .send({ ...DEMO_POLICY, ...overrides })
      .expect(200);
  }

  /** A test product (an accessory unless told otherwise) through the catalogue API. */
  async function makeProduct(fields: Record<string, unknown> = {}): Promise<string> {
    const sku = uniqueSku('TQ');
    madeSkus.push(sku);
    const response = await manager.agent
      .post('/api/products')
      .set('x-csrf-token', manager.csrfToken)
      .send({
        sku,
        kind: 'component',
        name: `Test accessory ${sku}`,
        brand: 'Testbrand',
        priceCents: 1995,
        stockQty: 10,
        attributes: { role: 'accessory' },
        ...fields,
      })
      .expect(201);
    return (response.body as { id: string }).id;
  }

  function packageFor(items: Item[], extra: Record<string, unknown> = {}) {
    return { vehicleModelId: strata, uses: ['daily'], constantLoadKg: 0, items, ...extra };
  }

  async function preview(body: object, session: Session = visitor): Promise<Preview> {
    const response = await session.agent
      .post('/api/quotes/preview')
      .set('x-csrf-token', session.csrfToken)
      .send(body);
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    return response.body as Preview;
  }

  async function save(body: object, session: Session = customer): Promise<Quote> {
    const response = await session.agent
      .post('/api/quotes')
      .set('x-csrf-token', session.csrfToken)
      .send(body);
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    madeQuotes.push((response.body as Quote).id);
    return response.body as Quote;
  }

  async function getPdf(session: Session, url: string): Promise<request.Response> {
    return session.agent.get(url).buffer(true).parse(binary);
  }

  async function rowCounts(): Promise<Record<string, number>> {
    const counts: Record<string, number> = {};
    for (const table of QUOTE_TABLES) {
      counts[table] = Number(
        (await testApp.db.query(`select count(*) from "${table}"`)).rows[0].count,
      );
    }
    counts.attachedUploads = Number(
      (await testApp.db.query('select count(*) from upload where quote_id is not null')).rows[0]
        .count,
    );
    return counts;
  }

  /** Every row other writes could touch, with xmin: equal means nothing at all was written. */
  async function writeSnapshot(): Promise<string> {
    const rows: Record<string, unknown> = {};
    for (const table of [...QUOTE_TABLES, 'upload', 'workshop', 'product']) {
      rows[table] = (
        await testApp.db.query(`select xmin::text as xmin, * from "${table}" order by id`)
      ).rows;
    }
    return JSON.stringify(rows);
  }

  /** An upload row as the uploads feature stores it (the files are not needed here). */
  async function insertUpload(ownerId: string): Promise<string> {
    const result = await testApp.db.query<{ id: string }>(
      `insert into upload (id, created_at, updated_at, owner_id, kind, format, storage_key, thumbnail_key, bytes, width_px, height_px)
       values (gen_random_uuid(), now(), now(), $1, 'vehicle', 'jpeg', md5(random()::text), md5(random()::text), 1234, 640, 480) returning id`,
      [ownerId],
    );
    madeUploads.push(result.rows[0].id);
    return result.rows[0].id;
  }

  function inContext<T>(work: (orm: MikroORM) => Promise<T>): Promise<T> {
    const orm = testApp.app.get<MikroORM>(MikroORM);
    return RequestContext.create(orm.em, () => work(orm));
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    visitor = await anonymousSession(testApp);
    customer = await signInAs(testApp, 'customer');
    other = await registerCustomer(testApp);
    desk = await signInAs(testApp, 'desk');
    tech = await signInAs(testApp, 'tech');
    manager = await signInAs(testApp, 'manager');
    customerId = (
      await testApp.db.query<{ id: string }>('select id from "user" where email = $1', [
        demoUser('customer').email,
      ])
    ).rows[0].id;
    strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
    const { updatedAt: _updatedAt, ...policy } = (
      await manager.agent.get('/api/policies').expect(200)
    ).body as Record<string, unknown>;
    originalPolicy = policy;
    await setPolicy({});
  });

  afterAll(async () => {
    await manager.agent
      .put('/api/policies')
      .set('x-csrf-token', manager.csrfToken)
      .send(originalPolicy);
    await testApp.db.query('delete from upload where id = any($1)', [madeUploads]);
    await testApp.db.query('delete from quote where id = any($1)', [madeQuotes]);
    await testApp.db.query('delete from product where sku = any($1)', [madeSkus]);
    await testApp.close();
  });

  describe('pricing through the API', () => {
    it('takes GST as one eleventh of the total, rounded once per invoice or on each line', async () => {
      const ids = [await makeProduct(), await makeProduct(), await makeProduct()];
      const body = packageFor(ids.map((id) => ({ productId: id, quantity: 1 })));

      await setPolicy({ taxRoundingMethod: 'per-invoice' });
      const perInvoice = await preview(body);
      expect(perInvoice.price.totalCents).toBe(5985);
      // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-90 (REFERENCES.md): three
      // lines at $19.95, GST-inclusive: 59.85 / 11 = 5.4409… → $5.44 rounding the invoice once.
      expect(perInvoice.price.taxCents).toBe(544);
      expect(perInvoice.price.lines.every((line) => line.taxCents === null)).toBe(true);

      await setPolicy({ taxRoundingMethod: 'per-line' });
      const perLine = await preview(body);
      // Source: as above: 19.95 / 11 = 1.8136… → $1.81 a line, 3 × 1.81 = $5.43 rounding each line.
      expect(perLine.price.taxCents).toBe(543);
      expect(perLine.price.lines.map((line) => line.taxCents)).toEqual([181, 181, 181]);

      await setPolicy({ taxRoundingMethod: 'per-line', pricesIncludeTax: false });
      const exclusivePerLine = await preview(body);
      // Source: GST Act s 9-70 (10 % of the value) and s 9-90 half a cent up: 1.995 → $2.00 a
      // line, $6.00 in all, added to the $59.85 subtotal.
      expect(exclusivePerLine.price.taxCents).toBe(600);
      expect(exclusivePerLine.price.totalCents).toBe(6585);

      await setPolicy({ taxRoundingMethod: 'per-invoice', pricesIncludeTax: false });
      // Source: as above, once on the invoice: 5.985 → $5.99.
      expect((await preview(body)).price.taxCents).toBe(599);
      await setPolicy({});
    });

    it('takes the deposit as a percentage between the floor and the cap, higher for special orders', async () => {
      const small = await makeProduct({ priceCents: 30000 });
      const large = await makeProduct({ priceCents: 600000 });
      const ordered = await makeProduct({ priceCents: 100000, stockQty: 0, leadDays: 5 });
      const sameDay = await makeProduct({ priceCents: 100000, stockQty: 0, leadDays: 0 });

      // Common practice (no published source): a deposit as a percentage of the total with a
      // floor and a cap, and a higher share when parts must be ordered in. The policy values are
      // the demo workshop's own (20 %, $100.00–$1,000.00, 50 % for special orders).
      const floor = (await preview(packageFor([{ productId: small, quantity: 1 }]))).price;
      expect(floor.totalCents).toBe(30000);
      expect(floor.depositCents).toBe(10000); // 20 % = $60.00, below the $100.00 floor
      expect(floor.deposit.basis).toBe('floor');
      expect(floor.balanceDueCents).toBe(20000);

      const cap = (await preview(packageFor([{ productId: large, quantity: 1 }]))).price;
      expect(cap.depositCents).toBe(100000); // 20 % = $1,200.00, above the $1,000.00 cap
      expect(cap.deposit.basis).toBe('cap');

      const special = (await preview(packageFor([{ productId: ordered, quantity: 1 }]))).price;
      expect(special.deposit.specialOrder).toBe(true);
      expect(special.deposit.percentApplied).toBe(50);
      expect(special.depositCents).toBe(50000);
      expect(special.deposit.specialOrderSkus).toHaveLength(1);

      // None on the shelf but in the same day: not a special order.
      const notSpecial = (await preview(packageFor([{ productId: sameDay, quantity: 1 }]))).price;
      expect(notSpecial.deposit.specialOrder).toBe(false);
      expect(notSpecial.depositCents).toBe(20000);
    });

    it('gives the bundle discount only with a kit, wheels and tyres, and charges fitting per wheel', async () => {
      const [kit, wheel, tyre] = await productIds(testApp.db, [
        'BR-STR-50-L',
        'IW-STK-1780-P20',
        'QD-TG-2657017',
      ]);
      const full = await preview(
        packageFor([
          { productId: kit, quantity: 1 },
          { productId: wheel, quantity: 4 },
          { productId: tyre, quantity: 5 },
        ]),
      );
      expect(full.price.bundleDiscountApplied).toBe(true);
      // Parts: 1,695.00 + 4 × 389.00 + 5 × 329.00 = 4,896.00; 5 % = 244.80 off.
      expect(full.price.breakdown.partsCents).toBe(489600);
      const discount = full.price.lines.find((line) => line.kind === 'bundle-discount');
      expect(discount?.amountCents).toBe(-24480);
      // Wheels fitted: the larger of the wheel and tyre quantities; tyres replaced: the tyres.
      expect(full.wheelsFitted).toBe(5);
      expect(full.tyresReplaced).toBe(5);
      expect(full.price.lines.find((line) => line.kind === 'fitting-balancing')).toMatchObject({
        quantity: 5,
        amountCents: 17500,
      });
      expect(full.price.lines.find((line) => line.kind === 'tyre-disposal')).toMatchObject({
        quantity: 5,
        amountCents: 3250,
      });
      // Labour: the kit's 270 minutes at $140.00/h.
      expect(full.price.breakdown.labourCents).toBe(63000);
      const sum = full.price.lines.reduce((total, line) => total + line.amountCents, 0);
      expect(full.price.totalCents).toBe(sum);
      // Source: GST Act s 9-90 and the one-eleventh rule (REFERENCES.md): GST in a
      // GST-inclusive total is total / 11, rounded half up to the cent.
      expect(full.price.taxCents).toBe(Math.round(full.price.totalCents / 11));

      for (const missing of [kit, wheel, tyre]) {
        const items = [
          { productId: kit, quantity: 1 },
          { productId: wheel, quantity: 4 },
          { productId: tyre, quantity: 4 },
        ].filter((item) => item.productId !== missing);
        const partial = await preview(packageFor(items));
        expect(partial.price.bundleDiscountApplied).toBe(false);
        expect(partial.price.lines.some((line) => line.kind === 'bundle-discount')).toBe(false);
      }
    });

    it('writes nothing, and runs no ORM query for ten lines once the catalogue copy is current', async () => {
      const skus = [
        'BR-STR-50-M',
        'IW-STK-1780-P20',
        'QD-TG-2657017',
        'DW-DD-25',
        'BR-GPS-LEAF',
        'BR-EBL-50',
        'IW-HR-1101-1061',
        'KW-SVC-ALIGN',
        'KW-SVC-HEADLIGHT',
        'KW-SVC-SPEEDO',
      ];
      const ids = await productIds(testApp.db, skus);
      const body = packageFor(
        ids.map((id, index) => ({ productId: id, quantity: index === 1 || index === 2 ? 4 : 1 })),
        { constantLoadKg: 200 },
      );
      const before = await writeSnapshot();
      // Warm the per-process catalogue copy (CatalogueSnapshotService), then count.
      await preview(body);
      const knex = testApp.app.get<MikroORM>(MikroORM).em.getKnex();
      const queries: string[] = [];
      const listener = (query: { sql: string }) => queries.push(query.sql);
      knex.on('query', listener);
      let result: Preview;
      try {
        result = await preview(body);
      } finally {
        knex.removeListener('query', listener);
      }
      expect(
        result.price.lines.filter((line) => ['part', 'service'].includes(line.kind)),
      ).toHaveLength(10);
      // With the catalogue copy current, no ORM query at all: only the revision check, which
      // goes through the plain pg pool. (test/catalogue-snapshot.e2e-spec.ts shows the copy
      // follows every write.)
      expect(queries).toEqual([]);
      await preview(body, customer);
      await preview(body, desk);
      expect(await writeSnapshot()).toBe(before);
    });
  });

  describe('saving', () => {
    it('saves the customer’s package as version 1, sent, with the catalogue snapshot', async () => {
      const [kit, wheel, tyre, alignment] = await productIds(testApp.db, [
        'BR-STR-50-M',
        'IW-STK-1780-P20',
        'QD-TG-2657017',
        'KW-SVC-ALIGN',
      ]);
      const blueUte = (
        await testApp.db.query<{ id: string }>(
          "select id from customer_vehicle where owner_id = $1 and nickname = 'The blue ute'",
          [customerId],
        )
      ).rows[0].id;
      const body = packageFor(
        [
          { productId: kit, quantity: 1 },
          { productId: wheel, quantity: 4 },
          { productId: tyre, quantity: 4 },
          { productId: alignment, quantity: 1 },
        ],
        { constantLoadKg: 200, uses: ['daily', 'towing'], customerVehicleId: blueUte },
      );
      const priced = await preview(body, customer);
      const quote = await save(body);
      expect(quote.reference).toBe(`Q-${String(quote.number).padStart(6, '0')}`);
      expect(quote.customer.email).toBe(demoUser('customer').email);
      expect(quote.vehicle).toMatchObject({
        vehicleModelId: strata,
        name: 'Vantrel Strata SR dual cab',
        year: 2019,
        customerVehicle: { id: blueUte, nickname: 'The blue ute' },
      });
      expect(quote.versions).toHaveLength(1);
      const [version] = quote.versions;
      expect(version).toMatchObject({
        number: 1,
        state: 'sent',
        bookable: true,
        createdBy: { role: 'customer' },
        wheelsFitted: 4,
        tyresReplaced: 4,
        validUntilDate: priced.validUntilDate,
        pdfUrl: `/api/quotes/${quote.id}/versions/1/pdf`,
      });
      expect(version.price).toEqual(priced.price);
      expect(version.lines.map((line) => [line.sku, line.quantity, line.unitPriceCents])).toEqual([
        ['BR-STR-50-M', 1, 174500],
        ['IW-STK-1780-P20', 4, 38900],
        ['QD-TG-2657017', 4, 32900],
        ['KW-SVC-ALIGN', 1, 14900],
      ]);
      // Valid to the end of that day in Sydney (UTC+10 or +11).
      const validUntil = new Date(version.validUntil);
      expect(validUntil.toLocaleDateString('en-CA', { timeZone: 'Australia/Sydney' })).toBe(
        version.validUntilDate,
      );
      expect(
        new Date(validUntil.getTime() + 1).toLocaleDateString('en-CA', {
          timeZone: 'Australia/Sydney',
        }),
      ).not.toBe(version.validUntilDate);

      const stored = await testApp.db.query(
        'select state, total_cents, deposit_cents from quote_version where id = $1',
        [version.id],
      );
      expect(stored.rows[0]).toEqual({
        state: 'sent',
        total_cents: priced.price.totalCents,
        deposit_cents: priced.price.depositCents,
      });
    });

    it('keeps a saved version as it was when the catalogue and the policy change', async () => {
      const part = await makeProduct({ priceCents: 50000, labourMinutes: 90, bayKind: 'hoist' });
      const quote = await save(packageFor([{ productId: part, quantity: 2 }]));
      const before = (await customer.agent.get(`/api/quotes/${quote.id}`).expect(200))
        .body as Quote;
      const pdfBefore = await getPdf(customer, before.versions[0].pdfUrl);
      const pdfTextBefore = await pdfText(pdfBefore.body as Buffer);

      await manager.agent
        .patch(`/api/products/${part}`)
        .set('x-csrf-token', manager.csrfToken)
        .send({ priceCents: 99900, labourMinutes: 30 })
        .expect(200);
      await setPolicy({
        labourRateCentsPerHour: 20000,
        deposit: { ...DEMO_POLICY.deposit, percent: 50 },
      });

      // The change is live for new prices ...
      const now = await preview(packageFor([{ productId: part, quantity: 2 }]));
      expect(now.price.breakdown.partsCents).toBe(199800);
      expect(now.price.breakdown.labourCents).toBe(20000);
      // ... and the saved version is untouched: lines, totals, deposit, the PDF.
      const after = (await customer.agent.get(`/api/quotes/${quote.id}`).expect(200)).body as Quote;
      expect(after.versions[0].lines).toEqual(before.versions[0].lines);
      expect(after.versions[0].price).toEqual(before.versions[0].price);
      expect(after.versions[0].fitReport).toEqual(before.versions[0].fitReport);
      expect(after.versions[0].price.breakdown.partsCents).toBe(100000);
      // 2 × 90 min at $140.00/h.
      expect(after.versions[0].price.breakdown.labourCents).toBe(42000);
      const pdfAfter = await getPdf(customer, after.versions[0].pdfUrl);
      expect(await pdfText(pdfAfter.body as Buffer)).toBe(pdfTextBefore);
      await setPolicy({});
    });

    it('lets the desk save a walk-in quote as a draft for a customer, then send it', async () => {
      const part = await makeProduct();
      const quote = await save(
        { ...packageFor([{ productId: part, quantity: 1 }]), customerId: other.id },
        desk,
      );
      expect(quote.customer.id).toBe(other.id);
      expect(quote.versions[0]).toMatchObject({
        state: 'draft',
        bookable: false,
        createdBy: { name: 'Bea Corran', role: 'desk' },
      });

      const early = await other.agent
        .post(`/api/quotes/${quote.id}/versions/1/accept`)
        .set('x-csrf-token', other.csrfToken)
        .expect(409);
      expect(early.body.message).toBe('The workshop has not sent version 1 yet.');

      const sent = await desk.agent
        .post(`/api/quotes/${quote.id}/versions/1/send`)
        .set('x-csrf-token', desk.csrfToken)
        .expect(200);
      expect(sent.body.versions[0]).toMatchObject({ state: 'sent', bookable: true });
      const again = await manager.agent
        .post(`/api/quotes/${quote.id}/versions/1/send`)
        .set('x-csrf-token', manager.csrfToken)
        .expect(409);
      expect(again.body.message).toBe('Only a draft can be sent; version 1 is sent.');

      const accepted = await other.agent
        .post(`/api/quotes/${quote.id}/versions/1/accept`)
        .set('x-csrf-token', other.csrfToken)
        .expect(200);
      expect(accepted.body.versions[0]).toMatchObject({ state: 'accepted', bookable: true });
      const declined = await other.agent
        .post(`/api/quotes/${quote.id}/versions/1/decline`)
        .set('x-csrf-token', other.csrfToken)
        .expect(409);
      expect(declined.body.message).toBe('Version 1 is already accepted.');

      const version = await inContext(async (orm) => {
        const user = await orm.em.findOneOrFail(User, { id: other.id });
        return testApp.app.get(QuotesService).assertBookable(quote.versions[0].id, user);
      });
      expect(version.id).toBe(quote.versions[0].id);
    });

    it('lets the customer decline a sent version, after which it cannot be accepted', async () => {
      const quote = await save(packageFor([{ productId: await makeProduct(), quantity: 1 }]));
      const declined = await customer.agent
        .post(`/api/quotes/${quote.id}/versions/1/decline`)
        .set('x-csrf-token', customer.csrfToken)
        .expect(200);
      expect(declined.body.versions[0]).toMatchObject({ state: 'declined', bookable: false });
      const accept = await customer.agent
        .post(`/api/quotes/${quote.id}/versions/1/accept`)
        .set('x-csrf-token', customer.csrfToken)
        .expect(409);
      expect(accept.body.message).toBe('Version 1 was declined. Ask the workshop for a new quote.');
      await customer.agent
        .post(`/api/quotes/${quote.id}/versions/2/accept`)
        .set('x-csrf-token', customer.csrfToken)
        .expect(404);
    });

    it('hands photos the desk took for a walk-in to the customer with the quote', async () => {
      const deskUser = await testApp.db.query<{ id: string }>(
        `select id from "user" where role = 'desk' and email = $1`,
        ['desk@liftwright.example'],
      );
      const deskPhoto = await insertUpload(deskUser.rows[0].id);
      const strangerPhoto = await insertUpload(customerId);
      const part = await makeProduct();
      const refused = await desk.agent
        .post('/api/quotes')
        .set('x-csrf-token', desk.csrfToken)
        .send({
          ...packageFor([{ productId: part, quantity: 1 }]),
          customerId: other.id,
          photoIds: [deskPhoto, strangerPhoto],
        })
        .expect(400);
      // A third customer's photo cannot be moved onto this customer's quote.
      expect(refused.body.fieldErrors.photoIds[0]).toContain(strangerPhoto);
      const saved = await desk.agent
        .post('/api/quotes')
        .set('x-csrf-token', desk.csrfToken)
        .send({
          ...packageFor([{ productId: part, quantity: 1 }]),
          customerId: other.id,
          photoIds: [deskPhoto],
        })
        .expect(201);
      expect(saved.body.photos.map((photo: { id: string }) => photo.id)).toEqual([deskPhoto]);
      const row = await testApp.db.query<{ owner_id: string; quote_id: string }>(
        'select owner_id, quote_id from upload where id = $1',
        [deskPhoto],
      );
      expect(row.rows[0]).toEqual({ owner_id: other.id, quote_id: saved.body.id });
    });

    it('attaches the customer’s own unattached photos', async () => {
      const mine = await insertUpload(customerId);
      const theirs = await insertUpload(other.id);
      const part = await makeProduct();
      const before = await rowCounts();
      const refused = await customer.agent
        .post('/api/quotes')
        .set('x-csrf-token', customer.csrfToken)
        .send({ ...packageFor([{ productId: part, quantity: 1 }]), photoIds: [mine, theirs] })
        .expect(400);
      expect(refused.body.fieldErrors.photoIds[0]).toContain(theirs);
      expect(await rowCounts()).toEqual(before);

      const quote = await save({
        ...packageFor([{ productId: part, quantity: 1 }]),
        photoIds: [mine],
      });
      expect(quote.photos).toEqual([
        {
          id: mine,
          kind: 'vehicle',
          widthPx: 640,
          heightPx: 480,
          url: `/api/uploads/${mine}`,
          thumbnailUrl: `/api/uploads/${mine}/thumbnail`,
        },
      ]);
      const again = await customer.agent
        .post('/api/quotes')
        .set('x-csrf-token', customer.csrfToken)
        .send({ ...packageFor([{ productId: part, quantity: 1 }]), photoIds: [mine] })
        .expect(400);
      expect(Object.keys(again.body.fieldErrors)).toEqual(['photoIds']);
    });
  });

  describe('bad input', () => {
    it('refuses with field errors and writes nothing', async () => {
      const [barrowKit, otherBoltWheel, fitting, stockWheel, otherWheel] = await productIds(
        testApp.db,
        ['TH-BAR-50-M', 'SL-GIB-1780-P35', 'KW-SVC-FITBAL', 'IW-STK-1780-P20', 'IW-STK-1785-00'],
      );
      const accessory = await makeProduct();
      const retired = await makeProduct({ active: false });
      const otherVehicle = (
        await testApp.db.query<{ id: string }>(
          'insert into customer_vehicle (id, created_at, updated_at, owner_id, vehicle_model_id) values (gen_random_uuid(), now(), now(), $1, $2) returning id',
          [other.id, strata],
        )
      ).rows[0].id;
      const unknown = '00000000-0000-4000-8000-000000000000';
      const managerId = (
        await testApp.db.query<{ id: string }>('select id from "user" where email = $1', [
          demoUser('manager').email,
        ])
      ).rows[0].id;
      const one = (id: string) => [{ productId: id, quantity: 1 }];
      const cases: Array<{ name: string; session?: Session; body: object; keys: string[] }> = [
        { name: 'unknown product', body: packageFor(one(unknown)), keys: ['items[0].productId'] },
        { name: 'inactive product', body: packageFor(one(retired)), keys: ['items[0].productId'] },
        { name: 'other vehicle', body: packageFor(one(barrowKit)), keys: ['items[0].productId'] },
        {
          name: 'duplicate',
          body: packageFor([
            { productId: accessory, quantity: 1 },
            { productId: accessory, quantity: 2 },
          ]),
          keys: ['items[1].productId'],
        },
        {
          name: 'quantity 0',
          body: packageFor([{ productId: accessory, quantity: 0 }]),
          keys: ['items[0].quantity'],
        },
        {
          name: 'quantity 25',
          body: packageFor([{ productId: accessory, quantity: 25 }]),
          keys: ['items[0].quantity'],
        },
        { name: 'no items', body: packageFor([]), keys: ['items'] },
        { name: 'policy service', body: packageFor(one(fitting)), keys: ['items[0].productId'] },
        {
          name: 'two wheels',
          body: packageFor([
            { productId: stockWheel, quantity: 4 },
            { productId: otherWheel, quantity: 4 },
          ]),
          keys: ['items'],
        },
        {
          name: 'does not fit',
          body: packageFor([{ productId: otherBoltWheel, quantity: 4 }]),
          keys: ['items'],
        },
        {
          name: 'unknown vehicle',
          body: { ...packageFor(one(accessory)), vehicleModelId: unknown },
          keys: ['vehicleModelId'],
        },
        {
          name: 'year outside the model',
          body: { ...packageFor(one(accessory)), vehicleYear: 2001 },
          keys: ['vehicleYear'],
        },
        {
          name: 'unknown use',
          body: { ...packageFor(one(accessory)), uses: ['racing'] },
          keys: ['uses'],
        },
        {
          name: 'load over 3000 kg',
          body: { ...packageFor(one(accessory)), constantLoadKg: 3001 },
          keys: ['constantLoadKg'],
        },
        {
          name: "another customer's vehicle",
          body: { ...packageFor(one(accessory)), customerVehicleId: otherVehicle },
          keys: ['customerVehicleId'],
        },
        {
          name: 'a customer naming a customer',
          body: { ...packageFor(one(accessory)), customerId: other.id },
          keys: ['customerId'],
        },
        {
          name: 'the desk without a customer',
          session: desk,
          body: packageFor(one(accessory)),
          keys: ['customerId'],
        },
        {
          name: 'the desk naming a staff member',
          session: desk,
          body: { ...packageFor(one(accessory)), customerId: managerId },
          keys: ['customerId'],
        },
        {
          name: 'unknown field',
          body: { ...packageFor(one(accessory)), wheelsFitted: 4 },
          keys: ['wheelsFitted'],
        },
      ];
      const before = await writeSnapshot();
      for (const { name, session = customer, body, keys } of cases) {
        const response = await session.agent
          .post('/api/quotes')
          .set('x-csrf-token', session.csrfToken)
          .send(body);
        expect(response.status, name).toBe(400);
        expect(Object.keys(response.body.fieldErrors as object), name).toEqual(keys);
      }
      expect(await writeSnapshot()).toBe(before);

      const doesNotFit = await customer.agent
        .post('/api/quotes')
        .set('x-csrf-token', customer.csrfToken)
        .send(packageFor([{ productId: otherBoltWheel, quantity: 4 }]))
        .expect(400);
      expect(doesNotFit.body.fieldErrors.items.join(' ')).toMatch(/6x114\.3.*6x139\.7/);
      const inactive = await customer.agent
        .post('/api/quotes/preview')
        .set('x-csrf-token', customer.csrfToken)
        .send(packageFor(one(retired)))
        .expect(400);
      expect(inactive.body.fieldErrors['items[0].productId'][0]).toMatch(/not sold any more/);
      // The preview shows a package that does not fit (so the planner can say why).
      const shown = await preview(packageFor([{ productId: otherBoltWheel, quantity: 4 }]));
      expect(shown.fitReport.verdict).toBe('does-not-fit');
      await testApp.db.query('delete from customer_vehicle where id = $1', [otherVehicle]);
    });
  });

  describe('expiry', () => {
    it('reads a lapsed version as expired: not bookable, not acceptable', async () => {
      const quote = await save(packageFor([{ productId: await makeProduct(), quantity: 1 }]));
      const versionId = quote.versions[0].id;
      await testApp.db.query(
        "update quote_version set valid_until_date = '2020-03-31', valid_until = '2020-03-31T12:59:59.999Z' where id = $1",
        [versionId],
      );
      const read = (await customer.agent.get(`/api/quotes/${quote.id}`).expect(200)).body as Quote;
      expect(read.versions[0]).toMatchObject({ state: 'expired', bookable: false });
      const stored = await testApp.db.query(
        'select state, state_changed_at from quote_version where id = $1',
        [versionId],
      );
      expect(stored.rows[0].state).toBe('expired');
      expect(new Date(stored.rows[0].state_changed_at as string).toISOString()).toBe(
        '2020-03-31T12:59:59.999Z',
      );
      const list = (await customer.agent.get('/api/quotes').expect(200)).body as {
        items: Array<{ id: string; latestVersion: { state: string } }>;
      };
      expect(list.items.find((item) => item.id === quote.id)?.latestVersion.state).toBe('expired');

      const accept = await customer.agent
        .post(`/api/quotes/${quote.id}/versions/1/accept`)
        .set('x-csrf-token', customer.csrfToken)
        .expect(409);
      expect(accept.body.message).toBe(
        'This quote expired on 31 March 2020. Ask the workshop for a new one.',
      );
      await inContext(async (orm) => {
        const user = await orm.em.findOneOrFail(User, { id: customerId });
        const quotes = testApp.app.get(QuotesService);
        await expect(quotes.assertBookable(versionId, user)).rejects.toBeInstanceOf(
          ConflictException,
        );
        await expect(quotes.assertBookable(versionId, user)).rejects.toThrow(
          'This quote expired on 31 March 2020. Ask the workshop for a new one.',
        );
        const stranger = await orm.em.findOneOrFail(User, { id: other.id });
        await expect(quotes.assertBookable(versionId, stranger)).rejects.toBeInstanceOf(
          NotFoundException,
        );
      });
    });

    it('reads a version as expired only once the last valid day has ended in the workshop', async () => {
      const quote = await save(packageFor([{ productId: await makeProduct(), quantity: 1 }]));
      await testApp.db.query(
        "update quote_version set valid_until = now() + interval '1 minute' where id = $1",
        [quote.versions[0].id],
      );
      const read = (await customer.agent.get(`/api/quotes/${quote.id}`).expect(200)).body as Quote;
      expect(read.versions[0]).toMatchObject({ state: 'sent', bookable: true });
    });
  });

  describe('the PDF', () => {
    it('holds every line, the total, the GST and the deposit', async () => {
      const [kit, wheel, tyre, alignment] = await productIds(testApp.db, [
        'BR-STR-50-M',
        'IW-STK-1780-P20',
        'QD-TG-2657017',
        'KW-SVC-ALIGN',
      ]);
      const quote = await save(
        packageFor(
          [
            { productId: kit, quantity: 1 },
            { productId: wheel, quantity: 4 },
            { productId: tyre, quantity: 4 },
            { productId: alignment, quantity: 1 },
          ],
          { constantLoadKg: 200 },
        ),
      );
      const version = quote.versions[0];
      const response = await getPdf(customer, version.pdfUrl);
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toBe('application/pdf');
      expect(response.headers['content-disposition']).toBe(
        `inline; filename="quote-${quote.reference}-v1.pdf"`,
      );
      const text = await pdfText(response.body as Buffer);
      // Source: pdf-parse 2 (general-purpose PDF text extraction) reads the printed text back.
      // A long description wraps (after a space or a dash): compare without white space.
      const squashed = text.replace(/\s/g, '');
      for (const line of version.price.lines) {
        expect(squashed, line.description).toContain(line.description.replace(/\s/g, ''));
        expect(text, line.description).toContain(formatCents(line.amountCents));
      }
      // Parts 1,745.00 + 1,556.00 + 1,316.00, alignment 149.00, labour 630.00, fitting 140.00,
      // disposal 26.00, discount −230.85 (5 % of 4,617.00): total $5,331.15.
      expect(version.price.totalCents).toBe(533115);
      expect(text).toContain('$5,331.15');
      // Source: GST Act s 9-90 and the one-eleventh rule: 5,331.15 / 11 = 484.65 (484.6500).
      expect(text).toContain('Includes GST of $484.65.');
      // 20 % of the total is $1,066.23: over the $1,000.00 cap.
      expect(text).toContain('Deposit to book $1,000.00');
      expect(text).toContain('Balance due on completion $4,331.15');
      for (const expected of [
        'Kestrelmere 4x4 & Tyre',
        '7 Quarry Flat Road, Tallowgate',
        '0491 570 006',
        'bookings@kestrelmere.example',
        `Quote ${quote.reference}, version 1`,
        'Robin Yarrow',
        'Vantrel Strata SR dual cab',
        'National code defaults',
        'Have the wheel nuts re-torqued after the first 100 km.',
        'inspected by a licensed professional',
      ]) {
        expect(text, expected).toContain(expected);
      }
      const desksCopy = await getPdf(desk, version.pdfUrl);
      expect(desksCopy.status).toBe(200);
      await getPdf(customer, `/api/quotes/${quote.id}/versions/2/pdf`).then((missing) =>
        expect(missing.status).toBe(404),
      );
    });
  });

  describe('access', () => {
    it('shows a customer only their own quotes: another customer gets 404', async () => {
      const quote = await save(packageFor([{ productId: await makeProduct(), quantity: 1 }]));
      await other.agent.get(`/api/quotes/${quote.id}`).expect(404);
      expect((await getPdf(other, quote.versions[0].pdfUrl)).status).toBe(404);
      for (const action of ['accept', 'decline']) {
        await other.agent
          .post(`/api/quotes/${quote.id}/versions/1/${action}`)
          .set('x-csrf-token', other.csrfToken)
          .expect(404);
      }
      const theirs = (await other.agent.get('/api/quotes').expect(200)).body as {
        items: Array<{ id: string; customer: { id: string } }>;
      };
      expect(theirs.items.every((item) => item.customer.id === other.id)).toBe(true);
      expect(theirs.items.some((item) => item.id === quote.id)).toBe(false);
      const mine = (await customer.agent.get('/api/quotes').expect(200)).body as {
        items: Array<{ id: string; customer: { id: string } }>;
      };
      expect(mine.items.every((item) => item.customer.id === customerId)).toBe(true);
      expect(mine.items.some((item) => item.id === quote.id)).toBe(true);
    });

    it('keeps technicians and visitors out', async () => {
      const quote = await save(packageFor([{ productId: await makeProduct(), quantity: 1 }]));
      await tech.agent.get('/api/quotes').expect(403);
      await tech.agent.get(`/api/quotes/${quote.id}`).expect(403);
      expect((await getPdf(tech, quote.versions[0].pdfUrl)).status).toBe(403);
      await request(testApp.server).get(`/api/quotes/${quote.id}`).expect(401);
      await visitor.agent
        .post('/api/quotes')
        .set('x-csrf-token', visitor.csrfToken)
        .send(packageFor([{ productId: await makeProduct(), quantity: 1 }]))
        .expect(401);
      await desk.agent
        .post(`/api/quotes/${quote.id}/versions/1/accept`)
        .set('x-csrf-token', desk.csrfToken)
        .expect(403);
      await customer.agent
        .post(`/api/quotes/${quote.id}/versions/1/send`)
        .set('x-csrf-token', customer.csrfToken)
        .expect(403);
    });

    it('lets the desk list every quote, newest first, by customer or by search', async () => {
      const mine = await save(packageFor([{ productId: await makeProduct(), quantity: 1 }]));
      const theirs = await save(
        { ...packageFor([{ productId: await makeProduct(), quantity: 1 }]), customerId: other.id },
        desk,
      );
      type List = {
        items: Array<{
          id: string;
          reference: string;
          customer: { id: string };
          latestVersion: { state: string; number: number; totalCents: number };
          versionCount: number;
          vehicleName: string;
        }>;
      };
      const all = (await desk.agent.get('/api/quotes').expect(200)).body as List;
      const ids = all.items.map((item) => item.id);
      expect(ids.indexOf(theirs.id)).toBeLessThan(ids.indexOf(mine.id));
      expect(all.items.find((item) => item.id === theirs.id)).toMatchObject({
        reference: theirs.reference,
        vehicleName: 'Vantrel Strata SR dual cab',
        versionCount: 1,
        latestVersion: { number: 1, state: 'draft', totalCents: 1995 },
      });

      const byCustomer = (await manager.agent.get(`/api/quotes?customerId=${other.id}`).expect(200))
        .body as List;
      expect(byCustomer.items.length).toBeGreaterThan(0);
      expect(byCustomer.items.every((item) => item.customer.id === other.id)).toBe(true);

      const byReference = (
        await desk.agent.get(`/api/quotes?q=${encodeURIComponent(mine.reference)}`).expect(200)
      ).body as List;
      expect(byReference.items.map((item) => item.id)).toContain(mine.id);
      expect(byReference.items.map((item) => item.id)).not.toContain(theirs.id);

      const byEmail = (
        await desk.agent
          .get(`/api/quotes?q=${encodeURIComponent(other.email.toUpperCase())}`)
          .expect(200)
      ).body as List;
      expect(byEmail.items.map((item) => item.id)).toContain(theirs.id);
      expect(byEmail.items.every((item) => item.customer.id === other.id)).toBe(true);

      const byRego = (await desk.agent.get('/api/quotes?q=nosuchrego').expect(200)).body as List;
      expect(byRego.items).toEqual([]);

      await desk.agent.get('/api/quotes?customerId=nope').expect(400);
    });
  });

  it('leaves a quote row without any version out of the lists instead of failing', async () => {
    const model = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
    const bare = await testApp.db.query<{ id: string }>(
      `insert into quote (id, created_at, updated_at, customer_id, created_by_id, vehicle_model_id, uses)
       values (gen_random_uuid(), now(), now(), $1, $1, $2, '[]') returning id`,
      [customerId, model],
    );
    try {
      for (const session of [desk, customer]) {
        const list = (await session.agent.get('/api/quotes').expect(200)).body as {
          items: { id: string }[];
        };
        expect(list.items.some((item) => item.id === bare.rows[0].id)).toBe(false);
      }
    } finally {
      await testApp.db.query('delete from quote where id = $1', [bare.rows[0].id]);
    }
  });

  it('finds quotes by the rego of the customer’s vehicle', async () => {
    const rego = (
      await testApp.db.query<{ id: string; rego: string }>(
        "select id, rego from customer_vehicle where owner_id = $1 and nickname = 'The blue ute'",
        [customerId],
      )
    ).rows[0];
    const quote = await save(
      packageFor([{ productId: await productId(testApp.db, 'KW-SVC-ALIGN'), quantity: 1 }], {
        customerVehicleId: rego.id,
      }),
    );
    const found = (
      await desk.agent
        .get(`/api/quotes?q=${encodeURIComponent(rego.rego.toLowerCase())}`)
        .expect(200)
    ).body as { items: Array<{ id: string }> };
    expect(found.items.map((item) => item.id)).toContain(quote.id);
  });
});
