/**
 * Checks of the tyre to be fitted: rim diameter and width, load capacity, speed symbol,
 * overall diameter change, speedometer reading and body clearance.
 */
import { checked, show, showSigned, skipped, switchedOff } from '../check-outcome';
import {
  type FitmentContext,
  type ParsedTyre,
  diameterIncreaseOverRuleBaseMm,
} from '../fitment-context';
import type { CheckOutcome, FitCheckCode } from '../fitment.types';
import { loadIndexKg, tyreLoadCapacityKg } from '../load-index';
import { approvedRimWidthRangeIn } from '../rim-width';
import type { RuleKey, RuleSetLimits } from '../rule-set-limits';
import { speedSymbolKmh } from '../speed-symbols';
import {
  allowedIndicatedRangeKmh,
  indicatedSpeedAfterTyreChangeKmh,
  speedometerReadingAllowed,
} from '../speedometer';
import { formatTyreDesignation, isPassengerMetric } from '../tyre-designation';

const REFERENCE_TRUE_SPEED_KMH = 100;

function unreadable(code: FitCheckCode, which: string): CheckOutcome {
  return skipped(
    code,
    'missing-data',
    `The ${which} size could not be read, so this was not checked.`,
  );
}

function tyreNotReplaced(code: FitCheckCode): CheckOutcome {
  return skipped(code, 'not-applicable', 'The stock tyres stay on the vehicle.');
}

/** The replacement tyre, or an outcome explaining why there is none to check. */
function replacementTyre(context: FitmentContext, code: FitCheckCode): ParsedTyre | CheckOutcome {
  if (!context.tyreReplaced) return tyreNotReplaced(code);
  if (context.newTyre === null) return unreadable(code, 'new tyre');
  return context.newTyre;
}

function isOutcome(value: ParsedTyre | CheckOutcome): value is CheckOutcome {
  return 'ran' in value;
}

function sizeName(tyre: ParsedTyre): string {
  return formatTyreDesignation(tyre.size);
}

export function checkRimDiameter(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'rim-diameter';
  if (!ruleSet.rimDiameterMatch.enabled) return switchedOff(code);
  if (!context.wheelReplaced && !context.tyreReplaced) {
    return skipped(code, 'not-applicable', 'The stock wheels and tyres stay on the vehicle.');
  }
  const tyre = context.fittedTyre;
  if (tyre === null) return unreadable(code, context.tyreReplaced ? 'new tyre' : 'stock tyre');
  const wheelDiameterIn = context.fittedWheel.diameterIn;
  const tyreRimDiameterIn = tyre.size.rimDiameterIn;
  const matches = wheelDiameterIn === tyreRimDiameterIn;
  return checked(ruleSet, {
    code,
    verdict: matches ? 'ok' : 'does-not-fit',
    message: matches
      ? `The ${show(wheelDiameterIn)} in wheel suits the ${sizeName(tyre)} tyre.`
      : `The ${sizeName(tyre)} tyre needs a ${show(tyreRimDiameterIn)} in wheel, but the wheel is ${show(wheelDiameterIn)} in.`,
    numbers: { wheelDiameterIn, tyreRimDiameterIn },
    keys: ['rimDiameterMatch'],
  });
}

export function checkRimWidth(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'rim-width';
  if (!ruleSet.rimWidthForSection.enabled) return switchedOff(code);
  if (!context.wheelReplaced && !context.tyreReplaced) {
    return skipped(code, 'not-applicable', 'The stock wheels and tyres stay on the vehicle.');
  }
  const tyre = context.fittedTyre;
  if (tyre === null) return unreadable(code, context.tyreReplaced ? 'new tyre' : 'stock tyre');
  const spec = context.tyreReplaced ? context.newTyreSpec : null;
  const makerData =
    spec?.approvedRimWidthMinIn !== undefined && spec.approvedRimWidthMaxIn !== undefined
      ? { minIn: spec.approvedRimWidthMinIn, maxIn: spec.approvedRimWidthMaxIn }
      : undefined;
  const range = approvedRimWidthRangeIn(tyre.size, makerData);
  const wheelWidthIn = context.fittedWheel.widthIn;
  if (range === null) {
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `No rim-width range is known for ${sizeName(tyre)}: confirm the ${show(wheelWidthIn)} in wheel against the tyre maker's approved rim widths.`,
      numbers: { wheelWidthIn },
      keys: ['rimWidthForSection'],
    });
  }
  const rangeText = `${show(range.minIn)}–${show(range.maxIn)} in`;
  const basisText =
    range.basis === 'tyre-maker'
      ? "the tyre maker's approved range"
      : `Liftwright's estimate around the ${show(range.measuringRimIn ?? 0)} in measuring rim; the tyre maker's approved range decides`;
  const fits = wheelWidthIn >= range.minIn && wheelWidthIn <= range.maxIn;
  const numbers: Record<string, number> = {
    wheelWidthIn,
    rangeMinIn: range.minIn,
    rangeMaxIn: range.maxIn,
  };
  if (range.measuringRimIn !== null) numbers.measuringRimIn = range.measuringRimIn;
  return checked(ruleSet, {
    code,
    verdict: fits ? 'ok' : 'does-not-fit',
    message: fits
      ? `The ${show(wheelWidthIn)} in wide wheel suits ${sizeName(tyre)} (${rangeText}, ${basisText}).`
      : `The ${show(wheelWidthIn)} in wide wheel is outside the ${rangeText} range for ${sizeName(tyre)} (${basisText}): the tyre would not seat and support the load as designed.`,
    numbers,
    keys: ['rimWidthForSection'],
  });
}

