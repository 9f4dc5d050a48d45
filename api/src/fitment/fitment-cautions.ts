/** Cautions shown with the report: always the guide note; with a lift or a wheel change, the rest. */
import { type FitmentContext, diameterChangeOverStockMm } from './fitment-context';
import type { Caution } from './fitment.types';

export const GUIDE_ONLY_CAUTION: Caution = {
  code: 'guide-only',
  message:
    "Liftwright's report is a guide: local codes and licensed practice decide. Confirm the limits with your road authority.",
};

const LIFT_CAUTIONS: Caution[] = [
  {
    code: 'handling-and-rollover',
    message:
      'A raised vehicle has a higher centre of gravity: handling, braking and rollover behaviour change, most of all when loaded or off-road.',
  },
  {
    code: 'modification-limits',
    message:
      "Local modification limits apply; beyond them the vehicle needs an engineer's certificate before it is driven on the road.",
  },
  {
    code: 'insurer',
    message: 'Tell your insurer about the modification before you drive the vehicle.',
  },
];

const WHEEL_CAUTIONS: Caution[] = [
  {
    code: 'wheel-nut-retorque',
    message: 'Have the wheel nuts re-torqued after the first 100 km.',
  },
  {
    code: 'qualified-fitting',
    message: 'The work must be fitted by qualified technicians.',
  },
];

/** The vehicle's height changes: a suspension lift or lowering, or larger tyres. */
export function isLiftOrHeightChange(context: FitmentContext): boolean {
  const kit = context.input.suspensionKit;
  const suspensionChanged = kit !== undefined && (kit.frontLiftMm !== 0 || kit.rearLiftMm !== 0);
  return suspensionChanged || (diameterChangeOverStockMm(context) ?? 0) > 0;
}

export function fitmentCautions(context: FitmentContext): Caution[] {
  const lifted = isLiftOrHeightChange(context);
  const workOnWheels =
    lifted ||
    context.wheelReplaced ||
    context.tyreReplaced ||
    context.input.suspensionKit !== undefined;
  return [
    ...(lifted ? LIFT_CAUTIONS : []),
    ...(workOnWheels ? WHEEL_CAUTIONS : []),
    GUIDE_ONLY_CAUTION,
  ];
}
