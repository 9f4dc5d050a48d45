import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { FitReport } from '../../fitment/fitment.types';
import { VERDICTS_WORST_FIRST } from '../../fitment/fitment.types';
import { RULE_KEYS } from '../../fitment/rule-set-limits';

const FIT_CHECK_CODES = [
  'tyre-designation',
  'bolt-pattern',
  'centre-bore',
  'stud-thread',
  'wheel-load-rating',
  'rim-diameter',
  'rim-width',
  'tyre-load-capacity',
  'speed-symbol',
  'tyre-diameter-change',
  'speedometer',
  'tyre-clearance',
  'suspension-lift',
  'combined-lift',
  'wheel-track-change',
  'joint-angle',
  'spring-rating',
  'gross-vehicle-mass',
  'alignment',
];

const ADDITION_ROLES = [
  'diff-drop',
  'alignment',
  'hub-rings',
  'greasable-shackles',
  'extended-brake-lines',
  'steering-damper',
  'headlight-re-aim',
  'speedometer-recalibration',
  'spring-rating',
];

const NUMBERS_SCHEMA = {
  type: 'object',
  additionalProperties: { type: 'number' },
  description: 'The values behind the verdict, rounded to 0.1, with the unit in the key',
  example: { stockDiameterMm: 776.3, newDiameterMm: 830.8, increaseOverBaseMm: 54.5 },
} as const;

export class FitRuleResponse {
  @ApiProperty({ description: 'Source text of the rule(s) that decided the verdict' })
  source!: string;

  @ApiProperty({ enum: RULE_KEYS, isArray: true, enumName: 'RuleKey' })
  keys!: string[];
}

export class FitCheckResponse {
  @ApiProperty({ enum: FIT_CHECK_CODES, enumName: 'FitCheckCode' })
  code!: string;

  @ApiProperty({ enum: VERDICTS_WORST_FIRST, enumName: 'FitVerdict' })
  verdict!: string;

  @ApiProperty({ description: 'Plain words a customer can read' })
  message!: string;

  @ApiProperty(NUMBERS_SCHEMA)
  numbers!: Record<string, number>;

  @ApiProperty({ type: FitRuleResponse })
  rule!: FitRuleResponse;
}

export class SkippedCheckResponse {
  @ApiProperty({ enum: FIT_CHECK_CODES, enumName: 'FitCheckCode' })
  code!: string;

  @ApiProperty({
    enum: ['disabled-by-rule-set', 'not-applicable', 'missing-data'],
    enumName: 'SkipReason',
  })
  reason!: string;

  @ApiProperty()
  message!: string;
}

export class FitMetricsResponse {
  @ApiProperty({ type: Number, nullable: true, example: 776.3 })
  stockDiameterMm!: number | null;

  @ApiProperty({ type: Number, nullable: true, example: 802.8 })
  newDiameterMm!: number | null;

  @ApiProperty({ type: Number, nullable: true, example: 26.5 })
  diameterChangeMm!: number | null;

  @ApiProperty({ type: Number, nullable: true, example: 3.4 })
  diameterChangePercent!: number | null;

  @ApiProperty({ type: Number, nullable: true, example: 96.7 })
  speedometerAtTrue100Kmh!: number | null;

  @ApiProperty({ type: Number, nullable: true })
  groundClearanceGainMm!: number | null;

  @ApiProperty({ type: Number, nullable: true })
  groundClearanceGainFrontMm!: number | null;

  @ApiProperty({ type: Number, nullable: true })
  groundClearanceGainRearMm!: number | null;

  @ApiProperty({ example: 63.3 })
  combinedLiftMm!: number;

  @ApiProperty({ example: 20 })
  trackChangeMm!: number;

  @ApiProperty({ example: 22.7 })
  outerEdgeChangePerSideMm!: number;

  @ApiProperty({ type: Number, nullable: true, example: 6.3 })
  jointAngleAddedDeg!: number | null;
}

export class SuggestedAdditionResponse {
  @ApiProperty({ enum: ADDITION_ROLES, enumName: 'AdditionRole' })
  role!: string;

  @ApiProperty()
  reason!: string;

  @ApiProperty({ description: 'true: the package is not complete without it (added as a line)' })
  required!: boolean;

  @ApiPropertyOptional({
    format: 'uuid',
    description: 'Spring rating: the product id of the kit rating that covers the load',
  })
  variantId?: string;

  @ApiPropertyOptional(NUMBERS_SCHEMA)
  numbers?: Record<string, number>;
}

export class CautionResponse {
  @ApiProperty({
    enum: [
      'guide-only',
      'handling-and-rollover',
      'modification-limits',
      'insurer',
      'wheel-nut-retorque',
      'qualified-fitting',
    ],
    enumName: 'CautionCode',
  })
  code!: string;

  @ApiProperty()
  message!: string;
}

export class FitReportResponse {
  @ApiProperty({
    enum: VERDICTS_WORST_FIRST,
    enumName: 'FitVerdict',
    description: 'The worst verdict of the checks that ran',
  })
  verdict!: string;

  @ApiProperty({ example: 'National code defaults' })
  ruleSetName!: string;

  @ApiProperty({ type: [FitCheckResponse] })
  checks!: FitCheckResponse[];

  @ApiProperty({ type: [SkippedCheckResponse] })
  skippedChecks!: SkippedCheckResponse[];

  @ApiProperty({ type: FitMetricsResponse })
  metrics!: FitMetricsResponse;

  @ApiProperty({ type: [SuggestedAdditionResponse] })
  suggestedAdditions!: SuggestedAdditionResponse[];

  @ApiProperty({ type: [CautionResponse] })
  cautions!: CautionResponse[];

  static from(report: FitReport): FitReportResponse {
    return Object.assign(new FitReportResponse(), {
      verdict: report.verdict,
      ruleSetName: report.ruleSetName,
      checks: report.checks.map((check) => ({
        code: check.code,
        verdict: check.verdict,
        message: check.message,
        numbers: { ...check.numbers },
        rule: { source: check.rule.source, keys: [...check.rule.keys] },
      })),
      skippedChecks: report.skippedChecks.map((skipped) => ({ ...skipped })),
      metrics: { ...report.metrics },
      suggestedAdditions: report.suggestedAdditions.map((addition) => ({
        ...addition,
        ...(addition.numbers ? { numbers: { ...addition.numbers } } : {}),
      })),
      cautions: report.cautions.map((caution) => ({ ...caution })),
    });
  }
}