export function checkTyreLoadCapacity(
  context: FitmentContext,
  ruleSet: RuleSetLimits,
): CheckOutcome {
  const code = 'tyre-load-capacity';
  if (!ruleSet.tyreLoadCapacity.enabled) return switchedOff(code);
  const tyre = replacementTyre(context, code);
  if (isOutcome(tyre)) return tyre;
  const { vehicle } = context;
  const { loadIndexSingle, loadIndexDual } = tyre.size;
  if (loadIndexSingle === null) {
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `Could not check: the load index of ${sizeName(tyre)} is not given. Confirm the tyre's load rating before fitting.`,
      numbers: {},
      keys: ['tyreLoadCapacity'],
    });
  }
  const capacity = tyreLoadCapacityKg(loadIndexSingle, loadIndexDual);
  if (capacity === null) {
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `Could not check: the load index of ${sizeName(tyre)} is not in Liftwright's table. Confirm the tyre's load rating before fitting.`,
      numbers: { loadIndexSingle },
      keys: ['tyreLoadCapacity'],
    });
  }
  const derate = ruleSet.passengerTyreLightTruckDerateFactor;
  const treatedAsLightTruck = vehicle.lightTruck ?? vehicle.offRoadCategory;
  const derateFactor =
    derate.enabled && treatedAsLightTruck && isPassengerMetric(tyre.size) ? derate.value : 1;
  const singleKg = capacity.singleKg / derateFactor;
  const dualKg = capacity.dualKg === null ? null : capacity.dualKg / derateFactor;
  const frontNeedKg = vehicle.frontAxleKg / 2;
  const rearNeedKg = vehicle.rearAxleKg / (vehicle.dualRearWheels ? 4 : 2);
  const rearCapacityKg = vehicle.dualRearWheels ? dualKg : singleKg;
  const placardKg = loadIndexKg(vehicle.placardLoadIndex);

  const numbers: Record<string, number> = {
    loadIndexSingle,
    capacityPerTyreKg: singleKg,
    requiredPerTyreKg: vehicle.dualRearWheels ? frontNeedKg : Math.max(frontNeedKg, rearNeedKg),
    placardLoadIndex: vehicle.placardLoadIndex,
  };
  if (placardKg !== null) numbers.placardCapacityKg = placardKg;
  if (derateFactor !== 1) numbers.derateFactor = derateFactor;
  if (loadIndexDual !== null) numbers.loadIndexDual = loadIndexDual;
  if (vehicle.dualRearWheels) {
    numbers.requiredPerDualTyreKg = rearNeedKg;
    if (dualKg !== null) numbers.dualCapacityPerTyreKg = dualKg;
  }

  const problems: string[] = [];
  if (singleKg < frontNeedKg || (!vehicle.dualRearWheels && singleKg < rearNeedKg)) {
    problems.push(
      `each tyre carries ${show(singleKg)} kg but the heaviest axle puts ${show(Math.max(frontNeedKg, vehicle.dualRearWheels ? 0 : rearNeedKg))} kg on each tyre`,
    );
  }
  if (vehicle.dualRearWheels) {
    if (rearCapacityKg === null) {
      problems.push(
        'the tyre has no dual-fitment load index (such as 121/118) for the dual rear wheels',
      );
    } else if (rearCapacityKg < rearNeedKg) {
      problems.push(
        `in dual fitment each rear tyre carries ${show(rearCapacityKg)} kg but needs ${show(rearNeedKg)} kg`,
      );
    }
  }
  if (placardKg !== null && singleKg < placardKg) {
    problems.push(
      `its capacity is below the placard's load index ${vehicle.placardLoadIndex} (${show(placardKg)} kg)`,
    );
  }
  const keys: RuleKey[] =
    derateFactor === 1
      ? ['tyreLoadCapacity']
      : ['tyreLoadCapacity', 'passengerTyreLightTruckDerateFactor'];
  const derateText =
    derateFactor === 1
      ? ''
      : ` (a passenger tyre on a light truck, derated by ${show(derateFactor, 2)})`;
  if (problems.length > 0) {
    return checked(ruleSet, {
      code,
      verdict: 'does-not-fit',
      message: `${sizeName(tyre)} cannot carry this vehicle${derateText}: ${problems.join('; ')}.`,
      numbers,
      keys,
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'ok',
    message: `${sizeName(tyre)} carries ${show(singleKg)} kg per tyre${derateText}, enough for the axle ratings and the placard's load index ${vehicle.placardLoadIndex}.`,
    numbers,
    keys,
  });
}

