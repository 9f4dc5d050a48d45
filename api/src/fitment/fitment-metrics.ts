/**
 * The metrics shown with the report.
 *
 * Ground clearance gain at the differentials (the lowest points): larger tyres raise everything
 * by half their diameter increase; a suspension lift raises only what the body carries. A solid
 * axle's diff housing moves with the wheels, so it rises only by half the diameter change; a
 * chassis-mounted diff (independent suspension) also rises with the lift, less any diff drop.
 */
import { roundTenth } from './check-outcome';
import { type FitmentContext, combinedLiftMm, diameterChangeOverStockMm } from './fitment-context';
import type { FitMetrics } from './fitment.types';
import { addedHalfShaftAngleDeg } from './joint-angle';
import { indicatedSpeedAfterTyreChangeKmh } from './speedometer';
import { outerEdgeChangePerSideMm, trackChangeMm } from './wheel-track';

function roundOrNull(value: number | null): number | null {
  return value === null ? null : roundTenth(value);
}

export interface GroundClearanceGainMm {
  frontMm: number;
  rearMm: number;
  lowestMm: number;
}

export function groundClearanceGainMm(context: FitmentContext): GroundClearanceGainMm | null {
  const changeMm = diameterChangeOverStockMm(context);
  if (changeMm === null) return null;
  const tyreRiseMm = changeMm / 2;
  const { vehicle } = context;
  const frontMm =
    vehicle.frontSuspension === 'independent'
      ? tyreRiseMm + context.frontLiftMm - context.diffDropMm
      : tyreRiseMm;
  const rearMm =
    vehicle.rearSuspension === 'independent' ? tyreRiseMm + context.rearLiftMm : tyreRiseMm;
  return { frontMm, rearMm, lowestMm: Math.min(frontMm, rearMm) };
}

export function fitmentMetrics(context: FitmentContext): FitMetrics {
  const stockDiameterMm = context.stockTyre?.geometry.overallDiameterMm ?? null;
  const newDiameterMm = context.fittedTyre?.geometry.overallDiameterMm ?? null;
  const diameterChangeMm = diameterChangeOverStockMm(context);
  const clearance = groundClearanceGainMm(context);
  const stockWheel = context.vehicle.stockWheel;
  const halfShaftLengthMm = context.vehicle.frontHalfShaftLengthMm;
  const jointAngleApplies =
    context.vehicle.frontSuspension === 'independent' &&
    halfShaftLengthMm !== undefined &&
    halfShaftLengthMm > 0;
  return {
    stockDiameterMm: roundOrNull(stockDiameterMm),
    newDiameterMm: roundOrNull(newDiameterMm),
    diameterChangeMm: roundOrNull(diameterChangeMm),
    diameterChangePercent:
      diameterChangeMm === null || stockDiameterMm === null
        ? null
        : roundTenth((diameterChangeMm / stockDiameterMm) * 100),
    speedometerAtTrue100Kmh:
      stockDiameterMm === null || newDiameterMm === null
        ? null
        : roundTenth(indicatedSpeedAfterTyreChangeKmh(100, stockDiameterMm, newDiameterMm)),
    groundClearanceGainMm: roundOrNull(clearance?.lowestMm ?? null),
    groundClearanceGainFrontMm: roundOrNull(clearance?.frontMm ?? null),
    groundClearanceGainRearMm: roundOrNull(clearance?.rearMm ?? null),
    combinedLiftMm: roundTenth(combinedLiftMm(context)),
    trackChangeMm: roundTenth(trackChangeMm(stockWheel, context.fittedWheel)),
    outerEdgeChangePerSideMm: roundTenth(outerEdgeChangePerSideMm(stockWheel, context.fittedWheel)),
    jointAngleAddedDeg: jointAngleApplies
      ? roundTenth(
          addedHalfShaftAngleDeg(context.frontLiftMm, halfShaftLengthMm, context.diffDropMm),
        )
      : null,
  };
}
