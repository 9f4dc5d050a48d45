/**
 * Checks of the replacement wheel against the vehicle: bolt pattern, centre bore (with any
 * hub-centric rings in the package), stud thread, wheel load rating and wheel track change. Each
 * applies only when a replacement wheel is given; the centre-bore check also runs when the stock
 * wheels stay but the package holds hub-centric rings (they are not needed).
 */
import { checked, show, showSigned, skipped, switchedOff } from '../check-outcome';
import type { FitmentContext } from '../fitment-context';
import type { BoltPattern, CheckOutcome, WheelSpec } from '../fitment.types';
import type { RuleSetLimits } from '../rule-set-limits';
import { outerEdgeChangePerSideMm, trackChangeMm } from '../wheel-track';

const PCD_TOLERANCE_MM = 0.05;
const BORE_TOLERANCE_MM = 0.05;

function stockWheelsStay(code: Parameters<typeof skipped>[0]): CheckOutcome {
  return skipped(code, 'not-applicable', 'The stock wheels stay on the vehicle.');
}

export function formatBoltPattern(pattern: BoltPattern): string {
  return `${pattern.studCount}x${show(pattern.pcdMm, 2)}`;
}

export function checkBoltPattern(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'bolt-pattern';
  if (!ruleSet.boltPatternMatch.enabled) return switchedOff(code);
  const wheel = context.input.wheel;
  if (!wheel) return stockWheelsStay(code);
  const vehiclePattern = context.vehicle.boltPattern;
  const matches =
    wheel.boltPattern.studCount === vehiclePattern.studCount &&
    Math.abs(wheel.boltPattern.pcdMm - vehiclePattern.pcdMm) <= PCD_TOLERANCE_MM;
  return checked(ruleSet, {
    code,
    verdict: matches ? 'ok' : 'does-not-fit',
    message: matches
      ? `The wheel's ${formatBoltPattern(wheel.boltPattern)} bolt pattern matches the vehicle.`
      : `The wheel's ${formatBoltPattern(wheel.boltPattern)} bolt pattern does not match the vehicle's ${formatBoltPattern(vehiclePattern)}: it cannot be bolted on.`,
    numbers: {
      vehicleStudCount: vehiclePattern.studCount,
      vehiclePcdMm: vehiclePattern.pcdMm,
      wheelStudCount: wheel.boltPattern.studCount,
      wheelPcdMm: wheel.boltPattern.pcdMm,
    },
    keys: ['boltPatternMatch'],
  });
}

/** The sizes of a set of hub-centric rings. */
export interface HubRingSizes {
  /** Outer diameter, mm: the side that sits in the wheel's centre bore. */
  ringOuterMm: number;
  /** Inner diameter, mm: the side that sits on the hub spigot. */
  ringInnerMm: number;
}

/**
 * Common practice (no published source): a hub-centric ring centres the wheel only when its
 * outer diameter matches the wheel's centre bore and its inner diameter matches the hub, each
 * within the centre-bore tolerance. A ring too small for the hub does not go on; one too small
 * for the bore leaves the wheel free to sit off centre.
 */
export function hubRingsMatch(
  rings: HubRingSizes,
  wheelBoreMm: number,
  hubBoreMm: number,
): boolean {
  return (
    Math.abs(rings.ringOuterMm - wheelBoreMm) <= BORE_TOLERANCE_MM &&
    Math.abs(rings.ringInnerMm - hubBoreMm) <= BORE_TOLERANCE_MM
  );
}

function ringSizesText(outerMm: number, innerMm: number): string {
  return `${show(outerMm, 2)} → ${show(innerMm, 2)} mm`;
}

/** The hub-centric rings in the package, split by whether their sizes are recorded. */
function hubRingsIn(context: FitmentContext): { sized: HubRingSizes[]; unsized: number } {
  const sized: HubRingSizes[] = [];
  let unsized = 0;
  for (const component of context.input.components ?? []) {
    if (component.role !== 'hub-rings') continue;
    if (component.ringOuterMm === undefined || component.ringInnerMm === undefined) unsized += 1;
    else sized.push({ ringOuterMm: component.ringOuterMm, ringInnerMm: component.ringInnerMm });
  }
  return { sized, unsized };
}

function ringNumbers(rings: HubRingSizes | undefined): Record<string, number> {
  return rings ? { ringOuterMm: rings.ringOuterMm, ringInnerMm: rings.ringInnerMm } : {};
}

/** "the hub-centric rings (110.1 → 106.1 mm)", or without sizes when none are recorded. */
function ringsNamed(rings: HubRingSizes | undefined): string {
  return rings
    ? `the hub-centric rings (${ringSizesText(rings.ringOuterMm, rings.ringInnerMm)})`
    : 'the hub-centric rings';
}