export function checkSpeedSymbol(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'speed-symbol';
  const { minSpeedKmhOther, minSpeedKmhOffRoad, speedSymbolOffRoadExemption } = ruleSet;
  if (
    !minSpeedKmhOther.enabled &&
    !minSpeedKmhOffRoad.enabled &&
    !ruleSet.placardSpeedSymbolEnforced.enabled
  ) {
    return switchedOff(code);
  }
  const tyre = replacementTyre(context, code);
  if (isOutcome(tyre)) return tyre;
  const { vehicle } = context;
  const symbol = tyre.size.speedSymbol;
  if (symbol === null) {
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `Could not check: the speed symbol of ${sizeName(tyre)} is not given. Confirm the tyre's speed rating before fitting.`,
      numbers: {},
      keys: ['minSpeedKmhOther'],
    });
  }
  const tyreSpeedKmh = speedSymbolKmh(symbol);
  const placardSpeedKmh = speedSymbolKmh(vehicle.placardSpeedSymbol);
  const exemptionApplies = vehicle.offRoadCategory && speedSymbolOffRoadExemption.enabled;
  const minimumRule: RuleKey | null = exemptionApplies
    ? minSpeedKmhOffRoad.enabled
      ? 'minSpeedKmhOffRoad'
      : null
    : minSpeedKmhOther.enabled
      ? 'minSpeedKmhOther'
      : null;
  const legalMinimumKmh =
    minimumRule === null
      ? null
      : Math.min(ruleSet[minimumRule].value, vehicle.topSpeedKmh ?? Number.POSITIVE_INFINITY);

  const numbers: Record<string, number> = { tyreSpeedKmh, placardSpeedKmh };
  if (legalMinimumKmh !== null) numbers.minimumSpeedKmh = legalMinimumKmh;
  const tyreText = `${sizeName(tyre)} is rated for ${tyreSpeedKmh} km/h (${symbol})`;

  if (minimumRule !== null && legalMinimumKmh !== null && tyreSpeedKmh < legalMinimumKmh) {
    const minimumKeys: RuleKey[] = exemptionApplies
      ? [minimumRule, 'speedSymbolOffRoadExemption']
      : [minimumRule];
    return checked(ruleSet, {
      code,
      verdict: 'does-not-fit',
      message: `${tyreText}, below the ${show(legalMinimumKmh)} km/h minimum for this vehicle.`,
      numbers,
      keys: minimumKeys,
    });
  }
  if (tyreSpeedKmh < placardSpeedKmh) {
    if (ruleSet.placardSpeedSymbolEnforced.enabled && !exemptionApplies) {
      return checked(ruleSet, {
        code,
        verdict: 'does-not-fit',
        message: `${tyreText}, below the ${placardSpeedKmh} km/h (${vehicle.placardSpeedSymbol}) on the vehicle's tyre placard.`,
        numbers,
        keys: ['placardSpeedSymbolEnforced'],
      });
    }
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `${tyreText}, below the placard's ${placardSpeedKmh} km/h (${vehicle.placardSpeedSymbol}) but within the rules for this vehicle. Never drive faster than ${tyreSpeedKmh} km/h on them, and tell your insurer.`,
      numbers,
      keys: exemptionApplies
        ? ['speedSymbolOffRoadExemption']
        : ['placardSpeedSymbolEnforced', ...(minimumRule ? [minimumRule] : [])],
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'ok',
    message: `${tyreText}, at least the placard's ${placardSpeedKmh} km/h (${vehicle.placardSpeedSymbol}).`,
    numbers,
    keys: minimumRule ? [minimumRule] : ['placardSpeedSymbolEnforced'],
  });
}

