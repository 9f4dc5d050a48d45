import type { AdditionRole, FitCheckCode, FitVerdict } from '@/types/api';

/** Worst first, as the API orders verdicts. */
export const verdictsWorstFirst: readonly FitVerdict[] = [
  'does-not-fit',
  'needs-certification',
  'advisory',
  'ok',
];

/** A verdict in a few words, for chips. */
export const verdictLabels: Record<FitVerdict, string> = {
  ok: 'Fits',
  advisory: 'Fits, with advice',
  'needs-certification': 'Needs certification',
  'does-not-fit': 'Does not fit',
};

/** A package's verdict as a sentence, for the fit report's headline. */
export const verdictHeadlines: Record<FitVerdict, string> = {
  ok: 'This package fits your vehicle.',
  advisory: 'This package fits. Read the advice below.',
  'needs-certification':
    "This package fits, but it goes past the limits a vehicle may be modified without an engineer's certificate.",
  'does-not-fit': 'This package does not fit your vehicle.',
};

export const verdictSeverity: Record<FitVerdict, 'success' | 'info' | 'warning' | 'error'> = {
  ok: 'success',
  advisory: 'info',
  'needs-certification': 'warning',
  'does-not-fit': 'error',
};

/** The check each code stands for, in plain words. */
export const checkLabels: Record<FitCheckCode, string> = {
  'tyre-designation': 'Tyre size',
  'bolt-pattern': 'Bolt pattern',
  'centre-bore': 'Centre bore',
  'stud-thread': 'Wheel nut thread',
  'wheel-load-rating': 'Wheel load rating',
  'rim-diameter': 'Rim diameter',
  'rim-width': 'Rim width for the tyre',
  'tyre-load-capacity': 'Tyre load capacity',
  'speed-symbol': 'Tyre speed rating',
  'tyre-diameter-change': 'Overall diameter change',
  speedometer: 'Speedometer reading',
  'tyre-clearance': 'Tyre clearance',
  'suspension-lift': 'Suspension lift',
  'combined-lift': 'Combined lift',
  'wheel-track-change': 'Wheel track change',
  'joint-angle': 'Front drive-shaft angle',
  'spring-rating': 'Spring rating for the load',
  'gross-vehicle-mass': 'Gross vehicle mass',
  alignment: 'Wheel alignment',
};

/** What each suggested addition is, in plain words. */
export const additionLabels: Record<AdditionRole, string> = {
  'diff-drop': 'Differential drop',
  alignment: 'Wheel alignment',
  'hub-rings': 'Hub-centric rings',
  'greasable-shackles': 'Greasable shackles and pins',
  'extended-brake-lines': 'Extended brake lines',
  'steering-damper': 'Steering damper',
  'headlight-re-aim': 'Headlight re-aim',
  'speedometer-recalibration': 'Speedometer recalibration',
  'spring-rating': 'Springs rated for your load',
};

/**
 * Why an addition matters, where the fit report's own reason says what but not why (the others'
 * reasons already explain themselves).
 */
export const additionExplanations: Partial<Record<AdditionRole, string>> = {
  'diff-drop':
    'Lowers the front differential so the front half-shafts sit at a gentler angle after the lift, which saves the CV joints.',
  alignment:
    'Sets camber, caster and toe again, so the vehicle tracks straight and the tyres wear evenly.',
  'hub-rings':
    "Centre a wheel with a larger bore on the vehicle's hub, so the wheel runs true and the studs are not carrying it alone.",
  'spring-rating':
    'Springs rated for the load you always carry keep the ride height and handling where the kit intends.',
};

/** Said with every fit report: the product's checks are a guide, not the final word. */
export const DEFER_TO_LOCAL_RULES =
  'This report is a guide. Your state or territory rules, an engineer where certification is needed, and the licensed technicians who fit the parts have the final word.';