export function checkCentreBore(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'centre-bore';
  if (!ruleSet.centreBoreFit.enabled) return switchedOff(code);
  const wheel = context.input.wheel;
  const rings = hubRingsIn(context);
  const hasRings = rings.sized.length > 0 || rings.unsized > 0;
  const firstRings = rings.sized[0];
  const hubBoreMm = context.vehicle.centreBoreMm;
  const keys: ['centreBoreFit'] = ['centreBoreFit'];
  if (!wheel) {
    if (!hasRings) return stockWheelsStay(code);
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `The stock wheels stay and sit on the hub (${show(hubBoreMm, 2)} mm): ${ringsNamed(firstRings)} are not needed.`,
      numbers: { hubBoreMm, ...ringNumbers(firstRings) },
      keys,
    });
  }
  const wheelBoreMm = wheel.centreBoreMm;
  const differenceMm = wheelBoreMm - hubBoreMm;
  const numbers = { hubBoreMm, wheelBoreMm, differenceMm };
  if (differenceMm < -BORE_TOLERANCE_MM) {
    return checked(ruleSet, {
      code,
      verdict: 'does-not-fit',
      message: `The wheel's centre bore (${show(wheelBoreMm, 2)} mm) is smaller than the hub (${show(hubBoreMm, 2)} mm): the wheel will not sit on the hub.${hasRings ? ' Hub-centric rings cannot change that.' : ''}`,
      numbers: { ...numbers, ...ringNumbers(firstRings) },
      keys,
    });
  }
  if (differenceMm <= BORE_TOLERANCE_MM) {
    return checked(ruleSet, {
      code,
      verdict: hasRings ? 'advisory' : 'ok',
      message: hasRings
        ? `The wheel's centre bore matches the hub (${show(hubBoreMm, 2)} mm): ${ringsNamed(firstRings)} are not needed.`
        : `The wheel's centre bore matches the hub (${show(hubBoreMm, 2)} mm).`,
      numbers: { ...numbers, ...ringNumbers(firstRings) },
      keys,
    });
  }
  const larger = `The wheel's centre bore (${show(wheelBoreMm, 2)} mm) is larger than the hub (${show(hubBoreMm, 2)} mm)`;
  const needed = ringSizesText(wheelBoreMm, hubBoreMm);
  const wrong = rings.sized.find((sizes) => !hubRingsMatch(sizes, wheelBoreMm, hubBoreMm));
  if (wrong) {
    return checked(ruleSet, {
      code,
      verdict: 'does-not-fit',
      message: `The hub-centric rings (${ringSizesText(wrong.ringOuterMm, wrong.ringInnerMm)}) do not match this wheel and hub (${needed}): choose rings of those sizes.`,
      numbers: { ...numbers, ...ringNumbers(wrong) },
      keys,
    });
  }
  if (rings.unsized > 0) {
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `${larger}, and the sizes of the hub-centric rings in the package are not recorded, so they could not be checked: make sure they are ${needed} before fitting.`,
      numbers: { ...numbers, ...ringNumbers(firstRings) },
      keys,
    });
  }
  if (firstRings) {
    return checked(ruleSet, {
      code,
      verdict: 'advisory',
      message: `${larger}: ${ringsNamed(firstRings)} centre the wheel on the hub. Keep them in place whenever the wheel is refitted.`,
      numbers: { ...numbers, ...ringNumbers(firstRings) },
      keys,
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'advisory',
    message: `${larger}: hub-centric rings (${needed}) centre the wheel on the hub.`,
    numbers,
    keys,
    additions: [
      {
        role: 'hub-rings',
        reason: `Hub-centric rings ${needed} centre the wheel on the hub and stop vibration.`,
        required: false,
        numbers: {
          wheelBoreMm,
          hubBoreMm,
          ringOuterMm: wheelBoreMm,
          ringInnerMm: hubBoreMm,
        },
      },
    ],
  });
}

interface MetricThread {
  diameterMm: number;
  pitchMm: number;
}

/** "M12x1.5", "m12 x 1.5", "M12×1.5" → the same canonical text. */
export function normaliseThread(thread: string): string {
  return thread.toUpperCase().replace(/\s+/g, '').replace(/×/g, 'X');
}

export function parseMetricThread(thread: string): MetricThread | null {
  const match = /^M(\d+(?:\.\d+)?)X(\d+(?:\.\d+)?)$/.exec(normaliseThread(thread));
  return match ? { diameterMm: Number(match[1]), pitchMm: Number(match[2]) } : null;
}