export function checkTyreDiameterChange(
  context: FitmentContext,
  ruleSet: RuleSetLimits,
): CheckOutcome {
  const code = 'tyre-diameter-change';
  const increaseKey: RuleKey = context.vehicle.offRoadCategory
    ? 'tyreDiameterIncreaseMaxMm'
    : 'tyreDiameterIncreaseMaxMmOther';
  const increaseLimit = ruleSet[increaseKey];
  const decreaseLimit = ruleSet.tyreDiameterDecreaseMaxMm;
  const percentLimit = ruleSet.diameterChangeMaxPercent;
  if (!increaseLimit.enabled && !decreaseLimit.enabled && !percentLimit.enabled) {
    return switchedOff(code);
  }
  const tyre = replacementTyre(context, code);
  if (isOutcome(tyre)) return tyre;
  const { stockTyre, ruleBaseDiameterMm, smallestSpecifiedDiameterMm } = context;
  if (stockTyre === null || ruleBaseDiameterMm === null || smallestSpecifiedDiameterMm === null) {
    return unreadable(code, 'stock tyre');
  }
  const newDiameterMm = tyre.geometry.overallDiameterMm;
  const changeMm = newDiameterMm - ruleBaseDiameterMm;
  const decreaseMm = smallestSpecifiedDiameterMm - newDiameterMm;
  const changePercent = (changeMm / ruleBaseDiameterMm) * 100;
  const baseIsLargestSpecified =
    context.largestSpecifiedTyre !== null &&
    context.largestSpecifiedTyre.geometry.overallDiameterMm >= stockTyre.geometry.overallDiameterMm;
  const baseName = baseIsLargestSpecified
    ? 'the largest size the maker specifies'
    : 'the stock size';

  const numbers: Record<string, number> = {
    stockDiameterMm: stockTyre.geometry.overallDiameterMm,
    ruleBaseDiameterMm,
    newDiameterMm,
    changeMm,
    changePercent,
  };
  if (increaseLimit.enabled) numbers.limitMm = increaseLimit.value;
  if (decreaseLimit.enabled) numbers.decreaseLimitMm = decreaseLimit.value;
  if (percentLimit.enabled) numbers.limitPercent = percentLimit.value;

  const described = `${sizeName(tyre)} is ${show(newDiameterMm)} mm tall, ${showSigned(changeMm)} mm (${showSigned(changePercent)} %) against ${baseName} (${show(ruleBaseDiameterMm)} mm)`;
  const breaches: { key: RuleKey; text: string }[] = [];
  if (increaseLimit.enabled && changeMm > increaseLimit.value) {
    breaches.push({
      key: increaseKey,
      text: `over the ${showSigned(increaseLimit.value)} mm limit`,
    });
  }
  if (decreaseLimit.enabled && decreaseMm > decreaseLimit.value) {
    breaches.push({
      key: 'tyreDiameterDecreaseMaxMm',
      text: `more than ${show(decreaseLimit.value)} mm smaller than the specified sizes`,
    });
  }
  if (percentLimit.enabled && Math.abs(changePercent) > percentLimit.value) {
    breaches.push({
      key: 'diameterChangeMaxPercent',
      text: `outside the ±${show(percentLimit.value)} % limit`,
    });
  }
  if (breaches.length > 0) {
    return checked(ruleSet, {
      code,
      verdict: 'needs-certification',
      message: `${described}: ${breaches.map((breach) => breach.text).join(' and ')}, so the vehicle needs an engineer's certificate.`,
      numbers,
      keys: breaches.map((breach) => breach.key),
    });
  }
  const appliedKeys = (
    [increaseKey, 'tyreDiameterDecreaseMaxMm', 'diameterChangeMaxPercent'] as RuleKey[]
  ).filter((key) => ruleSet[key].enabled);
  return checked(ruleSet, {
    code,
    verdict: 'ok',
    message: `${described}: within the limits.`,
    numbers,
    keys: appliedKeys,
  });
}

