/**
 * Fictional vehicles and parts for the fitment specs. Makes, models and brands are invented; the
 * specifications are plausible, not any real vehicle's.
 */
import type {
  CheckOutcome,
  FitCheck,
  FitmentInput,
  SkippedCheck,
  SuspensionKitSpec,
  VehicleSpec,
  WheelSpec,
} from './fitment.types';

/** A dual-cab ute with independent front suspension and rear leaf springs. */
export const korrinRidgebackUte: VehicleSpec = {
  make: 'Korrin',
  model: 'Ridgeback',
  variant: 'GX dual cab',
  frontSuspension: 'independent',
  rearSuspension: 'leaf',
  boltPattern: { studCount: 6, pcdMm: 139.7 },
  studThread: 'M12x1.5',
  centreBoreMm: 106.1,
  stockTyre: '265/65R17 112S',
  stockWheel: { diameterIn: 17, widthIn: 7.5, offsetMm: 30 },
  gvmKg: 3100,
  frontAxleKg: 1350,
  rearAxleKg: 1900,
  kerbMassKg: 2150,
  placardLoadIndex: 112,
  placardSpeedSymbol: 'S',
  frontHalfShaftLengthMm: 450,
  offRoadCategory: true,
  topSpeedKmh: 175,
};

/** A wagon with a solid front axle on coils and a coil rear. */
export const tarvelleTrackerWagon: VehicleSpec = {
  make: 'Tarvelle',
  model: 'Tracker',
  variant: '76 wagon',
  frontSuspension: 'solid-axle',
  rearSuspension: 'coil',
  boltPattern: { studCount: 5, pcdMm: 150 },
  studThread: 'M14x1.5',
  centreBoreMm: 110.1,
  stockTyre: '265/70R16 112S',
  largestSpecifiedTyre: '265/75R16 116S',
  stockWheel: { diameterIn: 16, widthIn: 7, offsetMm: 30 },
  gvmKg: 3300,
  frontAxleKg: 1450,
  rearAxleKg: 2000,
  kerbMassKg: 2450,
  placardLoadIndex: 112,
  placardSpeedSymbol: 'S',
  offRoadCategory: true,
  topSpeedKmh: 170,
};

/** A passenger hatchback without off-road features (for the "other cars" limits). */
export const wenlowMarlinHatch: VehicleSpec = {
  make: 'Wenlow',
  model: 'Marlin',
  variant: 'SX hatch',
  frontSuspension: 'independent',
  rearSuspension: 'independent',
  boltPattern: { studCount: 5, pcdMm: 114.3 },
  studThread: 'M12x1.5',
  centreBoreMm: 67.1,
  stockTyre: '205/55R16 91V',
  stockWheel: { diameterIn: 16, widthIn: 6.5, offsetMm: 45 },
  gvmKg: 1800,
  frontAxleKg: 950,
  rearAxleKg: 900,
  kerbMassKg: 1300,
  placardLoadIndex: 91,
  placardSpeedSymbol: 'V',
  offRoadCategory: false,
  topSpeedKmh: 200,
};

/** "Veldtline Trailhand" 17x8 ET+20 alloy for the ute. */
export const trailhandWheel: WheelSpec = {
  id: 'wheel-trailhand-17x8',
  diameterIn: 17,
  widthIn: 8,
  offsetMm: 20,
  boltPattern: { studCount: 6, pcdMm: 139.7 },
  centreBoreMm: 106.1,
  studThread: 'M12x1.5',
  loadRatingKg: 1250,
};

/** "Quillmoor Ridge" 50 mm kit for the ute, with heavier spring ratings. */
export const quillmoorKit50: SuspensionKitSpec = {
  id: 'kit-quillmoor-50',
  name: 'Quillmoor Ridge 50 mm',
  frontLiftMm: 50,
  rearLiftMm: 50,
  constantLoadMinKg: 0,
  constantLoadMaxKg: 150,
  keepsTwoThirdsTravel: true,
  variants: [
    {
      id: 'kit-quillmoor-50-medium',
      name: 'medium (150–300 kg)',
      constantLoadMinKg: 150,
      constantLoadMaxKg: 300,
    },
    {
      id: 'kit-quillmoor-50-heavy',
      name: 'heavy (300–600 kg)',
      constantLoadMinKg: 300,
      constantLoadMaxKg: 600,
    },
  ],
};

/** The ute with nothing changed. */
export function stockUte(): FitmentInput {
  return { vehicle: { ...korrinRidgebackUte } };
}

/** A package that passes every check under the default rule set. */
export function passingUtePackage(): FitmentInput {
  return {
    vehicle: { ...korrinRidgebackUte, largestSpecifiedTyre: '265/70R17 115S' },
    wheel: { ...trailhandWheel, offsetMm: 25 },
    tyre: { designation: '265/70R17 121/118S' },
    suspensionKit: { ...quillmoorKit50, frontLiftMm: 40, rearLiftMm: 45 },
    components: [
      { role: 'alignment', name: 'Wheel alignment' },
      { role: 'speedometer-recalibration', name: 'Speedometer recalibration' },
    ],
    usage: { constantLoadKg: 120, accessoriesMassKg: 90, occupantCount: 2 },
  };
}

/** The check of an outcome that ran; throws (failing the test) when it was skipped. */
export function ranCheck(outcome: CheckOutcome): FitCheck {
  if (!outcome.ran) {
    throw new Error(
      `expected ${outcome.skipped.code} to run, it was skipped: ${outcome.skipped.reason}`,
    );
  }
  return outcome.check;
}

/** The skip record of an outcome that did not run; throws when it ran. */
export function skippedCheck(outcome: CheckOutcome): SkippedCheck {
  if (outcome.ran) throw new Error(`expected ${outcome.check.code} to be skipped, it ran`);
  return outcome.skipped;
}
