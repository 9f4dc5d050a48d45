import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { launchBrowser, newPage, screenshot } from '../support/browser';
import { demoUsers } from '../support/env';
import { getJson, mainNavigation, signIn } from '../support/session';

const JOURNEY = 'manage-catalogue';

/** The fields of a product this journey reads (GET /api/products). */
interface Product {
  id: string;
  sku: string;
  kind: string;
  name: string;
  brand: string;
  priceCents: number;
  labourMinutes: number;
  bayKind: string | null;
  stockQty: number;
  leadDays: number;
  active: boolean;
  attributes: Record<string, unknown>;
}

interface RuleSet {
  id: string;
  name: string;
  jurisdiction: string;
  isDefault: boolean;
  limits: Record<
    string,
    { enabled: boolean; value: number | null; unit: string | null; source: string; label: string }
  >;
}

interface VehicleModel {
  id: string;
  make: string;
  model: string;
  variant: string;
  yearFrom: number;
  yearTo: number;
  boltPattern: string;
  centreBoreMm: number;
}

let browser: Browser;
let workDir: string;
beforeAll(async () => {
  browser = await launchBrowser();
  workDir = mkdtempSync(join(tmpdir(), 'liftwright-price-list-'));
});
afterAll(async () => {
  await browser?.close();
  if (workDir) rmSync(workDir, { recursive: true, force: true });
});

/**
 * The price as the page should show it: Australian dollars formatted by the browser-independent
 * Intl implementation of this Node process (an outside reference, not the app's own code).
 */
const aud = new Intl.NumberFormat('en-AU', {
  style: 'currency',
  currency: 'AUD',
  currencyDisplay: 'narrowSymbol',
});
function shownPrice(cents: number): string {
  return aud.format(cents / 100);
}

/** Cents as the price list writes dollars ("1249.00"), by integer arithmetic. */
function dollarsText(cents: number): string {
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
}

/**
 * The first price from `wholeDollars` up whose dollars text, read as a float and multiplied by
 * 100, is not the whole number of cents (so truncating code would lose a cent).
 * Source: IEEE 754-2019 binary64 — 0.29 and most two-decimal fractions have no exact binary form.
 */
function floatTrapCents(wholeDollars: number): number {
  for (let whole = wholeDollars; ; whole += 1) {
    for (let cents = 1; cents < 100; cents += 1) {
      const text = `${whole}.${String(cents).padStart(2, '0')}`;
      if (Number(text) * 100 < whole * 100 + cents) return whole * 100 + cents;
    }
  }
}

/** One CSV field, quoted when it holds a comma, quote or line break (RFC 4180 §2.6–2.7). */
function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

const CSV_HEADER =
  'sku,kind,name,brand,price,labour_minutes,bay_kind,stock_qty,lead_days,active,attributes';

function csvRow(fields: string[]): string {
  return fields.map(csvField).join(',');
}

/** A stored product as a price-list row, with another price. */
function priceListRow(product: Product, priceText: string): string {
  return csvRow([
    product.sku,
    product.kind,
    product.name,
    product.brand,
    priceText,
    String(product.labourMinutes),
    product.bayKind ?? '',
    String(product.stockQty),
    String(product.leadDays),
    String(product.active),
    JSON.stringify(product.attributes),
  ]);
}

/** The grid row (role "row") whose SKU cell holds exactly this SKU. */
function gridRow(page: Page, sku: string): Locator {
  return page
    .getByRole('row')
    .filter({ has: page.getByRole('gridcell', { name: sku, exact: true }) });
}

/** Narrows the catalogue grid to one SKU through the search box and waits for its row. */
async function findInCatalogue(page: Page, sku: string): Promise<Locator> {
  await page.getByRole('searchbox', { name: 'Search products' }).fill(sku);
  const row = gridRow(page, sku);
  await row.waitFor();
  await expect.poll(() => page.getByRole('button', { name: /^Edit / }).count()).toBe(1);
  return row;
}