export function checkSpeedometer(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'speedometer';
  if (!ruleSet.speedometerAccuracy.enabled) return switchedOff(code);
  const tyre = replacementTyre(context, code);
  if (isOutcome(tyre)) return tyre;
  if (context.stockTyre === null) return unreadable(code, 'stock tyre');
  const stockDiameterMm = context.stockTyre.geometry.overallDiameterMm;
  const newDiameterMm = tyre.geometry.overallDiameterMm;
  const indicatedAtTrue100Kmh = indicatedSpeedAfterTyreChangeKmh(
    REFERENCE_TRUE_SPEED_KMH,
    stockDiameterMm,
    newDiameterMm,
  );
  const allowed = allowedIndicatedRangeKmh(REFERENCE_TRUE_SPEED_KMH);
  // The lower bound holds at every speed or none; the upper bound is tightest at top speed.
  const trueSpeedsKmh = [REFERENCE_TRUE_SPEED_KMH];
  if (context.vehicle.topSpeedKmh !== undefined) trueSpeedsKmh.push(context.vehicle.topSpeedKmh);
  const withinRule = trueSpeedsKmh.every((trueKmh) =>
    speedometerReadingAllowed(
      indicatedSpeedAfterTyreChangeKmh(trueKmh, stockDiameterMm, newDiameterMm),
      trueKmh,
    ),
  );
  const numbers = {
    stockDiameterMm,
    newDiameterMm,
    indicatedAtTrue100Kmh,
    allowedMinKmh: allowed.minKmh,
    allowedMaxKmh: allowed.maxKmh,
  };
  const keys: RuleKey[] = ['speedometerAccuracy'];
  const reading = `On ${sizeName(tyre)} the speedometer would show ${show(indicatedAtTrue100Kmh)} km/h at a true 100 km/h (assuming it read exactly true on the stock tyres)`;
  if (withinRule) {
    return checked(ruleSet, {
      code,
      verdict: 'ok',
      message: `${reading}: within the allowed ${show(allowed.minKmh)}–${show(allowed.maxKmh)} km/h.`,
      numbers,
      keys,
    });
  }
  const problem =
    indicatedAtTrue100Kmh < REFERENCE_TRUE_SPEED_KMH
      ? 'it would read below your true speed, which is not allowed'
      : 'it would read further above your true speed than allowed';
  if (context.includedRoles.has('speedometer-recalibration')) {
    return checked(ruleSet, {
      code,
      verdict: 'ok',
      message: `${reading}: ${problem}; the recalibration in the package corrects it.`,
      numbers,
      keys,
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'advisory',
    message: `${reading}: ${problem}. The speedometer must be recalibrated; the recalibration has been added.`,
    numbers,
    keys,
    additions: [
      {
        role: 'speedometer-recalibration',
        reason: `The speedometer would show ${show(indicatedAtTrue100Kmh)} km/h at a true 100 km/h on the new tyres; it must never read below true speed.`,
        required: true,
        numbers: { indicatedAtTrue100Kmh },
      },
    ],
  });
}

export function checkTyreClearance(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'tyre-clearance';
  const allowance = ruleSet.clearanceAllowanceMmPer25mmLift;
  if (!allowance.enabled) return switchedOff(code);
  const tyre = replacementTyre(context, code);
  if (isOutcome(tyre)) return tyre;
  const increaseMm = diameterIncreaseOverRuleBaseMm(context);
  if (increaseMm === null) return unreadable(code, 'stock tyre');
  // The tighter end decides: the smaller of the front and rear lifts.
  const liftMm = Math.max(0, Math.min(context.frontLiftMm, context.rearLiftMm));
  const clearAllowanceMm = (liftMm / 25) * allowance.value;
  const numbers = { diameterIncreaseMm: increaseMm, suspensionLiftMm: liftMm, clearAllowanceMm };
  const keys: RuleKey[] = ['clearanceAllowanceMmPer25mmLift'];
  if (increaseMm <= clearAllowanceMm) {
    return checked(ruleSet, {
      code,
      verdict: 'ok',
      message:
        increaseMm <= 0
          ? `${sizeName(tyre)} is no larger than the sizes the maker specifies, so body clearance should be as before.`
          : `${sizeName(tyre)} is ${show(increaseMm)} mm larger; a ${show(liftMm)} mm lift usually clears up to ${show(clearAllowanceMm)} mm more (a rule of thumb, checked at fitting).`,
      numbers,
      keys,
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'advisory',
    message: `${sizeName(tyre)} is ${show(increaseMm)} mm larger, more than the ${show(clearAllowanceMm)} mm a ${show(liftMm)} mm lift usually clears: it may rub at full lock or full articulation. The fit is trial-checked at the workshop; trimming or a larger lift may be needed.`,
    numbers,
    keys,
  });
}
