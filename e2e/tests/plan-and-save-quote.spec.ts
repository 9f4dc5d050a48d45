import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { checkAccessibility, waitForAnimations, type AxeFinding } from '../support/axe';
import { launchBrowser, newPage, screenshot } from '../support/browser';
import { artifactsDir } from '../support/env';
import { getJson, mainNavigation, postJson } from '../support/session';

const JOURNEY = 'plan-and-save-quote';
/** The load the guest says they always carry (drawers and water), within a light-load kit. */
const CONSTANT_LOAD_KG = 120;

type Verdict = 'ok' | 'advisory' | 'needs-certification' | 'does-not-fit';

interface VehicleModel {
  id: string;
  make: string;
  model: string;
  variant: string;
  yearFrom: number;
  yearTo: number;
  stockTyre: string;
}

interface PlannerOption {
  product: {
    id: string;
    name: string;
    kind: string;
    attributes: { designation?: string; role?: string };
  };
  verdict: Verdict;
  suggestedBy: string[];
  metrics: { diameterChangePercent: number | null; speedometerAtTrue100Kmh: number | null };
}

interface Suggestion {
  role: string;
  required: boolean;
}

interface OptionsAnswer {
  items: PlannerOption[];
  suggestedAdditions: Suggestion[];
}

interface PreviewAnswer {
  price: {
    totalCents: number;
    depositCents: number;
    taxCents: number;
    pricesIncludeTax: boolean;
    taxRatePercent: number;
    taxRoundingMethod: string;
    lines: { description: string; amountCents: number }[];
  };
  fitReport: { verdict: Verdict };
}

interface PackageItem {
  productId: string;
  quantity: number;
}

interface QuoteSummary {
  id: string;
  reference: string;
  latestVersion: { totalCents: number; state: string };
}

/** What the guest will choose, found in the live demo catalogue before the journey starts. */
interface Plan {
  vehicle: VehicleModel;
  year: number;
  kit: PlannerOption;
  wheel: PlannerOption;
  tyre: PlannerOption;
  addOn: PlannerOption;
}

const aud = new Intl.NumberFormat('en-AU', {
  style: 'currency',
  currency: 'AUD',
  currencyDisplay: 'narrowSymbol',
});
/**
 * Money as the page shows it, by this Node process's Intl (not the app's own code); a discount
 * with the true minus sign (U+2212) that the page prints, where Intl gives a hyphen.
 */
const shownMoney = (cents: number) =>
  cents < 0 ? `\u2212${aud.format(-cents / 100)}` : aud.format(cents / 100);

/** The fit report's headline for each verdict, as the planner words it. */
const verdictTitles: Record<Verdict, string> = {
  ok: 'Fits',
  advisory: 'Fits, with advice',
  'needs-certification': 'Needs certification',
  'does-not-fit': 'Does not fit',
};

/**
 * Nominal overall diameter of a tyre from its size designation, in mm.
 */
function overallDiameterMm(designation: string): number | null {
  const metric = /^(?:P|LT)?(\d{3})\/(\d{2,3})Z?R(\d{2})/.exec(designation);
  if (metric) {
    const [width, aspect, rim] = metric.slice(1).map(Number);
    // Source: ISO 4000-1 / ETRTO nominal dimensions: D = rim × 25.4 + 2 × width × aspect / 100.
    return rim * 25.4 + (2 * width * aspect) / 100;
  }
  const flotation = /^(\d{2}(?:\.\d+)?)x\d+(?:\.\d+)?R\d{2}/.exec(designation);
  // Source: ETRTO flotation sizes (e.g. 33x12.50R17LT): the first figure is the overall diameter in inches.
  if (flotation) return Number(flotation[1]) * 25.4;
  return null;
}

const selectable = (option: PlannerOption) => option.verdict !== 'does-not-fit';
/** Charged by the workshop's policy per wheel and tyre; never offered as an add-on. */
const POLICY_SERVICES = new Set(['fitting-balancing', 'tyre-disposal']);

async function options(
  page: Page,
  vehicleModelId: string,
  items: PackageItem[],
  kind: string,
): Promise<OptionsAnswer> {
  const answer = await postJson<OptionsAnswer>(page, '/api/planner/options', {
    vehicleModelId,
    constantLoadKg: CONSTANT_LOAD_KG,
    items,
    kind,
  });
  expect(answer.status, `planner options for ${kind}`).toBe(200);
  return answer.body;
}

/**
 * A vehicle for which the catalogue has a kit, wheels and tyres that fit together, a tyre that
 * changes the overall diameter, and a part the fit report suggests but does not require (the
 * required ones the planner puts in by itself). Chosen from the API so the journey follows the
 * demo catalogue as it is, not a copy of it.
 */