async function productsNow(page: Page): Promise<Product[]> {
  const { status, body } = await getJson<{ items: Product[] }>(
    page,
    '/api/products?includeInactive=true',
  );
  expect(status).toBe(200);
  return body.items;
}

describe('the manager keeps the catalogue, its price list and the rules', () => {
  it('edits a price, imports a CSV price list, and reviews a rule set (desktop)', async () => {
    const { context, page } = await newPage(browser, 'desktop');
    await signIn(page, demoUsers.manager);
    await page.waitForURL('**/manage');

    await mainNavigation(page).getByRole('link', { name: 'Catalogue' }).click();
    await page.waitForURL('**/manage/catalogue');
    await page.getByRole('heading', { level: 1, name: 'Catalogue' }).waitFor();
    for (const name of ['Import price list', 'Export CSV', 'New product']) {
      expect(await page.getByRole('button', { name }).isVisible(), name).toBe(true);
    }

    // Seeded products, sorted so the run picks the same ones each time.
    const seeded = (await productsNow(page))
      .filter((product) => product.active && !product.sku.startsWith('E2E-'))
      .sort((a, b) => a.sku.localeCompare(b.sku));
    const edited = seeded.find((product) => product.kind === 'suspension-kit');
    const updatedByFile = seeded.find((product) => product.kind === 'tyre');
    expect(edited, 'a seeded suspension kit').toBeDefined();
    expect(updatedByFile, 'a seeded tyre').toBeDefined();

    // ---- Edit one product's price -------------------------------------------------------
    // A price that binary floating point gets wrong when multiplied by 100 (like 0.29 * 100 =
    // 28.999...): the integer cents the API stores must still come out exact.
    const newCents = floatTrapCents(Math.floor(edited!.priceCents / 100) + 13);
    let row = await findInCatalogue(page, edited!.sku);
    expect(await row.textContent()).toContain(shownPrice(edited!.priceCents));
    await page.getByRole('button', { name: `Edit ${edited!.sku}` }).click();
    const editor = page.getByRole('dialog', { name: `Edit ${edited!.sku}` });
    await editor.waitFor();
    const priceField = editor.getByLabel('Price (AUD)');
    expect(await priceField.inputValue()).toBe(dollarsText(edited!.priceCents));

    // The form's schema mirrors the API: at most two decimals.
    await priceField.fill('12.345');
    await editor.getByRole('button', { name: 'Save changes' }).click();
    await editor.getByText('Enter dollars with at most 2 decimals').waitFor();
    expect(await priceField.getAttribute('aria-invalid')).toBe('true');

    await priceField.fill(dollarsText(newCents));
    await editor.getByRole('button', { name: 'Save changes' }).click();
    await editor.waitFor({ state: 'hidden' });
    await page.getByText(`Saved ${edited!.sku}.`).waitFor();
    row = gridRow(page, edited!.sku);
    await expect.poll(() => row.textContent()).toContain(shownPrice(newCents));

    const stored = await getJson<Product>(page, `/api/products/${edited!.id}`);
    expect(stored.status).toBe(200);
    expect(stored.body.priceCents).toBe(newCents);

    // ---- Import a price list: one updated, one new, one rejected --------------------------
    const stamp = Date.now().toString(36).toUpperCase();
    const newSku = `E2E-SVC-${stamp}`;
    const rejectedSku = `E2E-BAD-${stamp}`;
    const fileCents = updatedByFile!.priceCents + 500;
    const csv = [
      CSV_HEADER,
      priceListRow(updatedByFile!, dollarsText(fileCents)),
      csvRow([
        newSku,
        'service',
        'Wash-down before fitting',
        'Kestrelmere workshop',
        '25.00',
        '20',
        'tyre',
        '0',
        '0',
        'true',
        JSON.stringify({ role: 'fitting-balancing', perWheel: false }),
      ]),
      // Three decimals: the API refuses the row and says why.
      csvRow([
        rejectedSku,
        'service',
        'Priced to a tenth of a cent',
        'Kestrelmere workshop',
        '12.345',
        '0',
        '',
        '0',
        '0',
        'true',
        JSON.stringify({ role: 'alignment', perWheel: false }),
      ]),
    ].join('\n');
    const csvPath = join(workDir, 'price-list.csv');
    writeFileSync(csvPath, `${csv}\n`);

    await page.getByRole('searchbox', { name: 'Search products' }).fill('');
    await page.getByRole('button', { name: 'Import price list' }).click();
    const importer = page.getByRole('dialog', { name: 'Import price list' });
    await importer.waitFor();
    const fileInput = importer.getByLabel('Price list file (CSV)');

    // A file that is not text is refused by the API's content check, with the reason shown.
    // Source: PNG signature bytes, ISO/IEC 15948 (PNG) §5.2.
    const pngSignature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]);
    await fileInput.setInputFiles({
      name: 'price-list.csv',
      mimeType: 'text/csv',
      buffer: pngSignature,
    });
    const refusal = importer.getByRole('alert');
    await refusal.waitFor();
    expect(await refusal.textContent()).toMatch(/not imported.*not a CSV price list/);
    expect(await importer.getByRole('button', { name: 'Apply changes' }).isDisabled()).toBe(true);

    await fileInput.setInputFiles(csvPath);

    const summary = importer.getByRole('list', { name: 'Rows by status' });
    await summary.waitFor();
    const counts = await summary.getByRole('listitem').allTextContents();
    expect(counts).toEqual(['1 new', '1 updated', '0 unchanged', '1 rejected']);

    const previewRow = (sku: string) =>
      importer.getByRole('row').filter({ has: page.getByRole('cell', { name: sku, exact: true }) });
    expect(await previewRow(newSku).textContent()).toContain('New');
    const updatedText = await previewRow(updatedByFile!.sku).textContent();
    expect(updatedText).toContain('Updated');
    expect(updatedText).toContain(
      `Price: ${shownPrice(updatedByFile!.priceCents)} → ${shownPrice(fileCents)}`,
    );
    const rejectedText = await previewRow(rejectedSku).textContent();
    expect(rejectedText).toContain('Rejected');
    expect(rejectedText).toMatch(/price .*more than 2 decimals/);
    expect(await importer.getByText('Apply 2 changes: 1 new, 1 updated').count()).toBe(1);
    await screenshot(page, JOURNEY, 'import-preview');

    // Nothing is written by the preview.
    expect((await productsNow(page)).some((product) => product.sku === newSku)).toBe(false);

    await importer.getByRole('button', { name: 'Apply changes' }).click();
    await importer.waitFor({ state: 'hidden' });
    await page
      .getByText('Price list applied: 1 new product added, 1 updated. 1 rejected row was skipped.')
      .waitFor();

    // The grid shows what was written (its query was refreshed)...
    row = await findInCatalogue(page, newSku);
    await expect.poll(() => row.textContent()).toContain(shownPrice(2500));
    row = await findInCatalogue(page, updatedByFile!.sku);
    await expect.poll(() => row.textContent()).toContain(shownPrice(fileCents));
    // ...and so does the API; the rejected row changed nothing.
    const after = await productsNow(page);
    expect(after.find((product) => product.sku === newSku)).toMatchObject({
      kind: 'service',
      priceCents: 2500,
      labourMinutes: 20,
      bayKind: 'tyre',
    });
    expect(after.find((product) => product.sku === updatedByFile!.sku)?.priceCents).toBe(fileCents);
    expect(after.some((product) => product.sku === rejectedSku)).toBe(false);

    // "Export CSV" saves the catalogue in the import's columns, the new product included.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export CSV' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.csv$/);
    const exportedPath = join(workDir, 'export.csv');
    await download.saveAs(exportedPath);
    const exported = readFileSync(exportedPath, 'utf8').split(/\r?\n/);
    expect(exported[0]).toBe(CSV_HEADER);
    expect(exported.some((line) => line.startsWith(`${newSku},service,`))).toBe(true);
    expect(exported.some((line) => line.startsWith(`${rejectedSku},`))).toBe(false);

    // Switched off, the journey's product stays in the manager's grid but leaves the public
    // list (so repeated runs do not offer customers test products).
    await findInCatalogue(page, newSku);
    await page.getByRole('button', { name: `Edit ${newSku}` }).click();
    const newEditor = page.getByRole('dialog', { name: `Edit ${newSku}` });
    await newEditor.waitFor();
    const activeSwitch = newEditor.getByLabel('Active', { exact: true });
    expect(await activeSwitch.isChecked()).toBe(true);
    await activeSwitch.uncheck();
    await newEditor.getByRole('button', { name: 'Save changes' }).click();
    await newEditor.waitFor({ state: 'hidden' });
    await page.getByText(`Saved ${newSku}.`).waitFor();
    expect((await productsNow(page)).find((p) => p.sku === newSku)?.active).toBe(false);
    const publicList = await getJson<{ items: Product[] }>(page, '/api/products');
    expect(publicList.status).toBe(200);
    expect(publicList.body.items.some((p) => p.sku === newSku)).toBe(false);

    // A server-side check lands on its field: the API reads the tyre size with the fit engine's
    // parser (the form only checks it is there), and nothing is added.
    await page.getByRole('button', { name: 'New product' }).click();
    const creator = page.getByRole('dialog', { name: 'New product' });
    await creator.waitFor();
    await creator.getByLabel('Kind').selectOption('tyre');
    await creator.getByLabel('SKU').fill(`E2E-TYR-${stamp}`);
    await creator.getByLabel('Name').fill('Trial tyre with a misspelt size');
    await creator.getByLabel('Brand').fill('Quendra');
    await creator.getByLabel('Price (AUD)').fill('300.00');
    const sizeField = creator.getByLabel('Tyre size');
    await sizeField.fill('265/70X17 115T');
    await creator.getByRole('button', { name: 'Add product' }).click();
    await expect.poll(() => sizeField.getAttribute('aria-invalid')).toBe('true');
    const sizeErrorId = await sizeField.getAttribute('aria-describedby');
    expect(sizeErrorId).toBeTruthy();
    expect((await page.locator(`[id="${sizeErrorId}"]`).textContent())?.length).toBeGreaterThan(5);
    await expect.poll(() => creator.isVisible()).toBe(true);
    expect((await productsNow(page)).some((p) => p.sku === `E2E-TYR-${stamp}`)).toBe(false);
    await creator.getByRole('button', { name: 'Cancel' }).click();
    await creator.waitFor({ state: 'hidden' });

    await page.getByRole('searchbox', { name: 'Search products' }).fill('');
    await expect.poll(() => page.getByRole('button', { name: /^Edit / }).count()).toBe(25);
    await screenshot(page, JOURNEY, 'catalogue');

    // ---- Vehicles: the spec sheets, with the editor's cross-field check -------------------
    await mainNavigation(page).getByRole('link', { name: 'Vehicles' }).click();
    await page.waitForURL('**/manage/vehicles');
    await page.getByRole('heading', { level: 1, name: 'Vehicles' }).waitFor();
    await expect
      .poll(() => page.getByRole('button', { name: 'New vehicle' }).isVisible())
      .toBe(true);
    const vehicles = await getJson<{ items: VehicleModel[] }>(page, '/api/vehicle-models');
    expect(vehicles.status).toBe(200);
    const vehicle = vehicles.body.items[0];
    const vehicleLabel = `${vehicle.make} ${vehicle.model} ${vehicle.variant}`;
    await page.getByRole('button', { name: `Edit ${vehicleLabel}` }).click();
    const specSheet = page.getByRole('dialog', { name: `Edit ${vehicleLabel}` });
    await specSheet.waitFor();
    await specSheet.getByLabel('Last model year').fill(String(vehicle.yearFrom - 1));
    await specSheet.getByLabel('Bolt pattern').fill('6-139.7');
    await specSheet.getByRole('button', { name: 'Save changes' }).click();
    await specSheet.getByText('Must not be before the first model year.').waitFor();
    await specSheet.getByText('Write stud count x PCD in mm, like 6x139.7.').waitFor();
    await screenshot(page, JOURNEY, 'vehicle-editor');

    // Corrected, with one real change (half a millimetre of centre bore), it saves; then the
    // demo value goes back through the same editor.
    const changedBore = Math.round((vehicle.centreBoreMm + 0.5) * 10) / 10;
    await specSheet.getByLabel('Last model year').fill(String(vehicle.yearTo));
    await specSheet.getByLabel('Bolt pattern').fill(vehicle.boltPattern);
    await specSheet.getByLabel('Centre bore (mm)').fill(String(changedBore));
    await specSheet.getByRole('button', { name: 'Save changes' }).click();
    await specSheet.waitFor({ state: 'hidden' });
    await page.getByText(`Saved ${vehicleLabel}.`).waitFor();
    const changedVehicle = await getJson<VehicleModel>(page, `/api/vehicle-models/${vehicle.id}`);
    expect(changedVehicle.body).toMatchObject({
      centreBoreMm: changedBore,
      yearTo: vehicle.yearTo,
      boltPattern: vehicle.boltPattern,
    });
    await page.getByRole('button', { name: `Edit ${vehicleLabel}` }).click();
    await specSheet.waitFor();
    expect(await specSheet.getByLabel('Centre bore (mm)').inputValue()).toBe(String(changedBore));
    await specSheet.getByLabel('Centre bore (mm)').fill(String(vehicle.centreBoreMm));
    await specSheet.getByRole('button', { name: 'Save changes' }).click();
    await specSheet.waitFor({ state: 'hidden' });
    const restoredVehicle = await getJson<VehicleModel>(page, `/api/vehicle-models/${vehicle.id}`);
    expect(restoredVehicle.body.centreBoreMm).toBe(vehicle.centreBoreMm);
    await screenshot(page, JOURNEY, 'vehicles');

    // ---- Rules: each limit with its label, unit and source; a change saved and undone -----
    await mainNavigation(page).getByRole('link', { name: 'Rules' }).click();
    await page.waitForURL('**/manage/rules');
    await page.getByRole('heading', { level: 1, name: 'Rules' }).waitFor();
    expect(await page.getByText(/confirm it with the road authority/).count()).toBe(1);

    const ruleSets = await getJson<{ items: RuleSet[] }>(page, '/api/rule-sets');
    expect(ruleSets.status).toBe(200);
    expect(ruleSets.body.items.length).toBeGreaterThanOrEqual(2);
    const defaultSet = ruleSets.body.items.find((set) => set.isDefault)!;
    const otherSet = ruleSets.body.items.find((set) => !set.isDefault)!;
    // A limit in millimetres whose value differs between the two sets, so the picker's switch
    // from one set to the other shows in the field.
    const [key, limit] = Object.entries(defaultSet.limits).find(
      ([ruleKey, rule]) =>
        rule.value !== null && rule.unit === 'mm' && otherSet.limits[ruleKey]?.value !== rule.value,
    )!;
    expect(limit, 'a millimetre limit the two sets set differently').toBeDefined();
    const rule = page.getByRole('group', { name: limit.label, exact: true });
    expect(await rule.textContent()).toContain(limit.source);
    const valueField = rule.getByLabel(`Value (${limit.unit})`);
    expect(await valueField.inputValue()).toBe(String(limit.value));
    expect(await rule.getByLabel('Enabled').isChecked()).toBe(limit.enabled);

    // The schema mirrors the API: no negative limits.
    await valueField.fill('-5');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await rule.getByText('Use zero or more.').waitFor();

    const changedValue = limit.value! + 5;
    await valueField.fill(String(changedValue));
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(`Saved 1 rule of ${defaultSet.name}.`).waitFor();
    let saved = await getJson<RuleSet>(page, `/api/rule-sets/${defaultSet.id}`);
    expect(saved.body.limits[key].value).toBe(changedValue);
    await screenshot(page, JOURNEY, 'rules');

    // Put the demo value back, through the same screen.
    await valueField.fill(String(limit.value));
    await page.getByRole('button', { name: 'Save changes' }).click();
    await expect
      .poll(async () => (await getJson<RuleSet>(page, `/api/rule-sets/${defaultSet.id}`)).body)
      .toMatchObject({ limits: { [key]: { value: limit.value } } });

    // The other rule set opens from the picker, with its own values.
    await page.getByLabel('Rule set').selectOption(otherSet.id);
    await page.getByText(otherSet.jurisdiction, { exact: true }).waitFor();
    expect(new URL(page.url()).searchParams.get('set')).toBe(otherSet.id);
    const otherRule = page.getByRole('group', {
      name: otherSet.limits[key].label,
      exact: true,
    });
    expect(await otherRule.getByLabel(`Value (${limit.unit})`).inputValue()).toBe(
      String(otherSet.limits[key].value),
    );
    saved = await getJson<RuleSet>(page, `/api/rule-sets/${otherSet.id}`);
    expect(saved.body.limits[key].value).toBe(otherSet.limits[key].value);
    await context.close();
  });

  it('the catalogue, vehicles and rules fit a phone', async () => {
    const { context, page } = await newPage(browser, 'phone');
    await signIn(page, demoUsers.manager);
    await page.waitForURL('**/manage');
    const pageWidth = () => page.evaluate(() => document.documentElement.scrollWidth);

    await mainNavigation(page).getByRole('link', { name: 'Catalogue' }).click();
    await page.waitForURL('**/manage/catalogue');
    await page.getByRole('heading', { level: 1, name: 'Catalogue' }).waitFor();
    await expect.poll(() => page.getByRole('button', { name: /^Edit / }).count()).toBe(25);
    // The grid shows a compact column set: nothing pushes the page sideways.
    expect(await pageWidth()).toBeLessThanOrEqual(390);
    await screenshot(page, JOURNEY, 'catalogue');

    await page
      .getByRole('button', { name: /^Edit / })
      .first()
      .click();
    const editor = page.getByRole('dialog', { name: /^Edit / });
    await editor.waitFor();
    await expect.poll(() => editor.getByLabel('Price (AUD)').isVisible()).toBe(true);
    await editor.getByRole('button', { name: 'Cancel' }).click();
    await editor.waitFor({ state: 'hidden' });

    await page.getByRole('button', { name: 'Import price list' }).click();
    const importer = page.getByRole('dialog', { name: 'Import price list' });
    await importer.waitFor();
    expect(await importer.getByLabel('Price list file (CSV)').count()).toBe(1);
    await importer.getByRole('button', { name: 'Cancel' }).click();
    await importer.waitFor({ state: 'hidden' });

    await mainNavigation(page).getByRole('link', { name: 'Vehicles' }).click();
    await page.waitForURL('**/manage/vehicles');
    await page.getByRole('heading', { level: 1, name: 'Vehicles' }).waitFor();
    await expect
      .poll(() => page.getByRole('button', { name: /^Edit / }).count())
      .toBeGreaterThan(0);
    expect(await pageWidth()).toBeLessThanOrEqual(390);
    await screenshot(page, JOURNEY, 'vehicles');

    // Past five destinations, the phone's bottom bar keeps the rest under "More".
    await mainNavigation(page).getByRole('button', { name: 'More' }).click();
    // The menu opens over the page (outside the nav element), named by its button.
    await page.getByRole('menu').getByRole('menuitem', { name: 'Rules' }).click();
    await page.waitForURL('**/manage/rules');
    await page.getByRole('heading', { level: 1, name: 'Rules' }).waitFor();
    await page.getByRole('button', { name: 'Save changes' }).waitFor();
    expect(await pageWidth()).toBeLessThanOrEqual(390);
    await screenshot(page, JOURNEY, 'rules');
    await context.close();
  });
});
