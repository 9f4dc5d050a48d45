import { ApiProperty } from '@nestjs/swagger';
import { QUOTE_VERSION_STATES } from '../quote-states';
import { QuoteCustomerResponse } from './quote.response';

export class QuoteSummaryVersionResponse {
  @ApiProperty()
  number!: number;

  @ApiProperty({ enum: QUOTE_VERSION_STATES, enumName: 'QuoteVersionState' })
  state!: string;

  @ApiProperty()
  totalCents!: number;

  @ApiProperty()
  depositCents!: number;

  @ApiProperty({ example: '2026-12-31' })
  validUntilDate!: string;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;
}

export class QuoteSummaryResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty()
  number!: number;

  @ApiProperty({ example: 'Q-000123' })
  reference!: string;

  @ApiProperty({ type: QuoteCustomerResponse })
  customer!: QuoteCustomerResponse;

  @ApiProperty({ example: 'Vantrel Strata SR dual cab' })
  vehicleName!: string;

  @ApiProperty({ type: QuoteSummaryVersionResponse })
  latestVersion!: QuoteSummaryVersionResponse;

  @ApiProperty()
  versionCount!: number;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;
}

export class QuoteListResponse {
  @ApiProperty({ type: [QuoteSummaryResponse], description: 'Newest first, at most 200' })
  items!: QuoteSummaryResponse[];
}