export function checkStudThread(context: FitmentContext, ruleSet: RuleSetLimits): CheckOutcome {
  const code = 'stud-thread';
  if (!ruleSet.studThreadMatch.enabled) return switchedOff(code);
  const wheel = context.input.wheel;
  if (!wheel) return stockWheelsStay(code);
  const vehicleThread = parseMetricThread(context.vehicle.studThread);
  const wheelThread = parseMetricThread(wheel.studThread);
  const matches =
    vehicleThread && wheelThread
      ? vehicleThread.diameterMm === wheelThread.diameterMm &&
        vehicleThread.pitchMm === wheelThread.pitchMm
      : normaliseThread(context.vehicle.studThread) === normaliseThread(wheel.studThread);
  const numbers: Record<string, number> = {};
  if (vehicleThread) {
    numbers.vehicleThreadDiameterMm = vehicleThread.diameterMm;
    numbers.vehicleThreadPitchMm = vehicleThread.pitchMm;
  }
  if (wheelThread) {
    numbers.wheelThreadDiameterMm = wheelThread.diameterMm;
    numbers.wheelThreadPitchMm = wheelThread.pitchMm;
  }
  return checked(ruleSet, {
    code,
    verdict: matches ? 'ok' : 'does-not-fit',
    message: matches
      ? `The wheel nuts (${wheel.studThread}) match the vehicle's studs.`
      : `The wheel nuts are ${wheel.studThread} but the vehicle's studs are ${context.vehicle.studThread}: they cannot be tightened safely.`,
    numbers,
    keys: ['studThreadMatch'],
  });
}

/** Load each wheel must carry: half the heaviest axle, a quarter of the rear axle on dual rear wheels. */
export function requiredWheelLoadKg(context: FitmentContext): number {
  const { frontAxleKg, rearAxleKg, dualRearWheels } = context.vehicle;
  return Math.max(frontAxleKg / 2, rearAxleKg / (dualRearWheels ? 4 : 2));
}

export function checkWheelLoadRating(
  context: FitmentContext,
  ruleSet: RuleSetLimits,
): CheckOutcome {
  const code = 'wheel-load-rating';
  if (!ruleSet.wheelLoadRating.enabled) return switchedOff(code);
  const wheel = context.input.wheel;
  if (!wheel) return stockWheelsStay(code);
  const requiredPerWheelKg = requiredWheelLoadKg(context);
  const enough = wheel.loadRatingKg >= requiredPerWheelKg;
  return checked(ruleSet, {
    code,
    verdict: enough ? 'ok' : 'does-not-fit',
    message: enough
      ? `Each wheel is rated for ${show(wheel.loadRatingKg)} kg; the heaviest axle needs ${show(requiredPerWheelKg)} kg per wheel.`
      : `Each wheel is rated for only ${show(wheel.loadRatingKg)} kg, but the heaviest axle puts up to ${show(requiredPerWheelKg)} kg on each wheel.`,
    numbers: {
      wheelLoadRatingKg: wheel.loadRatingKg,
      requiredPerWheelKg,
      frontAxleKg: context.vehicle.frontAxleKg,
      rearAxleKg: context.vehicle.rearAxleKg,
    },
    keys: ['wheelLoadRating'],
  });
}

function spacerVerdict(wheel: WheelSpec, ruleSet: RuleSetLimits): boolean {
  return wheel.isSpacer === true && ruleSet.wheelSpacersProhibited.enabled;
}

export function checkWheelTrackChange(
  context: FitmentContext,
  ruleSet: RuleSetLimits,
): CheckOutcome {
  const code = 'wheel-track-change';
  const limit = ruleSet.trackIncreaseMaxMm;
  if (!limit.enabled && !ruleSet.wheelSpacersProhibited.enabled) return switchedOff(code);
  const wheel = context.input.wheel;
  if (!wheel) return stockWheelsStay(code);
  const stock = context.vehicle.stockWheel;
  const changeMm = trackChangeMm(stock, wheel);
  const outerEdgeMm = outerEdgeChangePerSideMm(stock, wheel);
  const numbers: Record<string, number> = {
    stockWidthIn: stock.widthIn,
    stockOffsetMm: stock.offsetMm,
    newWidthIn: wheel.widthIn,
    newOffsetMm: wheel.offsetMm,
    trackChangeMm: changeMm,
    outerEdgeChangePerSideMm: outerEdgeMm,
  };
  if (limit.enabled) numbers.limitMm = limit.value;
  const movement = `The track changes by ${showSigned(changeMm)} mm and each outer rim edge moves ${showSigned(outerEdgeMm)} mm.`;

  if (spacerVerdict(wheel, ruleSet)) {
    return checked(ruleSet, {
      code,
      verdict: 'does-not-fit',
      message: `This fitment uses wheel spacers, which are not permitted unless the vehicle maker fitted them. ${movement}`,
      numbers,
      keys: ['wheelSpacersProhibited'],
    });
  }
  if (limit.enabled && changeMm > limit.value) {
    return checked(ruleSet, {
      code,
      verdict: 'needs-certification',
      message: `${movement} The limit is ${showSigned(limit.value)} mm, so the vehicle needs an engineer's certificate (or wheels with more offset).`,
      numbers,
      keys: ['trackIncreaseMaxMm'],
    });
  }
  return checked(ruleSet, {
    code,
    verdict: 'ok',
    message: limit.enabled
      ? `${movement} That is within the ${showSigned(limit.value)} mm limit.`
      : movement,
    numbers,
    keys: limit.enabled ? ['trackIncreaseMaxMm'] : ['wheelSpacersProhibited'],
  });
}
