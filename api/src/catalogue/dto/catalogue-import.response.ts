import { ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';

export const IMPORT_ROW_STATUSES = ['new', 'updated', 'unchanged', 'rejected'] as const;
export type ImportRowStatus = (typeof IMPORT_ROW_STATUSES)[number];

export class ImportSummaryResponse {
  @ApiProperty({ example: 2 })
  new!: number;

  @ApiProperty({ example: 5 })
  updated!: number;

  @ApiProperty({ example: 40 })
  unchanged!: number;

  @ApiProperty({ example: 1 })
  rejected!: number;
}

export class FieldChangeResponse {
  @ApiProperty({ description: 'Stored value (product field, e.g. priceCents in cents)' })
  from!: unknown;

  @ApiProperty({ description: 'Value from the file' })
  to!: unknown;
}

export class ImportRowResponse {
  @ApiProperty({ example: 3, description: 'Line of the file (the header is line 1)' })
  line!: number;

  @ApiProperty({ example: 'BR-STR-50-M', description: 'As written in the file' })
  sku!: string;

  @ApiProperty({ enum: IMPORT_ROW_STATUSES, enumName: 'ImportRowStatus' })
  status!: ImportRowStatus;

  @ApiPropertyOptional({
    example: 'price has more than 2 decimals',
    description: 'Rejected rows: why',
  })
  reason?: string;

  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: { $ref: getSchemaPath(FieldChangeResponse) },
    example: { priceCents: { from: 189500, to: 194900 } },
    description: 'Updated rows: each changed product field (API field names)',
  })
  changes?: Record<string, FieldChangeResponse>;
}

export class ImportPreviewResponse {
  @ApiProperty({ type: ImportSummaryResponse })
  summary!: ImportSummaryResponse;

  @ApiProperty({ type: [ImportRowResponse] })
  rows!: ImportRowResponse[];
}

/** What apply did: the same summary and rows as the preview, now written. */
export class ImportApplyResponse extends ImportPreviewResponse {}
