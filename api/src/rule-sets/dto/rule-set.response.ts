import { ApiProperty, getSchemaPath } from '@nestjs/swagger';
import { RULE_KEYS } from '../../fitment/rule-set-limits';
import type { RuleSet } from '../entities/rule-set.entity';
import { RULE_KEY_LABELS } from '../rule-key-labels';

export class RuleLimitResponse {
  @ApiProperty({ description: 'false: the rule is switched off and its check does not run' })
  enabled!: boolean;

  @ApiProperty({
    type: Number,
    nullable: true,
    example: 50,
    description: 'null for a switch (a rule without a number)',
  })
  value!: number | null;

  @ApiProperty({ type: String, nullable: true, example: 'mm', description: 'null for a switch' })
  unit!: string | null;

  @ApiProperty({ description: "The rule's published source, quoted in the fit report" })
  source!: string;

  @ApiProperty({ example: 'Largest suspension raise or lowering without certification' })
  label!: string;
}

export class RuleSetResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'National code defaults' })
  name!: string;

  @ApiProperty({ example: 'AU (VSB 14 Section LS and state codes as quoted)' })
  jurisdiction!: string;

  @ApiProperty()
  description!: string;

  @ApiProperty({ description: 'Used by the fit report when no rule set is named' })
  isDefault!: boolean;

  @ApiProperty({
    type: 'object',
    additionalProperties: { $ref: getSchemaPath(RuleLimitResponse) },
    description: 'Every rule key, in report order',
  })
  limits!: Record<string, RuleLimitResponse>;

  static from(ruleSet: RuleSet): RuleSetResponse {
    const limits: Record<string, RuleLimitResponse> = {};
    for (const key of RULE_KEYS) {
      const rule = ruleSet.limits[key];
      limits[key] = {
        enabled: rule.enabled,
        value: 'value' in rule ? rule.value : null,
        unit: 'unit' in rule ? rule.unit : null,
        source: rule.source,
        label: RULE_KEY_LABELS[key],
      };
    }
    return Object.assign(new RuleSetResponse(), {
      id: ruleSet.id,
      name: ruleSet.name,
      jurisdiction: ruleSet.jurisdiction,
      description: ruleSet.description,
      isDefault: ruleSet.isDefault,
      limits,
    });
  }
}

export class RuleSetListResponse {
  @ApiProperty({ type: [RuleSetResponse] })
  items!: RuleSetResponse[];
}