async function findPlan(page: Page): Promise<Plan> {
  const models = await getJson<{ items: VehicleModel[] }>(page, '/api/vehicle-models');
  expect(models.status).toBe(200);
  for (const vehicle of models.body.items) {
    const items: PackageItem[] = [];
    const kit = (await options(page, vehicle.id, items, 'suspension-kit')).items.find(selectable);
    if (!kit) continue;
    items.push({ productId: kit.product.id, quantity: 1 });
    const wheel = (await options(page, vehicle.id, items, 'wheel')).items.find(selectable);
    if (!wheel) continue;
    items.push({ productId: wheel.product.id, quantity: 4 });
    const tyres = (await options(page, vehicle.id, items, 'tyre')).items.filter(
      (option) =>
        selectable(option) &&
        (option.metrics.diameterChangePercent ?? 0) !== 0 &&
        overallDiameterMm(option.product.attributes.designation ?? '') !== null,
    );
    // A tyre whose size change shows (1 % or more) when there is one.
    const tyre =
      tyres.find((option) => Math.abs(option.metrics.diameterChangePercent ?? 0) >= 1) ?? tyres[0];
    if (!tyre || overallDiameterMm(vehicle.stockTyre) === null) continue;
    items.push({ productId: tyre.product.id, quantity: 4 });
    // A part first, else a workshop service (the planner lists both with their suggestions).
    let addOn: PlannerOption | undefined;
    for (const kind of ['component', 'service']) {
      const answer = await options(page, vehicle.id, items, kind);
      const optional = answer.suggestedAdditions.filter((s) => !s.required).map((s) => s.role);
      addOn = answer.items.find(
        (option) =>
          selectable(option) &&
          !POLICY_SERVICES.has(option.product.attributes.role ?? '') &&
          option.suggestedBy.some((role) => optional.includes(role)),
      );
      if (addOn) break;
    }
    if (!addOn) continue;
    return { vehicle, year: vehicle.yearTo, kit, wheel, tyre, addOn };
  }
  throw new Error('The demo catalogue has no vehicle with a fitting kit, wheels, tyres and add-on');
}

let browser: Browser;
const findings: AxeFinding[] = [];
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  // Every axe finding (moderate and minor ones included), for the report.
  mkdirSync(join(artifactsDir, JOURNEY), { recursive: true });
  writeFileSync(
    join(artifactsDir, JOURNEY, 'axe-findings.json'),
    `${JSON.stringify(findings, null, 2)}\n`,
  );
});

let shots = 0;
/**
 * A numbered screenshot of the step once it has settled and fits the phone's width, then axe on
 * it (fails on serious or critical violations).
 */
async function record(page: Page, step: string, fullPage = true): Promise<void> {
  shots += 1;
  const name = `plan-${String(shots).padStart(2, '0')}-${step}`;
  await waitForAnimations(page);
  // Nothing wider than the phone: no sideways scrolling at 390 px.
  await expect
    .poll(() => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth))
    .toBeLessThanOrEqual(0);
  await screenshot(page, JOURNEY, name, { fullPage });
  findings.push(...(await checkAccessibility(page, name)));
}

/** Waits until the planner shows the step with this title as its one h1. */
async function onStep(page: Page, title: string): Promise<void> {
  await expect
    .poll(() => page.getByRole('heading', { level: 1, name: title, exact: true }).isVisible())
    .toBe(true);
  await expect.poll(() => page.getByRole('heading', { level: 1 }).count()).toBe(1);
}

async function isFocused(locator: Locator): Promise<boolean> {
  return locator.evaluate((element) => element === document.activeElement);
}

/** Presses Tab until `target` has the focus (at most `limit` presses). */
async function tabTo(page: Page, target: Locator, limit = 25): Promise<void> {
  for (let presses = 0; presses < limit; presses += 1) {
    await page.keyboard.press('Tab');
    if (await isFocused(target)) return;
  }
  throw new Error(`Tab did not reach the control within ${limit} presses`);
}

/** The text of the elements named by a control's aria-describedby. */
async function accessibleDescription(control: Locator): Promise<string> {
  return control.evaluate((element) =>
    (element.getAttribute('aria-describedby') ?? '')
      .split(/\s+/)
      .map((id) => document.getElementById(id)?.textContent ?? '')
      .join(' '),
  );
}

/** The value printed beside a label in a description list (`<dt>label</dt><dd>value</dd>`). */
async function describedValue(scope: Locator, label: string): Promise<string> {
  return scope
    .locator('dt', { hasText: label })
    .first()
    .evaluate((term) => term.nextElementSibling?.textContent ?? '');
}

