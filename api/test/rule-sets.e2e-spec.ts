import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { productIds, ruleSetId, vehicleModelId } from './support/catalogue';
import { signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface RuleSet {
  id: string;
  name: string;
  isDefault: boolean;
  limits: Record<
    string,
    { enabled: boolean; value: number | null; unit: string | null; source: string; label: string }
  >;
}

describe('rule sets (HTTP)', () => {
  let testApp: TestApp;
  let manager: Session;
  let desk: Session;

  beforeAll(async () => {
    testApp = await startTestApp();
    manager = await signInAs(testApp, 'manager');
    desk = await signInAs(testApp, 'desk');
  });

  afterAll(async () => {
    await testApp.close();
  });

  const patch = (id: string, limits: unknown) =>
    manager.agent
      .patch(`/api/rule-sets/${id}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({ limits });

  const stored = async (id: string) =>
    (await testApp.db.query('select xmin::text, * from rule_set where id = $1', [id])).rows;

  it('lists both seeded rule sets, the default first, every rule with its source and label', async () => {
    const response = await desk.agent.get('/api/rule-sets').expect(200);
    const items = (response.body as { items: RuleSet[] }).items;
    expect(items.map((item) => [item.name, item.isDefault])).toEqual([
      ['National code defaults', true],
      ['Stricter example', false],
    ]);
    const lift = items[0].limits.suspensionLiftMaxMm;
    // Source: VicRoads VSI 8 §13.2 quoting VSB 14 Section LS: 50 mm without certification.
    expect(lift).toMatchObject({ enabled: true, value: 50, unit: 'mm' });
    expect(lift.source).toMatch(/VSI 8 §13\.2/);
    expect(lift.label).toBe('Largest suspension raise or lowering without certification');
    expect(items[0].limits.boltPatternMatch).toMatchObject({
      enabled: true,
      value: null,
      unit: null,
    });
    expect(Object.keys(items[0].limits)).toHaveLength(28);
    expect(items[1].limits.suspensionLiftMaxMm.value).toBe(40);
    const one = await desk.agent.get(`/api/rule-sets/${items[1].id}`).expect(200);
    expect(one.body).toEqual(items[1]);
  });

  it('refuses bad changes with a field error per rule and changes nothing', async () => {
    const id = await ruleSetId(testApp.db, 'National code defaults');
    const before = await stored(id);
    const cases: Array<[unknown, Record<string, string[]>]> = [
      [
        { suspensionLiftMaxMm: { value: -5 } },
        { 'limits.suspensionLiftMaxMm.value': ['must be a number of zero or more'] },
      ],
      [
        { suspensionLiftMaxMm: { value: 'fifty' } },
        { 'limits.suspensionLiftMaxMm.value': ['must be a number'] },
      ],
      [
        { jointAngleThresholdDeg: { value: 95 } },
        { 'limits.jointAngleThresholdDeg.value': ['an angle must be below 90°'] },
      ],
      [
        { passengerTyreLightTruckDerateFactor: { value: 0.9 } },
        {
          'limits.passengerTyreLightTruckDerateFactor.value': ['a derate factor must be 1 or more'],
        },
      ],
      [
        { boltPatternMatch: { value: 1 } },
        { 'limits.boltPatternMatch.value': ['this rule is a switch and has no value'] },
      ],
      [
        { liftEverything: { enabled: true } },
        { 'limits.liftEverything': ['is not a rule Liftwright knows'] },
      ],
      [
        { combinedLiftMaxMm: { enabled: 'yes', source: 'mine' } },
        {
          'limits.combinedLiftMaxMm.enabled': ['must be true or false'],
          'limits.combinedLiftMaxMm.source': ['is not an expected field'],
        },
      ],
      [
        { combinedLiftMaxMm: 75 },
        { 'limits.combinedLiftMaxMm': ['must be an object with enabled and/or value'] },
      ],
    ];
    for (const [limits, fieldErrors] of cases) {
      const response = await patch(id, limits).expect(400);
      expect(response.body.fieldErrors).toEqual(fieldErrors);
    }
    // A good change next to a bad one is not half-applied.
    await patch(id, {
      trackIncreaseMaxMm: { value: 50 },
      suspensionLiftMaxMm: { value: -1 },
    }).expect(400);
    await manager.agent
      .patch(`/api/rule-sets/${id}`)
      .set('x-csrf-token', manager.csrfToken)
      .send({})
      .expect(400);
    expect(await stored(id)).toEqual(before);
  });

  it('applies a change, which the fit report then uses', async () => {
    const id = await ruleSetId(testApp.db, 'Stricter example');
    const original = (await manager.agent.get(`/api/rule-sets/${id}`).expect(200)).body as RuleSet;
    try {
      const response = await patch(id, {
        suspensionLiftMaxMm: { value: 45 },
        diameterChangeMaxPercent: { enabled: false },
      }).expect(200);
      const changed = response.body as RuleSet;
      expect(changed.limits.suspensionLiftMaxMm).toMatchObject({
        enabled: true,
        value: 45,
        unit: 'mm',
      });
      expect(changed.limits.suspensionLiftMaxMm.source).toBe(
        original.limits.suspensionLiftMaxMm.source,
      );
      expect(changed.limits.diameterChangeMaxPercent.enabled).toBe(false);

      const strata = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
      const report = await manager.agent
        .post('/api/fitment/check')
        .set('x-csrf-token', manager.csrfToken)
        .send({
          vehicleModelId: strata,
          productIds: await productIds(testApp.db, ['BR-STR-50-L']),
          ruleSetId: id,
        })
        .expect(200);
      const lift = (
        report.body as {
          checks: Array<{ code: string; verdict: string; numbers: Record<string, number> }>;
        }
      ).checks.find((check) => check.code === 'suspension-lift');
      expect(lift).toMatchObject({ verdict: 'needs-certification', numbers: { limitMm: 45 } });
    } finally {
      await patch(id, {
        suspensionLiftMaxMm: { value: original.limits.suspensionLiftMaxMm.value },
        diameterChangeMaxPercent: { enabled: original.limits.diameterChangeMaxPercent.enabled },
      }).expect(200);
    }
  });

  it('answers 404 for an unknown rule set', async () => {
    await patch('00000000-0000-4000-8000-000000000000', {
      suspensionLiftMaxMm: { value: 40 },
    }).expect(404);
    await desk.agent.get('/api/rule-sets/00000000-0000-4000-8000-000000000000').expect(404);
  });
});
