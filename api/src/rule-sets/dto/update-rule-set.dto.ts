import { ApiProperty, getSchemaPath } from '@nestjs/swagger';
import { IsDefined, IsObject } from 'class-validator';

/** Documentation of one rule's change; the service checks the keys against the rule set. */
export class RuleLimitPatch {
  @ApiProperty({ required: false })
  enabled?: boolean;

  @ApiProperty({ required: false, description: 'Numeric rules only', example: 40 })
  value?: number;
}

export class UpdateRuleSetDto {
  @ApiProperty({
    type: 'object',
    additionalProperties: { $ref: getSchemaPath(RuleLimitPatch) },
    example: { suspensionLiftMaxMm: { value: 40 }, diameterChangeMaxPercent: { enabled: true } },
    description:
      'Rule key → { enabled?, value? }. Unknown keys, and a value for a switch, are refused.',
  })
  @IsDefined({ message: 'is required' })
  @IsObject({ message: 'must be an object of rule keys' })
  limits!: Record<string, unknown>;
}