/** The first number in a text such as "+3.4 %" or "96.7 km/h" (− as the minus sign). */
function firstNumber(text: string): number {
  const match = /([+−-]?)\s*(\d+(?:[.,]\d+)*)/.exec(text);
  if (!match) return Number.NaN;
  const value = Number(match[2].replace(/,/g, ''));
  return match[1] === '−' || match[1] === '-' ? -value : value;
}

describe('a guest plans a build on a phone and saves the quote', () => {
  it('plans, registers on the way, saves, and finds the quote and its PDF', async () => {
    const { context, page } = await newPage(browser, 'phone');
    // Every price preview the page asks for, with what it sent (read on the review step).
    const previews: {
      sent: { vehicleModelId: string; constantLoadKg: number; items: PackageItem[] };
      status: number;
      answer: Promise<unknown>;
    }[] = [];
    page.on('response', (response) => {
      const request = response.request();
      if (!response.url().endsWith('/api/quotes/preview') || request.method() !== 'POST') return;
      previews.push({
        sent: request.postDataJSON(),
        status: response.status(),
        answer: response.json().catch(() => null),
      });
    });
    try {
      // 1. Home page → "Start planning".
      await page.goto('/');
      const plan = await findPlan(page);
      const vehicleName = `${plan.vehicle.make} ${plan.vehicle.model} ${plan.vehicle.variant}`;
      await expect
        .poll(() => page.getByRole('link', { name: 'Start planning' }).isVisible())
        .toBe(true);
      await record(page, 'home');
      await page.getByRole('link', { name: 'Start planning' }).click();

      // 2. Vehicle: make, model, year; the stock set-up is shown.
      await page.waitForURL('**/plan/vehicle');
      await onStep(page, 'Your vehicle');
      const make = page.getByLabel('Make');
      await expect
        .poll(() => make.locator('option', { hasText: plan.vehicle.make }).count())
        .toBe(1);
      await make.selectOption(plan.vehicle.make);
      const model = page.getByLabel('Model');
      await expect.poll(() => model.locator(`option[value="${plan.vehicle.id}"]`).count()).toBe(1);
      await model.selectOption(plan.vehicle.id);
      await page.getByLabel('Year').selectOption(String(plan.year));
      await expect
        .poll(() => page.getByText(plan.vehicle.stockTyre).first().isVisible())
        .toBe(true);
      await record(page, 'vehicle');
      await page.getByRole('button', { name: 'Next' }).click();

      // 3. How you use it, by keyboard only: Tab to a choice, Space, Tab to Next, Enter.
      await page.waitForURL('**/plan/use');
      await onStep(page, 'How you use it');
      // Focus starts on the step heading, so a keyboard user begins at the top of the step.
      await expect
        .poll(() => isFocused(page.getByRole('heading', { level: 1, name: 'How you use it' })))
        .toBe(true);
      const daily = page.getByRole('checkbox', { name: 'Daily driving' });
      await tabTo(page, daily);
      await page.keyboard.press('Space');
      await expect.poll(() => daily.isChecked()).toBe(true);
      const touring = page.getByRole('checkbox', { name: 'Touring' });
      await tabTo(page, touring);
      await page.keyboard.press('Space');
      await expect.poll(() => touring.isChecked()).toBe(true);
      const load = page.getByLabel('Constant load');
      await tabTo(page, load);
      await page.keyboard.press('ControlOrMeta+A');
      await page.keyboard.type(String(CONSTANT_LOAD_KG));
      await expect.poll(() => load.inputValue()).toBe(String(CONSTANT_LOAD_KG));
      await expect
        .poll(() => page.getByText(/drawers, canopy, water, tools you always carry/i).isVisible())
        .toBe(true);
      await record(page, 'use');
      await tabTo(page, page.getByRole('button', { name: 'Next' }));
      await page.keyboard.press('Enter');

      // 4. Lift & suspension: a kit that fits this vehicle and load.
      await page.waitForURL('**/plan/lift');
      await onStep(page, 'Lift & suspension');
      const kit = page.getByRole('radio', { name: plan.kit.product.name, exact: true });
      await expect.poll(() => kit.isVisible()).toBe(true);
      await kit.check();
      await expect.poll(() => kit.isChecked()).toBe(true);
      await record(page, 'lift');
      await page.getByRole('button', { name: 'Next' }).click();

      // 5. Wheels & tyres, four of each; the diameter and speedometer effect is shown.
      await page.waitForURL('**/plan/wheels');
      await onStep(page, 'Wheels & tyres');
      const wheel = page.getByRole('radio', { name: plan.wheel.product.name, exact: true });
      await expect.poll(() => wheel.isVisible()).toBe(true);
      await wheel.check();
      const tyre = page.getByRole('radio', { name: plan.tyre.product.name, exact: true });
      await expect.poll(() => tyre.isVisible()).toBe(true);
      await tyre.check();
      const four = page.getByRole('radio', { name: /^4\b/ });
      await expect.poll(() => four.isVisible()).toBe(true);
      await four.check();
      const effect = page.getByRole('region', { name: 'With your choice' });
      await expect.poll(() => effect.getByText('Diameter change').isVisible()).toBe(true);
      await expect
        .poll(() => effect.getByText('Speedometer at a true 100 km/h').isVisible())
        .toBe(true);
      const stockMm = overallDiameterMm(plan.vehicle.stockTyre) as number;
      const newMm = overallDiameterMm(plan.tyre.product.attributes.designation ?? '') as number;
      // Source: ISO 4000-1 / ETRTO nominal diameters (above); change = (D_new − D_stock) / D_stock.
      const expectedChange = ((newMm - stockMm) / stockMm) * 100;
      // Source: ISO 4000-1 / ETRTO: a tyre rolls π·D per revolution, so a speedometer that reads
      // true on the stock tyre reads true speed × D_stock / D_new on the new one (UN ECE
      // Regulation No. 39 §5.3 then bounds the allowed error).
      const expectedSpeedo = (100 * stockMm) / newMm;
      await expect
        .poll(async () => firstNumber(await describedValue(effect, 'Diameter change')))
        .toBeCloseTo(expectedChange, 1);
      await expect
        .poll(async () =>
          firstNumber(await describedValue(effect, 'Speedometer at a true 100 km/h')),
        )
        .toBeCloseTo(expectedSpeedo, 1);
      await record(page, 'wheels');
      await page.getByRole('button', { name: 'Next' }).click();

      // 6. Add-ons: a companion the fit report suggests, marked as suggested.
      await page.waitForURL('**/plan/add-ons');
      await onStep(page, 'Add-ons');
      const addOn = page.getByRole('checkbox', { name: plan.addOn.product.name, exact: true });
      await expect.poll(() => addOn.isVisible()).toBe(true);
      await expect.poll(() => page.getByText('Suggested for your build').isVisible()).toBe(true);
      // The card says why: "Suggested: …" is read with the checkbox (its description).
      await expect.poll(() => accessibleDescription(addOn)).toMatch(/Suggested: /);
      await addOn.check();
      await expect.poll(() => addOn.isChecked()).toBe(true);
      await record(page, 'add-ons');
      await page.getByRole('button', { name: 'Next' }).click();

      // 7. Review: fit report verdict, the lines, total and deposit as the API priced them.
      await page.waitForURL('**/plan/review');
      await onStep(page, 'Review & save');
      const price = page.getByRole('table', { name: 'The price of your build, line by line' });
      await expect.poll(() => price.isVisible()).toBe(true);
      // The page priced the build with every choice in it (the newest preview it asked for).
      const withAddOn = () =>
        previews.filter((p) => p.sent.items.some((i) => i.productId === plan.addOn.product.id));
      await expect.poll(() => withAddOn().length).toBeGreaterThan(0);
      const latest = withAddOn()[withAddOn().length - 1];
      expect(latest.status).toBe(200);
      expect(latest.sent.vehicleModelId).toBe(plan.vehicle.id);
      expect(latest.sent.constantLoadKg).toBe(CONSTANT_LOAD_KG);
      expect(latest.sent.items).toEqual(
        expect.arrayContaining([
          { productId: plan.kit.product.id, quantity: 1 },
          { productId: plan.wheel.product.id, quantity: 4 },
          { productId: plan.tyre.product.id, quantity: 4 },
          { productId: plan.addOn.product.id, quantity: 1 },
        ]),
      );
      const preview = (await latest.answer) as PreviewAnswer;
      expect(preview.fitReport.verdict).not.toBe('does-not-fit');
      // The report opens with the package's verdict.
      const report = page.getByRole('region', { name: 'Fit report' });
      await expect
        .poll(() => report.getByRole('status').first().textContent())
        .toMatch(new RegExp(`^${verdictTitles[preview.fitReport.verdict]}`));
      for (const line of preview.price.lines) {
        await expect
          .poll(() => price.getByRole('row', { name: line.description }).first().textContent())
          .toContain(shownMoney(line.amountCents));
      }
      await expect
        .poll(() => price.getByRole('row', { name: /^Total/ }).textContent())
        .toContain(shownMoney(preview.price.totalCents));
      await expect
        .poll(() => price.getByRole('row', { name: /^Deposit/ }).textContent())
        .toContain(shownMoney(preview.price.depositCents));
      if (
        preview.price.pricesIncludeTax &&
        preview.price.taxRoundingMethod === 'per-invoice' &&
        preview.price.taxRatePercent === 10
      ) {
        // Source: A New Tax System (Goods and Services Tax) Act 1999 s 9-70 and s 9-75: GST is
        // 10 % of the value, and the value is 10/11 of the GST-inclusive price, so GST is 1/11.
        // From memory: rounded to the nearest cent once per invoice (s 9-90, as the API's tax
        // tests cite it).
        const gstCents = Math.round(preview.price.totalCents / 11);
        await expect
          .poll(() => price.getByRole('row', { name: /GST/ }).textContent())
          .toContain(shownMoney(gstCents));
      }
      await record(page, 'review');

      // 8. Save as a guest → asked to register or sign in.
      await page.getByRole('button', { name: 'Save quote' }).click();
      const dialog = page.getByRole('dialog', { name: 'Register or sign in to save' });
      await expect.poll(() => dialog.isVisible()).toBe(true);
      await record(page, 'save-asks-to-register', false);
      await dialog.getByRole('link', { name: 'Register' }).click();

      // 9. Register a new account; the app comes back to the review with the build kept.
      await page.waitForURL('**/register?redirectTo=*');
      const email = `planner.${Date.now()}@example.test`;
      await page.getByLabel('Name').fill('Sam Planner');
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password', { exact: true }).fill('a-long-enough-passphrase');
      await page.getByLabel('Confirm password').fill('a-long-enough-passphrase');
      await record(page, 'register');
      await page.getByRole('button', { name: 'Create account' }).click();
      await page.waitForURL('**/plan/review');
      await onStep(page, 'Review & save');
      await expect.poll(() => page.getByText(vehicleName).first().isVisible()).toBe(true);
      await expect
        .poll(() => price.getByRole('row', { name: /^Total/ }).textContent())
        .toContain(shownMoney(preview.price.totalCents));
      await record(page, 'review-signed-in');

      // 10. Save: the quote opens in My quotes with its reference and total.
      await page.getByRole('button', { name: 'Save quote' }).click();
      await page.waitForURL(/\/account\/quotes\/[0-9a-f-]{36}$/);
      const quoteId = new URL(page.url()).pathname.split('/').pop() as string;
      const mine = await getJson<{ items: QuoteSummary[] }>(page, '/api/quotes');
      expect(mine.status).toBe(200);
      expect(mine.body.items).toHaveLength(1);
      const saved = mine.body.items[0];
      expect(saved.id).toBe(quoteId);
      expect(saved.reference).toMatch(/^Q-\d{6}$/);
      expect(saved.latestVersion.totalCents).toBe(preview.price.totalCents);
      await expect
        .poll(() =>
          page.getByRole('heading', { level: 1, name: new RegExp(saved.reference) }).isVisible(),
        )
        .toBe(true);
      await expect
        .poll(() => page.getByText(shownMoney(saved.latestVersion.totalCents)).first().isVisible())
        .toBe(true);
      await record(page, 'quote');

      // The PDF of version 1 answers as a PDF document.
      const pdfLink = page.getByRole('link', { name: 'PDF of version 1' });
      await expect.poll(() => pdfLink.isVisible()).toBe(true);
      const pdfHref = (await pdfLink.getAttribute('href')) as string;
      expect(pdfHref).toBe(`/api/quotes/${quoteId}/versions/1/pdf`);
      const pdf = await page.request.get(pdfHref);
      expect(pdf.status()).toBe(200);
      expect(pdf.headers()['content-type']).toBe('application/pdf');
      expect(pdf.headers()['content-disposition']).toContain(`quote-${saved.reference}-v1.pdf`);
      // Source: ISO 32000-1 §7.5.2: a PDF file begins with the header "%PDF-".
      expect((await pdf.body()).subarray(0, 5).toString('latin1')).toBe('%PDF-');

      // 11. My quotes lists it, from the customer navigation.
      await mainNavigation(page).getByRole('link', { name: 'My quotes' }).click();
      await page.waitForURL('**/account/quotes');
      const listed = page.getByRole('link', { name: new RegExp(saved.reference) });
      await expect.poll(() => listed.isVisible()).toBe(true);
      await expect
        .poll(() => page.getByText(shownMoney(saved.latestVersion.totalCents)).first().isVisible())
        .toBe(true);
      await record(page, 'my-quotes');
    } finally {
      await context.close();
    }
  }, 240_000);
});
