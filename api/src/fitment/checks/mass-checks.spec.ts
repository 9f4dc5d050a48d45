import { describe, expect, it } from 'vitest';
import { buildFitmentContext } from '../fitment-context';
import { korrinRidgebackUte, ranCheck } from '../fitment.fixtures';
import type { FitmentInput } from '../fitment.types';
import { defaultRuleSetLimits } from '../rule-set-limits';
import { checkGrossVehicleMass } from './mass-checks';

function ute(extra: Partial<FitmentInput>) {
  return buildFitmentContext({ vehicle: korrinRidgebackUte, ...extra });
}

describe('gross vehicle mass with accessories', () => {
  // Source: the vehicle maker's GVM (compliance plate): kerb + accessories + load + occupants ≤ GVM; 75 kg per occupant is
  // Liftwright's rule-set default (no published source).
  it('passes 2150 + 90 + 120 + 2 × 75 = 2510 kg under a 3100 kg GVM', () => {
    const check = ranCheck(
      checkGrossVehicleMass(
        ute({ usage: { constantLoadKg: 120, accessoriesMassKg: 90, occupantCount: 2 } }),
        defaultRuleSetLimits,
      ),
    );
    expect(check).toMatchObject({
      verdict: 'ok',
      numbers: { totalMassKg: 2510, gvmKg: 3100, marginKg: 590, occupantMassKg: 150 },
    });
  });

  it('needs certification 100 kg over the GVM, counting component masses', () => {
    const check = ranCheck(
      checkGrossVehicleMass(
        ute({
          usage: { constantLoadKg: 700, accessoriesMassKg: 150, occupantCount: 2 },
          components: [{ role: 'accessory', name: 'Steel bar', massKg: 50 }],
        }),
        defaultRuleSetLimits,
      ),
    );
    expect(check).toMatchObject({
      verdict: 'needs-certification',
      numbers: { accessoriesMassKg: 200, totalMassKg: 3200, marginKg: -100 },
    });
    expect(check.message).toContain('GVM');
  });

  it('passes at exactly the GVM and leaves occupants out when the allowance is off', () => {
    const exact = ute({ usage: { constantLoadKg: 875, occupantCount: 1 } });
    expect(ranCheck(checkGrossVehicleMass(exact, defaultRuleSetLimits))).toMatchObject({
      verdict: 'ok',
      numbers: { marginKg: 0 },
    });
    const noOccupants = {
      ...defaultRuleSetLimits,
      occupantAllowanceKg: { ...defaultRuleSetLimits.occupantAllowanceKg, enabled: false },
    };
    expect(
      ranCheck(checkGrossVehicleMass(ute({ usage: { constantLoadKg: 950 } }), noOccupants)),
    ).toMatchObject({
      verdict: 'ok',
      numbers: { occupantMassKg: 0, totalMassKg: 3100 },
    });
    expect(
      ranCheck(checkGrossVehicleMass(ute({ usage: { constantLoadKg: 950 } }), defaultRuleSetLimits))
        .verdict,
    ).toBe('needs-certification');
  });
});
